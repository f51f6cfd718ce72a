import type { QueryClient } from '@tanstack/react-query';
import type { ZodType, ZodTypeDef } from 'zod';

import { apiFetch, idempotencyHeader, isApiError } from '@/components/api/client';
import { isOnline, reportNoNetwork } from '@/components/offline/connectivity';
import { keepInOutbox, newOutboxId, type NewOutboxItem, type OutboxItem } from '@/components/offline/outbox';

/** A write's outcome: the server's answer, or kept on the device to send later. */
export type SentOrKept<T> = { kept: false; data: T } | { kept: true; item: OutboxItem };

/** The signed-in account's id, from the cached "who am I" query. */
export function signedInUserId(queryClient: QueryClient): number | null {
  const me = queryClient.getQueryData<{ id: number } | null>(['me']);
  return me && typeof me.id === 'number' ? me.id : null;
}

/**
 * Sends a write now when the server can be reached, with a fresh
 * idempotency key; with no network (known before, or found on the way) it
 * is kept in the outbox under that same key, so if the first try did reach
 * the server the later send is answered from it and nothing is written
 * twice. Any other failure is thrown as before (the form shows it).
 * Example: `await sendOrKeep(queryClient, { kind: 'change', title: 'String changed', method: 'POST', path: '/api/bows/3/changes', body, bowId: 3, recordId: null })`
 */
export async function sendOrKeep<T>(
  queryClient: QueryClient,
  write: Omit<NewOutboxItem, 'userId'>,
  schema?: ZodType<T, ZodTypeDef, unknown>,
): Promise<SentOrKept<T>> {
  const userId = signedInUserId(queryClient);
  const id = write.id ?? newOutboxId();
  if (userId !== null && !isOnline()) return { kept: true, item: await keepInOutbox({ ...write, id, userId }) };
  try {
    const data = await apiFetch<T>(write.path, { method: write.method, body: write.body, schema, headers: { [idempotencyHeader]: id } });
    return { kept: false, data };
  } catch (error) {
    if (userId === null || !isApiError(error) || error.status !== 0) throw error;
    reportNoNetwork();
    return { kept: true, item: await keepInOutbox({ ...write, id, userId }) };
  }
}
