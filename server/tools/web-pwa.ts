/**
 * The steps after `expo export` that make dist/ an installable, offline-ready
 * web app (run by web-export.ts, so `npm start` and `npm test` get them):
 *
 *  1. icons drawn from Pinwright's mark (components/shell/mark.tsx) and
 *     rendered to PNG with sharp: 192 and 512 px, maskable 192/512 (mark inside
 *     the 80 % safe circle of the W3C Web App Manifest "maskable" purpose),
 *     and a 180 px apple-touch-icon;
 *  2. manifest.webmanifest (name, short name, icons, display standalone,
 *     theme and background colours read from components/theme.ts);
 *  3. the web fonts (assets/fonts/web/*.woff2) copied in under content-hashed
 *     names; index.html gets their @font-face rules, a preload for the two
 *     faces of words the first screen shows, and the manifest, icon and
 *     theme-color links (the "single" web output writes Expo's own page, not
 *     app/+html.tsx);
 *  4. sw.js, a Workbox 7 service worker (workbox-build generateSW) that
 *     precaches the shell, every script, font and icon, answers navigations
 *     with index.html (never /api: the data is the app's own IndexedDB
 *     cache), and waits when updated until the page asks it to take over;
 *  5. every compressible file precompressed beside itself (.br at brotli
 *     quality 11, .gz at gzip level 9), served by server/web-static.ts.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import zlib from 'node:zlib';

export const SERVICE_WORKER = 'sw.js';
export const MANIFEST = 'manifest.webmanifest';
/** Files whose bytes compress (text, and TrueType whose tables are uncompressed). */
export const COMPRESSIBLE = /\.(js|mjs|css|html|json|webmanifest|svg|ico|ttf|otf|txt|map)$/;

type Palette = Record<string, string>;

/** The hex colours of components/theme.ts (read as text: the module imports react-native). */
export function readPalette(root: string): Palette {
  const source = fs.readFileSync(path.join(root, 'components/theme.ts'), 'utf8');
  const block = source.slice(source.indexOf('export const colors'), source.indexOf('} as const', source.indexOf('export const colors')));
  const palette: Palette = {};
  for (const match of block.matchAll(/^\s*(\w+):\s*'(#[0-9A-Fa-f]{6})'/gm)) palette[match[1]] = match[2];
  for (const name of ['slate', 'paper', 'onSlate', 'signalOnSlate']) {
    if (!palette[name]) throw new Error(`components/theme.ts: colour "${name}" not found for the app icons`);
  }
  return palette;
}

/**
 * The mark of components/shell/mark.tsx (viewBox 0 0 32 32) on a slate
 * ground. `markShare` is the part of the icon's width the mark's 32-unit box
 * takes; `rounded` gives the ground rounded corners (the plain icon), a
 * maskable or Apple icon is full-bleed (the platform cuts its own shape).
 */
export function iconSvg(palette: Palette, size: number, markShare: number, rounded: boolean): string {
  const box = size * markShare;
  const scale = box / 32;
  const offset = (size - box) / 2;
  const radius = rounded ? size * 0.18 : 0;
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}" viewBox="0 0 ${size} ${size}">
  <rect width="${size}" height="${size}" rx="${radius}" fill="${palette.slate}"/>
  <g transform="translate(${offset} ${offset}) scale(${scale})">
    <circle cx="17" cy="16" r="11.5" stroke="${palette.onSlate}" stroke-width="3" fill="none"/>
    <line x1="1.5" y1="16" x2="13" y2="16" stroke="${palette.onSlate}" stroke-width="3" stroke-linecap="round"/>
    <circle cx="17" cy="16" r="4" fill="${palette.signalOnSlate}"/>
  </g>
</svg>`;
}

export const ICONS = [
  { file: 'icons/icon-192.png', size: 192, share: 0.72, rounded: true, purpose: 'any' },
  { file: 'icons/icon-512.png', size: 512, share: 0.72, rounded: true, purpose: 'any' },
  // Maskable: keep the mark inside the central 80 % circle (W3C manifest spec, "maskable" icons).
  { file: 'icons/maskable-192.png', size: 192, share: 0.56, rounded: false, purpose: 'maskable' },
  { file: 'icons/maskable-512.png', size: 512, share: 0.56, rounded: false, purpose: 'maskable' },
  // iOS home screen: 180 px, square (iOS rounds the corners itself).
  { file: 'icons/apple-touch-icon.png', size: 180, share: 0.66, rounded: false, purpose: null },
] as const;

async function writeIcons(dist: string, palette: Palette): Promise<void> {
  const sharp = (await import('sharp')).default;
  fs.mkdirSync(path.join(dist, 'icons'), { recursive: true });
  await Promise.all(
    ICONS.map((icon) =>
      sharp(Buffer.from(iconSvg(palette, icon.size, icon.share, icon.rounded)))
        .png({ compressionLevel: 9 })
        .toFile(path.join(dist, icon.file)),
    ),
  );
}

export function manifest(palette: Palette) {
  return {
    name: 'Pinwright',
    short_name: 'Pinwright',
    description: 'Sight tapes, sight-ins and level checks for compound bows.',
    id: '/',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'any',
    theme_color: palette.slate,
    background_color: palette.paper,
    icons: ICONS.filter((icon) => icon.purpose).map((icon) => ({
      src: `/${icon.file}`,
      sizes: `${icon.size}x${icon.size}`,
      type: 'image/png',
      purpose: icon.purpose,
    })),
  };
}

/**
 * The web fonts, one family per face, named as components/theme.ts names them.
 * The faces of words are preloaded: they arrive beside the script, so the
 * first screen's text shows in its own face with no swap. The numeral faces
 * are fetched on first use (the sign-in screen has none), and
 * `font-display: swap` shows a number in the fallback face until then.
 */
export const WEB_FONTS = [
  { family: 'AtkinsonHyperlegible_400Regular', preload: true },
  { family: 'AtkinsonHyperlegible_700Bold', preload: true },
  { family: 'BarlowCondensed_500Medium', preload: false },
  { family: 'BarlowCondensed_600SemiBold', preload: false },
] as const;

/** Copies assets/fonts/web/<family>.woff2 to dist/assets/fonts/<family>.<md5>.woff2; returns each one's URL. */
function copyFonts(root: string, dist: string): { family: string; href: string; preload: boolean }[] {
  const out = path.join(dist, 'assets', 'fonts');
  fs.mkdirSync(out, { recursive: true });
  return WEB_FONTS.map(({ family, preload }) => {
    const source = path.join(root, 'assets', 'fonts', 'web', `${family}.woff2`);
    const bytes = fs.readFileSync(source);
    const name = `${family}.${crypto.createHash('md5').update(bytes).digest('hex')}.woff2`;
    fs.writeFileSync(path.join(out, name), bytes);
    return { family, href: `/assets/fonts/${name}`, preload };
  });
}

/** Adds the fonts, the manifest, icon and theme-colour tags to dist/index.html (once). */
function linkHead(root: string, dist: string, palette: Palette): void {
  const file = path.join(dist, 'index.html');
  let html = fs.readFileSync(file, 'utf8');
  if (html.includes(MANIFEST)) return;
  const fonts = copyFonts(root, dist);
  const faces = fonts
    .map(
      ({ family, href, preload }) =>
        `@font-face{font-family:"${family}";src:url("${href}") format("woff2");font-display:${preload ? 'block' : 'swap'}}`,
    )
    .join('\n');
  const tags = [
    ...fonts
      .filter((font) => font.preload)
      .map(({ href }) => `<link rel="preload" href="${href}" as="font" type="font/woff2" crossorigin />`),
    `<style>${faces}</style>`,
    `<link rel="manifest" href="/${MANIFEST}" />`,
    '<link rel="apple-touch-icon" href="/icons/apple-touch-icon.png" />',
    `<meta name="theme-color" content="${palette.slate}" />`,
    '<meta name="description" content="Sight tapes, sight-ins and level checks for compound bows." />',
    `<style>html, body { background-color: ${palette.paper}; }</style>`,
  ].join('\n    ');
  html = html.replace('</head>', `    ${tags}\n  </head>`);
  fs.writeFileSync(file, html);
}

async function writeServiceWorker(dist: string): Promise<{ count: number; size: number }> {
  const { generateSW } = await import('workbox-build');
  const result = await generateSW({
    globDirectory: dist,
    globPatterns: ['**/*.{html,js,css,ttf,otf,woff2,png,ico,svg,webmanifest}'],
    globIgnores: ['**/*.br', '**/*.gz', '**/*.map', SERVICE_WORKER, 'metadata.json'],
    swDest: path.join(dist, SERVICE_WORKER),
    // The whole app, so every screen opens with no signal after one visit.
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    // Expo's build names carry a 32-hex content hash: no revision needed for them.
    dontCacheBustURLsMatching: /[.-][0-9a-f]{32}\.\w+$/,
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api(\/|$)/],
    cleanupOutdatedCaches: true,
    // An update waits until the page asks (the "new version is ready" notice), so
    // one page never runs old and new files together.
    skipWaiting: false,
    clientsClaim: false,
    inlineWorkboxRuntime: true,
    sourcemap: false,
    mode: 'production',
  });
  for (const warning of result.warnings) console.warn(`  service worker: ${warning}`);
  return { count: result.count, size: result.size };
}

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

function listFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? listFiles(full) : [full];
  });
}

/** Writes <file>.br and <file>.gz beside each compressible file, when smaller. */
export async function precompress(dist: string): Promise<{ files: number; raw: number; br: number }> {
  const files = listFiles(dist).filter((file) => COMPRESSIBLE.test(file));
  let raw = 0;
  let br = 0;
  await Promise.all(
    files.map(async (file) => {
      const data = fs.readFileSync(file);
      const [b, g] = await Promise.all([
        brotli(data, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length } }),
        gzip(data, { level: 9 }),
      ]);
      raw += data.length;
      br += Math.min(b.length, data.length);
      if (b.length < data.length) fs.writeFileSync(`${file}.br`, b);
      if (g.length < data.length) fs.writeFileSync(`${file}.gz`, g);
    }),
  );
  return { files: files.length, raw, br };
}

/** All post-export steps, in order (the service worker hashes the final index.html). */
export async function finishWebExport(root: string, log: (line: string) => void = console.log): Promise<void> {
  const dist = path.join(root, 'dist');
  const palette = readPalette(root);
  await writeIcons(dist, palette);
  fs.writeFileSync(path.join(dist, MANIFEST), `${JSON.stringify(manifest(palette), null, 2)}\n`);
  linkHead(root, dist, palette);
  const sw = await writeServiceWorker(dist);
  log(`  service worker: ${sw.count} files precached (${Math.round(sw.size / 1024)} KB before compression)`);
  const packed = await precompress(dist);
  log(`  precompressed ${packed.files} files: ${Math.round(packed.raw / 1024)} KB → ${Math.round(packed.br / 1024)} KB brotli`);
}
