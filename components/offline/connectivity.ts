import { onlineManager } from '@tanstack/react-query';

/**
 * Whether Pinwright can reach its server, as react-query's onlineManager
 * knows it. react-query starts out "online" and only listens to the window's
 * online/offline events, so a page opened with no signal would try every
 * request and fail. Here it starts from `navigator.onLine`, and a request
 * that fails for want of a network (a weak signal the phone still calls
 * "online") marks it offline too; then a light probe (GET /api/health every
 * `probeMs`) brings it back. While offline react-query pauses its fetches and
 * keeps what it has (the cache restored from the device), and the outbox
 * waits.
 */

const probeMs = 10_000;
let probe: ReturnType<typeof setInterval> | null = null;
let started = false;

function stopProbe() {
  if (probe) clearInterval(probe);
  probe = null;
}

function startProbe() {
  if (probe || typeof fetch === 'undefined') return;
  probe = setInterval(async () => {
    if (typeof navigator !== 'undefined' && navigator.onLine === false) return; // the 'online' event will say
    try {
      const res = await fetch('/api/health', { cache: 'no-store', credentials: 'same-origin' });
      if (res.status < 500) {
        stopProbe();
        onlineManager.setOnline(true);
      }
    } catch {
      // still no way through
    }
  }, probeMs);
}

/** Hooks onlineManager to the browser (once; a no-op outside a browser). */
export function startConnectivity() {
  if (started || typeof window === 'undefined' || !window.addEventListener) return;
  started = true;
  onlineManager.setEventListener((setOnline) => {
    const onOnline = () => {
      stopProbe();
      setOnline(true);
    };
    const onOffline = () => setOnline(false);
    window.addEventListener('online', onOnline, false);
    window.addEventListener('offline', onOffline, false);
    if (typeof navigator !== 'undefined' && navigator.onLine === false) setOnline(false);
    return () => {
      window.removeEventListener('online', onOnline);
      window.removeEventListener('offline', onOffline);
    };
  });
}

/** A request found no network: treat the app as offline until the probe or the browser says otherwise. */
export function reportNoNetwork() {
  if (!started) return;
  onlineManager.setOnline(false);
  startProbe();
}

/** True while Pinwright believes it can reach the server. */
export const isOnline = () => onlineManager.isOnline();
