import type { FitResult } from '@/math/fit/fit-sight';
import { distanceToMetres, metresToDistance, type DistanceUnit } from '@/math/units/convert';
import type { FitInput } from '@/shared/fit';
import type { StoredFit } from '@/shared/sight-in';

/**
 * The fit of a sight-in, one rule each, used by the sight-in screen's live
 * table (components/sight-ins/live-fit.ts), the saved fit
 * (server/services/fit-service.ts) and the tests, so what the archer sees
 * while typing is what is saved:
 * - predictDistances: which distances get a predicted mark;
 * - sightInFitInput: bow + build + marks + air → math's FitInput;
 * - storedFitOf / fitResultOf: math's FitResult ↔ the fit stored with a
 *   sight-in (readings as the archer reads the scale).
 * Pure; imports math's types and units only.
 *
 * Readings: math takes scale readings growing as the pin moves down. For a bow
 * whose scale grows upward, readings are negated on the way in and mapped back
 * in the stored fit (marks, residuals, scale zero); the fitted `model` stays in
 * math's convention, which is also the physical one the tape is drawn from.
 *
 * Example: sightInFitInput(bow, build, { altitudeM: null, temperatureC: null, marks }).predict
 *   → [10, 15, …, 100] (marks to 60 yd, no fixed pins)
 */

/** Nearest, step and farthest of the predicted grid, in the fit's unit; the grid reaches `beyond` past the longest mark, at most `max`. */
export const PREDICT_GRID = { first: 10, step: 5, last: 100, beyond: 20, max: 150 } as const;

/**
 * Distances whose marks are predicted (in the fit's unit): every 5 from 10 to
 * 100, or to 20 beyond the longest mark rounded up to 10 (at most 150), plus
 * each fixed pin's distance (between 5 and 150). The same in yards and metres:
 * a metric archer shoots 90 and 100 m too, and a pin's own distance must be in
 * the table (common practice, no published source).
 * Example: predictDistances(60, [33]) → [10, 15, …, 30, 33, 35, …, 100]
 */
export function predictDistances(longest: number, pins: readonly number[] = []): number[] {
  const { first, step, last: top, beyond, max } = PREDICT_GRID;
  const last = Math.min(max, Math.max(top, Math.ceil((longest + beyond) / 10) * 10));
  const distances: number[] = [];
  for (let distance = first; distance <= last; distance += step) distances.push(distance);
  for (const pin of pins) {
    // Numeric care: a pin converted from metres may differ from a grid distance by rounding only.
    if (pin >= 5 && pin <= max && !distances.some((distance) => Math.abs(distance - pin) < 1e-6)) distances.push(pin);
  }
  return distances.sort((a, b) => a - b);
}

/** What a fit needs of a bow; fixed pins' distances are predicted too. */
export interface FitBow {
  sightRadiusMm: number;
  peepHeightMm: number;
  scaleDirection: 'down' | 'up';
  pinDistances?: readonly number[];
  pinDistanceUnit?: DistanceUnit;
}

/** What a fit needs of an arrow build (a saved build's `derived.totalGr` is its totalGr). */
export interface FitBuild {
  totalGr: number;
  diameterMm: number;
  dragCoefficient: number | null;
  speedFps: number | null;
}

/** A sighted mark as the archer entered it: distance in `unit`, scale reading as read (mm). */
export interface FitMark {
  distance: number;
  unit: DistanceUnit;
  scaleMm: number;
}

/** What a fit needs of a sight-in: its air (null = not measured) and its marks. */
export interface FitSightIn {
  altitudeM: number | null;
  temperatureC: number | null;
  marks: readonly FitMark[];
}

/**
 * The sign turning a reading as the archer reads it into math's (growing as the pin moves down), and back.
 * Example: scaleSignOf('up') → -1
 */
export function scaleSignOf(scaleDirection: 'down' | 'up'): 1 | -1 {
  return scaleDirection === 'up' ? -1 : 1;
}

/** A distance in `from` → `to`, exact (math/units). Example: convertDistance(100, 'yd', 'm') → 91.44 */
export function convertDistance(distance: number, from: DistanceUnit, to: DistanceUnit): number {
  return from === to ? distance : metresToDistance(distanceToMetres(distance, from), to);
}

/**
 * The math core's fit input for a sight-in: sight radius and peep height from
 * the bow; mass, diameter, drag coefficient and chronographed speed from the
 * build; air from the sight-in; marks in the first mark's unit (others
 * converted exactly), readings signed for math's downward-growing convention;
 * predictions at predictDistances with the bow's fixed pins.
 * Example: sightInFitInput(bow, build, { altitudeM: 1450, temperatureC: 4, marks }).sight → { radiusMm: 838, peepHeightMm: 112 }
 */
export function sightInFitInput(bow: FitBow, build: FitBuild, sightIn: FitSightIn): FitInput {
  const unit: DistanceUnit = sightIn.marks[0]?.unit ?? 'yd';
  const sign = scaleSignOf(bow.scaleDirection);
  const marks = sightIn.marks.map((mark) => ({ distance: convertDistance(mark.distance, mark.unit, unit), markMm: sign * mark.scaleMm }));
  const air: NonNullable<FitInput['air']> = {};
  if (sightIn.altitudeM !== null) air.altitudeM = sightIn.altitudeM;
  if (sightIn.temperatureC !== null) air.temperatureC = sightIn.temperatureC;
  const arrow: FitInput['arrow'] = { massGr: build.totalGr, diameterMm: build.diameterMm };
  if (build.dragCoefficient !== null) arrow.dragCoefficient = build.dragCoefficient;
  if (build.speedFps !== null) arrow.speedFps = build.speedFps;
  return {
    distanceUnit: unit,
    sight: { radiusMm: bow.sightRadiusMm, peepHeightMm: bow.peepHeightMm },
    arrow,
    air,
    marks,
    predict: predictDistances(
      Math.max(...marks.map((mark) => mark.distance)),
      (bow.pinDistances ?? []).map((pin) => convertDistance(pin, bow.pinDistanceUnit ?? 'yd', unit)),
    ),
  };
}

/**
 * The fit as stored with a sight-in: readings as the archer reads the scale
 * (negated for an upward-growing scale), `scaleDirection` added; JSON has no
 * NaN, so an unreachable predicted mark is stored as null. The model stays math's.
 * Example: storedFitOf(fitSight(input), 'up').marks[2].markMm → −(math's mark at that distance)
 */
export function storedFitOf(fit: FitResult, scaleDirection: 'down' | 'up'): StoredFit {
  const sign = scaleSignOf(scaleDirection);
  const finite = (value: number) => (Number.isFinite(value) ? value : null);
  return {
    ...fit,
    scaleDirection,
    scaleZeroMm: sign * fit.scaleZeroMm,
    marks: fit.marks.map((mark) => ({
      ...mark,
      markMm: Number.isFinite(mark.markMm) ? sign * mark.markMm : null,
      sigmaMm: finite(mark.sigmaMm),
    })),
    residuals: fit.residuals.map((residual) => ({
      ...residual,
      markMm: sign * residual.markMm,
      fittedMm: sign * residual.fittedMm,
      residualMm: sign * residual.residualMm,
      standardised: sign * residual.standardised,
    })),
    model: fit.model,
  };
}

/**
 * A stored fit back in math's terms (readings growing downward, NaN where the
 * arrow cannot reach): what storedFitOf was given, except slope shots (a
 * sight-in asks for none) and warnings' codes, which stay as stored.
 * Example: fitResultOf(storedFitOf(fit, 'up')).marks → fit.marks
 */
export function fitResultOf(stored: StoredFit): Omit<FitResult, 'shots' | 'warnings'> & { warnings: StoredFit['warnings'] } {
  const sign = scaleSignOf(stored.scaleDirection);
  const number = (value: number | null) => (value === null ? NaN : value);
  return {
    distanceUnit: stored.distanceUnit,
    speedFps: stored.speedFps,
    dragCoefficient: stored.dragCoefficient,
    peepHeightMm: stored.peepHeightMm,
    sightRadiusMm: stored.sightRadiusMm,
    scaleZeroMm: sign * stored.scaleZeroMm,
    rmsMm: stored.rmsMm,
    method: stored.method,
    airDensityKgM3: stored.airDensityKgM3,
    marks: stored.marks.map((mark) => ({
      distance: mark.distance,
      markMm: mark.markMm === null ? NaN : sign * mark.markMm,
      sigmaMm: number(mark.sigmaMm),
      sigmaDistance: mark.sigmaDistance,
      verify: mark.verify,
    })),
    residuals: stored.residuals.map((residual) => ({
      distance: residual.distance,
      markMm: sign * residual.markMm,
      fittedMm: sign * residual.fittedMm,
      residualMm: sign * residual.residualMm,
      standardised: sign * residual.standardised,
      outlier: residual.outlier,
    })),
    nextDistance: stored.nextDistance,
    warnings: stored.warnings,
    model: stored.model,
  };
}
