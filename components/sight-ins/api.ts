import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import type { OutboxItem } from '@/components/offline/outbox';
import { sendOrKeep } from '@/components/offline/send-or-keep';
import { sightInSchema, type SightIn, type SightInInput, type SightInUpdate } from '@/shared/sight-in';

/** Query keys for sight-ins. */
export const sightInKeys = {
  all: ['sightIns'] as const,
  detail: (id: number) => ['sightIns', id] as const,
};

const sightInResponse = z.object({ sightIn: sightInSchema });

/** GET /api/sight-ins/:id: the sight-in with its marks and stored fit. */
export async function fetchSightIn(id: number): Promise<SightIn> {
  const { sightIn } = await apiFetch(`/api/sight-ins/${id}`, { schema: sightInResponse });
  return sightIn;
}

/**
 * One sight-in with its marks and the fit the server stored.
 * Example: `const sight-in = useSightIn(12); sightIn.data?.marks.length`
 */
export function useSightIn(id: number | undefined) {
  return useQuery<SightIn, ApiError>({
    queryKey: sightInKeys.detail(id ?? 0),
    queryFn: () => fetchSightIn(id as number),
    enabled: typeof id === 'number' && Number.isInteger(id) && id > 0,
  });
}

/**
 * A new sight-in for a bow (bowId, whole input) or an edit of one (id, any
 * subset; marks replace the whole set). `title` names it in the outbox;
 * `outboxId`, the item a previous offline save of the same form was kept
 * as (saving again replaces it while it waits).
 */
export type SaveSightInVariables = {
  id?: number;
  bowId?: number;
  input: SightInInput | SightInUpdate;
  title?: string;
  outboxId?: string;
};

/** Saved on the server, or kept on this phone to send when the signal is back (components/offline). */
export type SaveSightInResult = { kept: false; sightIn: SightIn } | { kept: true; item: OutboxItem };

/**
 * Saves a sight-in with all its marks in one request (POST /api/bows/:bowId/sight-ins
 * or PATCH /api/sight-ins/:id), with an idempotency key; the server refits and
 * stores the fit. With no signal the save is kept in the outbox instead.
 * Example: `useSaveSightIn().mutate({ bowId: 3, input }, { onSuccess: (r) => r.kept || router.replace(`/sight-ins/${r.sightIn.id}`) })`
 */
export function useSaveSightIn() {
  const queryClient = useQueryClient();
  return useMutation<SaveSightInResult, ApiError, SaveSightInVariables>({
    mutationFn: async ({ id, bowId, input, title, outboxId }) => {
      const path = id ? `/api/sight-ins/${id}` : `/api/bows/${bowId}/sight-ins`;
      const marks = input.marks?.length ?? 0;
      const result = await sendOrKeep(
        queryClient,
        {
          id: outboxId,
          kind: id ? 'marks' : 'sight-in',
          title: title ?? (id ? `Marks of a sight-in (${marks})` : `New sight-in · ${marks} marks`),
          method: id ? 'PATCH' : 'POST',
          path,
          body: input,
          bowId: bowId ?? null,
          recordId: id ?? null,
        },
        sightInResponse,
      );
      return result.kept ? result : { kept: false, sightIn: result.data.sightIn };
    },
    onSuccess: (result) => {
      if (result.kept) return;
      queryClient.setQueryData(sightInKeys.detail(result.sightIn.id), result.sightIn);
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}

/**
 * Deletes a sight-in with its marks and tapes (DELETE /api/sight-ins/:id).
 * Example: `useDeleteSightIn().mutate(sight-in)`
 */
export function useDeleteSightIn() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, Pick<SightIn, 'id' | 'bowId'>>({
    mutationFn: ({ id }) => apiFetch<void>(`/api/sight-ins/${id}`, { method: 'DELETE' }),
    onSuccess: (_, sightIn) => {
      queryClient.removeQueries({ queryKey: sightInKeys.detail(sightIn.id) });
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}
