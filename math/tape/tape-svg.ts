import type { TapeOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { NUMERAL_FONT } from '@/math/tape/glyphs';
import { textElement } from '@/math/tape/text-path';
import { formatTapeNumber, tapeLayout, type TapeLayout } from '@/math/tape/tape-layout';

/**
 * A sight tape as a standalone SVG in millimetres: width="…mm" height="…mm"
 * and a viewBox in mm, so one user unit is one millimetre. Each tick is a
 * <line> with data-distance (the tape's unit) and data-offset-mm (from the
 * top edge); numerals are outline paths (no fonts needed), each with
 * data-numeral and its text in aria-label. The outline is the
 * cut line. Geometry and alignment: see tape-layout.ts and math/README.md.
 *
 * Example: tapeSvg(fit, { from: 20, to: 100, widthMm: 12 }) → '<svg xmlns="http://www.w3.org/2000/svg" width="12mm" height="49.0419mm" …'
 */
export function tapeSvg(fit: { model: SightModel }, options: TapeOptionsInput = {}): string {
  const layout = tapeLayout(fit.model, options);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${mm(layout.widthMm)}mm" height="${mm(layout.lengthMm)}mm" viewBox="0 0 ${mm(layout.widthMm)} ${mm(layout.lengthMm)}" data-unit="${layout.unit}" data-scale="1">`,
    tapeGroup(layout),
    '</svg>',
  ].join('\n');
}

/**
 * The tape's drawing as an SVG group at the origin (mm), for the print sheet
 * to place with a transform. `extraAttributes` goes on the <g>.
 * Example: tapeGroup(tapeLayout(model, {}), 'transform="translate(20 40)"') → '<g class="tape" …>…</g>'
 */
export function tapeGroup(layout: TapeLayout, extraAttributes = ''): string {
  const width = layout.widthMm;
  const across = (x: number) => (layout.mirror ? width - x : x);
  const lines = layout.ticks.map(
    (tick) =>
      `<line data-distance="${formatTapeNumber(tick.distance)}" data-offset-mm="${fixed(tick.offsetMm)}" data-kind="${tick.kind}" x1="${mm(across(0))}" y1="${fixed(tick.offsetMm)}" x2="${mm(across(tick.lengthMm))}" y2="${fixed(tick.offsetMm)}" stroke-width="${tick.strokeMm}"/>`,
  );
  const numerals = layout.ticks
    .filter((tick) => tick.numeral)
    .map((tick) =>
      textElement(
        formatTapeNumber(tick.distance),
        NUMERAL_FONT,
        { x: across(layout.numeralXMm), y: tick.offsetMm, sizeMm: layout.numeralHeightMm, anchor: layout.mirror ? 'end' : 'start', baseline: 'middle' },
        `data-numeral="${formatTapeNumber(tick.distance)}"`,
      ),
    );
  const unitLabel = textElement(
    layout.unit,
    NUMERAL_FONT,
    { x: across(layout.numeralXMm), y: 0.4 + layout.numeralHeightMm / 2, sizeMm: layout.numeralHeightMm, anchor: layout.mirror ? 'end' : 'start', baseline: 'middle' },
    'class="unit"',
  );
  return [
    `<g class="tape" data-unit="${layout.unit}" data-scale="${layout.scale}" data-orientation="${layout.orientation}" data-mirror="${layout.mirror}"${extraAttributes ? ` ${extraAttributes}` : ''}>`,
    `<rect class="cut-line" x="0" y="0" width="${mm(width)}" height="${fixed(layout.lengthMm)}" fill="#fff" stroke="#8a8a8a" stroke-width="0.1"/>`,
    `<g class="ticks" stroke="#000" stroke-linecap="butt">`,
    ...lines,
    '</g>',
    `<g class="numerals" fill="#000">`,
    ...numerals,
    unitLabel,
    '</g>',
    '</g>',
  ].join('\n');
}

/** Lengths to 0.1 µm: far below print resolution, so nothing visible is rounded. */
function fixed(value: number): string {
  return value.toFixed(4);
}

function mm(value: number): string {
  return String(Number(value.toFixed(4)));
}
