import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import { tapeSchema, type Tape, type TapeLayout } from '@/shared/tape';

const tapeResponse = z.object({ tape: tapeSchema });

/** A new layout for a sight-in (sightInId) or an edit of a saved one (id). */
export type SaveTapeVariables = { id?: number; sightInId?: number; input: TapeLayout };

/**
 * Saves a tape layout (POST /api/sight-ins/:sightInId/tapes or PATCH /api/tapes/:id);
 * the bow's tape list and readiness refresh.
 * Example: `useSaveTape().mutate({ sightInId: 12, input: layout })`
 */
export function useSaveTape() {
  const queryClient = useQueryClient();
  return useMutation<Tape, ApiError, SaveTapeVariables>({
    mutationFn: async ({ id, sightInId, input }) => {
      const path = id ? `/api/tapes/${id}` : `/api/sight-ins/${sightInId}/tapes`;
      const { tape } = await apiFetch(path, { method: id ? 'PATCH' : 'POST', body: input, schema: tapeResponse });
      return tape;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bowKeys.all }),
  });
}

/**
 * Deletes a saved tape layout (DELETE /api/tapes/:id).
 * Example: `useDeleteTape().mutate(tape.id)`
 */
export function useDeleteTape() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, number>({
    mutationFn: (id) => apiFetch<void>(`/api/tapes/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bowKeys.all }),
  });
}
