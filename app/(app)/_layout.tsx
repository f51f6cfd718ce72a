import { useQueryClient } from '@tanstack/react-query';
import { Redirect, Slot, usePathname } from 'expo-router';
import { useDeferredValue, useEffect } from 'react';

import { useMe } from '@/components/auth/api';
import { fetchHomeBows, homeKeys } from '@/components/home/api';
import { AppShell } from '@/components/shell/app-shell';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';

export const unstable_settings = { initialRouteName: 'index' };

// The one sign-in gate for every signed-in page. A Slot keeps the back stack but
// renders only the page in front, so pages left behind leave nothing in the DOM.
export default function SignedInLayout() {
  const me = useMe();
  useBenchAlongsideSignInCheck(me.isPending);
  // The check's answer comes as an urgent update (React Query reads its cache with
  // useSyncExternalStore), which would draw the whole shell and page behind it in one
  // block of the main thread. Deferred, React draws them in short slices between which
  // the page stays responsive, and keeps "Opening…" meanwhile (React docs, useDeferredValue).
  const answered = useDeferredValue(!me.isPending);
  if (me.isPending || !answered) return <LoadingView label="Opening your bench…" />;
  if (me.isError) {
    return (
      <ErrorView
        title="Pinwright could not check who is signed in"
        error={me.error}
        onRetry={() => me.refetch()}
        retrying={me.isFetching}
      />
    );
  }
  if (!me.data) return <Redirect href="/sign-in" />;
  return (
    <AppShell user={me.data}>
      <Slot />
    </AppShell>
  );
}

/**
 * On a cold load of the Bench, its bow list is asked for alongside the sign-in
 * check instead of after it: one round trip before the Bench shows, not two.
 * Signed out, that one request is refused (401) and the page moves to sign-in.
 * It is asked for in a task of its own, a moment after the layout mounts: the
 * bow list's schemas are built on first use, and together with the effects of
 * the first commit that made one long task of the main thread.
 */
function useBenchAlongsideSignInCheck(checking: boolean) {
  const pathname = usePathname();
  const queryClient = useQueryClient();
  useEffect(() => {
    if (!(checking && pathname === '/')) return;
    const later = setTimeout(() => void queryClient.prefetchQuery({ queryKey: homeKeys.bows, queryFn: fetchHomeBows }));
    return () => clearTimeout(later);
    // Only when the layout first mounts: later visits to the Bench fetch as usual.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
}
