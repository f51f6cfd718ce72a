import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { PRODUCT_LEAD } from '@/components/shell/product-lead';
import { addFirstPaintShell } from '@/server/tools/web-export';
import { readPalette } from '@/server/tools/web-pwa';

const root = path.resolve(__dirname, '../..');
// Expo's "single" output page, cut down to the part the shell is put beside.
const page =
  '<!DOCTYPE html><html lang="en"><head><title>Pinwright</title></head><body><div id="root"></div><script src="/entry.js" defer></script></body></html>';

function writePage(html: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-shell-'));
  const file = path.join(dir, 'index.html');
  fs.writeFileSync(file, html);
  return file;
}

describe('the first-paint shell of the exported page (server/tools/web-export.ts)', () => {
  const palette = readPalette(root);

  it('puts the name, the product’s lead and "Opening…" beside #root, in the theme colours, with no form or link', () => {
    const file = writePage(page);
    addFirstPaintShell(file, palette);
    const html = fs.readFileSync(file, 'utf8');
    expect(html).toContain('<div id="root"></div><div id="pw-first-paint"');
    const shell = html.slice(html.indexOf('<div id="pw-first-paint"'), html.indexOf('<script'));
    expect(shell).toContain('>Pinwright</p>');
    // The sign-in page's own lead, so the first text shown is the text that stays.
    expect(shell).toContain(PRODUCT_LEAD.replace("'", '&#39;'));
    expect(shell).toContain('role="status"');
    expect(shell).toContain(`background:${palette.paper}`);
    expect(shell).toContain(`color:${palette.ink}`);
    expect(shell).not.toMatch(/<(form|input|a|button)\b/);
    // Before the script, so it paints before the script has arrived.
    expect(html.indexOf('pw-first-paint')).toBeLessThan(html.indexOf('<script'));
  });

  it('adds it once however often the export is finished', () => {
    const file = writePage(page);
    addFirstPaintShell(file, palette);
    addFirstPaintShell(file, palette);
    expect(fs.readFileSync(file, 'utf8').split('id="pw-first-paint"')).toHaveLength(2);
  });

  it('refuses a page without the empty root element rather than writing a page with no shell', () => {
    const file = writePage(page.replace('<div id="root"></div>', '<main></main>'));
    expect(() => addFirstPaintShell(file, palette)).toThrow(/root/);
    expect(fs.readFileSync(file, 'utf8')).not.toContain('pw-first-paint');
  });
});
