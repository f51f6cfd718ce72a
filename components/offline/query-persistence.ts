import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import { persistQueryClientRestore, persistQueryClientSave, type Persister } from '@tanstack/react-query-persist-client';
import type { QueryClient } from '@tanstack/react-query';

import { cacheDb, queriesKey } from '@/components/offline/device-store';

/**
 * The react-query cache kept on the device, one per signed-in account, so
 * the records an archer opened online open again with no signal (the
 * persist-client and async-storage persister of @tanstack/query, over
 * IndexedDB). The device remembers which account it last had signed in;
 * at start that account's cache is restored (the "who am I" query with it,
 * so the sign-in gate lets the archer in offline). When the account changes
 * the saving follows it; when the server says nobody is signed in, or on
 * sign-out, that account's cache is deleted.
 */

/** Kept this long on the device (a hunting trip without signal can last weeks). */
export const cacheMaxAgeMs = 30 * 24 * 60 * 60_000;
/** Changing this drops every device cache (when the shape of what is cached changes). */
const buster = 'pinwright-cache-1';
const accountKey = 'account';

interface AccountPersister {
  userId: number;
  persister: Persister;
  /** Set before the cache is deleted, so a throttled save still in flight writes nothing. */
  closed: boolean;
  unsubscribe: () => void;
}

let current: AccountPersister | null = null;

function persisterFor(userId: number, isClosed: () => boolean): Persister {
  return createAsyncStoragePersister({
    key: queriesKey(userId),
    // Saves are already gathered by saveAfterChanges below.
    throttleTime: 0,
    storage: {
      getItem: async (key) => (await cacheDb.get<string>(key)) ?? null,
      setItem: async (key, value) => {
        if (!isClosed()) await cacheDb.set(key, value);
      },
      removeItem: async (key) => {
        await cacheDb.del(key);
      },
    },
  });
}

/** How long after a change to the cache it is saved. Short: a page left right after its data arrived should still have it saved. */
export const saveDelayMs = 100;

/**
 * Calls `save` once, `delayMs` after the first of a run of changes to the
 * query or mutation cache (an entry added, removed or updated), and again
 * after the next change. The persist-client's own subscription
 * (persistQueryClientSubscribe) copies the whole cache out (`dehydrate`) at
 * every change, inside the task that made it: on a cold load of the Bench
 * that was several copies, one of them in the task that receives the bow
 * list. Here the copy is made once, in a task of its own, of the cache as it
 * stands by then. Returns the unsubscribe, which also drops a pending save.
 */
export function saveAfterChanges(queryClient: QueryClient, save: () => void, delayMs = saveDelayMs): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const changed = (event: { type: string }) => {
    if (event.type !== 'added' && event.type !== 'removed' && event.type !== 'updated') return;
    timer ??= setTimeout(() => {
      timer = undefined;
      save();
    }, delayMs);
  };
  const unsubscribeQueries = queryClient.getQueryCache().subscribe(changed);
  const unsubscribeMutations = queryClient.getMutationCache().subscribe(changed);
  return () => {
    unsubscribeQueries();
    unsubscribeMutations();
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
  };
}

/** The account whose cache is being kept, if any. */
export const keptAccount = () => current?.userId ?? null;

/** Starts saving the cache for `userId` (stops saving any other account's). */
export async function keepCacheFor(queryClient: QueryClient, userId: number) {
  if (current?.userId === userId) return;
  stopKeeping();
  const entry: AccountPersister = {
    userId,
    persister: persisterFor(userId, () => entry.closed),
    closed: false,
    unsubscribe: () => undefined,
  };
  entry.unsubscribe = saveAfterChanges(queryClient, () => {
    if (entry.closed) return;
    // A save that fails (storage full, private mode) leaves the previous copy; the screens go on.
    persistQueryClientSave({
      queryClient,
      persister: entry.persister,
      buster,
      dehydrateOptions: { shouldDehydrateQuery: (query) => query.state.status === 'success' },
    }).catch(() => undefined);
  });
  current = entry;
  await cacheDb.set(accountKey, userId);
}

function stopKeeping() {
  if (!current) return;
  current.closed = true;
  current.unsubscribe();
  current = null;
}

/**
 * Restores the cache of the account this device last had signed in (before
 * the screens render). Resolves to that account's id, or null.
 */
export async function restoreDeviceCache(queryClient: QueryClient): Promise<number | null> {
  const userId = await cacheDb.get<number>(accountKey);
  if (typeof userId !== 'number') return null;
  try {
    await persistQueryClientRestore({ queryClient, persister: persisterFor(userId, () => false), buster, maxAge: cacheMaxAgeMs });
  } catch {
    return null;
  }
  await keepCacheFor(queryClient, userId);
  return userId;
}

/**
 * Deletes what the device keeps of `userId`'s records (or of the account
 * being kept): the saved cache and the "last signed in" mark. The in-memory
 * cache is the caller's to clear.
 */
export async function forgetDeviceCache(userId: number | null = keptAccount()) {
  if (current && (userId === null || current.userId === userId)) stopKeeping();
  const last = await cacheDb.get<number>(accountKey);
  if (userId !== null) await cacheDb.del(queriesKey(userId));
  if (last !== undefined && (userId === null || last === userId)) {
    await cacheDb.del(accountKey);
    if (typeof last === 'number') await cacheDb.del(queriesKey(last));
  }
}
