/**
 * The app's route table, built from the files in app/ the way expo-router builds
 * it (its own getRoutes and getNavigationConfig), with every page's address
 * pattern and the segments each page puts on screen. For tests that check a
 * stand-in or a rewrite of the router's path lookup against the router itself.
 */
import fs from 'node:fs';
import path from 'node:path';

/* eslint-disable @typescript-eslint/no-require-imports */
const { getRoutes } = require('expo-router/build/getRoutes');
const { getNavigationConfig } = require('expo-router/build/getLinkingConfig');
/* eslint-enable @typescript-eslint/no-require-imports */

const appDir = path.resolve(__dirname, '../../app');

export function appFiles(dir = appDir): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? appFiles(full) : /\.tsx?$/.test(entry.name) ? [`./${path.relative(appDir, full)}`] : [];
  });
}

/** A require context over app/ as Metro gives expo-router one; each screen is an empty component, layouts keep their initialRouteName. */
function appContext() {
  const keys = appFiles();
  const load = (key: string) => {
    const text = fs.readFileSync(path.join(appDir, key), 'utf8');
    const initial = /unstable_settings = \{ initialRouteName: '([^']+)' \}/.exec(text)?.[1];
    return { default: () => null, ...(initial ? { unstable_settings: { initialRouteName: initial } } : {}) };
  };
  return Object.assign(load, { keys: () => keys, resolve: (key: string) => key, id: 'app' });
}

const routeTree = getRoutes(appContext(), {
  skipGenerated: true,
  ignoreEntryPoints: true,
  platform: 'web',
  preserveRedirectAndRewrites: true,
});
/** As app.json sets it: no sitemap; the not-found route is kept. */
export const table: object = getNavigationConfig(routeTree, true, { sitemap: false, notFound: true });

/** Every page's address pattern, e.g. '/sight-ins/[id]/tape', with groups left out as in a URL. */
export const patterns = appFiles()
  .filter((key) => !/(^|\/)(_layout|\+html|\+not-found)\.tsx$/.test(key))
  .map((key) =>
    `/${key.slice(2).replace(/\.tsx?$/, '')}`
      .replace(/\/\([^)]+\)/g, '')
      .replace(/\/index$/, '')
      .replace(/^$/, '/'),
  );

/** The segments a page puts on screen, e.g. ['(app)', 'sight-ins', '[id]', 'tape']. */
export const segmentSets = [
  [],
  ...appFiles()
    .filter((key) => !/(^|\/)(_layout|\+html)\.tsx$/.test(key))
    .map((key) =>
      key
        .slice(2)
        .replace(/\.tsx?$/, '')
        .split('/')
        .filter((part) => part !== 'index'),
    ),
];

/** A pattern with every [param] filled in with `id`. */
export const concrete = (pattern: string, id: string) => pattern.replace(/\[[^\]]+\]/g, id) || '/';
