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
/** How often an open page asks whether a new version was deployed. */
const CHECK_EVERY_MS = 60 * 60 * 1000;

/**
 * Registers the service worker (once the page has loaded and the browser is
 * idle, so it never competes with the first screen) and, when a new
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
    // After the load event, at the browser's first idle moment: fetching and starting
    // the worker then never competes with the first screen being drawn.
    let idle: number | undefined;
    const whenIdle = () => {
      idle =
        typeof requestIdleCallback === 'function' ? requestIdleCallback(register, { timeout: 5000 }) : window.setTimeout(register, 1000);
    };
    if (document.readyState === 'complete') whenIdle();
    else window.addEventListener('load', whenIdle, { once: true });
    document.addEventListener('visibilitychange', check);
    const timer = setInterval(check, CHECK_EVERY_MS);
    return () => {
      gone = true;
      window.removeEventListener('load', whenIdle);
      if (idle !== undefined) {
        if (typeof cancelIdleCallback === 'function') cancelIdleCallback(idle);
        else window.clearTimeout(idle);
      }
      document.removeEventListener('visibilitychange', check);
      clearInterval(timer);
    };
  }, []);

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
