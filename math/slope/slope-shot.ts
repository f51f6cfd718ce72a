import { degToRad, distanceToMetres, metresToDistance } from '@/math/units/convert';
import { brentRoot } from '@/math/numeric/brent-root';
import { markFromElevationMm, shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { solveElevation } from '@/math/flight/solve-elevation';

/**
 * A shot up or down a slope: the mark it needs, the level distance whose mark
 * is the same ("aim as if"), and beside it the rifleman's-rule horizontal
 * distance S·cos θ. The rule is exact only as the elevation goes to zero; in
 * the full model uphill needs slightly more than it gives and downhill
 * slightly less, because gravity's component along the line of sight slows or
 * speeds the arrow. Both are estimates: confirm on real terrain.
 *
 * Units: distances in model.distanceUnit, angle in degrees (+ uphill), mark mm.
 * Example: slopeShot(model, 40, -30) → { distance: 40, angleDeg: -30, markMm: 19.84, aimAsIf: 33.54, horizontal: 34.64, aimAsIfMinusHorizontal: -1.10 }
 */
export interface SlopeShot {
  distance: number;
  angleDeg: number;
  /** The mark to hold, mm; NaN if out of reach. */
  markMm: number;
  /** Level distance with the same mark; null if no level distance has it. */
  aimAsIf: number | null;
  /** Rifleman's rule: slant distance × cos(angle). */
  horizontal: number;
  /** aimAsIf − horizontal (null with aimAsIf). */
  aimAsIfMinusHorizontal: number | null;
}

export function slopeShot(model: SightModel, distance: number, angleDeg: number): SlopeShot {
  const shot = shotParametersOf(model);
  const rangeM = distanceToMetres(distance, model.distanceUnit);
  const solution = solveElevation(shot, rangeM, degToRad(angleDeg));
  const horizontal = distance * Math.cos(degToRad(angleDeg));
  if (!solution) return { distance, angleDeg, markMm: NaN, aimAsIf: null, horizontal, aimAsIfMinusHorizontal: null };
  const markMm = markFromElevationMm(model, solution.elevationRad);
  const levelM = levelRangeForMark(model, markMm, rangeM);
  const aimAsIf = levelM === null ? null : metresToDistance(levelM, model.distanceUnit);
  return { distance, angleDeg, markMm, aimAsIf, horizontal, aimAsIfMinusHorizontal: aimAsIf === null ? null : aimAsIf - horizontal };
}

/**
 * The level range (m) whose mark is `markMm`, on the same side of the
 * short-range turning point as `nearRangeM` (level marks fall from 5 yd to
 * about 14 yd, where the arrow's rise past the line of sight peaks, then grow).
 * Null if no level range in 2–1.2·nearRangeM has that mark.
 * Example: levelRangeForMark(model, 19.96, 36.576) → 30.92
 */
export function levelRangeForMark(model: SightModel, markMm: number, nearRangeM: number): number | null {
  const shot = shotParametersOf(model);
  let guess: number | undefined;
  const levelMark = (rangeM: number): number => {
    const solution = solveElevation(shot, rangeM, 0, guess);
    if (!solution) return NaN;
    guess = solution.elevationRad;
    return markFromElevationMm(model, solution.elevationRad);
  };
  // Turning point of the level marks: tan γ ≈ h/S + g·S/(2v²) is least at S = v·√(2h/g).
  const turningM = shot.speedMps * Math.sqrt((2 * shot.peepHeightM) / shot.gravityMps2);
  const shortBranch = nearRangeM < turningM && turningM > 2;
  const [low, high] = shortBranch ? [2, turningM] : [Math.max(turningM, 1), Math.max(1.2 * nearRangeM, turningM + 1)];
  const lowMiss = levelMark(low) - markMm;
  const highMiss = levelMark(high) - markMm;
  if (!Number.isFinite(lowMiss) || !Number.isFinite(highMiss) || lowMiss * highMiss > 0) return null;
  // Numeric care: 1e-7 m of range is ≈ 1e-4 mm of mark at most.
  return brentRoot((rangeM) => levelMark(rangeM) - markMm, low, high, 1e-7, 100, lowMiss, highMiss);
}
