/**
 * babel.config.js rewrites, in Metro's web builds only, expo-router's
 * `a.localeCompare(b) !== 0` between route names in its path lookup
 * (fork/getStateFromPath.js) to `a !== b`, so a cold load does not set up the
 * locale's collation for it. Here the router's file is put through that plugin
 * as Metro would, and the rewritten lookup must answer exactly as the router's
 * own for every page of this app, with every set of segments on screen, and
 * for generated addresses; it must compare no string by locale on the way,
 * where the router's own does.
 */
import { transformSync } from '@babel/core';
import fc from 'fast-check';
import fs from 'node:fs';
import path from 'node:path';

import { concrete, patterns, segmentSets, table } from '../helpers/app-routes';

type Lookup = { getStateFromPath: (p: string, o: object, s?: string[]) => unknown };
/* eslint-disable @typescript-eslint/no-require-imports */
const router: Lookup = require('expo-router/build/fork/getStateFromPath');
const { routerNameEquality } = require('../../babel.config.js');
/* eslint-enable @typescript-eslint/no-require-imports */

const root = path.resolve(__dirname, '../..');
const file = require.resolve('expo-router/build/fork/getStateFromPath');
const source = fs.readFileSync(file, 'utf8');

/** The router's file through the plugin alone, with the caller Metro's web build names. */
function rewrite(caller: Record<string, unknown>, filename = file): string {
  return transformSync(source, { babelrc: false, configFile: false, filename, plugins: [routerNameEquality], caller: caller as never })!
    .code!;
}
const metroWeb = { name: 'metro', bundler: 'metro', platform: 'web', projectRoot: root };

/** Runs rewritten CommonJS as a module beside the original file (its own requires resolve as the original's do). */
function load(code: string): Lookup {
  const mod = { exports: {} as Lookup };
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const localRequire = (request: string) => require(request.startsWith('.') ? path.join(path.dirname(file), request) : request);
  new Function('exports', 'require', 'module', '__filename', '__dirname', code)(mod.exports, localRequire, mod, file, path.dirname(file));
  return mod.exports;
}

const rewritten = load(rewrite(metroWeb));

/** Runs `work` and counts the localeCompare calls made meanwhile. */
function localeCompares(work: () => void): number {
  const spy = jest.spyOn(String.prototype, 'localeCompare');
  try {
    work();
    return spy.mock.calls.length;
  } finally {
    spy.mockRestore();
  }
}

describe("the web build's rewrite of the router's route-name comparison", () => {
  it('rewrites only the equality test, in Metro web builds of that one file', () => {
    expect(source).toMatch(/\.localeCompare\([^)]*\) !== 0/);
    const code = rewrite(metroWeb);
    expect(code).not.toMatch(/\.localeCompare\([^)]*\) !== 0/);
    expect(code).toMatch(/parentScreens\[i\] !== config\.parentScreens\[i\]/);
    // jest-expo also calls itself 'metro' but names no project root; native builds and other files keep it.
    expect(rewrite({ name: 'metro', bundler: 'metro', platform: 'web' })).toMatch(/\.localeCompare\([^)]*\) !== 0/);
    expect(rewrite({ ...metroWeb, platform: 'ios' })).toMatch(/\.localeCompare\([^)]*\) !== 0/);
    expect(rewrite(metroWeb, file.replace('fork', 'react-navigation/core'))).toMatch(/\.localeCompare\([^)]*\) !== 0/);
  });

  it('answers as the router does for every page, with every set of segments on screen, comparing no string by locale', () => {
    let routerCompares = 0;
    let rewrittenCompares = 0;
    for (const pattern of patterns) {
      for (const segments of segmentSets) {
        const address = concrete(pattern, '42');
        let expected: unknown;
        let actual: unknown;
        routerCompares += localeCompares(() => (expected = router.getStateFromPath(address, table, segments)));
        rewrittenCompares += localeCompares(() => (actual = rewritten.getStateFromPath(address, table, segments)));
        expect(actual).toEqual(expected);
      }
    }
    // The router's own lookup does compare names by locale here (app/(app)/_layout.tsx names an initial route).
    expect(routerCompares).toBeGreaterThan(0);
    expect(rewrittenCompares).toBe(0);
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
        expect(rewritten.getStateFromPath(where, table, segments)).toEqual(router.getStateFromPath(where, table, segments));
      }),
      { numRuns: 300 },
    );
  });
});
