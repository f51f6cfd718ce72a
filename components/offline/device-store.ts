import { createStore, del, delMany, entries, get, keys, set, type UseStore } from 'idb-keyval';

/**
 * What Pinwright keeps on the device, in IndexedDB (idb-keyval): two small
 * databases, each with one object store.
 * - `pinwright-cache`: the react-query cache of each signed-in account
 *   (`queries:<userId>`) and which account this device last had signed in
 *   (`account`).
 * - `pinwright-outbox`: writes made offline, waiting to be sent (one entry per
 *   write, keyed by its idempotency key; see outbox.ts).
 * Where IndexedDB is missing (Jest's jsdom, a private window that refuses it)
 * every call is a no-op that resolves, so the app still runs, online only.
 */

const available = () => typeof indexedDB !== 'undefined';

let cacheStore: UseStore | null = null;
let outboxStore: UseStore | null = null;

function cache(): UseStore {
  cacheStore ??= createStore('pinwright-cache', 'kv');
  return cacheStore;
}

function outbox(): UseStore {
  outboxStore ??= createStore('pinwright-outbox', 'items');
  return outboxStore;
}

/** A guarded idb-keyval call: undefined where IndexedDB is missing or fails. */
async function guarded<T>(work: () => Promise<T>): Promise<T | undefined> {
  if (!available()) return undefined;
  try {
    return await work();
  } catch {
    return undefined;
  }
}

/** The key of an account's query cache. */
export const queriesKey = (userId: number) => `queries:${userId}`;

export const cacheDb = {
  get: <T>(key: string) => guarded(() => get<T>(key, cache())),
  set: (key: string, value: unknown) => guarded(() => set(key, value, cache())),
  del: (key: string) => guarded(() => del(key, cache())),
};

export const outboxDb = {
  all: async <T>() => ((await guarded(() => entries<string, T>(outbox()))) ?? []).map(([, value]) => value),
  put: (id: string, value: unknown) => guarded(() => set(id, value, outbox())),
  del: (id: string) => guarded(() => del(id, outbox())),
  delMany: (ids: string[]) => guarded(() => delMany(ids, outbox())),
  keys: async () => (await guarded(() => keys<string>(outbox()))) ?? [],
};
