import type { TapeOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { NUMERAL_FONT, SMALL_PRINT_FONT } from '@/math/tape/glyphs';
import { measureTextMm, textElement } from '@/math/tape/text-path';
import { formatTapeNumber, tapeLayout } from '@/math/tape/tape-layout';
import { tapeGroup } from '@/math/tape/tape-svg';
import { wrapText } from '@/math/sheet/wrap-text';
import { PREDICTED_CAUTION } from '@/math/builds/predict-build';
import { TAPE_CAUTION } from '@/math/cautions';

/**
 * The tape of a predicted (not sighted) build, as a standalone SVG in
 * millimetres: the tape at true size (tapeLayout/tapeGroup, exactly as a
 * sighted tape is drawn, so its tick spacing is the predicted marks' spacing)
 * with, beside it, PREDICTED_CAUTION in large outline type, the build, its
 * speed and the tape caution. The word PREDICTED also runs down the tape's
 * free edge, so a cut-out tape still says what it is. Outline glyphs only: no
 * <text>, no fonts needed.
 *
 * Units: mm. Example: predictedTapeSvg(prediction.model, { from: 20, to: 80 }, { build: 'Elk 520', speed: '264 fps (predicted)' }) → '<svg … width="63mm" height="42.1565mm" …'
 */
export function predictedTapeSvg(
  model: SightModel,
  options: TapeOptionsInput = {},
  labels: { bow?: string; build?: string; speed?: string } = {},
): string {
  const layout = tapeLayout(model, options);
  const gapMm = 4;
  const columnMm = 46;
  const x0 = layout.widthMm + gapMm;
  const parts: string[] = [];

  // The free strip along the tape's edge, beyond the numerals.
  const widest = Math.max(
    0,
    ...layout.ticks
      .filter((tick) => tick.numeral)
      .map((tick) => measureTextMm(formatTapeNumber(tick.distance), NUMERAL_FONT, layout.numeralHeightMm)),
  );
  const freeMm = layout.widthMm - (layout.numeralXMm + widest) - 0.3;
  const stripSizeMm = Math.min(1.8, freeMm - 0.6);
  if (stripSizeMm >= 1.2) {
    // Centre line of the strip; the words read bottom to top (rotated −90°).
    const centreX = layout.mirror ? freeMm / 2 + 0.15 : layout.widthMm - freeMm / 2 - 0.15;
    const word = 'PREDICTED · NOT SIGHTED';
    const wordMm = measureTextMm(word, SMALL_PRINT_FONT, stripSizeMm);
    const repeats = Math.max(1, Math.floor((layout.lengthMm - 4) / (wordMm + 8)));
    const pitch = layout.lengthMm / repeats;
    parts.push('<g class="predicted-strip" fill="#000">');
    for (let i = 0; i < repeats; i++) {
      const centreY = pitch * (i + 0.5);
      parts.push(
        `<g transform="translate(${fixed(centreX)} ${fixed(centreY)}) rotate(-90)">${textElement(word, SMALL_PRINT_FONT, { x: 0, y: 0, sizeMm: stripSizeMm, anchor: 'middle', baseline: 'middle' })}</g>`,
      );
    }
    parts.push('</g>');
  }

  // The words beside the tape.
  let y = 4;
  const words: string[] = [];
  for (const line of wrapText(PREDICTED_CAUTION, NUMERAL_FONT, 3, columnMm)) {
    words.push(textElement(line, NUMERAL_FONT, { x: x0, y, sizeMm: 3 }, 'fill="#000" data-caution="predicted"'));
    y += 4.2;
  }
  y += 1;
  for (const line of [labels.bow, labels.build, labels.speed].filter((value): value is string => Boolean(value))) {
    for (const wrapped of wrapText(line, SMALL_PRINT_FONT, 2, columnMm)) {
      words.push(textElement(wrapped, SMALL_PRINT_FONT, { x: x0, y, sizeMm: 2 }, 'fill="#000"'));
      y += 2.9;
    }
  }
  y += 1;
  for (const line of wrapText(TAPE_CAUTION, SMALL_PRINT_FONT, 1.7, columnMm)) {
    words.push(textElement(line, SMALL_PRINT_FONT, { x: x0, y, sizeMm: 1.7 }, 'fill="#3c3c3c"'));
    y += 2.5;
  }

  const widthMm = x0 + columnMm + 1;
  const heightMm = Math.max(layout.lengthMm, y + 1);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${fixed(widthMm)}mm" height="${fixed(heightMm)}mm" viewBox="0 0 ${fixed(widthMm)} ${fixed(heightMm)}" data-unit="${layout.unit}" data-predicted="true">`,
    `<rect class="ground" x="0" y="0" width="${fixed(widthMm)}" height="${fixed(heightMm)}" fill="#fff"/>`,
    tapeGroup(layout, 'data-predicted="true"'),
    ...parts,
    '<g class="predicted-words">',
    ...words,
    '</g>',
    '</svg>',
  ].join('\n');
}

function fixed(value: number): string {
  return String(Number(value.toFixed(4)));
}
