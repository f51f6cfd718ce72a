import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Workbox } from 'workbox-window';

import { loadWorkbox } from '@/components/shell/load-workbox';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { colors, layout, radii, space } from '@/components/theme';

/** The service worker written at export time (server/tools/web-pwa.ts). */
export const SERVICE_WORKER_URL = '/sw.js';
/**
 * How long the page's own requests (the sign-in check, the bow list: React
 * Query's fetches and saves) must have been settled before the worker is
 * fetched and started: its precache then does not share a weak signal with them.
 */
const QUIET_MS = 1000;
/** Started anyway after this long, should the page never go quiet (a hung request). */
const AT_LATEST_MS = 15_000;
/** How often an open page asks whether a new version was deployed. */
const CHECK_EVERY_MS = 60 * 60 * 1000;

/**
 * Registers the service worker (once the page has loaded, its own requests
 * have settled and the browser is idle, so it never competes with the first
 * screen or its data) and, when a new
 * deployment's worker is installed and waiting, shows a quiet "A new version
 * is ready — Reload" notice. Reload asks the waiting worker to take over and
 * loads the page again from it, so a page never runs old and new files
 * together. Shown on every page; nothing in development (the Expo dev server
 * has no service worker).
 * Example: `<UpdateNotice />` once, beside the router's stack.
 */
export function UpdateNotice() {
  const [waiting, setWaiting] = useState<Workbox | null>(null);
  const [reloading, setReloading] = useState(false);
  const asked = useRef(false);
  const wide = useWide();
  const queryClient = useQueryClient();

  useEffect(() => {
    if (__DEV__ || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
    let wb: Workbox | null = null;
    let gone = false;
    const register = () => {
      // workbox-window is fetched only now (see load-workbox.ts); the service worker
      // precaches its file like every other script.
      loadWorkbox()
        .then(({ Workbox }) => {
          if (gone) return;
          const worker = new Workbox(SERVICE_WORKER_URL);
          wb = worker;
          worker.addEventListener('waiting', () => setWaiting(worker));
          // The new worker is in charge: load the page again, all from the new version.
          worker.addEventListener('controlling', () => {
            if (asked.current) window.location.reload();
          });
          return worker.register();
        })
        .catch(() => {
          /* no service worker (private window, blocked, file not reached): the app still works online */
        });
    };
    const check = () => {
      if (wb && document.visibilityState === 'visible') wb.update().catch(() => {});
    };
    // After the load event, once the page's own requests have been settled for
    // QUIET_MS, at the browser's next idle moment.
    let idle: number | undefined;
    let quiet: ReturnType<typeof setTimeout> | undefined;
    let latest: ReturnType<typeof setTimeout> | undefined;
    const unwatch: (() => void)[] = [];
    let started = false;
    const start = () => {
      if (started) return;
      started = true;
      unwatch.forEach((stop) => stop());
      clearTimeout(quiet);
      clearTimeout(latest);
      idle =
        typeof requestIdleCallback === 'function' ? requestIdleCallback(register, { timeout: 5000 }) : window.setTimeout(register, 1000);
    };
    // Every change to a query or a save moves the check QUIET_MS on; only then are
    // the requests counted. Counting is a pass over every query, and restoring the
    // device's copy makes one change per query: counting at each change took 12 ms
    // of one task at start-up (a CPU profile of a cold Bench, unthrottled).
    const settle = () => {
      clearTimeout(quiet);
      quiet = setTimeout(() => {
        if (queryClient.isFetching() + queryClient.isMutating() === 0) start();
      }, QUIET_MS);
    };
    const watch = () => {
      unwatch.push(queryClient.getQueryCache().subscribe(settle), queryClient.getMutationCache().subscribe(settle));
      latest = setTimeout(start, AT_LATEST_MS);
      settle();
    };
    if (document.readyState === 'complete') watch();
    else window.addEventListener('load', watch, { once: true });
    document.addEventListener('visibilitychange', check);
    const timer = setInterval(check, CHECK_EVERY_MS);
    return () => {
      gone = true;
      window.removeEventListener('load', watch);
      unwatch.forEach((stop) => stop());
      clearTimeout(quiet);
      clearTimeout(latest);
      if (idle !== undefined) {
        if (typeof cancelIdleCallback === 'function') cancelIdleCallback(idle);
        else window.clearTimeout(idle);
      }
      document.removeEventListener('visibilitychange', check);
      clearInterval(timer);
    };
  }, [queryClient]);

  if (!waiting) return null;
  const reload = () => {
    asked.current = true;
    setReloading(true);
    waiting.messageSkipWaiting();
    // Should the switch not be reported (another tab took it first), reload anyway.
    setTimeout(() => window.location.reload(), 3000);
  };
  return (
    <View style={[styles.wrap, wide ? styles.wrapWide : styles.wrapPhone]} pointerEvents="box-none">
      <View style={styles.notice} role="status" aria-live="polite" testID="update-notice">
        <Text variant="body" tone="onSlate" style={styles.text}>
          A new version of Pinwright is ready.
        </Text>
        <Button
          label="Reload"
          pendingLabel="Reloading…"
          pending={reloading}
          onPress={reload}
          accessibilityLabel="Reload for the new version"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  // Fixed to the window (react-native-web), above the phone's bottom tab bar.
  wrap: { position: 'fixed' as 'absolute', left: 0, right: 0, alignItems: 'center', paddingHorizontal: space.md, zIndex: 50 },
  wrapPhone: { bottom: layout.bottomBarHeight + space.sm },
  wrapWide: { bottom: space.xl, alignItems: 'flex-end', paddingHorizontal: space.xl },
  notice: {
    width: '100%',
    maxWidth: layout.formMax,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.sm,
    paddingLeft: space.lg,
    paddingRight: space.sm,
    borderRadius: radii.md,
    backgroundColor: colors.slate,
    boxShadow: '0 4px 16px rgba(0, 0, 0, 0.25)',
  },
  text: { flex: 1 },
});
