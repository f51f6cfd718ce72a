import { slopeShot, type SlopeShot } from '@/math/slope/slope-shot';
import type { SightModel } from '@/math/flight/sight-model';
import { FitInputError } from '@/math/fit/fit-input-error';
import { SLOPE_CAUTION } from '@/math/cautions';

/**
 * A field card for slopes: for every line-of-sight angle and slant distance,
 * the mark to hold, the level distance to aim as if ("aim as if"), the
 * rifleman's-rule horizontal distance and their difference (see slopeShot).
 * The card carries the slope caution; these are estimates, confirm on real terrain.
 *
 * Units: distances in model.distanceUnit, angles degrees (+ uphill), marks mm.
 * Example: fieldCard(model).rows.find(r => r.angleDeg === -30 && r.distance === 40)?.aimAsIf → ≈ 33.5
 */
export interface FieldCard {
  anglesDeg: number[];
  distances: number[];
  /** One row per angle × distance, angles outer, in the order given. */
  rows: SlopeShot[];
  caution: string;
}

/** The card's default angles: −40° to +40° every 10°. */
export const FIELD_CARD_ANGLES_DEG = [-40, -30, -20, -10, 0, 10, 20, 30, 40];
/** The card's default slant distances: 20 to 60 every 10 (the model's unit). */
export const FIELD_CARD_DISTANCES = [20, 30, 40, 50, 60];

export function fieldCard(model: SightModel, options: { anglesDeg?: number[]; distances?: number[] } = {}): FieldCard {
  const anglesDeg = options.anglesDeg ?? FIELD_CARD_ANGLES_DEG;
  const distances = options.distances ?? FIELD_CARD_DISTANCES;
  if (anglesDeg.length === 0 || distances.length === 0) throw new FitInputError('fieldCard', 'Choose at least one angle and one distance');
  anglesDeg.forEach((angle, i) => {
    if (!(Math.abs(angle) <= 60)) throw new FitInputError(`anglesDeg[${i}]`, 'Enter an angle between -60 and 60°');
  });
  const rows = anglesDeg.flatMap((angle) => distances.map((distance) => slopeShot(model, distance, angle)));
  return { anglesDeg, distances, rows, caution: SLOPE_CAUTION };
}
