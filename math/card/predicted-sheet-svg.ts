import type { TapeOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { INCH_MM } from '@/math/units/constants';
import { NUMERAL_FONT, SMALL_PRINT_FONT, type GlyphFont } from '@/math/tape/glyphs';
import { textElement } from '@/math/tape/text-path';
import { wrapText } from '@/math/sheet/wrap-text';
import { PAPER_SIZES_MM } from '@/math/sheet/paper';
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

const MARGIN_MM = 12;
const SMALL_MM = 2.1;
const LINE_MM = 3.6;

/**
 * The print sheet of a predicted (not sighted) build's tape: a page (A4 or US
 * Letter) in millimetres headed PREDICTED — NOT SIGHTED in large outline type,
 * the bow, build, speed and the sight-in it is carried on, the predicted
 * caution, the print instruction and the tape caution, calibration bars of
 * 50 mm and 2 in, and the predicted tape at 100 % exactly as predictedTapeSvg
 * draws it (PREDICTED also runs down its edge, so a cut-out tape says so).
 * No scale variants: a predicted tape is for trying at the range, not for
 * fine-tuning a sight's scale. Outline glyphs only (no fonts); one user unit
 * is one millimetre; the root carries data-predicted="true".
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
  const paper = PAPER_SIZES_MM[paperName];
  const usableMm = paper.widthMm - 2 * MARGIN_MM;
  const labels = options.labels ?? {};
  const parts: string[] = [];
  const text = (content: string, font: GlyphFont, x: number, y: number, sizeMm: number, attributes = '') =>
    parts.push(textElement(content, font, { x, y, sizeMm }, attributes));

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
  for (const line of lines.flatMap((line) => wrapText(line, SMALL_PRINT_FONT, SMALL_MM, usableMm))) {
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, SMALL_MM, 'class="small-print"');
    y += LINE_MM;
  }
  y += 1.5;
  for (const [sentence, className] of [
    [PREDICTED_CAUTION, 'caution'],
    [PRINT_INSTRUCTION, 'instruction'],
    [TAPE_CAUTION, 'caution'],
  ] as const) {
    for (const line of wrapText(sentence, SMALL_PRINT_FONT, SMALL_MM * 1.2, usableMm)) {
      text(line, SMALL_PRINT_FONT, MARGIN_MM, y, SMALL_MM * 1.2, `class="${className}"`);
      y += LINE_MM * 1.2;
    }
  }

  y += 2;
  parts.push(calibrationBar(MARGIN_MM, y, 50, 10, '50 mm'));
  parts.push(calibrationBar(MARGIN_MM + 50 + 22, y, 2 * INCH_MM, INCH_MM / 2, '2 in'));
  y += 10;

  // The predicted tape as predictedTapeSvg draws it, its mm viewBox placed on the page's mm grid.
  const tapeSvg = predictedTapeSvg(model, tape, { bow: labels.bow, build: labels.build, speed: labels.speed });
  const size = /width="([\d.]+)mm" height="([\d.]+)mm"/.exec(tapeSvg);
  const tapeWidthMm = Number(size?.[1] ?? 0);
  const tapeHeightMm = Number(size?.[2] ?? 0);
  if (y + tapeHeightMm > paper.heightMm - MARGIN_MM) {
    throw new FitInputError('tape', `The predicted tape needs ${tapeHeightMm.toFixed(0)} mm of the page and does not fit; shorten the range`);
  }
  if (tapeWidthMm > usableMm) {
    throw new FitInputError('tape', `The predicted tape and its words need ${tapeWidthMm.toFixed(0)} mm across and do not fit; narrow the tape`);
  }
  const inner = tapeSvg.slice(tapeSvg.indexOf('>') + 1, tapeSvg.lastIndexOf('</svg>'));
  parts.push(`<g class="predicted-tape" data-predicted="true" transform="translate(${fixed(MARGIN_MM)} ${fixed(y)})">${inner}</g>`);

  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${fixed(paper.widthMm)}mm" height="${fixed(paper.heightMm)}mm" viewBox="0 0 ${fixed(paper.widthMm)} ${fixed(paper.heightMm)}" data-paper="${paperName}" data-predicted="true">`,
    `<rect x="0" y="0" width="${fixed(paper.widthMm)}" height="${fixed(paper.heightMm)}" fill="#fff"/>`,
    '<g fill="#000">',
    ...parts,
    '</g>',
    '</svg>',
  ].join('\n');
}

/** A calibration bar `lengthMm` long at (x, y) with ticks every `tickMm` and its label (as on the sighted print sheet). */
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
