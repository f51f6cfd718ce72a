import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { ApiError, apiFetch } from '@/components/api/client';
import { arrowSetSchema, type ArrowSet, type ArrowSetInput, type ArrowUpdate } from '@/shared/arrow-set';

/** Query keys of arrow sets; every key starts with 'arrow-sets'. */
export const arrowSetKeys = {
  all: ['arrow-sets'] as const,
  ofBuild: (buildId: number) => ['arrow-sets', buildId] as const,
};

const setsResponse = z.object({ sets: z.array(arrowSetSchema) });
const setResponse = z.object({ set: arrowSetSchema });

/** A build's arrow sets. */
export function useArrowSets(buildId: number | undefined) {
  return useQuery<ArrowSet[], ApiError>({
    queryKey: arrowSetKeys.ofBuild(buildId ?? 0),
    queryFn: async () => (await apiFetch(`/api/builds/${buildId}/arrow-sets`, { schema: setsResponse })).sets,
    enabled: typeof buildId === 'number' && Number.isInteger(buildId) && buildId > 0,
  });
}

/** Adds a set with its arrows. */
export function useAddArrowSet(buildId: number) {
  const queryClient = useQueryClient();
  return useMutation<ArrowSet, ApiError, ArrowSetInput>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/builds/${buildId}/arrow-sets`, { method: 'POST', body: input, schema: setResponse })).set,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: arrowSetKeys.ofBuild(buildId) }),
  });
}

/** Changes one arrow (status, note, spin, weight). */
export function useUpdateArrow(buildId: number) {
  const queryClient = useQueryClient();
  return useMutation<ArrowSet, ApiError, { arrowId: number; update: ArrowUpdate }>({
    mutationFn: async ({ arrowId, update }) =>
      (await apiFetch(`/api/arrows/${arrowId}`, { method: 'PATCH', body: update, schema: setResponse })).set,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: arrowSetKeys.ofBuild(buildId) }),
  });
}

/** Records that an arrow flew out of the group at a sight-in. */
export function useAddFlier(buildId: number) {
  const queryClient = useQueryClient();
  return useMutation<ArrowSet, ApiError, { arrowId: number; sightInId: number }>({
    mutationFn: async ({ arrowId, sightInId }) =>
      (await apiFetch(`/api/arrows/${arrowId}/fliers`, { method: 'POST', body: { sightInId, note: '' }, schema: setResponse })).set,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: arrowSetKeys.ofBuild(buildId) }),
  });
}
