import { useQuery } from '@tanstack/react-query';

import { authKeys, fetchMe } from '@/components/auth/api';
import type { User } from '@/shared/auth';
import type { UnitsLike } from '@/shared/units';

/**
 * The signed-in archer's unit choices from the account already loaded (the
 * signed-in layout loads it); never fetches on its own. Undefined before
 * then: shared/units then shows stored units (mm, m, °C, fps, grains).
 * Example: `const units = useUnits(); shownUnit('altitude', units)` → 'ft'
 */
export function useUnits(): UnitsLike {
  const me = useQuery<User | null>({ queryKey: authKeys.me, queryFn: fetchMe, enabled: false, staleTime: Infinity });
  return me.data ?? undefined;
}
