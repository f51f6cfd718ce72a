import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowListResponseSchema, bowSchema, type Bow, type BowInput, type BowSummary, type BowUpdate } from '@/shared/bow';
import { bowDetailSchema, type BowDetail } from '@/shared/bow-detail';

/**
 * Query keys for bows. Every bow-related key starts with 'bows', so
 * invalidating bowKeys.all refreshes the Bench list and every open bow.
 */
export const bowKeys = {
  all: ['bows'] as const,
  list: ['bows', 'list'] as const,
  detail: (id: number) => ['bows', 'detail', id] as const,
};

const bowResponse = z.object({ bow: bowSchema });
const bowDetailResponse = z.object({ bow: bowDetailSchema });

/** GET /api/bows: the signed-in archer's bows with their readiness. */
export async function fetchBows(): Promise<BowSummary[]> {
  const { bows } = await apiFetch('/api/bows', { schema: bowListResponseSchema });
  return bows;
}

/** GET /api/bows/:id: one bow with its builds, sight-ins (newest first) and tapes. */
export async function fetchBow(id: number): Promise<BowDetail> {
  const { bow } = await apiFetch(`/api/bows/${id}`, { schema: bowDetailResponse });
  return bow;
}

/**
 * The archer's bows with readiness (Bench).
 * Example: `const bows = useBows(); bows.data?.map((bow) => bow.nickname)`
 */
export function useBows() {
  return useQuery<BowSummary[], ApiError>({ queryKey: bowKeys.list, queryFn: fetchBows });
}

/**
 * One bow with its builds, sight-ins and tapes. Disabled until `id` is a number.
 * Example: `const bow = useBow(3); bow.data?.builds.length`
 */
export function useBow(id: number | undefined) {
  return useQuery<BowDetail, ApiError>({
    queryKey: bowKeys.detail(id ?? 0),
    queryFn: () => fetchBow(id as number),
    enabled: typeof id === 'number' && Number.isInteger(id) && id > 0,
  });
}

/** What useSaveBow takes: a new bow (no id) or a whole edited bow (with id). */
export type SaveBowVariables = { id?: number; input: BowInput | BowUpdate };

/**
 * Creates (POST /api/bows) or updates (PATCH /api/bows/:id) a bow; refreshes every bow query.
 * Example: `useSaveBow().mutate({ input }, { onSuccess: (bow) => router.replace(`/bows/${bow.id}`) })`
 */
export function useSaveBow() {
  const queryClient = useQueryClient();
  return useMutation<Bow, ApiError, SaveBowVariables>({
    mutationFn: async ({ id, input }) => {
      const path = id ? `/api/bows/${id}` : '/api/bows';
      const { bow } = await apiFetch(path, { method: id ? 'PATCH' : 'POST', body: input, schema: bowResponse });
      return bow;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bowKeys.all }),
  });
}

/**
 * Deletes a bow with all its builds, sight-ins and tapes (DELETE /api/bows/:id).
 * Example: `useDeleteBow().mutate(3, { onSuccess: () => router.replace('/') })`
 */
export function useDeleteBow() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, number>({
    mutationFn: (id) => apiFetch<void>(`/api/bows/${id}`, { method: 'DELETE' }),
    onSuccess: (_, id) => {
      queryClient.removeQueries({ queryKey: bowKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}
