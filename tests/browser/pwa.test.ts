/**
 * The installable app shell: manifest and icons, compressed responses and
 * cache headers, the app opening with no network after one visit, and a new
 * deployment's service worker taking over only when the archer reloads.
 *
 * Each test serves its own copy of dist/ (a new deployment is simulated by
 * rewriting that copy), so other tests' dist/ is never touched.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { createApp } from '@/server/app';
import { START_UP_LIST } from '@/server/tools/start-up-modules';
import { readPalette } from '@/server/tools/web-pwa';
import { DESKTOP, PHONE, newPage, pageErrors, screenshot, stackForFile } from '../helpers/browser';

const root = path.resolve(__dirname, '../..');
const stack = stackForFile();
let copy: string;
let server: Server;
let base: string;

beforeAll(async () => {
  copy = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-dist-'));
  fs.cpSync(path.join(root, 'dist'), copy, { recursive: true });
  const app = createApp({ sessionExpiryTimer: false, webDir: copy });
  server = await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}, 60_000);

afterAll(async () => {
  server?.closeAllConnections();
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  if (copy) fs.rmSync(copy, { recursive: true, force: true });
});

const entryScript = () => {
  const html = fs.readFileSync(path.join(copy, 'index.html'), 'utf8');
  const match = html.match(/src="(\/_expo\/static\/js\/web\/entry-[0-9a-f]{32}\.js)"/);
  if (!match) throw new Error('index.html names no entry script');
  return match[1];
};

/**
 * A new deployment, as far as the browser can tell: index.html changes, so
 * its precache revision in sw.js changes (as a rebuild would write), and the
 * precompressed twins are written again.
 */
function deployNewVersion(marker: string): void {
  const indexFile = path.join(copy, 'index.html');
  const oldHtml = fs.readFileSync(indexFile);
  const html = oldHtml.toString().replace(/<meta name="pinwright-deployment"[^>]*>/, '');
  const newHtml = Buffer.from(html.replace('</head>', `<meta name="pinwright-deployment" content="${marker}" /></head>`));
  const md5 = (data: Buffer) => crypto.createHash('md5').update(data).digest('hex');
  const swFile = path.join(copy, 'sw.js');
  const sw = fs.readFileSync(swFile, 'utf8');
  if (!sw.includes(md5(oldHtml))) throw new Error('sw.js does not carry index.html’s revision');
  const newSw = Buffer.from(sw.replace(md5(oldHtml), md5(newHtml)));
  for (const [file, data] of [
    [indexFile, newHtml],
    [swFile, newSw],
  ] as const) {
    fs.writeFileSync(file, data);
    fs.writeFileSync(`${file}.br`, zlib.brotliCompressSync(data));
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(data));
  }
}

/** Waits until the page's service worker has installed its precache and is active. */
async function waitForActiveWorker(page: Page): Promise<void> {
  await page.evaluate(async () => {
    const registration = await navigator.serviceWorker.ready;
    return registration.active?.state;
  });
}

it('serves a valid web app manifest with icons that load at their stated sizes', async () => {
  const res = await fetch(`${base}/manifest.webmanifest`, { headers: { 'Accept-Encoding': 'identity' } });
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toMatch(/^application\/manifest\+json/);
  const manifest = await res.json();
  const palette = readPalette(root);
  expect(manifest).toMatchObject({ name: 'Pinwright', short_name: 'Pinwright', display: 'standalone', start_url: '/' });
  // Colours from components/theme.ts: slate bars, paper ground.
  expect(manifest.theme_color).toBe(palette.slate);
  expect(manifest.background_color).toBe(palette.paper);
  const wanted = ['192x192 any', '512x512 any', '192x192 maskable', '512x512 maskable'];
  expect(manifest.icons.map((i: { sizes: string; purpose: string }) => `${i.sizes} ${i.purpose}`).sort()).toEqual([...wanted].sort());
  const icons = [
    ...manifest.icons.map((i: { src: string; sizes: string }) => [i.src, Number(i.sizes.split('x')[0])]),
    ['/icons/apple-touch-icon.png', 180],
  ];
  for (const [src, size] of icons as [string, number][]) {
    const icon = await fetch(`${base}${src}`);
    expect(icon.headers.get('content-type')).toBe('image/png');
    const meta = await sharp(Buffer.from(await icon.arrayBuffer())).metadata();
    expect([src, meta.width, meta.height]).toEqual([src, size, size]);
  }

  // The page links them, and the browser fetches the manifest it names.
  const { context, page } = await newPage(stack, PHONE);
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').waitFor();
  expect(await page.locator('link[rel="manifest"]').getAttribute('href')).toBe('/manifest.webmanifest');
  expect(await page.locator('link[rel="apple-touch-icon"]').getAttribute('href')).toBe('/icons/apple-touch-icon.png');
  expect(await page.locator('meta[name="theme-color"]').getAttribute('content')).toBe(palette.slate);
  const cdp = await context.newCDPSession(page);
  const { url, errors } = await cdp.send('Page.getAppManifest');
  expect(url).toBe(`${base}/manifest.webmanifest`);
  expect(errors).toEqual([]);
  await context.close();
});

it('runs the start-up modules in slices before the first render, under a name that is the hash of the script', () => {
  const script = entryScript();
  const code = fs.readFileSync(path.join(copy, script), 'utf8');
  // The script is rewritten after Metro wrote it (server/tools/start-up-modules.ts); a year's immutable
  // caching is only safe if its name still changes with its content.
  expect(script).toContain(`entry-${crypto.createHash('md5').update(code).digest('hex')}.js`);
  const loader = /\n\(function\(ids,main\)\{.*\}\)\((\[[\d,]*\]),(\d+)\);\n$/.exec(code);
  expect(loader).not.toBeNull();
  const ids = JSON.parse(loader![1]) as number[];
  const listed = JSON.parse(fs.readFileSync(START_UP_LIST, 'utf8')) as string[];
  expect(ids.length).toBeGreaterThan(listed.length * 0.9);
  expect(ids).not.toContain(Number(loader![2]));
});

it('sends brotli where accepted, else gzip, with the right types and cache headers', async () => {
  const script = entryScript();
  const plain = fs.readFileSync(path.join(copy, script));
  const get = (url: string, encoding: string) => fetch(`${base}${url}`, { headers: { 'Accept-Encoding': encoding } });
  // Node's fetch decodes the body itself; the headers say what was on the wire.
  const br = await get(script, 'gzip, deflate, br');
  expect([br.headers.get('content-encoding'), br.headers.get('vary'), br.headers.get('content-type')]).toEqual([
    'br',
    'Accept-Encoding',
    'text/javascript; charset=utf-8',
  ]);
  expect(Buffer.from(await br.arrayBuffer()).equals(plain)).toBe(true);
  expect(Number(br.headers.get('content-length'))).toBeLessThan(plain.length / 3);
  const gz = await get(script, 'gzip');
  expect(gz.headers.get('content-encoding')).toBe('gzip');
  expect(Buffer.from(await gz.arrayBuffer()).equals(plain)).toBe(true);
  const none = await get(script, 'identity');
  expect(none.headers.get('content-encoding')).toBeNull();
  expect(Number(none.headers.get('content-length'))).toBe(plain.length);
  const refused = await get(script, 'br;q=0, gzip');
  expect(refused.headers.get('content-encoding')).toBe('gzip');

  // Hashed build files: a year, immutable. The page, the worker and the manifest: always revalidated.
  expect(br.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
  for (const url of ['/', '/sign-in', '/index.html', '/sw.js', '/manifest.webmanifest']) {
    expect([url, (await get(url, 'br')).headers.get('cache-control')]).toEqual([url, 'no-cache']);
  }
  // A build file that is not there is a 404, never index.html run as a script.
  expect((await get('/_expo/static/js/web/entry-00000000000000000000000000000000.js', 'br')).status).toBe(404);
  // Fonts are WOFF2 (compressed inside, so sent as they are), hashed and cached for a year.
  const html = fs.readFileSync(path.join(copy, 'index.html'), 'utf8');
  const preloaded = [...html.matchAll(/<link rel="preload" href="([^"]+)" as="font" type="font\/woff2"/g)].map((m) => m[1]);
  expect(preloaded.map((href) => path.basename(href).split('.')[0]).sort()).toEqual([
    'AtkinsonHyperlegible_400Regular',
    'AtkinsonHyperlegible_700Bold',
  ]); // the faces of words; the numeral faces load on first use
  expect(html.match(/@font-face\{/g)).toHaveLength(4);
  for (const href of preloaded) {
    const fontRes = await get(href, 'br');
    expect([fontRes.status, fontRes.headers.get('content-type'), fontRes.headers.get('content-encoding')]).toEqual([
      200,
      'font/woff2',
      null,
    ]);
    expect(fontRes.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    expect(
      Buffer.from(await fontRes.arrayBuffer())
        .subarray(0, 4)
        .toString('latin1'),
    ).toBe('wOF2');
  }

  // The API: compressed on the fly (compression middleware) when the body is worth it.
  const sheet = await fetch(`${base}/api/try/sheet.svg`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Pinwright-Csrf': '1', 'Accept-Encoding': 'br, gzip' },
    body: JSON.stringify({
      distanceUnit: 'yd',
      sight: { radiusMm: 820, peepHeightMm: 110 },
      arrow: { massGr: 420, diameterMm: 6.5 },
      marks: [
        { distance: 20, markMm: 14.9 },
        { distance: 60, markMm: 32.6 },
      ],
    }),
  });
  expect(sheet.status).toBe(200);
  expect(['br', 'gzip']).toContain(sheet.headers.get('content-encoding'));
  expect((await sheet.text()).startsWith('<svg')).toBe(true);
});

it('opens the sign-in page with no network after one visit', async () => {
  const { context, page } = await newPage(stack, PHONE);
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').waitFor();
  await waitForActiveWorker(page);
  await context.setOffline(true);
  await page.reload();
  await page.getByLabel('E-mail').waitFor({ timeout: 15_000 });
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  // The faces of words come from the worker's precache too, not the fallback faces.
  const faces = await page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].filter((face) => face.status === 'loaded').map((face) => face.family.replace(/"/g, ''));
  });
  expect(faces).toEqual(expect.arrayContaining(['AtkinsonHyperlegible_400Regular', 'AtkinsonHyperlegible_700Bold']));
  await screenshot(page, 'offline-sign-in');
  // Another of the app's routes, never visited, still opens (navigation falls back to the app shell).
  await page.goto(`${base}/forgot-password`);
  await page.getByLabel('E-mail').waitFor({ timeout: 15_000 });
  expect(await page.evaluate(() => !!navigator.serviceWorker.controller)).toBe(true);
  await screenshot(page, 'offline-forgot-password');
  expect(pageErrors(page)).toEqual([]);
  await context.close();
});

for (const size of [PHONE, DESKTOP]) {
  it(`a new deployment waits, shows "a new version is ready", and reload gives a working page (${size.width}×${size.height})`, async () => {
    const { context, page } = await newPage(stack, size);
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await waitForActiveWorker(page);
    await page.reload(); // now the page is controlled by the worker
    await page.getByLabel('E-mail').waitFor();
    expect(await page.getByTestId('update-notice').count()).toBe(0);

    const marker = `v${Date.now()}`;
    deployNewVersion(marker);
    await page.reload(); // the browser checks sw.js on navigation and installs the new one
    const notice = page.getByTestId('update-notice');
    await notice.waitFor({ timeout: 30_000 });
    await page.getByText('A new version of Pinwright is ready.').waitFor();
    // Still the old version's page: nothing is switched under the archer's feet.
    expect(await page.locator(`meta[name="pinwright-deployment"][content="${marker}"]`).count()).toBe(0);
    await page.waitForTimeout(300);
    await screenshot(page, 'update-notice');

    await page.getByRole('button', { name: 'Reload for the new version' }).click();
    await page.waitForFunction((m) => document.querySelector('meta[name="pinwright-deployment"]')?.getAttribute('content') === m, marker, {
      timeout: 20_000,
    });
    await page.getByLabel('E-mail').waitFor();
    expect(await page.getByTestId('update-notice').count()).toBe(0);
    await page.getByLabel('E-mail').fill('still-works@example.test');
    expect(await page.getByLabel('E-mail').inputValue()).toBe('still-works@example.test');
    expect(pageErrors(page)).toEqual([]);
    await context.close();
  }, 90_000);
}
