/**
 * Live checks of the marks table, row by row, as the archer types: the one
 * rule the sight-in screen (and anything else that takes marks) uses to say
 * which row is wrong and why, before the fit blames the equipment.
 *
 * Each non-blank row may have one problem, named by its mark number:
 * - the distance or reading is empty, or not a number ("1g.0");
 * - the distance or reading is out of the range the API accepts;
 * - the distance is entered twice (the later row is named);
 * - the reading falls as the distance grows, past the short-range turning
 *   point (the later, farther row is named: it is left out of the fit until
 *   it is fixed or confirmed).
 *
 * Why a reading may fall at short range and not beyond: with the small-angle,
 * drag-free aim (projectile motion, any mechanics textbook) the sight angle is
 * tan γ ≈ h/D + g·D/(2v²) for peep height h above the arrow, distance D and
 * arrow speed v, smallest at D* = √(2·h·v²/g). Beyond D* the mark grows with
 * distance; drag only makes it grow faster. D* is taken for a fast arrow
 * (350 fps unless the build's chronographed speed is known), so the rule
 * never flags a real short-range dip.
 *
 * Example: checkMarks([{ distance: '20', scaleMm: '15' }, { distance: '30', scaleMm: '19' }, { distance: '40', scaleMm: '17' }],
 *   { unit: 'yd', scaleDirection: 'down', peepHeightMm: 110 }).problems
 *   → [{ row: 2, mark: 3, kind: 'falling', field: 'scaleMm', message: 'Mark 3 (40 yd): 17 mm is less than the 30 yd mark’s 19 mm; …' }]
 */
import { STANDARD_GRAVITY_MPS2 } from '@/math/units/constants';
import { fpsToMps, metresToDistance } from '@/math/units/convert';
import { distanceLimits } from './fit';

/** A row of the marks table as typed (only what the checks read). */
export interface MarkRowInput {
  distance: string;
  scaleMm: string;
  arrowsShot?: string;
  note?: string;
}

export interface MarkCheckContext {
  unit: 'yd' | 'm';
  /** 'down': readings grow as the pin moves down (longer distances); 'up': they shrink. */
  scaleDirection: 'down' | 'up';
  /** Peep height above the arrow's axis, mm. */
  peepHeightMm: number;
  /** The build's chronographed speed, fps, when known (else a fast 350 fps is assumed). */
  speedFps?: number | null;
}

export type MarkProblemKind = 'empty' | 'not-a-number' | 'out-of-range' | 'duplicate' | 'falling';

export interface MarkProblem {
  /** Table row (0-based). */
  row: number;
  /** The mark's number as the archer sees it (row + 1). */
  mark: number;
  kind: MarkProblemKind;
  field: 'distance' | 'scaleMm';
  /** One sentence naming the mark, e.g. "Mark 2: “1g.0” is not a number". */
  message: string;
}

/** A row the fit can use: table row, distance (table unit) and reading (mm, as read). */
export interface CheckedMark {
  row: number;
  distance: number;
  scaleMm: number;
}

export interface MarkCheckResult {
  /** One problem at most per row, in table order. */
  problems: MarkProblem[];
  /** Rows without a problem, in table order (what the fit may use). */
  usable: CheckedMark[];
  /** Rows whose reading falls (also in problems); the archer may confirm them on save. */
  falling: CheckedMark[];
}

/** Highest scale reading the API accepts, mm (shared/sightIn.ts markInputSchema). */
export const maxScaleMm = 200;
/** Speed assumed for the turning point when the build has no chronographed speed, fps (fast for a hunting arrow). */
export const turningPointSpeedFps = 350;
/**
 * A fall smaller than this is reading noise near the turning point, not a typo, mm
 * (a sight scale is read to about 0.2 mm: common practice, no published source).
 */
export const fallToleranceMm = 0.2;

/**
 * The short-range turning point D* = √(2·h·v²/g), in the table's unit.
 * Example: turningPointDistance(110, 350, 'yd') → about 17.6
 */
export function turningPointDistance(peepHeightMm: number, speedFps: number, unit: 'yd' | 'm'): number {
  const speed = fpsToMps(speedFps);
  const metres = Math.sqrt((2 * (peepHeightMm / 1000) * speed * speed) / STANDARD_GRAVITY_MPS2);
  return metresToDistance(metres, unit);
}

/** Typed text → number: '' → undefined, a decimal comma accepted, anything else → NaN (as the forms parse it). */
export function parseTyped(text: string | undefined | null): number | undefined {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return undefined;
  const normal = trimmed.replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(normal)) return NaN;
  return Number(normal);
}

const isBlank = (row: MarkRowInput | undefined) =>
  !row || [row.distance, row.scaleMm, row.arrowsShot ?? '', row.note ?? ''].every((text) => (text ?? '').trim() === '');

const show = (value: number) => String(Number(value.toFixed(2)));

/**
 * Checks every row of the marks table (blank rows are skipped, as on save).
 * Example: checkMarks([{ distance: '', scaleMm: '14.9' }], ctx).problems[0].message → 'Mark 1: enter the distance'
 */
export function checkMarks(rows: readonly (MarkRowInput | undefined)[], context: MarkCheckContext): MarkCheckResult {
  const problems: MarkProblem[] = [];
  const candidates: CheckedMark[] = [];
  const { unit } = context;

  rows.forEach((row, index) => {
    if (!row || isBlank(row)) return;
    const mark = index + 1;
    const problem = (kind: MarkProblemKind, field: MarkProblem['field'], message: string) =>
      problems.push({ row: index, mark, kind, field, message: `Mark ${mark}: ${message}` });
    const distance = parseTyped(row.distance);
    const scaleMm = parseTyped(row.scaleMm);
    if (distance === undefined) return problem('empty', 'distance', 'enter the distance');
    if (Number.isNaN(distance))
      return problem('not-a-number', 'distance', `“${row.distance.trim()}” is not a number; enter the distance in ${unit}`);
    if (distance < distanceLimits.min || distance > distanceLimits.max) {
      return problem(
        'out-of-range',
        'distance',
        `enter a distance between ${distanceLimits.min} and ${distanceLimits.max} ${unit} (not ${show(distance)})`,
      );
    }
    const twin = candidates.find((other) => Math.abs(other.distance - distance) < 1e-9);
    if (twin)
      return problem('duplicate', 'distance', `${show(distance)} ${unit} is entered twice (also mark ${twin.row + 1}); each distance once`);
    if (scaleMm === undefined) return problem('empty', 'scaleMm', 'enter the reading');
    if (Number.isNaN(scaleMm))
      return problem('not-a-number', 'scaleMm', `“${row.scaleMm.trim()}” is not a number; enter the reading in mm`);
    if (scaleMm < 0 || scaleMm > maxScaleMm)
      return problem('out-of-range', 'scaleMm', `enter a reading between 0 and ${maxScaleMm} mm (not ${show(scaleMm)})`);
    candidates.push({ row: index, distance, scaleMm });
  });

  // Falling readings: beyond the turning point each farther mark reads more (scale growing down) than every nearer one.
  const turning = turningPointDistance(context.peepHeightMm, context.speedFps ?? turningPointSpeedFps, unit);
  const sign = context.scaleDirection === 'up' ? -1 : 1;
  const byDistance = [...candidates].sort((a, b) => a.distance - b.distance);
  const falling: CheckedMark[] = [];
  for (const [position, mark] of byDistance.entries()) {
    if (mark.distance <= turning) continue;
    const nearer = byDistance
      .slice(0, position)
      .filter((other) => other.distance >= turning && !falling.includes(other))
      .find((other) => sign * (mark.scaleMm - other.scaleMm) < -fallToleranceMm);
    if (!nearer) continue;
    falling.push(mark);
    const direction = sign === 1 ? 'less' : 'more';
    problems.push({
      row: mark.row,
      mark: mark.row + 1,
      kind: 'falling',
      field: 'scaleMm',
      message:
        `Mark ${mark.row + 1} (${show(mark.distance)} ${unit}): ${show(mark.scaleMm)} mm is ${direction} than the ${show(nearer.distance)} ${unit} mark’s ${show(nearer.scaleMm)} mm; ` +
        `beyond about ${Math.round(turning)} ${unit} the reading ${sign === 1 ? 'grows' : 'shrinks'} with distance. Check both readings (a typo?)`,
    });
  }
  problems.sort((a, b) => a.row - b.row);
  return { problems, usable: candidates.filter((mark) => !falling.includes(mark)), falling };
}
