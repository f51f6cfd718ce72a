import { sheetOptionsSchema, fitIssueOf, type SheetOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { NUMERAL_FONT, SMALL_PRINT_FONT } from '@/math/tape/glyphs';
import { tapeLayouts } from '@/math/tape/tape-layout';
import { tapeGroup } from '@/math/tape/tape-svg';
import {
  SHEET_LINE_MM as LINE_MM,
  SHEET_MARGIN_MM as MARGIN_MM,
  SHEET_SMALL_MM as SMALL_MM,
  fixedMm as fixed,
  sheetPage,
} from '@/math/sheet/sheet-page';
import { ONE_MARK_CAUTION, ONE_MARK_STRIP, PRINT_INSTRUCTION, TAPE_CAUTION } from '@/math/cautions';

/**
 * The print sheet: a page (A4 or US Letter) in millimetres with the tape at
 * 100 %, beside it variants at −2, −1, −0.5, +0.5, +1 and +2 % for sights whose
 * scale differs from its nominal travel (each labelled with its percentage), a
 * calibration bar of 50 mm and 2 in with the instruction to print at actual
 * size and measure it before cutting, the bow, build, date and marks used in
 * small type, and the caution that a tape is an estimate until confirmed at
 * the range. All text is outline paths; width/height in mm and a viewBox in
 * mm make one user unit one millimetre. The page, its text and calibration
 * bars are math/sheet/sheet-page.ts, shared with the predicted sheet.
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

const TITLE_MM = 4;

export function printSheetSvg(fit: SheetFit, options: SheetOptionsInput = {}): string {
  const parsed = sheetOptionsSchema.safeParse(options);
  if (!parsed.success) {
    const { field, message } = fitIssueOf(parsed.error.issues[0]);
    throw new FitInputError(field, message);
  }
  const sheet = parsed.data;
  const page = sheetPage(sheet.paper);
  const { paper, usableMm, text } = page;
  const model = fit.model;

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
  for (const line of detailLines) y = page.lines(line, SMALL_PRINT_FONT, SMALL_MM, y, LINE_MM, 'class="small-print"');
  y += 1.5;
  if (labels.note) {
    // A header note the caller wants read first (e.g. "confirm at the range" after a change to the bow), large.
    y = page.lines(labels.note, NUMERAL_FONT, TITLE_MM * 0.8, y, TITLE_MM * 1.1, 'class="caution" data-caution="header-note"', 1);
    y += 1;
  }
  if (model.oneMark) {
    // A tape from one mark is an estimate everywhere but that mark: say so first, large, with where to shoot next.
    const next = model.oneMark.nextDistance;
    const words = `${ONE_MARK_STRIP}. ${ONE_MARK_CAUTION} Sighted: ${trim(model.oneMark.distance)} ${unit} only.${next !== null ? ` Shoot ${trim(next)} ${unit} next and fit again before you trust this tape.` : ''}`;
    y = page.lines(words, NUMERAL_FONT, TITLE_MM * 0.8, y, TITLE_MM * 1.1, 'class="caution" data-caution="one-mark"', 1);
    y += 1;
  }
  y = page.lines(PRINT_INSTRUCTION, SMALL_PRINT_FONT, SMALL_MM * 1.2, y, LINE_MM * 1.2, 'class="instruction"');
  y = page.lines(TAPE_CAUTION, SMALL_PRINT_FONT, SMALL_MM * 1.2, y, LINE_MM * 1.2, 'class="caution"');

  // Calibration bars: 50 mm and 2 in, each with end and intermediate ticks.
  y += 2;
  page.calibrationBars(y);
  y += 12;

  // Tapes: 100 % first, then the variants, wrapping to more rows if needed.
  const percents = sheet.variants ? [0, ...SHEET_VARIANT_PERCENTS] : [0];
  const layouts = tapeLayouts(
    model,
    sheet.tape ?? {},
    percents.map((percent) => 1 + percent / 100),
  ).map((layout, i) => ({ percent: percents[i], layout }));
  const labelOf = (percent: number) => (percent === 0 ? '100 %' : `${percent > 0 ? '+' : '−'}${Math.abs(percent)} %`);
  const widthMm = layouts[0].layout.widthMm;
  const pitchMm = Math.max(widthMm, 12) + 6;
  const perRow = Math.max(1, Math.floor((usableMm + 6) / pitchMm));
  const rowLengthMm = Math.max(...layouts.map(({ layout }) => layout.lengthMm)) + 8;
  const rows = Math.ceil(layouts.length / perRow);
  if (y + rows * rowLengthMm > paper.heightMm - MARGIN_MM) {
    throw new FitInputError(
      'tape',
      `The tapes need ${(rows * rowLengthMm).toFixed(0)} mm of the page and do not fit; shorten the range, narrow the tape or leave out the variants`,
    );
  }
  layouts.forEach(({ percent, layout }, index) => {
    const column = index % perRow;
    const row = Math.floor(index / perRow);
    const x = MARGIN_MM + column * pitchMm;
    const top = y + row * rowLengthMm;
    text(labelOf(percent), NUMERAL_FONT, x, top + 3, 2.6, `class="variant-label" data-percent="${percent}"`);
    page.add(tapeGroup(layout, `data-percent="${percent}" transform="translate(${fixed(x)} ${fixed(top + 5)})"`));
  });

  return page.svg(`data-paper="${sheet.paper}"`);
}

function trim(distance: number): string {
  return String(Number(distance.toFixed(2)));
}
