import { useQuery } from '@tanstack/react-query';

import { apiFetch, ApiError, isApiError } from '@/components/api/client';
import { bowListResponseSchema, type BowSummary } from '@/shared/bow';

/**
 * Query key of the archer's bow list. The same key and schema as the bows
 * feature's list (components/bows/api.ts), so both read one cache entry and
 * invalidating ['bows'] refreshes the home screen.
 */
export const homeKeys = {
  bows: ['bows', 'list'] as const,
};

/** Fetches the signed-in archer's bows with their readiness. A 404 (no bows API on this server yet) counts as no bows. */
export async function fetchHomeBows(): Promise<BowSummary[]> {
  try {
    const { bows } = await apiFetch('/api/bows', { schema: bowListResponseSchema });
    return bows;
  } catch (error) {
    if (isApiError(error, 404)) return [];
    throw error;
  }
}

/**
 * The archer's bows for the home screen (labelled "Bench").
 * Example: `const bows = useHomeBows(); bows.data?.length`
 */
export function useHomeBows() {
  return useQuery<BowSummary[], ApiError>({ queryKey: homeKeys.bows, queryFn: fetchHomeBows });
}
