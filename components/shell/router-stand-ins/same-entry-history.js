/**
 * Stands in for expo-router's browser-history wrapper (fork/createMemoryHistory.js)
 * where its linking hook imports it (metro.config.js, web only). Everything is
 * the router's own, except that a `replaceState` that would write exactly what
 * the current history entry already holds is not made.
 *
 * On a cold load the router replaces the current entry three times with the
 * same state (`{ id }`) and the same address, as its navigation state settles.
 * Each call is a same-document navigation for the browser (HTML Standard,
 * "URL and history update steps"): measured in Chromium during this app's start-up,
 * 0.3–9 ms each, unthrottled, inside the tasks that draw the first screen.
 * Skipping one that changes nothing leaves `history.state`, `location` and
 * the router's own list of entries as they would have been.
 * tests/components/same-entry-history.test.tsx drives it in jsdom.
 */
// Required where first used, like the module it stands in for (Metro's inlineRequires).
const router = () => require('expo-router/build/fork/createMemoryHistory');

/** True when the entry already holds `state` (a plain object of the same own keys and values) at `url`. */
function sameEntry(state, url) {
  const current = window.history.state;
  if (!state || !current || typeof state !== 'object' || typeof current !== 'object') return false;
  const keys = Object.keys(state);
  if (keys.length !== Object.keys(current).length) return false;
  if (!keys.every((key) => Object.is(state[key], current[key]) && (state[key] === null || typeof state[key] !== 'object'))) return false;
  try {
    return new URL(String(url), window.location.href).href === window.location.href;
  } catch {
    return false;
  }
}

function createMemoryHistory() {
  const history = router().createMemoryHistory();
  const replace = history.replace;
  history.replace = function replaceUnlessSame(...args) {
    const browserHistory = window.history;
    const own = Object.getOwnPropertyDescriptor(browserHistory, 'replaceState');
    const replaceState = browserHistory.replaceState;
    // Only for the length of the router's own call: its bookkeeping runs as before.
    browserHistory.replaceState = function (state, title, url) {
      if (arguments.length >= 3 && sameEntry(state, url)) return undefined;
      return replaceState.apply(browserHistory, arguments);
    };
    try {
      return replace.apply(this, args);
    } finally {
      if (own) Object.defineProperty(browserHistory, 'replaceState', own);
      else delete browserHistory.replaceState;
    }
  };
  return history;
}

module.exports = { createMemoryHistory };
