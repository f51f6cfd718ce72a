/**
 * The web fonts the build writes into index.html (server/tools/web-pwa.ts):
 * each family components/theme.ts names has its WOFF2 file, and the faces of
 * words — the ones the first screen shows — are the preloaded ones.
 */
import fs from 'node:fs';
import path from 'node:path';
import { WEB_FONTS } from '@/server/tools/web-pwa';

const root = path.resolve(__dirname, '../..');
const theme = fs.readFileSync(path.join(root, 'components/theme.ts'), 'utf8');

it('has a WOFF2 file for every family the theme names', () => {
  const named = [...new Set([...theme.matchAll(/family\('(\w+)'/g)].map((m) => m[1]))].sort();
  expect(WEB_FONTS.map((font) => font.family).sort()).toEqual(named);
  for (const { family } of WEB_FONTS) {
    const bytes = fs.readFileSync(path.join(root, 'assets/fonts/web', `${family}.woff2`));
    // WOFF2's signature (W3C WOFF File Format 2.0, §3 "wOF2").
    expect([family, bytes.subarray(0, 4).toString('latin1')]).toEqual([family, 'wOF2']);
  }
});

it('preloads the faces of words and leaves the numeral faces to load on first use', () => {
  const words = theme.match(/body: family\('(\w+)'/)?.[1];
  const bold = theme.match(/bold: family\('(\w+)'/)?.[1];
  expect(
    WEB_FONTS.filter((font) => font.preload)
      .map((font) => font.family)
      .sort(),
  ).toEqual([words, bold].sort());
});
