/**
 * Runs the web app's start-up modules in short slices before its first render.
 *
 * Metro's `inlineRequires` runs a module where it is first used, so on a cold
 * load about 0.7 s (at 4× CPU) of modules run for the first time inside
 * React's first render, in tasks of 100–400 ms that the phone cannot break up.
 * Lighthouse counts these as blocking time. This step rewrites the exported
 * entry script so that, before the app mounts, the modules a cold start is
 * known to need run one by one, about 8 ms of them per task, with a message
 * between tasks so the browser can paint and take a tap in between. The same
 * modules run, in the same order they run at start-up; only when changes.
 *
 * The list of modules (start-up-modules.json, paths from the project root) is
 * recorded from a real start-up by record-start-up-modules.ts. A module that is
 * not in this build any more is skipped, and one missing from the list is
 * simply run later, where it is first used, as before: a stale list costs
 * speed, never correctness. Module ids come from the export itself
 * (PINWRIGHT_MODULE_IDS in metro.config.js).
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

export const START_UP_LIST = path.join(__dirname, 'start-up-modules.json');

/** Milliseconds of module work per task; at Lighthouse's 4× CPU slow-down that is ~32 ms, under the 50 ms of a long task. */
export const SLICE_MS = 8;

/** The ids defined in a Metro bundle: each module is `__d(function…{…},<id>,[<deps>]…);`. */
export function definedModuleIds(code: string): Set<number> {
  const ids = new Set<number>();
  for (const match of code.matchAll(/\},(\d+),\[[\d,]*\](?:,"[^"\n]*")?\);$/gm)) ids.add(Number(match[1]));
  return ids;
}

/**
 * The entry script with its last statement, `__r(<main>);`, replaced by a loader
 * that first runs `ids` in slices of SLICE_MS, then the main module. Throws if
 * the script does not end the way Metro ends it, so a change there is noticed.
 */
export function withSlicedStartUp(code: string, ids: number[]): string {
  const tail = /\n__r\((\d+)\);\s*$/.exec(code);
  if (!tail) throw new Error('the entry script does not end with Metro’s `__r(<main>);`');
  const main = Number(tail[1]);
  const run = ids.filter((id) => id !== main);
  const loader =
    `(function(ids,main){var i=0,ch=new MessageChannel();` +
    `function slice(){var t=performance.now();` +
    // A module that throws here is marked failed by Metro and throws the same error again where the app first requires it.
    `while(i<ids.length&&performance.now()-t<${SLICE_MS}){try{__r(ids[i])}catch(e){}i++}` +
    `if(i<ids.length)ch.port2.postMessage(0);else{ch.port1.onmessage=null;__r(main)}}` +
    // The first slice too runs in a task of its own, not inside the script's evaluation (already ~10–30 ms of its own).
    `ch.port1.onmessage=slice;ch.port2.postMessage(0)})(${JSON.stringify(run)},${main});\n`;
  return `${code.slice(0, tail.index)}\n${loader}`;
}

/** How the list names a module: its path from the project root, or Metro's own name for a virtual one (`\0shim:…`). */
export function listName(root: string, modulePath: string): string {
  return modulePath.startsWith('\0') ? modulePath : path.relative(root, modulePath);
}

/** Ids, in list order, of the listed modules that this build defines in `code`. */
export function startUpIds(list: string[], idsByPath: Record<string, number>, root: string, code: string): number[] {
  const defined = definedModuleIds(code);
  const byRelative = new Map(Object.entries(idsByPath).map(([file, id]) => [listName(root, file), id]));
  const ids: number[] = [];
  for (const file of list) {
    const id = byRelative.get(file);
    if (id !== undefined && defined.has(id) && !ids.includes(id)) ids.push(id);
  }
  return ids;
}

/**
 * Rewrites dist/'s entry script (renamed to the hash of its new content, and
 * index.html pointed at it). Returns how many modules it runs ahead of the
 * first render, or 0 when there is no list or no id map.
 */
export function sliceStartUp(root: string, idsFile: string): { modules: number; listed: number } {
  if (!fs.existsSync(START_UP_LIST) || !fs.existsSync(idsFile)) return { modules: 0, listed: 0 };
  const list = JSON.parse(fs.readFileSync(START_UP_LIST, 'utf8')) as string[];
  const idsByPath = JSON.parse(fs.readFileSync(idsFile, 'utf8')) as Record<string, number>;
  const dist = path.join(root, 'dist');
  const indexHtml = path.join(dist, 'index.html');
  const html = fs.readFileSync(indexHtml, 'utf8');
  const src = /src="(\/_expo\/static\/js\/web\/entry-[0-9a-f]+\.js)"/.exec(html)?.[1];
  if (!src) throw new Error('dist/index.html has no entry script to slice');
  const file = path.join(dist, src);
  const code = fs.readFileSync(file, 'utf8');
  const ids = startUpIds(list, idsByPath, root, code);
  const sliced = withSlicedStartUp(code, ids);
  const hash = crypto.createHash('md5').update(sliced).digest('hex');
  const newSrc = src.replace(/entry-[0-9a-f]+\.js$/, `entry-${hash}.js`);
  fs.writeFileSync(path.join(dist, newSrc), sliced);
  if (newSrc !== src) fs.rmSync(file);
  fs.writeFileSync(indexHtml, html.split(src).join(newSrc));
  return { modules: ids.length, listed: list.length };
}
