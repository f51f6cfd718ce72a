/**
 * The export step that runs the start-up modules in short slices before the
 * web app's first render (server/tools/start-up-modules.ts), run here on a
 * small script written the way Metro writes one: `__d(factory, id, deps)` per
 * module, then `__r(<main>)`.
 */
import fs from 'node:fs';
import path from 'node:path';
import vm from 'node:vm';
import { recordingEntry } from '@/server/tools/record-start-up-modules';
import { definedModuleIds, listName, SLICE_MS, START_UP_LIST, startUpIds, withSlicedStartUp } from '@/server/tools/start-up-modules';

const root = path.resolve(__dirname, '../..');

/** A Metro-like runtime: modules run once, on first `__r`; one that throws keeps throwing. */
const RUNTIME =
  'var modules=new Map();' +
  'function __d(f,id,deps){if(!modules.has(id))modules.set(id,{f:f,done:false,error:null})}' +
  'function __r(id){var m=modules.get(id);if(!m)throw new Error("unknown module "+id);if(m.error)throw m.error;' +
  'if(!m.done){m.done=true;try{m.f()}catch(e){m.error=e;throw e}}}';

/** Module `id` notes its id and takes 3 ms of the fake clock; `fails` throws instead. */
function bundle(ids: number[], main: number, fails: number[] = []): string {
  const lines = ids.map((id) => {
    const body = fails.includes(id) ? `throw new Error("module ${id} fails")` : `ran.push(${id});clock.t+=3`;
    return `__d(function(g,r,i,a,m,e,d){${body}},${id},[]);`;
  });
  return ['var ran=[];', RUNTIME, ...lines, `__r(${main});`, ''].join('\n');
}

/** Runs a script with a fake clock and a MessageChannel whose messages arrive on the next turn. */
async function run(code: string) {
  const clock = { t: 0 };
  const posted: number[] = [];
  class Channel {
    port1: { onmessage: null | (() => void) } = { onmessage: null };
    port2 = {
      postMessage: () => {
        posted.push(clock.t);
        setImmediate(() => this.port1.onmessage?.());
      },
    };
  }
  const context = vm.createContext({ clock, MessageChannel: Channel, performance: { now: () => clock.t } });
  vm.runInContext(code, context);
  const ranAtOnce = [...(vm.runInContext('ran', context) as number[])];
  for (let i = 0; i < 50; i++) await new Promise((resolve) => setImmediate(resolve));
  return { ran: vm.runInContext('ran', context) as number[], posted, ranAtOnce };
}

it('finds the ids of the modules a Metro script defines', () => {
  const code = `${bundle([0, 7, 12], 0)}__d(function(g,r,i,a,m,e,d){},30,[1,2],"named");\n`;
  expect([...definedModuleIds(code)].sort((a, b) => a - b)).toEqual([0, 7, 12, 30]);
});

it('runs the listed modules in order, a few per task, then the main module last', async () => {
  const plain = await run(bundle([0, 1, 2, 3, 4, 5, 6, 7, 8, 9], 0));
  expect(plain).toEqual({ ran: [0], posted: [], ranAtOnce: [0] });

  const sliced = await run(withSlicedStartUp(bundle([0, 1, 2, 3, 4, 5, 6, 7, 8, 9], 0), [5, 3, 0, 1, 2, 4, 6, 7, 8]));
  expect(sliced.ran).toEqual([5, 3, 1, 2, 4, 6, 7, 8, 0]);
  // Nothing runs while the script itself is evaluated: the first slice waits for its own task.
  expect(sliced.ranAtOnce).toEqual([]);
  // 3 ms a module and SLICE_MS (8) a task: a message, 3 modules, a message, and so on.
  expect(SLICE_MS).toBe(8);
  expect(sliced.posted).toEqual([0, 9, 18]);
});

it('goes on past a module that fails early, and leaves it to fail again where the app needs it', async () => {
  const sliced = await run(withSlicedStartUp(bundle([0, 1, 2, 3], 0, [2]), [1, 2, 3]));
  expect(sliced.ran).toEqual([1, 3, 0]);
  const context = vm.createContext({ clock: { t: 0 } });
  vm.runInContext(bundle([0, 1, 2], 1, [2]), context);
  expect(() => vm.runInContext('__r(2)', context)).toThrow('module 2 fails');
  expect(() => vm.runInContext('__r(2)', context)).toThrow('module 2 fails');
});

it('refuses a script that does not end the way Metro ends one', () => {
  expect(() => withSlicedStartUp('__d(function(){},0,[]);\nconsole.log(1);\n', [0])).toThrow(/__r\(<main>\)/);
});

it('takes the listed modules this build defines, in list order, once each', () => {
  const idsByPath = {
    [path.join(root, 'node_modules/a/index.js')]: 4,
    [path.join(root, 'components/b.tsx')]: 2,
    [path.join(root, 'node_modules/c/index.js')]: 9,
    '\0shim:d.js': 3,
  };
  const code = bundle([2, 3, 4], 0);
  expect(
    startUpIds(
      [
        'components/b.tsx',
        'node_modules/gone/index.js',
        'node_modules/c/index.js',
        '\0shim:d.js',
        'node_modules/a/index.js',
        'components/b.tsx',
      ],
      idsByPath,
      root,
      code,
    ),
  ).toEqual([2, 3, 4]);
  expect(listName(root, path.join(root, 'app/_layout.tsx'))).toBe('app/_layout.tsx');
});

/** Module `id` requires `needs` at its top level, then notes itself; Metro passes require as the 2nd argument. */
function graph(modules: [number, number[]][], main: number): string {
  const lines = modules.map(
    ([id, needs]) => `__d(function(g,r,i,a,m,e,d){${needs.map((n) => `r(${n});`).join('')}ran.push(${id})},${id},[]);`,
  );
  return ['var ran=[];', RUNTIME.replace('m.f()', 'm.f(null,__r,__r,__r)'), ...lines, `__r(${main});`, ''].join('\n');
}

it('records on the script as Metro wrote it, noting each module when it finishes and the ones inside a require cycle', () => {
  // 0 is the entry: it needs 1, which needs 2 and 3; 3 needs 4, which needs 3 again (a cycle).
  const code = graph(
    [
      [0, [1]],
      [1, [2, 3]],
      [2, []],
      [3, [4]],
      [4, [3]],
    ],
    0,
  );
  const recording = recordingEntry(withSlicedStartUp(code, [2, 1]));
  expect(recording).toContain('\n__r(0);\n');
  expect(recording).not.toContain('function(ids,main)');
  const context = vm.createContext({});
  vm.runInContext(recording, context);
  expect(vm.runInContext('globalThis.__startUpOrder', context)).toEqual([2, 4, 3, 1, 0]);
  expect(vm.runInContext('globalThis.__startUpCycles', context)).toEqual([4]);
});

it('keeps a list of modules that exist, without the ones that mount the app', () => {
  const list = JSON.parse(fs.readFileSync(START_UP_LIST, 'utf8')) as string[];
  expect(list.length).toBeGreaterThan(100);
  expect(new Set(list).size).toBe(list.length);
  expect(list).not.toContain('node_modules/expo-router/entry.js');
  expect(list).not.toContain('node_modules/expo-router/entry-classic.js');
  // A path that is gone means a package moved its files: run record-start-up-modules.ts again.
  const missing = list.filter((file) => !file.startsWith('\0') && !fs.existsSync(path.join(root, file)));
  expect(missing).toEqual([]);
});
