import { useQuery } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { compareResponseSchema, type CompareResponse } from '@/shared/compare';

/** What the compare screen asks for: 2–4 builds (the first is the reference), forgiveness distance, optional common air. */
export interface CompareParams {
  builds: number[];
  at: number;
  altitudeM?: number;
  temperatureC?: number;
}

/**
 * The query string of GET /api/bows/:bowId/compare.
 * Example: compareQueryString({ builds: [3, 4], at: 40 }) → 'builds=3%2C4&at=40'
 */
export function compareQueryString(params: CompareParams): string {
  const query = new URLSearchParams({ builds: params.builds.join(','), at: String(params.at) });
  if (params.altitudeM !== undefined) query.set('altitudeM', String(params.altitudeM));
  if (params.temperatureC !== undefined) query.set('temperatureC', String(params.temperatureC));
  return query.toString();
}

/** Query keys: under 'bows', so a change to any bow's records refreshes comparisons too. */
export const compareKeys = {
  compare: (bowId: number, query: string) => ['bows', 'compare', bowId, query] as const,
};

/**
 * The comparison of builds on one bow; waits until two builds are chosen.
 * Example: `const compare = useCompare(3, { builds: [5, 6], at: 40 }); compare.data?.comparison.rows`
 */
export function useCompare(bowId: number, params: CompareParams) {
  const query = compareQueryString(params);
  return useQuery<CompareResponse, ApiError>({
    queryKey: compareKeys.compare(bowId, query),
    queryFn: () => apiFetch(`/api/bows/${bowId}/compare?${query}`, { schema: compareResponseSchema }),
    enabled: params.builds.length >= 2,
    placeholderData: (previous) => previous,
    retry: false,
  });
}
