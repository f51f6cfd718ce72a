import { useQuery } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { tripByBuildSchema, type TripByBuild } from '@/shared/trip';

/** Under the level keys, so every write that refreshes the level refreshes this too. */
export const tripKeys = { byBuild: (bowId: number) => ['level', 'trip', bowId] as const };

/**
 * Before a trip, build by build (GET /api/bows/:bowId/readiness, parsed with
 * its builds): the level, then each build's latest sight-in, tape and warnings.
 * Example: `useTripByBuild(3).data?.builds[0].tape?.fromLatestSightIn` → true
 */
export function useTripByBuild(bowId: number) {
  return useQuery<TripByBuild, ApiError>({
    queryKey: tripKeys.byBuild(bowId),
    queryFn: () => apiFetch(`/api/bows/${bowId}/readiness`, { schema: tripByBuildSchema }),
    enabled: Number.isInteger(bowId) && bowId > 0,
    staleTime: 0,
  });
}
