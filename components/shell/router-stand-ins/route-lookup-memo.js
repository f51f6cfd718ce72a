/**
 * Stands in for expo-router's path-to-state lookup (fork/getStateFromPath.js)
 * where its linking module imports it (metro.config.js, web only), and keeps the
 * lookup's last answers.
 *
 * The router's copy of the lookup turns off its own cache, because the order in
 * which it tries routes depends on the segments on screen. So every call rebuilds,
 * checks and sorts the pattern of every route in the app. On a cold load the very
 * same lookup (same path, same route table, same segments) runs three or four
 * times, 1–15 ms each at 4× CPU slow-down, in the router's renders and effects. The answer
 * depends only on those three inputs, so this keeps the last KEEP answers under
 * all three and hands out a fresh deep copy of one each time: callers get a new
 * state object, as before, and one that changes it changes nothing kept.
 * A lookup that throws is not kept (it throws again next time). A state is plain
 * data (route names, params, nested states), so the copy is a plain deep copy.
 * tests/components/route-lookup-memo.test.tsx compares it with the router's own
 * lookup on every route of this app.
 */
// Required where first used, like the module it stands in for (Metro's inlineRequires).
const router = () => require('expo-router/build/fork/getStateFromPath');

const KEEP = 16;
const answersByTable = new WeakMap(); // route table (options) → Map(path and segments → state)

/** A deep copy of plain objects (prototype-less ones too) and arrays; anything else (strings, numbers, …) as it is. */
function copy(value) {
  if (Array.isArray(value)) return value.map(copy);
  if (value === null || typeof value !== 'object') return value;
  const prototype = Object.getPrototypeOf(value);
  if (prototype !== Object.prototype && prototype !== null) return value;
  const out = Object.create(prototype);
  for (const key of Object.keys(value)) out[key] = copy(value[key]);
  return out;
}

function getStateFromPath(path, options, segments = []) {
  if (!options || typeof options !== 'object') {
    return router().getStateFromPath(path, options, segments);
  }
  let answers = answersByTable.get(options);
  if (!answers) answersByTable.set(options, (answers = new Map()));
  const key = JSON.stringify([path, segments]);
  if (!answers.has(key)) {
    answers.set(key, router().getStateFromPath(path, options, segments));
    // A Map keeps insertion order: the first key is the oldest answer.
    if (answers.size > KEEP) answers.delete(answers.keys().next().value);
  }
  return copy(answers.get(key));
}

module.exports = { getStateFromPath };
