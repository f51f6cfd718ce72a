/**
 * The web build's memo around expo-router's path-to-state lookup
 * (components/shell/router-stand-ins/route-lookup-memo.js) must answer exactly as
 * the router's own lookup does, for every route of this app and whatever
 * segments are on screen, and must never hand two callers the same object.
 * The route table is the one expo-router builds from the files in app/.
 */
import fc from 'fast-check';

import { concrete, patterns, segmentSets, table } from '../helpers/app-routes';

// The stand-in is plain CommonJS, as Metro bundles it.
/* eslint-disable @typescript-eslint/no-require-imports */
const router: { getStateFromPath: (p: string, o: object, s?: string[]) => unknown } = require('expo-router/build/fork/getStateFromPath');
const memo: {
  getStateFromPath: (p: string, o: object, s?: string[]) => unknown;
} = require('@/components/shell/router-stand-ins/route-lookup-memo');
/* eslint-enable @typescript-eslint/no-require-imports */

describe('the memo around the router’s path-to-state lookup', () => {
  it('builds a route table from app/ with every page in it', () => {
    expect(patterns.length).toBeGreaterThan(30);
    expect(patterns).toEqual(expect.arrayContaining(['/', '/sign-in', '/sight-ins/[id]/tape', '/bows/[id]/sight-ins/new', '/admin/audit']));
    // The table really routes: an id reaches the page's params; an unknown path reaches the not-found page.
    expect(JSON.stringify(router.getStateFromPath('/sight-ins/7/tape', table))).toContain('"id":"7"');
    expect(JSON.stringify(router.getStateFromPath('/no/such/page', table))).toContain('+not-found');
  });

  it('answers as the router does for every page, with every set of segments on screen', () => {
    for (const pattern of patterns) {
      for (const segments of segmentSets) {
        const address = concrete(pattern, '42');
        // The memo first (it may keep the answer), then the router, then the memo again (kept or not).
        const first = memo.getStateFromPath(address, table, segments);
        expect(first).toEqual(router.getStateFromPath(address, table, segments));
        expect(memo.getStateFromPath(address, table, segments)).toEqual(first);
      }
    }
  });

  it('answers as the router does for generated addresses: ids, query strings, hashes, unknown paths', () => {
    const address = fc.oneof(
      fc
        .tuple(
          fc.constantFrom(...patterns),
          fc.stringMatching(/^[0-9a-z-]{1,8}$/),
          fc.option(fc.stringMatching(/^[a-z]{1,5}=[0-9a-z]{0,5}$/)),
        )
        .map(([pattern, id, query]) => concrete(pattern, id) + (query ? `?${query}` : '')),
      fc.stringMatching(/^\/[a-z0-9/_-]{0,24}(#[a-z]{0,4})?$/),
    );
    fc.assert(
      fc.property(address, fc.constantFrom(...segmentSets), (where, segments) => {
        const kept = memo.getStateFromPath(where, table, segments);
        expect(kept).toEqual(router.getStateFromPath(where, table, segments));
        expect(memo.getStateFromPath(where, table, segments)).toEqual(kept);
      }),
      { numRuns: 300 },
    );
  });

  it('hands every caller its own copy: changing one answer changes no later one', () => {
    const first = memo.getStateFromPath('/sight-ins/9/tape', table, ['(app)']) as { routes: { name: string }[] };
    const second = memo.getStateFromPath('/sight-ins/9/tape', table, ['(app)']);
    expect(second).not.toBe(first);
    first.routes[0].name = 'changed';
    expect(memo.getStateFromPath('/sight-ins/9/tape', table, ['(app)'])).toEqual(
      router.getStateFromPath('/sight-ins/9/tape', table, ['(app)']),
    );
  });

  it('looks up once per path, route table and segments, keeps only the last 16, and keeps no failure', () => {
    const spy = jest.spyOn(router, 'getStateFromPath');
    try {
      memo.getStateFromPath('/bows/5', table, ['(app)']);
      memo.getStateFromPath('/bows/5', table, ['(app)']);
      expect(spy).toHaveBeenCalledTimes(1);
      memo.getStateFromPath('/bows/5', table, ['(app)', 'bows', '[id]']); // other segments: looked up
      memo.getStateFromPath('/bows/5', { ...table }, ['(app)']); // another table: looked up
      expect(spy).toHaveBeenCalledTimes(3);
      for (let i = 0; i < 16; i++) memo.getStateFromPath(`/builds/${i}`, table, ['(app)']);
      spy.mockClear();
      memo.getStateFromPath('/bows/5', table, ['(app)']); // pushed out by 16 newer answers
      expect(spy).toHaveBeenCalledTimes(1);

      const broken = { screens: { home: { path: 'home', surplus: true } } };
      spy.mockClear();
      expect(() => memo.getStateFromPath('/home', broken)).toThrow();
      expect(() => memo.getStateFromPath('/home', broken)).toThrow();
      expect(spy).toHaveBeenCalledTimes(2); // the failure was not kept: the router was asked again
    } finally {
      spy.mockRestore();
    }
  });
});
