import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import { sessionSchema, type Session, type SessionInput, type SessionUpdate } from '@/shared/session';

/** Query keys for sight-in sessions. */
export const sessionKeys = {
  all: ['sessions'] as const,
  detail: (id: number) => ['sessions', id] as const,
};

const sessionResponse = z.object({ session: sessionSchema });

/** GET /api/sessions/:id: the session with its marks and stored fit. */
export async function fetchSession(id: number): Promise<Session> {
  const { session } = await apiFetch(`/api/sessions/${id}`, { schema: sessionResponse });
  return session;
}

/**
 * One sight-in session with its marks and the fit the server stored.
 * Example: `const session = useSession(12); session.data?.marks.length`
 */
export function useSession(id: number | undefined) {
  return useQuery<Session, ApiError>({
    queryKey: sessionKeys.detail(id ?? 0),
    queryFn: () => fetchSession(id as number),
    enabled: typeof id === 'number' && Number.isInteger(id) && id > 0,
  });
}

/** A new session for a bow (bowId, whole input) or an edit of one (id, any subset; marks replace the whole set). */
export type SaveSessionVariables = { id?: number; bowId?: number; input: SessionInput | SessionUpdate };

/**
 * Saves a session with all its marks in one request (POST /api/bows/:bowId/sessions
 * or PATCH /api/sessions/:id); the server refits and stores the fit.
 * Example: `useSaveSession().mutate({ bowId: 3, input }, { onSuccess: (s) => router.replace(`/sessions/${s.id}`) })`
 */
export function useSaveSession() {
  const queryClient = useQueryClient();
  return useMutation<Session, ApiError, SaveSessionVariables>({
    mutationFn: async ({ id, bowId, input }) => {
      const path = id ? `/api/sessions/${id}` : `/api/bows/${bowId}/sessions`;
      const { session } = await apiFetch(path, { method: id ? 'PATCH' : 'POST', body: input, schema: sessionResponse });
      return session;
    },
    onSuccess: (session) => {
      queryClient.setQueryData(sessionKeys.detail(session.id), session);
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}

/**
 * Deletes a session with its marks and tapes (DELETE /api/sessions/:id).
 * Example: `useDeleteSession().mutate(session)`
 */
export function useDeleteSession() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, Pick<Session, 'id' | 'bowId'>>({
    mutationFn: ({ id }) => apiFetch<void>(`/api/sessions/${id}`, { method: 'DELETE' }),
    onSuccess: (_, session) => {
      queryClient.removeQueries({ queryKey: sessionKeys.detail(session.id) });
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}
