import type { GlyphFont } from '@/math/tape/glyphs';

/**
 * Text drawn as one SVG path in millimetres, from the glyph outlines of
 * glyphs.ts, so a print looks the same whatever fonts the printing machine has.
 * `sizeMm` is the height of the digits (the digit 1, baseline to top); a
 * character the font lacks is drawn as "?". No kerning.
 *
 * Example: textPath('40', NUMERAL_FONT, { x: 5, y: 10, sizeMm: 1.8 }) → { d: 'M…Z', widthMm: 2.24 }
 */
export interface TextPlacement {
  /** Anchor point, mm (SVG user units, y down). */
  x: number;
  y: number;
  /** Digit height, mm. */
  sizeMm: number;
  /** Horizontal anchor: the start, middle or end of the text at x. Default start. */
  anchor?: 'start' | 'middle' | 'end';
  /** Vertical anchor: the baseline, or the middle of the digits, at y. Default baseline. */
  baseline?: 'alphabetic' | 'middle';
}

type Parsed = { advance: number; commands: (string | number)[] };
const parsedCache = new WeakMap<GlyphFont, Map<string, Parsed>>();

function glyphOf(font: GlyphFont, character: string): Parsed {
  let cache = parsedCache.get(font);
  if (!cache) {
    cache = new Map();
    parsedCache.set(font, cache);
  }
  let parsed = cache.get(character);
  if (!parsed) {
    const entry = font.glyphs[character] ?? font.glyphs['?'];
    const commands: (string | number)[] = [];
    for (const token of entry[1].match(/[MLQCZ]|-?\d*\.?\d+/g) ?? []) commands.push(/[MLQCZ]/.test(token) ? token : Number(token));
    parsed = { advance: entry[0], commands };
    cache.set(character, parsed);
  }
  return parsed;
}

/** Width of `text` at digit height `sizeMm`, mm. Example: measureTextMm('100', NUMERAL_FONT, 1.8) → 2.94 */
export function measureTextMm(text: string, font: GlyphFont, sizeMm: number): number {
  let advance = 0;
  for (const character of text) advance += glyphOf(font, character).advance;
  return (advance * sizeMm) / font.digitHeight;
}

/** The path data (mm, absolute) and width (mm) of `text` placed as `placement` says. Example: see the module comment. */
export function textPath(text: string, font: GlyphFont, placement: TextPlacement): { d: string; widthMm: number } {
  const scale = placement.sizeMm / font.digitHeight;
  const widthMm = measureTextMm(text, font, placement.sizeMm);
  let x = placement.x - (placement.anchor === 'middle' ? widthMm / 2 : placement.anchor === 'end' ? widthMm : 0);
  const baselineY = placement.y + (placement.baseline === 'middle' ? placement.sizeMm / 2 : 0);
  const parts: string[] = [];
  const f = (value: number) => String(Math.round(value * 1000) / 1000);
  for (const character of text) {
    const glyph = glyphOf(font, character);
    const commands = glyph.commands;
    let i = 0;
    while (i < commands.length) {
      const op = commands[i++] as string;
      const count = op === 'Z' ? 0 : op === 'Q' ? 4 : op === 'C' ? 6 : 2;
      let part = op;
      for (let k = 0; k < count; k += 2) {
        const gx = commands[i + k] as number;
        const gy = commands[i + k + 1] as number;
        part += `${k ? ' ' : ''}${f(x + gx * scale)} ${f(baselineY - gy * scale)}`;
      }
      i += count;
      parts.push(part);
    }
    x += glyph.advance * scale;
  }
  return { d: parts.join(''), widthMm };
}
