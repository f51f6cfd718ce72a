/**
 * workbox-window, fetched when asked for: the web build puts it in a file of its
 * own, so the first screen's script does not carry it (update-notice.web.tsx asks
 * once the page has loaded). A module of its own so that tests can replace it.
 * Example: `const { Workbox } = await loadWorkbox();`
 */
export function loadWorkbox() {
  return import('workbox-window');
}
