import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, ApiError, isApiError } from '@/components/api/client';

/** Query keys for the bench (the list of the archer's bows). */
export const benchKeys = {
  bows: ['bows'] as const,
};

/**
 * The few bow fields the bench list reads. Interim: once the bows API lands with
 * its schema in shared/, replace this with that schema (types are never written twice).
 * Unknown fields pass through untouched.
 */
export const benchBowSchema = z
  .object({
    id: z.number().int(),
    nickname: z.string(),
    /** Level readiness, when the server reports it. */
    levelStatus: z.enum(['verified', 'due', 'failed', 'none']).optional(),
  })
  .passthrough();

export type BenchBow = z.infer<typeof benchBowSchema>;

const bowsResponse = z.object({ bows: z.array(benchBowSchema) });

/** Fetches the signed-in archer's bows. Until the bows API exists, its 404 counts as no bows. */
export async function fetchBows(): Promise<BenchBow[]> {
  try {
    const { bows } = await apiFetch('/api/bows', { schema: bowsResponse });
    return bows;
  } catch (error) {
    if (isApiError(error, 404)) return [];
    throw error;
  }
}

/**
 * The archer's bows for the bench.
 * Example: `const bows = useBows(); bows.data?.length`
 */
export function useBows() {
  return useQuery<BenchBow[], ApiError>({ queryKey: benchKeys.bows, queryFn: fetchBows });
}
