import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';

/**
 * The local slope of a fitted mark curve: how many millimetres the level mark
 * moves per unit of distance (model.distanceUnit) at `distance`, by a central
 * difference over ±`halfStep` (default 0.25 units). Numeric care: the marks are
 * solved to 1e-10 m of miss (≈ 1e-7 mm of mark), so the difference's rounding
 * error is about 1e-7 mm / 0.5 units, and its truncation error (h²/6 · s‴) is
 * below 1e-5 mm per unit for any arrow speed. NaN where the curve is out of reach.
 *
 * Divide a mark difference by it to turn millimetres into distance ("3 mm is
 * about 6 yd at 40 yd").
 *
 * Example: markSlopeMmPer(model, 40) → 0.4635 (mm per yard, for the example model of sight-model.ts)
 */
export function markSlopeMmPer(model: SightModel, distance: number, halfStep = 0.25): number {
  const [before, after] = predictMarksMm(model, [distance - halfStep, distance + halfStep]);
  return (after - before) / (2 * halfStep);
}
