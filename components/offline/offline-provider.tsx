import { onlineManager, type QueryClient } from '@tanstack/react-query';
import { useEffect, useState, type ReactNode } from 'react';

import { startConnectivity } from '@/components/offline/connectivity';
import { flushOutbox, loadOutbox, outboxItems, setOutboxAfterSend, unloadOutbox } from '@/components/offline/outbox';
import { forgetDeviceCache, keepCacheFor, restoreDeviceCache } from '@/components/offline/query-persistence';

/** How often waiting writes are tried again while the app is open, ms. */
const resendMs = 30_000;

/**
 * Follows the signed-in account ("who am I" query): keeps its cache on the
 * device and loads its outbox; when the server says nobody is signed in,
 * deletes that account's cache from the device and from memory (its outbox
 * stays, unseen, until it signs in again or signs out).
 */
function followAccount(queryClient: QueryClient) {
  const state = queryClient.getQueryState(['me']);
  const me = queryClient.getQueryData<{ id: number } | null>(['me']);
  if (me && typeof me.id === 'number') {
    void keepCacheFor(queryClient, me.id);
    void loadOutbox(me.id).then(() => flushOutbox(queryClient));
  } else if (me === null && state?.status === 'success') {
    void forgetDeviceCache();
    unloadOutbox();
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'me' });
  }
}

/**
 * Offline support around the app: connectivity from the browser, the
 * device's cache restored before the first screen renders (so a signed-in
 * archer opening the app with no signal gets in), and the outbox sent when
 * the server can be reached (at start, on reconnecting, and every 30 s).
 * Example: `<OfflineProvider queryClient={queryClient}>{children}</OfflineProvider>`
 */
export function OfflineProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  const [restored, setRestored] = useState(false);

  useEffect(() => {
    startConnectivity();
    setOutboxAfterSend((client) => {
      void client.invalidateQueries();
    });
    let live = true;
    const unsubscribeCache = queryClient.getQueryCache().subscribe((event) => {
      if (event.query.queryKey[0] === 'me' && (event.type === 'added' || event.type === 'updated')) followAccount(queryClient);
    });
    restoreDeviceCache(queryClient)
      .then((userId) => {
        // Nobody kept on this phone and no signal: nobody is signed in here (stale, so it is asked again once online).
        if (userId === null && !onlineManager.isOnline()) queryClient.setQueryData(['me'], null, { updatedAt: 0 });
        // What the device kept is a last sight, not fresh news: every restored query is stale, so each
        // screen asks the server again when it mounts (a reload must show changes made elsewhere);
        // with no signal the ask waits and the kept data stays on screen.
        void queryClient.invalidateQueries({ refetchType: 'none' });
      })
      .finally(() => {
        if (live) setRestored(true);
      });
    const unsubscribeOnline = onlineManager.subscribe((online) => {
      if (online) void flushOutbox(queryClient);
    });
    const timer = setInterval(() => {
      if (outboxItems().some((item) => item.state === 'waiting')) void flushOutbox(queryClient);
    }, resendMs);
    return () => {
      live = false;
      unsubscribeCache();
      unsubscribeOnline();
      clearInterval(timer);
    };
  }, [queryClient]);

  return restored ? <>{children}</> : null;
}
