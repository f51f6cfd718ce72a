import type { TapeOptionsInput } from '@/shared/fit';
import type { SightModel } from '@/math/flight/sight-model';
import { NUMERAL_FONT, SMALL_PRINT_FONT } from '@/math/tape/glyphs';
import { measureTextMm, textElement } from '@/math/tape/text-path';
import { ONE_MARK_STRIP } from '@/math/cautions';
import { formatTapeNumber, tapeLayout, type TapeLayout } from '@/math/tape/tape-layout';

/**
 * A sight tape as a standalone SVG in millimetres: width="…mm" height="…mm"
 * and a viewBox in mm, so one user unit is one millimetre. Each tick is a
 * <line> with data-distance (the tape's unit) and data-offset-mm (from the
 * top edge); numerals are outline paths (no fonts needed), each with
 * data-numeral and its text in aria-label. The outline is the
 * cut line. Geometry and alignment: see tape-layout.ts and math/README.md.
 * A tape fitted from one mark and a chronographed speed (model.oneMark) says
 * so along its free edge ("ESTIMATE FROM ONE MARK · 20 yd SIGHTED"), in every
 * copy, so a cut-out tape is never taken for a sighted one.
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
        {
          x: across(layout.numeralXMm),
          y: tick.offsetMm,
          sizeMm: layout.numeralHeightMm,
          anchor: layout.mirror ? 'end' : 'start',
          baseline: 'middle',
        },
        `data-numeral="${formatTapeNumber(tick.distance)}"`,
      ),
    );
  const unitLabel = textElement(
    layout.unit,
    NUMERAL_FONT,
    {
      x: across(layout.numeralXMm),
      y: 0.4 + layout.numeralHeightMm / 2,
      sizeMm: layout.numeralHeightMm,
      anchor: layout.mirror ? 'end' : 'start',
      baseline: 'middle',
    },
    'class="unit"',
  );
  const estimate = layout.estimate ? estimateStrip(layout) : '';
  return [
    `<g class="tape" data-unit="${layout.unit}" data-scale="${layout.scale}" data-orientation="${layout.orientation}" data-mirror="${layout.mirror}"${layout.estimate ? ' data-estimate="one-mark"' : ''}${extraAttributes ? ` ${extraAttributes}` : ''}>`,
    `<rect class="cut-line" x="0" y="0" width="${mm(width)}" height="${fixed(layout.lengthMm)}" fill="#fff" stroke="#8a8a8a" stroke-width="0.1"/>`,
    `<g class="ticks" stroke="#000" stroke-linecap="butt">`,
    ...lines,
    '</g>',
    `<g class="numerals" fill="#000">`,
    ...numerals,
    unitLabel,
    '</g>',
    estimate,
    '</g>',
  ].join('\n');
}

/**
 * The words of a one-mark estimate down the tape's free edge (beyond the
 * numerals), read bottom to top, repeated along the length; on a tape too
 * narrow for them, a hatched edge band instead (still unmistakable).
 */
function estimateStrip(layout: TapeLayout): string {
  const estimate = layout.estimate!;
  const widest = Math.max(
    0,
    ...layout.ticks
      .filter((tick) => tick.numeral)
      .map((tick) => measureTextMm(formatTapeNumber(tick.distance), NUMERAL_FONT, layout.numeralHeightMm)),
  );
  const freeMm = layout.widthMm - (layout.numeralXMm + widest) - 0.3;
  const sizeMm = Math.min(1.8, freeMm - 0.6);
  const centreX = layout.mirror ? freeMm / 2 + 0.15 : layout.widthMm - freeMm / 2 - 0.15;
  if (sizeMm < 1.2) {
    const x = layout.mirror ? 0.15 : layout.widthMm - Math.max(0.6, freeMm) - 0.15;
    return `<rect class="estimate-strip" x="${mm(x)}" y="0" width="${mm(Math.max(0.6, freeMm))}" height="${fixed(layout.lengthMm)}" fill="#000" fill-opacity="0.35" aria-label="${ONE_MARK_STRIP}"/>`;
  }
  // The longest wording that fits the tape's length, shrunk (to 1.2 mm at least) if even the short one is too long.
  const room = layout.lengthMm - 2;
  const long = `${ONE_MARK_STRIP} · ${formatTapeNumber(estimate.distance)} ${layout.unit} SIGHTED`;
  const word = measureTextMm(long, SMALL_PRINT_FONT, sizeMm) <= room ? long : ONE_MARK_STRIP;
  const size = Math.max(1.2, Math.min(sizeMm, (sizeMm * room) / measureTextMm(word, SMALL_PRINT_FONT, sizeMm)));
  const wordMm = measureTextMm(word, SMALL_PRINT_FONT, size);
  const repeats = Math.max(1, Math.floor((layout.lengthMm - 4) / (wordMm + 8)));
  const pitch = layout.lengthMm / repeats;
  const parts = ['<g class="estimate-strip" fill="#000" data-estimate="one-mark">'];
  for (let i = 0; i < repeats; i++) {
    parts.push(
      `<g transform="translate(${fixed(centreX)} ${fixed(pitch * (i + 0.5))}) rotate(-90)">${textElement(word, SMALL_PRINT_FONT, { x: 0, y: 0, sizeMm: size, anchor: 'middle', baseline: 'middle' })}</g>`,
    );
  }
  parts.push('</g>');
  return parts.join('\n');
}

/** Lengths to 0.1 µm: far below print resolution, so nothing visible is rounded. */
function fixed(value: number): string {
  return value.toFixed(4);
}

function mm(value: number): string {
  return String(Number(value.toFixed(4)));
}
