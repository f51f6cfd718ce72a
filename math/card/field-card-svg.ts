import type { CardAir, FieldCardData, FieldCardLabels } from '@/shared/field-card';
import { NUMERAL_FONT, SMALL_PRINT_FONT, type GlyphFont } from '@/math/tape/glyphs';
import { escapeXml, textElement } from '@/math/tape/text-path';
import { wrapText } from '@/math/sheet/wrap-text';

/** The card's paper: 100 × 150 mm, small enough to tape inside a bow case lid. */
export const FIELD_CARD_SIZE_MM = { widthMm: 100, heightMm: 150 } as const;

const MARGIN_MM = 5;
const INK = '#000';
const SOFT = '#3c3c3c';
const STRIPE = '#ececec';

/**
 * The field card as a standalone SVG in millimetres (width="100mm"
 * height="150mm", viewBox in mm: one user unit is one millimetre), every word
 * and number drawn as glyph outlines (textElement; no <text>, so the print
 * does not depend on installed fonts). From the top: the bow, build and
 * sight-in; the air the marks are for; the slope table (one row per angle, one
 * column per slant distance; each box: the mark to hold, the distance to set
 * on the sight-in tape, the rifleman's-rule distance and the difference); the
 * level marks in the card's air against the sight-in's; the crosswind drift
 * (in/cm at the target) and hold (mm at the sight) for three wind speeds on
 * the same distance columns; the cautions, wind's among them. Each
 * box is a <g data-angle data-distance data-mark-mm data-aim-as-if> for
 * tests and tools. The outer rectangle is the cut line.
 *
 * Units: mm on paper; distances in data.unit; marks mm as the archer reads them.
 * Example: fieldCardSvg(fieldCardData(model), { bow: 'Timberline slider', build: 'Elk heavy', date: '2026-11-14', place: 'Basin camp' }) → '<svg xmlns="http://www.w3.org/2000/svg" width="100mm" height="150mm" …'
 */
export function fieldCardSvg(data: FieldCardData, labels: FieldCardLabels): string {
  const { widthMm, heightMm } = FIELD_CARD_SIZE_MM;
  const contentMm = widthMm - 2 * MARGIN_MM;
  const parts: string[] = [];
  const text = (
    value: string,
    font: GlyphFont,
    x: number,
    y: number,
    sizeMm: number,
    anchor: 'start' | 'middle' | 'end' = 'start',
    fill = INK,
  ) => parts.push(textElement(value, font, { x, y, sizeMm, anchor }, `fill="${fill}"`));
  const unit = data.unit;

  // Heading.
  let y = MARGIN_MM + 3.2;
  text(`Field card · ${clip(labels.bow, 34)}`, NUMERAL_FONT, MARGIN_MM, y, 3.2);
  y += 3.4;
  text(
    `${clip(labels.build, 30)} · sighted ${labels.date}${labels.place ? `, ${clip(labels.place, 28)}` : ''}`,
    SMALL_PRINT_FONT,
    MARGIN_MM,
    y,
    1.7,
    'start',
    SOFT,
  );
  y += 2.9;
  text(`Sight-in air: ${airWords(data.sightIn)}`, SMALL_PRINT_FONT, MARGIN_MM, y, 1.7, 'start', SOFT);
  y += 3.6;
  text(data.sameAirAsSightIn ? 'Marks for the sight-in air' : `Marks for ${airWords(data.air)}`, NUMERAL_FONT, MARGIN_MM, y, 2.4);
  y += 3.2;
  for (const line of wrapText(
    `Each box: mark to hold (mm); ≈ distance to set on the sight-in tape (${unit}); rifleman's rule, slant × cos(angle), and the set distance minus it. ≈ none: hold the mark.`,
    SMALL_PRINT_FONT,
    1.6,
    contentMm,
  )) {
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, 1.6, 'start', SOFT);
    y += 2.3;
  }

  // Slope table.
  const angleColumnMm = 12;
  const columns = data.distances.length;
  const columnMm = (contentMm - angleColumnMm) / columns;
  const columnX = (index: number) => MARGIN_MM + angleColumnMm + columnMm * (index + 0.5);
  y += 1.2;
  parts.push(`<g class="slope-table" data-unit="${unit}">`);
  text('slope', SMALL_PRINT_FONT, MARGIN_MM, y + 2.2, 1.6, 'start', SOFT);
  data.distances.forEach((distance, index) =>
    text(`${formatDistance(distance)} ${unit}`, NUMERAL_FONT, columnX(index), y + 2.4, 2.2, 'middle'),
  );
  y += 3.6;
  parts.push(`<line x1="${MARGIN_MM}" y1="${fixed(y)}" x2="${widthMm - MARGIN_MM}" y2="${fixed(y)}" stroke="${INK}" stroke-width="0.2"/>`);
  const rowMm = 6.9;
  data.anglesDeg.forEach((angleDeg, row) => {
    const top = y + row * rowMm;
    if (row % 2 === 1) parts.push(`<rect x="${MARGIN_MM}" y="${fixed(top)}" width="${contentMm}" height="${rowMm}" fill="${STRIPE}"/>`);
    text(angleLabel(angleDeg), NUMERAL_FONT, MARGIN_MM + 0.6, top + 2.9, 2.3);
    text(angleDeg === 0 ? 'level' : angleDeg > 0 ? 'uphill' : 'downhill', SMALL_PRINT_FONT, MARGIN_MM + 0.6, top + 5.5, 1.6, 'start', SOFT);
    data.distances.forEach((distance, column) => {
      const cell = data.rows.find((candidate) => candidate.angleDeg === angleDeg && candidate.distance === distance);
      const x = columnX(column);
      parts.push(
        `<g class="cell" data-angle="${angleDeg}" data-distance="${distance}" data-mark-mm="${cell?.markMm ?? ''}" data-aim-as-if="${cell?.aimAsIf ?? ''}">`,
      );
      if (!cell || cell.markMm === null) {
        text('out of reach', SMALL_PRINT_FONT, x, top + 4.6, 1.6, 'middle', SOFT);
      } else {
        text(formatNumber(cell.markMm, 1), NUMERAL_FONT, x, top + 2.6, 2.4, 'middle');
        text(cell.aimAsIf === null ? '≈ none' : `≈ ${formatNumber(cell.aimAsIf, 1)}`, NUMERAL_FONT, x, top + 4.6, 1.7, 'middle');
        const difference = cell.aimAsIfMinusHorizontal === null ? '—' : signed(cell.aimAsIfMinusHorizontal, 1);
        text(`${formatNumber(cell.horizontal, 1)}  ${difference}`, NUMERAL_FONT, x, top + 6.5, 1.6, 'middle', SOFT);
      }
      parts.push('</g>');
    });
  });
  y += data.anglesDeg.length * rowMm;
  parts.push(`<line x1="${MARGIN_MM}" y1="${fixed(y)}" x2="${widthMm - MARGIN_MM}" y2="${fixed(y)}" stroke="${INK}" stroke-width="0.2"/>`);
  parts.push('</g>');

  // Level marks in the card's air against the sight-in's, and the crosswind, on the same distance columns.
  y += 3.8;
  text(
    data.sameAirAsSightIn ? 'Level marks, sight-in air (mm)' : 'Level marks here against the sight-in (mm)',
    NUMERAL_FONT,
    MARGIN_MM,
    y,
    2.2,
  );
  const labelColumnMm = 14;
  const shiftColumnMm = (contentMm - labelColumnMm) / Math.max(1, data.shift.length);
  const shiftX = (index: number) => MARGIN_MM + labelColumnMm + shiftColumnMm * (index + 0.5);
  y += 3.4;
  parts.push(`<g class="air-shift">`);
  text(unit, SMALL_PRINT_FONT, MARGIN_MM, y, 1.6, 'start', SOFT);
  data.shift.forEach((row, index) => text(formatDistance(row.distance), NUMERAL_FONT, shiftX(index), y, 2, 'middle'));
  const shiftRows: [string, (row: FieldCardData['shift'][number]) => string][] = data.sameAirAsSightIn
    ? [['sight-in', (row) => optional(row.sightInMarkMm, (value) => formatNumber(value, 1))]]
    : [
        ['sight-in', (row) => optional(row.sightInMarkMm, (value) => formatNumber(value, 1))],
        ['here', (row) => optional(row.markMm, (value) => formatNumber(value, 1))],
        ['shift', (row) => optional(row.shiftMm, (value) => signed(value, 2))],
      ];
  for (const [label, value] of shiftRows) {
    y += 2.9;
    text(label, SMALL_PRINT_FONT, MARGIN_MM, y, 1.6, 'start', SOFT);
    data.shift.forEach((row, index) => {
      parts.push(`<g data-row="${label}" data-distance="${row.distance}">`);
      text(value(row), NUMERAL_FONT, shiftX(index), y, 1.9, 'middle');
      parts.push('</g>');
    });
  }
  parts.push('</g>');

  // Crosswind: per speed, the drift at the target (in/cm) and the hold at the sight (mm).
  y += 1.2;
  parts.push(
    `<line x1="${MARGIN_MM}" y1="${fixed(y)}" x2="${widthMm - MARGIN_MM}" y2="${fixed(y)}" stroke="${SOFT}" stroke-width="0.15"/>`,
  );
  const wind = data.wind;
  for (const line of wrapText(
    `Crosswind from 3 or 9 o'clock, level: drift in/cm at the target; hold mm at the sight, into the wind (from 1, 5, 7, 11 o'clock: half)`,
    SMALL_PRINT_FONT,
    1.6,
    contentMm,
  )) {
    y += 2.3;
    text(line, SMALL_PRINT_FONT, MARGIN_MM, y, 1.6, 'start', SOFT);
  }
  parts.push(`<g class="wind" data-speed-unit="${wind.speedUnit}">`);
  for (const row of wind.rows) {
    y += 2.6;
    text(`${formatDistance(row.speed)} ${wind.speedUnit}`, NUMERAL_FONT, MARGIN_MM, y, 1.9);
    row.cells.forEach((cell, index) => {
      parts.push(
        `<g data-wind="${row.speed}" data-distance="${cell.distance}" data-drift-cm="${cell.driftCm ?? ''}" data-hold-mm="${cell.holdMm ?? ''}">`,
      );
      text(
        cell.driftIn === null || cell.driftCm === null
          ? '—'
          : `${formatNumber(cell.driftIn, 1)}/${formatNumber(cell.driftCm, Math.abs(cell.driftCm) < 9.95 ? 1 : 0)}`,
        NUMERAL_FONT,
        shiftX(index),
        y,
        1.9,
        'middle',
      );
      text(cell.holdMm === null ? '' : formatNumber(cell.holdMm, 1), NUMERAL_FONT, shiftX(index), y + 2.1, 1.6, 'middle', SOFT);
      parts.push('</g>');
    });
    text('hold', SMALL_PRINT_FONT, MARGIN_MM, y + 2.1, 1.6, 'start', SOFT);
    y += 2.1;
  }
  parts.push('</g>');

  // Cautions.
  y += 3.6;
  parts.push('<g class="cautions">');
  for (const caution of [...data.cautions, wind.caution]) {
    for (const line of wrapText(caution, SMALL_PRINT_FONT, 1.6, contentMm)) {
      text(line, SMALL_PRINT_FONT, MARGIN_MM, y, 1.6);
      y += 2.3;
    }
  }
  parts.push('</g>');
  text('Pinwright field card · cut along the outline', SMALL_PRINT_FONT, widthMm / 2, heightMm - 2.6, 1.6, 'middle', SOFT);

  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${widthMm}mm" height="${heightMm}mm" viewBox="0 0 ${widthMm} ${heightMm}" data-unit="${unit}" data-content-bottom-mm="${fixed(y)}" role="img" aria-label="${escapeXml(`Field card for ${labels.bow}, ${labels.build}`)}">`,
    `<rect class="cut-line" x="0.1" y="0.1" width="${widthMm - 0.2}" height="${heightMm - 0.2}" fill="#fff" stroke="#8a8a8a" stroke-width="0.2"/>`,
    ...parts,
    '</svg>',
  ].join('\n');
}

/** "2700 m, 5 °C", "2700 m, standard temperature", "sea level (assumed), standard temperature". */
export function airWords(air: Pick<CardAir, 'altitudeM' | 'temperatureC'>): string {
  const altitude = air.altitudeM === null ? 'sea level (assumed)' : `${formatNumber(air.altitudeM, 0)} m`;
  const temperature = air.temperatureC === null ? 'standard temperature' : `${formatSigned(air.temperatureC, 0)} °C`;
  return `${altitude}, ${temperature}`;
}

function angleLabel(angleDeg: number): string {
  return angleDeg === 0 ? '0°' : `${angleDeg > 0 ? '+' : '−'}${formatDistance(Math.abs(angleDeg))}°`;
}

/** Fixed decimals, with a true minus sign. */
function formatNumber(value: number, decimals: number): string {
  return value.toFixed(decimals).replace(/^-/, '−');
}

/** A distance or angle as entered: no trailing zeros ("20", "22.5"). */
function formatDistance(value: number): string {
  return String(Number(value.toFixed(2))).replace(/^-/, '−');
}

function formatSigned(value: number, decimals: number): string {
  // Numeric care: −0.2 °C at 0 decimals must not print as "−0".
  const rounded = Number(value.toFixed(decimals));
  return formatNumber(rounded === 0 ? 0 : rounded, decimals);
}

/** "+1.2", "−0.4", "0.0". */
function signed(value: number, decimals: number): string {
  const rounded = value.toFixed(decimals);
  if (Number(rounded) === 0) return (0).toFixed(decimals);
  return value > 0 ? `+${rounded}` : rounded.replace(/^-/, '−');
}

function optional(value: number | null, format: (value: number) => string): string {
  return value === null ? '—' : format(value);
}

function clip(value: string, length: number): string {
  return value.length > length ? `${value.slice(0, length - 1)}…` : value;
}

function fixed(value: number): string {
  return String(Number(value.toFixed(4)));
}
