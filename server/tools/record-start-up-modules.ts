/**
 * Records which modules of the web app's entry script run on a cold start
 * before the first screen shows, in the order they finish, and writes them to
 * start-up-modules.json (read at export by start-up-modules.ts). Run it after a change that moves what the first
 * screens load: `npx tsx server/tools/record-start-up-modules.ts`.
 *
 * It builds the export, copies it, undoes the start-up slicing in the copy and
 * adds a line that notes each module as it finishes, serves the copy with a
 * scratch database and the demo data, then opens, in headless Chromium at
 * 390×844, the sign-in page signed out and the Bench signed in as the demo
 * archer. The modules both had run by the time their screen showed make the
 * list; a module only one of them needs, or one that runs after the screen
 * shows, is left to run where it is first used, so it does not hold back the
 * other screen.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromiumOptions } from '../../tests/helpers/chromium';
import { withDemoApp } from './demo-app';
import { listName, START_UP_LIST } from './start-up-modules';
import { exportWeb, moduleIdsFile } from './web-export';

const root = path.resolve(__dirname, '../..');

/** Modules whose running mounts the app: they stay last, where Metro runs them. */
const MOUNTS_THE_APP = ['node_modules/expo-router/entry.js', 'node_modules/expo-router/entry-classic.js'];

/**
 * An entry script that runs as Metro wrote it and notes, in
 * globalThis.__startUpOrder, each module as it finishes: a module after the
 * modules its top level needed, so that running the list in order gives each
 * one little work of its own. A module that, while it ran, required one still
 * running (a require cycle) is noted in globalThis.__startUpCycles with the
 * modules between them; those are left to run inside the cycle's first module,
 * as they do without the list, so each sees the same half-made exports.
 */
export function recordingEntry(code: string): string {
  const unsliced = code.replace(/\n\(function\(ids,main\)\{.*\}\)\(\[[\d,]*\],(\d+)\);\n$/, '\n__r($1);\n');
  const firstModule = unsliced.indexOf('\n__d(');
  if (firstModule < 0) throw new Error('no Metro module definitions found in the entry script');
  const recorder =
    '(function(){var define=__d,stack=[],order=globalThis.__startUpOrder=[],cycles=globalThis.__startUpCycles=[];' +
    'function guard(req){return Object.assign(function(id){var k=stack.indexOf(id);' +
    'if(k>=0)for(var j=k+1;j<stack.length;j++)cycles.push(stack[j]);return req.apply(this,arguments)},req)}' +
    '__d=function(f,id,deps){return define(function(){var args=Array.prototype.slice.call(arguments);' +
    'args[1]=guard(args[1]);args[2]=guard(args[2]);args[3]=guard(args[3]);stack.push(id);' +
    'try{return f.apply(this,args)}finally{stack.pop();order.push(id)}},id,deps)}})();';
  return `${unsliced.slice(0, firstModule)}\n${recorder}${unsliced.slice(firstModule)}`;
}

async function main() {
  await exportWeb(root);
  const idsByPath = JSON.parse(fs.readFileSync(moduleIdsFile(root), 'utf8')) as Record<string, number>;
  const pathById = new Map(Object.entries(idsByPath).map(([file, id]) => [id, listName(root, file)]));

  const webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-record-'));
  fs.cpSync(path.join(root, 'dist'), webDir, { recursive: true });
  const src = /src="(\/_expo\/static\/js\/web\/entry-[0-9a-f]+\.js)"/.exec(fs.readFileSync(path.join(webDir, 'index.html'), 'utf8'))?.[1];
  if (!src) throw new Error('no entry script in dist/index.html');
  const entry = path.join(webDir, src);
  fs.writeFileSync(entry, recordingEntry(fs.readFileSync(entry, 'utf8')));
  for (const twin of ['.br', '.gz']) fs.rmSync(entry + twin, { force: true });

  try {
    await withDemoApp('pinwright_record', webDir, async ({ baseUrl, demoAccounts }) => {
      const archer = demoAccounts.find((a) => a.role === 'archer')!;
      const { chromium } = await import('playwright-core');
      const browser = await chromium.launch(chromiumOptions);
      const runs: number[][] = [];
      const inCycle = new Set<number>();
      try {
        for (const [name, url, signedIn, ready] of [
          ['sign-in page', '/sign-in', false, /Forgot your password/],
          ['Bench', '/', true, /Your bows/],
        ] as const) {
          const context = await browser.newContext({ viewport: { width: 390, height: 844 }, serviceWorkers: 'block' });
          if (signedIn) {
            const res = await context.request.post(`${baseUrl}/api/auth/sign-in`, {
              headers: { 'X-Pinwright-Csrf': '1' },
              data: { email: archer.email, password: archer.password },
            });
            if (!res.ok()) throw new Error(`demo sign-in failed: ${res.status()}`);
          }
          const page = await context.newPage();
          await page.goto(baseUrl + url);
          await page.getByText(ready).first().waitFor({ timeout: 30_000 });
          // What had run by the time the screen showed: what ran later must not hold the screen back.
          const { seen, cycles } = await page.evaluate(() => {
            const g = globalThis as { __startUpOrder?: number[]; __startUpCycles?: number[] };
            return { seen: [...(g.__startUpOrder ?? [])], cycles: [...(g.__startUpCycles ?? [])] };
          });
          console.log(`${name}: ${seen.length} modules ran before it showed, ${new Set(cycles).size} of them inside a require cycle`);
          for (const id of cycles) inCycle.add(id);
          runs.push(seen);
          await context.close();
        }
      } finally {
        await browser.close();
      }
      // Only what both first screens needed: a module one screen alone needs runs where it is first used.
      const list = runs[0]
        .filter((id) => runs.every((run) => run.includes(id)) && !inCycle.has(id))
        .map((id) => pathById.get(id))
        // Real files and Metro's stable virtual modules; not the app folder's context module, whose name changes with every route added.
        .filter(
          (file): file is string =>
            !!file && !MOUNTS_THE_APP.includes(file) && (file.startsWith('\0') || fs.existsSync(path.join(root, file))),
        );
      fs.writeFileSync(START_UP_LIST, `${JSON.stringify(list, null, 2)}\n`);
      console.log(`${list.length} modules written to ${path.relative(root, START_UP_LIST)}; run the export again to use them.`);
    });
  } finally {
    fs.rmSync(webDir, { recursive: true, force: true });
  }
}

if (require.main === module) {
  main().catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
}
