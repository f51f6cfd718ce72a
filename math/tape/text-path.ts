import type { GlyphFont } from '@/math/tape/glyphs';

/**
 * Text drawn as one SVG path from the glyph outlines of glyphs.ts, so a print
 * looks the same whatever fonts the printing machine has.
 *
 * The path data stays in font units (y up) and one transform places and scales
 * it: matrix(s 0 0 −s x y), s = sizeMm / digitHeight, so `sizeMm` is the
 * height of the digits (the digit 1, baseline to top). Each glyph is written
 * as one absolute move followed by relative commands, so placing a glyph costs
 * two numbers, not hundreds. A character the font lacks is drawn as "?". No kerning.
 *
 * Example: textPath('40', NUMERAL_FONT, { x: 5, y: 10, sizeMm: 1.8 }) → { d: 'M16 …z', transform: 'matrix(0.0025714286 0 0 -0.0025714286 5 10)', widthMm: 2.34 }
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

/** A glyph ready to place: advance, its first point, the rest of its outline in relative commands. */
interface PreparedGlyph {
  advance: number;
  startX: number;
  startY: number;
  rest: string;
}

const prepared = new WeakMap<GlyphFont, Map<string, PreparedGlyph>>();

function glyphOf(font: GlyphFont, character: string): PreparedGlyph {
  let cache = prepared.get(font);
  if (!cache) {
    cache = new Map();
    prepared.set(font, cache);
  }
  let glyph = cache.get(character);
  if (!glyph) {
    const entry = font.glyphs[character] ?? font.glyphs['?'];
    glyph = toRelative(entry[0], entry[1]);
    cache.set(character, glyph);
  }
  return glyph;
}

/** Rewrite an absolute M/L/Q/C/Z outline as a first absolute point plus relative commands. */
function toRelative(advance: number, path: string): PreparedGlyph {
  const tokens = path.match(/[MLQCZ]|-?\d*\.?\d+/g) ?? [];
  const n = (value: number) => String(Math.round(value * 100) / 100);
  let i = 0;
  let x = 0;
  let y = 0;
  let subpathX = 0;
  let subpathY = 0;
  let startX = NaN;
  let startY = NaN;
  let rest = '';
  const read = () => Number(tokens[i++]);
  while (i < tokens.length) {
    const op = tokens[i++];
    if (op === 'Z') {
      rest += 'z';
      x = subpathX;
      y = subpathY;
      continue;
    }
    const pairs = op === 'Q' ? 2 : op === 'C' ? 3 : 1;
    const points: number[] = [];
    for (let k = 0; k < pairs; k++) points.push(read(), read());
    if (op === 'M' && Number.isNaN(startX)) {
      startX = points[0];
      startY = points[1];
    } else {
      rest += op.toLowerCase() + points.map((value, k) => n(value - (k % 2 === 0 ? x : y))).join(' ');
    }
    x = points[points.length - 2];
    y = points[points.length - 1];
    if (op === 'M') {
      subpathX = x;
      subpathY = y;
    }
  }
  return { advance, startX: Number.isNaN(startX) ? 0 : startX, startY: Number.isNaN(startY) ? 0 : startY, rest };
}

/** Width of `text` at digit height `sizeMm`, mm. Example: measureTextMm('100', NUMERAL_FONT, 1.8) → 3.02 */
export function measureTextMm(text: string, font: GlyphFont, sizeMm: number): number {
  let advance = 0;
  for (const character of text) advance += glyphOf(font, character).advance;
  return (advance * sizeMm) / font.digitHeight;
}

/** The path data (font units), its placing transform and the width (mm) of `text`. Example: see the module comment. */
export function textPath(text: string, font: GlyphFont, placement: TextPlacement): { d: string; transform: string; widthMm: number } {
  const scale = placement.sizeMm / font.digitHeight;
  const widthMm = measureTextMm(text, font, placement.sizeMm);
  const x = placement.x - (placement.anchor === 'middle' ? widthMm / 2 : placement.anchor === 'end' ? widthMm : 0);
  const y = placement.y + (placement.baseline === 'middle' ? placement.sizeMm / 2 : 0);
  let d = '';
  let pen = 0;
  for (const character of text) {
    const glyph = glyphOf(font, character);
    if (glyph.rest) d += `M${Math.round((pen + glyph.startX) * 100) / 100} ${glyph.startY}${glyph.rest}`;
    pen += glyph.advance;
  }
  const s = Number(scale.toPrecision(8));
  return { d, transform: `matrix(${s} 0 0 ${-s} ${Number(x.toFixed(4))} ${Number(y.toFixed(4))})`, widthMm };
}

/**
 * `text` as a ready <path> element, with the text itself in aria-label (for
 * screen readers and tests) and any `attributes` added.
 * Example: textElement('50 mm', SMALL_PRINT_FONT, { x: 64, y: 90, sizeMm: 2.4 }) → '<path aria-label="50 mm" transform="matrix(…)" d="…"/>'
 */
export function textElement(text: string, font: GlyphFont, placement: TextPlacement, attributes = ''): string {
  const { d, transform } = textPath(text, font, placement);
  return `<path aria-label="${escapeXml(text)}"${attributes ? ` ${attributes}` : ''} transform="${transform}" d="${d}"/>`;
}

/** Escape text for an XML attribute or element. Example: escapeXml('a < b & "c"') → 'a &lt; b &amp; &quot;c&quot;' */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
