import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import type { OutboxItem } from '@/components/offline/outbox';
import { sendOrKeep } from '@/components/offline/send-or-keep';
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

/**
 * A new session for a bow (bowId, whole input) or an edit of one (id, any
 * subset; marks replace the whole set). `title` names it in the outbox;
 * `outboxId`, the item a previous offline save of the same form was kept
 * as (saving again replaces it while it waits).
 */
export type SaveSessionVariables = {
  id?: number;
  bowId?: number;
  input: SessionInput | SessionUpdate;
  title?: string;
  outboxId?: string;
};

/** Saved on the server, or kept on this phone to send when the signal is back (components/offline). */
export type SaveSessionResult = { kept: false; session: Session } | { kept: true; item: OutboxItem };

/**
 * Saves a session with all its marks in one request (POST /api/bows/:bowId/sessions
 * or PATCH /api/sessions/:id), with an idempotency key; the server refits and
 * stores the fit. With no signal the save is kept in the outbox instead.
 * Example: `useSaveSession().mutate({ bowId: 3, input }, { onSuccess: (r) => r.kept || router.replace(`/sessions/${r.session.id}`) })`
 */
export function useSaveSession() {
  const queryClient = useQueryClient();
  return useMutation<SaveSessionResult, ApiError, SaveSessionVariables>({
    mutationFn: async ({ id, bowId, input, title, outboxId }) => {
      const path = id ? `/api/sessions/${id}` : `/api/bows/${bowId}/sessions`;
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
        sessionResponse,
      );
      return result.kept ? result : { kept: false, session: result.data.session };
    },
    onSuccess: (result) => {
      if (result.kept) return;
      queryClient.setQueryData(sessionKeys.detail(result.session.id), result.session);
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
