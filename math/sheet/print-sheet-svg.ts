import { sheetOptionsSchema, fitIssueOf, type SheetOptionsInput } from '@/shared/fit';
import { INCH_MM } from '@/math/units/constants';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { NUMERAL_FONT, SMALL_PRINT_FONT, type GlyphFont } from '@/math/tape/glyphs';
import { textElement } from '@/math/tape/text-path';
import { tapeLayouts } from '@/math/tape/tape-layout';
import { tapeGroup } from '@/math/tape/tape-svg';
import { PAPER_SIZES_MM } from '@/math/sheet/paper';
import { wrapText } from '@/math/sheet/wrap-text';
import { ONE_MARK_CAUTION, ONE_MARK_STRIP, PRINT_INSTRUCTION, TAPE_CAUTION } from '@/math/cautions';

/**
 * The print sheet: a page (A4 or US Letter) in millimetres with the tape at
 * 100 %, beside it variants at −2, −1, −0.5, +0.5, +1 and +2 % for sights whose
 * scale differs from its nominal travel (each labelled with its percentage), a
 * calibration bar of 50 mm and 2 in with the instruction to print at actual
 * size and measure it before cutting, the bow, build, date and marks used in
 * small type, and the caution that a tape is an estimate until confirmed at
 * the range. All text is outline paths; width/height in mm and a viewBox in
 * mm make one user unit one millimetre.
 *
 * Example: printSheetSvg(fit, { paper: 'a4', labels: { bow: 'Grey Heron', build: 'Ash 420', date: '2026-12-01' } }) → '<svg … width="210mm" height="297mm" …'
 */

/** The scale variants printed beside the 100 % tape, in per cent of true size. */
export const SHEET_VARIANT_PERCENTS = [-2, -1, -0.5, 0.5, 1, 2] as const;

/** What the sheet needs from a fit: the model and the marks it was fitted to. */
export interface SheetFit {
  model: SightModel;
  residuals: readonly { distance: number; markMm: number }[];
  rmsMm: number;
}

const MARGIN_MM = 12;
const SMALL_MM = 2.1;
const TITLE_MM = 4;
const LINE_MM = 3.6;

export function printSheetSvg(fit: SheetFit, options: SheetOptionsInput = {}): string {
  const parsed = sheetOptionsSchema.safeParse(options);
  if (!parsed.success) {
    const { field, message } = fitIssueOf(parsed.error.issues[0]);
    throw new FitInputError(field, message);
  }
  const sheet = parsed.data;
  const paper = PAPER_SIZES_MM[sheet.paper];
  const usableMm = paper.widthMm - 2 * MARGIN_MM;
  const model = fit.model;
  const parts: string[] = [];
  const text = (content: string, font: GlyphFont, x: number, y: number, sizeMm: number, attributes = '') =>
    parts.push(textElement(content, font, { x, y, sizeMm }, attributes));

  // Header: title, labels, marks and fit in small type.
  let y = MARGIN_MM + TITLE_MM;
  const labels = sheet.labels ?? {};
  text(labels.bow ? `Sight tape: ${labels.bow}` : 'Sight tape', SMALL_PRINT_FONT, MARGIN_MM, y, TITLE_MM, 'class="title"');
  y += LINE_MM + 2;
  const unit = model.distanceUnit;
  const detailLines = [
    [labels.build ? `Build: ${labels.build}` : '', labels.date ? `Date: ${labels.date}` : ''].filter(Boolean).join('   ·   '),
    `Marks used: ${fit.residuals.map((mark) => `${trim(mark.distance)} ${unit} at ${mark.markMm.toFixed(2)} mm`).join(', ')}`,
    `Fit: ${model.speedFps.toFixed(1)} fps, drag coefficient ${model.dragCoefficient.toFixed(2)}, peep height ${model.peepHeightMm.toFixed(1)} mm, sight radius ${model.sightRadiusMm.toFixed(1)} mm, RMS ${fit.rmsMm.toFixed(2)} mm`,
  ].filter(Boolean);
  for (const line of detailLines.flatMap((line) => wrapText(line, SMALL_PRINT_FONT, SMALL_MM, usableMm))) {
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, SMALL_MM, 'class="small-print"');
    y += LINE_MM;
  }
  y += 1.5;
  if (labels.note) {
    // A header note the caller wants read first (e.g. "confirm at the range" after a change to the bow), large.
    for (const line of wrapText(labels.note, NUMERAL_FONT, TITLE_MM * 0.8, usableMm)) {
      text(line, NUMERAL_FONT, MARGIN_MM, y + 1, TITLE_MM * 0.8, 'class="caution" data-caution="header-note"');
      y += TITLE_MM * 1.1;
    }
    y += 1;
  }
  if (model.oneMark) {
    // A tape from one mark is an estimate everywhere but that mark: say so first, large, with where to shoot next.
    const next = model.oneMark.nextDistance;
    const words = `${ONE_MARK_STRIP}. ${ONE_MARK_CAUTION} Sighted: ${trim(model.oneMark.distance)} ${unit} only.${next !== null ? ` Shoot ${trim(next)} ${unit} next and fit again before you trust this tape.` : ''}`;
    for (const line of wrapText(words, NUMERAL_FONT, TITLE_MM * 0.8, usableMm)) {
      text(line, NUMERAL_FONT, MARGIN_MM, y + 1, TITLE_MM * 0.8, 'class="caution" data-caution="one-mark"');
      y += TITLE_MM * 1.1;
    }
    y += 1;
  }
  for (const line of wrapText(PRINT_INSTRUCTION, SMALL_PRINT_FONT, SMALL_MM * 1.2, usableMm)) {
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, SMALL_MM * 1.2, 'class="instruction"');
    y += LINE_MM * 1.2;
  }
  for (const line of wrapText(TAPE_CAUTION, SMALL_PRINT_FONT, SMALL_MM * 1.2, usableMm)) {
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, SMALL_MM * 1.2, 'class="caution"');
    y += LINE_MM * 1.2;
  }

  // Calibration bars: 50 mm and 2 in, each with end and intermediate ticks.
  y += 2;
  parts.push(calibrationBar(MARGIN_MM, y, 50, 10, '50 mm'));
  parts.push(calibrationBar(MARGIN_MM + 50 + 22, y, 2 * INCH_MM, INCH_MM / 2, '2 in'));
  y += 12;

  // Tapes: 100 % first, then the variants, wrapping to more rows if needed.
  const percents = sheet.variants ? [0, ...SHEET_VARIANT_PERCENTS] : [0];
  const layouts = tapeLayouts(model, sheet.tape ?? {}, percents.map((percent) => 1 + percent / 100)).map((layout, i) => ({ percent: percents[i], layout }));
  const labelOf = (percent: number) => (percent === 0 ? '100 %' : `${percent > 0 ? '+' : '−'}${Math.abs(percent)} %`);
  const widthMm = layouts[0].layout.widthMm;
  const pitchMm = Math.max(widthMm, 12) + 6;
  const perRow = Math.max(1, Math.floor((usableMm + 6) / pitchMm));
  const rowLengthMm = Math.max(...layouts.map(({ layout }) => layout.lengthMm)) + 8;
  const rows = Math.ceil(layouts.length / perRow);
  if (y + rows * rowLengthMm > paper.heightMm - MARGIN_MM) {
    throw new FitInputError('tape', `The tapes need ${(rows * rowLengthMm).toFixed(0)} mm of the page and do not fit; shorten the range, narrow the tape or leave out the variants`);
  }
  layouts.forEach(({ percent, layout }, index) => {
    const column = index % perRow;
    const row = Math.floor(index / perRow);
    const x = MARGIN_MM + column * pitchMm;
    const top = y + row * rowLengthMm;
    text(labelOf(percent), NUMERAL_FONT, x, top + 3, 2.6, `class="variant-label" data-percent="${percent}"`);
    parts.push(tapeGroup(layout, `data-percent="${percent}" transform="translate(${fixed(x)} ${fixed(top + 5)})"`));
  });

  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${fixed(paper.widthMm)}mm" height="${fixed(paper.heightMm)}mm" viewBox="0 0 ${fixed(paper.widthMm)} ${fixed(paper.heightMm)}" data-paper="${sheet.paper}">`,
    `<rect x="0" y="0" width="${fixed(paper.widthMm)}" height="${fixed(paper.heightMm)}" fill="#fff"/>`,
    `<g fill="#000">`,
    ...parts,
    '</g>',
    '</svg>',
  ].join('\n');
}

/**
 * A calibration bar `lengthMm` long at (x, y): a 1.2 mm black bar with ticks
 * every `tickMm` below it and its label. The bar is a <rect> carrying
 * data-calibration and data-length-mm so tests and people can check it.
 */
function calibrationBar(x: number, y: number, lengthMm: number, tickMm: number, label: string): string {
  const ticks: string[] = [];
  const count = Math.round(lengthMm / tickMm);
  for (let i = 0; i <= count; i++) {
    const tx = x + i * tickMm;
    const long = i === 0 || i === count;
    ticks.push(`<line x1="${fixed(tx)}" y1="${fixed(y)}" x2="${fixed(tx)}" y2="${fixed(y + (long ? 3.5 : 2.2))}" stroke="#000" stroke-width="0.15"/>`);
  }
  return [
    `<g class="calibration" data-calibration="${label}">`,
    `<rect data-calibration="${label}" data-length-mm="${fixed(lengthMm)}" x="${fixed(x)}" y="${fixed(y - 1.2)}" width="${fixed(lengthMm)}" height="1.2" fill="#000"/>`,
    ...ticks,
    textElement(label, SMALL_PRINT_FONT, { x: x + lengthMm + 2, y: y + 0.6, sizeMm: 2.4 }),
    '</g>',
  ].join('\n');
}

function fixed(value: number): string {
  return String(Number(value.toFixed(4)));
}

function trim(distance: number): string {
  return String(Number(distance.toFixed(2)));
}
