import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';

/**
 * Pin positions of a fixed multi-pin sight for chosen distances: each pin's
 * mark, its distance below the first (nearest) pin and the gap to the pin
 * above it, all mm, straight from the fitted marks. With `minGapMm` (the
 * closest the sight's pins can sit), pins closer than that are flagged.
 *
 * Units: distances in model.distanceUnit, lengths mm.
 * Example: pinPositions(model, [20, 30, 40, 50, 60]).pins.map(p => p.gapMm) → [null, 3.46, 4.38, 4.81, 5.08]
 */
export interface PinPosition {
  distance: number;
  markMm: number;
  /** Below the first pin, mm. */
  fromFirstMm: number;
  /** Gap to the previous pin, mm (null for the first). */
  gapMm: number | null;
  /** True when the gap is under minGapMm. */
  crowded: boolean;
}

export function pinPositions(model: SightModel, distances: readonly number[], minGapMm = 0): { pins: PinPosition[] } {
  if (distances.length === 0) throw new FitInputError('pins', 'Choose at least one distance for a pin');
  const sorted = [...distances].sort((a, b) => a - b);
  if (sorted.some((distance, i) => i > 0 && Math.abs(distance - sorted[i - 1]) < 1e-9))
    throw new FitInputError('pins', 'Each pin needs its own distance');
  const marks = predictMarksMm(model, sorted);
  const unreachable = marks.findIndex((mark) => !Number.isFinite(mark));
  if (unreachable >= 0)
    throw new FitInputError('pins', `The arrow cannot reach ${sorted[unreachable]} ${model.distanceUnit} with this fit`);
  return {
    pins: sorted.map((distance, i) => {
      const gapMm = i === 0 ? null : marks[i] - marks[i - 1];
      return { distance, markMm: marks[i], fromFirstMm: marks[i] - marks[0], gapMm, crowded: gapMm !== null && gapMm < minGapMm };
    }),
  };
}
