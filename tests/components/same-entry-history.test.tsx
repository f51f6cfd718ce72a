/**
 * The web build's stand-in for expo-router's browser-history wrapper
 * (components/shell/router-stand-ins/same-entry-history.js) skips only a
 * `replaceState` that would write what the current entry already holds. Run
 * side by side with the router's own wrapper in jsdom, over the same steps
 * (fixed and generated), it must leave the page in the same place:
 * `location`, `history.state`, and the wrapper's own entries.
 */
import fc from 'fast-check';

/* eslint-disable @typescript-eslint/no-require-imports */
type Entry = { path: string; state: object | undefined; id: string };
type MemoryHistory = {
  index: number;
  get(index: number): Entry;
  push(args: { path: string; state: object }): void;
  replace(args: { path: string; state: object }): void;
};
const original: { createMemoryHistory: () => MemoryHistory } = require('expo-router/build/fork/createMemoryHistory');
const standIn: { createMemoryHistory: () => MemoryHistory } = require('@/components/shell/router-stand-ins/same-entry-history');
/* eslint-enable @typescript-eslint/no-require-imports */

type Step = { op: 'push' | 'replace'; path: string };

/** Starts the page at `/` with no history state, as a cold load does. */
function freshPage() {
  window.history.replaceState(null, '', '/');
}

/** Runs the steps through one wrapper and reports where the page and the wrapper ended up. */
function run(make: () => MemoryHistory, steps: Step[]) {
  freshPage();
  const history = make();
  const seen: { href: string; state: unknown }[] = [];
  for (const step of steps) {
    history[step.op]({ path: step.path, state: { routes: [step.path] } });
    seen.push({ href: window.location.href, state: window.history.state });
  }
  const entry = history.get(0);
  return { seen, index: history.index, current: entry && { path: entry.path, state: entry.state } };
}

/** Ids are random per wrapper (nanoid): compare with each one replaced by its first-seen order. */
function withoutIds(result: ReturnType<typeof run>) {
  const ids = new Map<string, string>();
  const name = (id: string) => (ids.has(id) ? ids.get(id)! : (ids.set(id, `id${ids.size}`), ids.get(id)!));
  return {
    ...result,
    seen: result.seen.map(({ href, state }) => ({
      href,
      state: state && typeof state === 'object' && 'id' in state ? { id: name(String((state as { id: string }).id)) } : state,
    })),
  };
}

describe('history stand-in: no replaceState that changes nothing', () => {
  beforeEach(() => freshPage());
  afterEach(() => jest.restoreAllMocks());

  it('makes the first replace (the entry has no id yet) and skips the same one repeated, as the router does on a cold load', () => {
    const spy = jest.spyOn(window.history, 'replaceState');
    const history = standIn.createMemoryHistory();
    history.replace({ path: '/', state: { routes: ['home'] } });
    expect(spy).toHaveBeenCalledTimes(1);
    const state = window.history.state;
    expect(state).toEqual({ id: expect.any(String) });
    history.replace({ path: '/', state: { routes: ['home', 'again'] } });
    history.replace({ path: '/', state: { routes: ['home', 'once more'] } });
    expect(spy).toHaveBeenCalledTimes(1);
    expect(window.history.state).toEqual(state);
    // The wrapper's own entry still takes the newest navigation state.
    expect(history.get(0).state).toEqual({ routes: ['home', 'once more'] });
  });

  it('still replaces when the address changes (a redirect to sign-in)', () => {
    const spy = jest.spyOn(window.history, 'replaceState');
    const history = standIn.createMemoryHistory();
    history.replace({ path: '/', state: {} });
    history.replace({ path: '/sign-in', state: {} });
    expect(spy).toHaveBeenCalledTimes(2);
    expect(window.location.pathname).toBe('/sign-in');
  });

  it('still replaces when the entry holds other state than the router wrote', () => {
    const history = standIn.createMemoryHistory();
    history.replace({ path: '/', state: {} });
    const id = window.history.state.id;
    window.history.replaceState({ id, scroll: 120 }, '', '/');
    const spy = jest.spyOn(window.history, 'replaceState');
    history.replace({ path: '/', state: {} });
    expect(spy).toHaveBeenCalledTimes(1);
    expect(window.history.state).toEqual({ id });
  });

  it("puts the browser's replaceState back after each call (an own property only for the call)", () => {
    const history = standIn.createMemoryHistory();
    history.replace({ path: '/bows/3', state: {} });
    expect(Object.getOwnPropertyDescriptor(window.history, 'replaceState')).toBeUndefined();
    const spy = jest.spyOn(window.history, 'replaceState');
    history.replace({ path: '/bows/4', state: {} });
    expect(window.history.replaceState).toBe(spy);
    expect(spy).toHaveBeenCalledTimes(1);
  });

  it('ends where the router’s own wrapper ends, over generated pushes and replaces', () => {
    const paths = fc.constantFrom('/', '/sign-in', '/bows/3', '/bows/3?tab=tape', '/bows/3#marks', '/sight-ins/12', '/account');
    const steps = fc.array(fc.record({ op: fc.constantFrom<'push' | 'replace'>('push', 'replace'), path: paths }), {
      minLength: 1,
      maxLength: 8,
    });
    fc.assert(
      fc.property(steps, (list) => {
        expect(withoutIds(run(standIn.createMemoryHistory, list))).toEqual(withoutIds(run(original.createMemoryHistory, list)));
      }),
      { numRuns: 200 },
    );
  });
});
