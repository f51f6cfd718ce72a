import { INCH_MM } from '@/math/units/constants';
import { SMALL_PRINT_FONT, type GlyphFont } from '@/math/tape/glyphs';
import { textElement } from '@/math/tape/text-path';
import { PAPER_SIZES_MM } from '@/math/sheet/paper';
import { wrapText } from '@/math/sheet/wrap-text';

/**
 * The page both print sheets draw on (the sighted one, math/sheet/print-sheet-svg.ts,
 * and the predicted one, math/card/predicted-sheet-svg.ts): A4 or US Letter in
 * millimetres (one user unit is one millimetre), a 12 mm margin, outline text
 * at the left margin wrapped to the page, the 50 mm and 2 in calibration bars,
 * and the SVG root with a white page.
 *
 * Example: const page = sheetPage('a4'); const y = page.lines('Sight tape', SMALL_PRINT_FONT, 4, 16, 5.6);
 *   page.calibrationBars(y); page.svg('data-paper="a4"') → '<svg … width="210mm" height="297mm" … data-paper="a4">…'
 */

/** Page margin on every side, mm. */
export const SHEET_MARGIN_MM = 12;
/** Height of small print (labels, marks, fit), mm. */
export const SHEET_SMALL_MM = 2.1;
/** Line pitch of small print, mm. */
export const SHEET_LINE_MM = 3.6;

/** A page being drawn: write text and bars into it, then take its SVG. */
export interface SheetPage {
  /** The paper's size, mm. */
  paper: { widthMm: number; heightMm: number };
  /** Width between the margins, mm. */
  usableMm: number;
  /** One piece of outline text with its baseline's left end at (x, y). */
  text(content: string, font: GlyphFont, x: number, y: number, sizeMm: number, attributes?: string): void;
  /**
   * `content` wrapped to the usable width at the left margin, a line every
   * `stepMm` from `y` (each drawn `offsetMm` lower); returns the y after the last.
   */
  lines(content: string, font: GlyphFont, sizeMm: number, y: number, stepMm: number, attributes?: string, offsetMm?: number): number;
  /** The 50 mm and 2 in calibration bars side by side, their bars' top 1.2 mm above `y`. */
  calibrationBars(y: number): void;
  /** Markup placed as is (e.g. a tape group). */
  add(markup: string): void;
  /** The page's SVG; `rootAttributes` are added to the <svg> element. */
  svg(rootAttributes: string): string;
}

/** A blank page of the given paper. */
export function sheetPage(paperName: keyof typeof PAPER_SIZES_MM): SheetPage {
  const paper = PAPER_SIZES_MM[paperName];
  const usableMm = paper.widthMm - 2 * SHEET_MARGIN_MM;
  const parts: string[] = [];
  const text = (content: string, font: GlyphFont, x: number, y: number, sizeMm: number, attributes = '') => {
    parts.push(textElement(content, font, { x, y, sizeMm }, attributes));
  };
  return {
    paper,
    usableMm,
    text,
    lines(content, font, sizeMm, y, stepMm, attributes = '', offsetMm = 0) {
      let at = y;
      for (const line of wrapText(content, font, sizeMm, usableMm)) {
        text(line, font, SHEET_MARGIN_MM, at + offsetMm, sizeMm, attributes);
        at += stepMm;
      }
      return at;
    },
    calibrationBars(y) {
      parts.push(calibrationBar(SHEET_MARGIN_MM, y, 50, 10, '50 mm'));
      parts.push(calibrationBar(SHEET_MARGIN_MM + 50 + 22, y, 2 * INCH_MM, INCH_MM / 2, '2 in'));
    },
    add(markup) {
      parts.push(markup);
    },
    svg(rootAttributes) {
      return [
        `<svg xmlns="http://www.w3.org/2000/svg" width="${fixedMm(paper.widthMm)}mm" height="${fixedMm(paper.heightMm)}mm" viewBox="0 0 ${fixedMm(paper.widthMm)} ${fixedMm(paper.heightMm)}" ${rootAttributes}>`,
        `<rect x="0" y="0" width="${fixedMm(paper.widthMm)}" height="${fixedMm(paper.heightMm)}" fill="#fff"/>`,
        '<g fill="#000">',
        ...parts,
        '</g>',
        '</svg>',
      ].join('\n');
    },
  };
}

/**
 * A calibration bar `lengthMm` long at (x, y): a 1.2 mm black bar with ticks
 * every `tickMm` below it and its label. The bar is a <rect> carrying
 * data-calibration and data-length-mm so tests and people can check it.
 * Example: calibrationBar(12, 60, 50, 10, '50 mm') → '<g class="calibration" data-calibration="50 mm">…'
 */
export function calibrationBar(x: number, y: number, lengthMm: number, tickMm: number, label: string): string {
  const ticks: string[] = [];
  const count = Math.round(lengthMm / tickMm);
  for (let i = 0; i <= count; i++) {
    const tx = x + i * tickMm;
    const long = i === 0 || i === count;
    ticks.push(
      `<line x1="${fixedMm(tx)}" y1="${fixedMm(y)}" x2="${fixedMm(tx)}" y2="${fixedMm(y + (long ? 3.5 : 2.2))}" stroke="#000" stroke-width="0.15"/>`,
    );
  }
  return [
    `<g class="calibration" data-calibration="${label}">`,
    `<rect data-calibration="${label}" data-length-mm="${fixedMm(lengthMm)}" x="${fixedMm(x)}" y="${fixedMm(y - 1.2)}" width="${fixedMm(lengthMm)}" height="1.2" fill="#000"/>`,
    ...ticks,
    textElement(label, SMALL_PRINT_FONT, { x: x + lengthMm + 2, y: y + 0.6, sizeMm: 2.4 }),
    '</g>',
  ].join('\n');
}

/**
 * A length for SVG markup, to 0.1 µm without trailing zeros.
 * Example: fixedMm(215.89999999999998) → '215.9'
 */
export function fixedMm(value: number): string {
  return String(Number(value.toFixed(4)));
}
