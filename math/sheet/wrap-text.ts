import type { GlyphFont } from '@/math/tape/glyphs';
import { measureTextMm } from '@/math/tape/text-path';

/**
 * Break `text` into lines no wider than `widthMm` at digit height `sizeMm`,
 * at spaces (a word longer than a line stands alone on its line).
 * Example: wrapText('Print at actual size, then measure the bar', SMALL_PRINT_FONT, 2, 40) → ['Print at actual size, then', 'measure the bar']
 */
export function wrapText(text: string, font: GlyphFont, sizeMm: number, widthMm: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const candidate = line ? `${line} ${word}` : word;
    if (line && measureTextMm(candidate, font, sizeMm) > widthMm) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line) lines.push(line);
  return lines;
}
