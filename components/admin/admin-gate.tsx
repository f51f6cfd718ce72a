import type { ReactNode } from 'react';

import { useMe } from '@/components/auth/api';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';

/**
 * Renders its children for an administrator only; anyone else gets the
 * "no page here" screen (the API refuses them anyway).
 * Example: in app/(app)/admin/_layout.tsx, `<AdminGate><Stack /></AdminGate>`
 */
export function AdminGate({ children }: { children: ReactNode }) {
  const me = useMe();
  if (me.isPending) return <LoadingView />;
  if (me.data?.role !== 'admin') return <NotFoundScreen />;
  return <>{children}</>;
}
