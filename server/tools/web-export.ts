/**
 * Builds the web app into dist/ with the Expo CLI, offline, when dist/ is
 * older than any of its sources, then makes it an installable, offline-ready
 * app with precompressed files (web-pwa.ts). Shared by `npm start` and `npm test`.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { finishWebExport } from './web-pwa';

const SOURCES = ['app', 'components', 'shared', 'math', 'assets', 'app.json', 'babel.config.js', 'package-lock.json', 'metro.config.js', 'server/tools/web-pwa.ts'];

function newestMtime(target: string): number {
  if (!fs.existsSync(target)) return 0;
  const stat = fs.statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(target)) newest = Math.max(newest, newestMtime(path.join(target, entry)));
  return newest;
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
  await new Promise<void>((resolve, reject) => {
    const child = spawn(process.execPath, [path.join(root, 'node_modules/expo/bin/cli'), 'export', '--platform', 'web', '--output-dir', 'dist'], {
      cwd: root,
      env: { ...process.env, EXPO_NO_TELEMETRY: '1', EXPO_OFFLINE: '1', EXPO_UNSTABLE_HEADLESS: '1', CI: '1' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
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
  await finishWebExport(root, log);
  const stamp = path.join(root, 'dist', '.built-at');
  fs.writeFileSync(stamp, stampStart.toISOString());
  fs.utimesSync(stamp, stampStart, stampStart);
  log(`Web app built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
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
