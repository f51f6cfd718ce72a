/**
 * Builds the web app into dist/ with the Expo CLI, offline, when dist/ is
 * older than any of its sources, then makes it an installable, offline-ready
 * app with precompressed files (web-pwa.ts). Shared by `npm start` and `npm test`.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { PRODUCT_LEAD } from '../../components/shell/product-lead';
import { sliceStartUp } from './start-up-modules';
import { finishWebExport, readPalette } from './web-pwa';

const SOURCES = [
  'app',
  'components',
  'shared',
  'math',
  'assets',
  'app.json',
  'babel.config.js',
  'package-lock.json',
  'metro.config.js',
  'server/tools/web-pwa.ts',
  'server/tools/start-up-modules.ts',
  'server/tools/start-up-modules.json',
];

function newestMtime(target: string): number {
  if (!fs.existsSync(target)) return 0;
  const stat = fs.statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(target)) newest = Math.max(newest, newestMtime(path.join(target, entry)));
  return newest;
}

/** Where the last export's module ids are kept (see PINWRIGHT_MODULE_IDS in metro.config.js). */
export function moduleIdsFile(root: string): string {
  return path.join(root, 'node_modules', '.cache', 'pinwright', 'web-module-ids.json');
}

export function webExportIsStale(root: string): boolean {
  const stamp = path.join(root, 'dist', '.built-at');
  if (!fs.existsSync(stamp)) return true;
  const builtAt = fs.statSync(stamp).mtimeMs;
  return SOURCES.some((source) => newestMtime(path.join(root, source)) > builtAt);
}

export async function exportWeb(root: string, log: (line: string) => void = console.log): Promise<void> {
  log('Building the web app (expo export --platform web)… this takes about a minute the first time.');
  const started = Date.now();
  const stampStart = new Date();
  // metro.config.js writes here which module id each source file got (read by sliceStartUp
  // and by record-start-up-modules.ts).
  const idsFile = moduleIdsFile(root);
  fs.mkdirSync(path.dirname(idsFile), { recursive: true });
  fs.rmSync(idsFile, { force: true });
  await new Promise<void>((resolve, reject) => {
    const child = spawn(
      process.execPath,
      [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', 'dist'],
      {
        cwd: root,
        env: {
          ...process.env,
          EXPO_NO_TELEMETRY: '1',
          EXPO_OFFLINE: '1',
          EXPO_UNSTABLE_HEADLESS: '1',
          CI: '1',
          PINWRIGHT_MODULE_IDS: idsFile,
        },
        stdio: ['ignore', 'pipe', 'pipe'],
      },
    );
    let output = '';
    const keep = (chunk: Buffer) => {
      output += chunk.toString();
      // Show progress lines as they come, so a long build is visibly alive.
      for (const line of chunk.toString().split('\n')) if (/Web Bundled|Exporting|error/i.test(line)) log(`  ${line.trim()}`);
    };
    child.stdout.on('data', keep);
    child.stderr.on('data', keep);
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`expo export failed (exit ${code}):\n${output.slice(-4000)}`))));
  });
  addFirstPaintShell(path.join(root, 'dist', 'index.html'), readPalette(root));
  const sliced = sliceStartUp(root, idsFile);
  log(`  start-up: ${sliced.modules} of ${sliced.listed} listed modules run in short slices before the first render`);
  await finishWebExport(root, log);
  const stamp = path.join(root, 'dist', '.built-at');
  fs.writeFileSync(stamp, stampStart.toISOString());
  fs.utimesSync(stamp, stampStart, stampStart);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
}

const SHELL_ID = 'pw-first-paint';

const escapeHtml = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

/**
 * Puts a small static first screen into the exported page, beside
 * `<div id="root">`: the name, what Pinwright does (the sign-in page's own
 * lead, components/shell/product-lead.ts) and "Opening…", in the theme's
 * colours and the system font, covering the page,
 * so something true shows as soon as the page arrives instead of after the
 * ~280 KB script has downloaded and run. No form, no link. The app removes it
 * once its first screen has rendered (components/shell/first-screen.tsx).
 * Runs before web-pwa.ts, so the service worker's copy of index.html and its
 * .br/.gz twins include it. Idempotent.
 */
export function addFirstPaintShell(indexHtml: string, colors: Record<string, string>): void {
  const html = fs.readFileSync(indexHtml, 'utf8');
  if (html.includes(`id="${SHELL_ID}"`)) return;
  for (const name of ['paper', 'ink', 'inkSoft'])
    if (!colors[name]) throw new Error(`components/theme.ts: colour "${name}" not found for the first-paint shell`);
  const shell =
    `<div id="${SHELL_ID}" style="position:fixed;inset:0;z-index:10;box-sizing:border-box;padding:40px 24px;display:flex;flex-direction:column;` +
    `align-items:center;justify-content:center;gap:12px;background:${colors.paper};color:${colors.ink};` +
    `font-family:system-ui,-apple-system,'Segoe UI',Roboto,sans-serif;text-align:center">` +
    `<p style="margin:0;font-size:28px;line-height:34px;font-weight:700;letter-spacing:0.3px">Pinwright</p>` +
    `<p style="margin:0;max-width:360px;font-size:17px;line-height:26px;color:${colors.inkSoft}">` +
    `${escapeHtml(PRODUCT_LEAD)}</p>` +
    `<p role="status" style="margin:0;font-size:15px;line-height:22px;color:${colors.inkSoft}">Opening…</p></div>`;
  const withShell = html.replace('<div id="root"></div>', `<div id="root"></div>${shell}`);
  if (withShell === html) throw new Error('dist/index.html has no empty <div id="root"></div> to put the first-paint shell beside');
  fs.writeFileSync(indexHtml, withShell);
}

export async function exportWebIfStale(root: string, log: (line: string) => void = console.log): Promise<void> {
  if (webExportIsStale(root)) await exportWeb(root, log);
  else log('Web app is up to date (dist/).');
}

if (require.main === module) {
  exportWeb(path.resolve(__dirname, '../..')).catch((err) => {
    console.error(err.message);
    process.exit(1);
  });
}
