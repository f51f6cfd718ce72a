import type { TapeOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { NUMERAL_FONT, SMALL_PRINT_FONT } from '@/math/tape/glyphs';
import {
  SHEET_LINE_MM as LINE_MM,
  SHEET_MARGIN_MM as MARGIN_MM,
  SHEET_SMALL_MM as SMALL_MM,
  fixedMm as fixed,
  sheetPage,
} from '@/math/sheet/sheet-page';
import { PRINT_INSTRUCTION, TAPE_CAUTION } from '@/math/cautions';
import { PREDICTED_CAUTION } from '@/math/builds/predict-build';
import { predictedTapeSvg } from '@/math/card/predicted-tape-svg';

/** What the predicted sheet names: the bow, the new build, its speed and the sight-in whose sight carries it. */
export interface PredictedSheetLabels {
  bow?: string;
  build?: string;
  speed?: string;
  sightIn?: string;
}

/**
 * The print sheet of a predicted (not sighted) build's tape: a page (A4 or US
 * Letter) in millimetres headed PREDICTED — NOT SIGHTED in large outline type,
 * the bow, build, speed and the sight-in it is carried on, the predicted
 * caution, the print instruction and the tape caution, calibration bars of
 * 50 mm and 2 in, and the predicted tape at 100 % exactly as predictedTapeSvg
 * draws it (PREDICTED also runs down its edge, so a cut-out tape says so).
 * No scale variants: a predicted tape is for trying at the range, not for
 * fine-tuning a sight's scale. Outline glyphs only (no fonts); one user unit
 * is one millimetre; the root carries data-predicted="true". The page, its
 * text and calibration bars are math/sheet/sheet-page.ts, as on the sighted sheet.
 *
 * Units: mm. Example: predictedSheetSvg(prediction.model, { from: 20, to: 80 }, { paper: 'letter', labels: { build: 'Elk 520' } })
 *   → '<svg … width="215.9mm" height="279.4mm" … data-predicted="true">…'
 */
export function predictedSheetSvg(
  model: SightModel,
  tape: TapeOptionsInput = {},
  options: { paper?: 'a4' | 'letter'; labels?: PredictedSheetLabels } = {},
): string {
  const paperName = options.paper ?? 'a4';
  const page = sheetPage(paperName);
  const { paper, usableMm, text } = page;
  const labels = options.labels ?? {};

  let y = MARGIN_MM + 7;
  text('PREDICTED — NOT SIGHTED', NUMERAL_FONT, MARGIN_MM, y, 7, 'class="predicted-title" data-caution="predicted"');
  y += 6;
  text(labels.bow ? `Predicted sight tape: ${labels.bow}` : 'Predicted sight tape', SMALL_PRINT_FONT, MARGIN_MM, y, 4, 'class="title"');
  y += LINE_MM + 2;
  const lines = [
    [labels.build ? `Build: ${labels.build}` : '', labels.speed ? `Speed: ${labels.speed}` : ''].filter(Boolean).join('   ·   '),
    labels.sightIn ? `Carried on the sight of the sight-in of ${labels.sightIn}` : '',
    `Sight model: peep height ${model.peepHeightMm.toFixed(1)} mm, sight radius ${model.sightRadiusMm.toFixed(1)} mm, drag coefficient ${model.dragCoefficient.toFixed(2)}`,
  ].filter(Boolean);
  for (const line of lines) y = page.lines(line, SMALL_PRINT_FONT, SMALL_MM, y, LINE_MM, 'class="small-print"');
  y += 1.5;
  for (const [sentence, className] of [
    [PREDICTED_CAUTION, 'caution'],
    [PRINT_INSTRUCTION, 'instruction'],
    [TAPE_CAUTION, 'caution'],
  ] as const) {
    y = page.lines(sentence, SMALL_PRINT_FONT, SMALL_MM * 1.2, y, LINE_MM * 1.2, `class="${className}"`);
  }

  y += 2;
  page.calibrationBars(y);
  y += 10;

  // The predicted tape as predictedTapeSvg draws it, its mm viewBox placed on the page's mm grid.
  const tapeSvg = predictedTapeSvg(model, tape, { bow: labels.bow, build: labels.build, speed: labels.speed });
  const size = /width="([\d.]+)mm" height="([\d.]+)mm"/.exec(tapeSvg);
  const tapeWidthMm = Number(size?.[1] ?? 0);
  const tapeHeightMm = Number(size?.[2] ?? 0);
  if (y + tapeHeightMm > paper.heightMm - MARGIN_MM) {
    throw new FitInputError(
      'tape',
      `The predicted tape needs ${tapeHeightMm.toFixed(0)} mm of the page and does not fit; shorten the range`,
    );
  }
  if (tapeWidthMm > usableMm) {
    throw new FitInputError(
      'tape',
      `The predicted tape and its words need ${tapeWidthMm.toFixed(0)} mm across and do not fit; narrow the tape`,
    );
  }
  const inner = tapeSvg.slice(tapeSvg.indexOf('>') + 1, tapeSvg.lastIndexOf('</svg>'));
  page.add(`<g class="predicted-tape" data-predicted="true" transform="translate(${fixed(MARGIN_MM)} ${fixed(y)})">${inner}</g>`);

  return page.svg(`data-paper="${paperName}" data-predicted="true"`);
}
