import type { QueryClient } from '@tanstack/react-query';

import { ApiError, apiFetch, idempotencyHeader, isApiError, type ApiMethod } from '@/components/api/client';
import { isOnline, reportNoNetwork } from '@/components/offline/connectivity';
import { outboxDb } from '@/components/offline/device-store';

/**
 * The outbox: writes made where the server cannot be reached (a new
 * sight-in, new marks on one, a level check's steps, a logged change) are
 * kept on the device (IndexedDB, so they outlive the tab and the browser)
 * and sent in the order they were made once the server answers again.
 *
 * Each write carries its own idempotency key, sent as the `Idempotency-Key`
 * header every time it is tried: the server runs it once and answers a
 * repeat from the first (server/middleware/idempotency.ts), so a write
 * whose answer was lost on a weak signal is never made twice.
 *
 * When the server refuses a write (the bow was deleted, a share revoked,
 * the marks are no longer valid) it stays on the device as "refused", with
 * the server's reason, until the archer copies or discards it: nothing is
 * dropped without them seeing it.
 */

export type OutboxKind = 'sight-in' | 'marks' | 'check-steps' | 'change';

export interface OutboxRefusal {
  status: number;
  code: string;
  message: string;
  fields: Record<string, string>;
}

export interface OutboxItem {
  /** The idempotency key, also the item's id. */
  id: string;
  /** The account that made the write (only that account sends or sees it). */
  userId: number;
  kind: OutboxKind;
  /** One line for the archer, e.g. "New sight-in on Elk 415 · 3 marks". */
  title: string;
  /** When the write was made on the device (ISO 8601). */
  createdAt: string;
  /** Sending order: earlier first. */
  seq: number;
  method: ApiMethod;
  path: string;
  body: unknown;
  /** The bow the write belongs to (for lists on the bow's screens). */
  bowId: number | null;
  /** The record the write changes, when it exists (a saved sight-in, a check). */
  recordId: number | null;
  state: 'waiting' | 'sending' | 'refused';
  refusal: OutboxRefusal | null;
  /** Tries so far that found no network or a busy server. */
  attempts: number;
}

/** What a sent write produced (kept in memory, for the screen that made it). */
export interface OutboxSent {
  id: string;
  kind: OutboxKind;
  response: unknown;
}

type Listener = () => void;

let items: OutboxItem[] = [];
let loadedFor: number | null = null;
let loading: Promise<void> | null = null;
let sending = false;
const listeners = new Set<Listener>();
const sentListeners = new Set<(sent: OutboxSent) => void>();
let afterSend: ((queryClient: QueryClient, sent: OutboxSent) => void) | null = null;

function emit() {
  items = [...items];
  for (const listener of listeners) listener();
}

/** A new idempotency key (random UUID where the browser has one). */
export function newOutboxId(): string {
  const cryptoApi = (globalThis as { crypto?: { randomUUID?: () => string } }).crypto;
  if (cryptoApi?.randomUUID) return cryptoApi.randomUUID();
  return `k${Date.now().toString(36)}${Math.random().toString(36).slice(2, 12)}${Math.random().toString(36).slice(2, 12)}`;
}

/** Subscribes to changes of the outbox (for useSyncExternalStore). */
export function subscribeOutbox(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Subscribes to writes as they reach the server. */
export function onOutboxSent(listener: (sent: OutboxSent) => void): () => void {
  sentListeners.add(listener);
  return () => sentListeners.delete(listener);
}

/** Every item of the loaded account, oldest first. */
export const outboxItems = () => items;

/** Loads `userId`'s items from the device (other accounts' items stay stored, unseen). */
export function loadOutbox(userId: number): Promise<void> {
  if (loadedFor === userId && loading) return loading;
  loadedFor = userId;
  loading = (async () => {
    const stored = await outboxDb.all<OutboxItem>();
    if (loadedFor !== userId) return;
    // A write cut off mid-send (tab closed) is simply tried again: its key makes that safe.
    items = stored
      .filter((item) => item.userId === userId)
      .map((item) => (item.state === 'sending' ? { ...item, state: 'waiting' as const } : item))
      .sort((a, b) => a.seq - b.seq);
    emit();
  })();
  return loading;
}

/** Forgets the loaded list (in memory only), e.g. when nobody is signed in. */
export function unloadOutbox() {
  loadedFor = null;
  loading = null;
  items = [];
  emit();
}

/** Deletes every item of `userId` from the device (sign-out on a shared phone). */
export async function clearOutbox(userId: number) {
  const stored = await outboxDb.all<OutboxItem>();
  await outboxDb.delMany(stored.filter((item) => item.userId === userId).map((item) => item.id));
  if (loadedFor === userId) unloadOutbox();
}

async function save(item: OutboxItem) {
  const index = items.findIndex((other) => other.id === item.id);
  if (index >= 0) items[index] = item;
  else items.push(item);
  items.sort((a, b) => a.seq - b.seq);
  emit();
  await outboxDb.put(item.id, item);
}

export type NewOutboxItem = Pick<OutboxItem, 'userId' | 'kind' | 'title' | 'method' | 'path' | 'body' | 'bowId' | 'recordId'> & {
  id?: string;
};

/**
 * Keeps a write on the device. With the id of a waiting item, that item's
 * request is replaced (the archer saved again before it went out).
 */
export async function keepInOutbox(write: NewOutboxItem): Promise<OutboxItem> {
  if (loadedFor !== write.userId) await loadOutbox(write.userId);
  const existing = write.id ? items.find((item) => item.id === write.id && item.state === 'waiting') : undefined;
  const item: OutboxItem = existing
    ? { ...existing, title: write.title, body: write.body, method: write.method, path: write.path }
    : {
        id: write.id ?? newOutboxId(),
        userId: write.userId,
        kind: write.kind,
        title: write.title,
        createdAt: new Date().toISOString(),
        seq: Date.now() + items.length / 1000,
        method: write.method,
        path: write.path,
        body: write.body,
        bowId: write.bowId,
        recordId: write.recordId,
        state: 'waiting',
        refusal: null,
        attempts: 0,
      };
  await save(item);
  return item;
}

/** Discards an item (the archer chose to, after seeing it). */
export async function discardOutboxItem(id: string) {
  items = items.filter((item) => item.id !== id);
  emit();
  await outboxDb.del(id);
}

/** A refused item goes back to waiting (after the reason was dealt with, e.g. the share restored). */
export async function retryOutboxItem(id: string) {
  const item = items.find((other) => other.id === id);
  if (item) await save({ ...item, state: 'waiting', refusal: null });
}

/** Statuses that say nothing final about the write: keep it waiting and try later. */
const tryLater = (error: ApiError) =>
  error.status === 0 ||
  error.status >= 500 ||
  [401, 408, 429].includes(error.status) ||
  error.code === 'in_progress' ||
  error.code === 'csrf';

/** What to do with a sent write's answer (refresh queries); set once by the provider. */
export function setOutboxAfterSend(handler: (queryClient: QueryClient, sent: OutboxSent) => void) {
  afterSend = handler;
}

/**
 * Sends the waiting items of the loaded account, oldest first, one at a
 * time; stops at the first that finds no network or a busy server (the
 * rest wait behind it, keeping the order). Refused items are marked with
 * the reason and skipped. Resolves to how many were sent.
 */
export async function flushOutbox(queryClient: QueryClient): Promise<number> {
  if (sending || !isOnline()) return 0;
  sending = true;
  let sent = 0;
  try {
    for (const start of [...items]) {
      const item = items.find((other) => other.id === start.id);
      if (!item || item.state !== 'waiting') continue;
      await save({ ...item, state: 'sending' });
      try {
        const response = await apiFetch(item.path, { method: item.method, body: item.body, headers: { [idempotencyHeader]: item.id } });
        items = items.filter((other) => other.id !== item.id);
        emit();
        await outboxDb.del(item.id);
        sent += 1;
        const done: OutboxSent = { id: item.id, kind: item.kind, response };
        afterSend?.(queryClient, done);
        for (const listener of sentListeners) listener(done);
      } catch (error) {
        const failure = isApiError(error) ? error : new ApiError(0, 'network', 'Cannot reach Pinwright.');
        if (tryLater(failure)) {
          await save({ ...item, state: 'waiting', attempts: item.attempts + 1 });
          if (failure.status === 0) reportNoNetwork();
          break;
        }
        await save({
          ...item,
          state: 'refused',
          refusal: { status: failure.status, code: failure.code, message: failure.message, fields: failure.fields ?? {} },
        });
      }
    }
  } finally {
    sending = false;
  }
  return sent;
}

/** The body of an item as plain text to copy (what was typed, to keep elsewhere). */
export function outboxItemText(item: OutboxItem): string {
  return `${item.title}\nMade on this phone ${item.createdAt}\n${JSON.stringify(item.body, null, 2)}`;
}
