import { tapeOptionsSchema, fitIssueOf, type TapeOptions, type TapeOptionsInput } from '@/shared/fit';
import { distanceToMetres, metresToDistance, type DistanceUnit } from '@/math/units/convert';
import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { NUMERAL_FONT } from '@/math/tape/glyphs';
import { measureTextMm } from '@/math/tape/text-path';

/**
 * Where every tick of a sight tape goes, in millimetres, straight from the
 * fitted marks (no rounding).
 *
 * Geometry. The tape's top edge is y = 0 and runs across the tape; the
 * reference line lies `marginMm` below it and carries the tick of the smallest
 * mark (the first distance, whenever the tape starts beyond the short-range
 * turning point near 14 yd). With orientation "down" (numbers grow down the
 * tape, as the pin moves down for longer shots) the tick for distance D sits at
 *   y(D) = marginMm + scale·(s(D) − s_min)
 * and with "up" the tape is reversed: y(D) = marginMm + scale·(s_max − s(D)).
 * Either way the distance between two ticks is exactly the distance between
 * their marks on the sight's scale (times `scale`, 1 but for the print sheet's
 * ±0.5/1/2 % variants). To fit it: set the pin at a distance you have sighted
 * in, stick the tape so that distance's tick sits under the sight's pointer,
 * then check a second sighted distance before trusting the rest.
 *
 * Ticks: every `step`; longer every 5 and longest every 10, both numbered.
 * Numerals sit beside the longest tick, centred on their tick; a 5 numeral
 * that would overlap a neighbour is left out (its tick stays). `mirror` puts
 * the ticks on the right edge and the numerals to their left (for a pointer on
 * the tape's right), the digits still reading normally.
 *
 * Example: tapeLayout(fit.model, { from: 20, to: 100 }).ticks[0] → { distance: 20, markMm: 14.9, offsetMm: 4.6, kind: 'major', lengthMm: 5.4, strokeMm: 0.25, numeral: true }
 */
export interface TapeTick {
  /** In the tape's unit. */
  distance: number;
  /** The fitted mark, mm. */
  markMm: number;
  /** Distance from the tape's top edge, mm. */
  offsetMm: number;
  kind: 'minor' | 'middle' | 'major';
  /** Tick length across the tape, mm. */
  lengthMm: number;
  strokeMm: number;
  numeral: boolean;
}

export interface TapeLayout {
  unit: DistanceUnit;
  widthMm: number;
  lengthMm: number;
  marginMm: number;
  scale: number;
  orientation: 'down' | 'up';
  mirror: boolean;
  numeralHeightMm: number;
  /** Where numerals start across the tape (their left edge; their right edge when mirrored), mm. */
  numeralXMm: number;
  ticks: TapeTick[];
  /** Set when the model was fitted from one mark and a chronographed speed: the tape is drawn as an estimate (model.oneMark). */
  estimate?: { kind: 'one-mark'; distance: number; nextDistance: number | null };
}

/** Stroke widths of the ticks, mm: fine enough to read to a tenth of a yard, bold enough to print. */
export const TICK_STROKE_MM = { minor: 0.1, middle: 0.16, major: 0.25 } as const;

/**
 * Parse tape options (defaults filled in), naming a bad field as "tape.<field>".
 * Example: parseTapeOptions({ to: 80 }).from → 20
 */
export function parseTapeOptions(options: TapeOptionsInput = {}): TapeOptions {
  const parsed = tapeOptionsSchema.safeParse(options);
  if (!parsed.success) {
    const { field, message } = fitIssueOf(parsed.error.issues[0]);
    throw new FitInputError(field === 'input' ? 'tape' : `tape.${field}`, message);
  }
  return parsed.data;
}

/** The layout of a tape for `model` (see the module comment); `scale` stretches the tick spacing (1 = true size). */
export function tapeLayout(model: SightModel, options: TapeOptionsInput = {}, scale = 1): TapeLayout {
  return tapeLayouts(model, options, [scale])[0];
}

/**
 * Layouts of one tape at several scales (the print sheet's variants), solving
 * the marks once. Example: tapeLayouts(model, {}, [1, 0.99]).map(l => l.scale) → [1, 0.99]
 */
export function tapeLayouts(model: SightModel, options: TapeOptionsInput, scales: readonly number[]): TapeLayout[] {
  const tape = parseTapeOptions(options);
  const unit = tape.unit ?? model.distanceUnit;
  const distances: number[] = [];
  const count = Math.round((tape.to - tape.from) / tape.step);
  if (count > 2000) throw new FitInputError('tape.step', 'Too many ticks: use a larger step or a shorter range');
  for (let i = 0; i <= count; i++) distances.push(Number((tape.from + i * tape.step).toFixed(6)));
  if (distances[distances.length - 1] < tape.to - 1e-9) distances.push(tape.to);

  const inModelUnit = distances.map((distance) => metresToDistance(distanceToMetres(distance, unit), model.distanceUnit));
  const marks = predictMarksMm(model, inModelUnit);
  const unreachable = marks.findIndex((mark) => !Number.isFinite(mark));
  if (unreachable >= 0)
    throw new FitInputError('tape.to', `The arrow cannot reach ${distances[unreachable]} ${unit} with this fit; end the tape sooner`);

  const numeralHeightMm = tape.numeralHeightMm;
  const widest = Math.max(
    ...distances.filter(isMultipleOf5).map((distance) => measureTextMm(formatTapeNumber(distance), NUMERAL_FONT, numeralHeightMm)),
    0,
  );
  const edgeMm = 0.4;
  const gapMm = 0.5;
  const majorMm = Math.min(0.45 * tape.widthMm, tape.widthMm - widest - gapMm - edgeMm);
  if (majorMm < 1.5) throw new FitInputError('tape.widthMm', `The tape is too narrow for ${numeralHeightMm} mm numerals; make it wider`);
  const lengths = { major: majorMm, middle: 0.75 * majorMm, minor: 0.5 * majorMm };
  const lowest = Math.min(...marks);
  const highest = Math.max(...marks);
  // Room above the first tick (and below the last) for half a numeral and the unit label.
  const marginMm = 2 * numeralHeightMm + 1;

  return scales.map((scale) => {
    const ticks: TapeTick[] = distances.map((distance, i) => {
      const kind = isMultipleOf(distance, 10) ? 'major' : isMultipleOf5(distance) ? 'middle' : 'minor';
      const offsetMm = marginMm + scale * (tape.orientation === 'down' ? marks[i] - lowest : highest - marks[i]);
      return { distance, markMm: marks[i], offsetMm, kind, lengthMm: lengths[kind], strokeMm: TICK_STROKE_MM[kind], numeral: false };
    });
    // Numerals: tens first, then fives where they clear the ones already placed.
    const clearanceMm = numeralHeightMm + 0.25;
    const placed: number[] = [];
    for (const kind of ['major', 'middle'] as const) {
      for (const tick of ticks) {
        if (tick.kind !== kind) continue;
        if (placed.some((offset) => Math.abs(offset - tick.offsetMm) < clearanceMm)) continue;
        tick.numeral = true;
        placed.push(tick.offsetMm);
      }
    }
    return {
      unit,
      widthMm: tape.widthMm,
      lengthMm: 2 * marginMm + scale * (highest - lowest),
      marginMm,
      scale,
      orientation: tape.orientation,
      mirror: tape.mirror,
      numeralHeightMm,
      numeralXMm: majorMm + gapMm,
      ticks,
      ...(model.oneMark ? { estimate: { kind: 'one-mark' as const, ...model.oneMark } } : {}),
    };
  });
}

/** A tape numeral: the distance without trailing zeros. Example: formatTapeNumber(45) → '45' */
export function formatTapeNumber(distance: number): string {
  return String(Number(distance.toFixed(3)));
}

// Numeric care: distances come from sums of steps; compare to multiples within 1e-6.
function isMultipleOf(distance: number, every: number): boolean {
  return Math.abs(distance / every - Math.round(distance / every)) < 1e-6;
}

function isMultipleOf5(distance: number): boolean {
  return isMultipleOf(distance, 5);
}
