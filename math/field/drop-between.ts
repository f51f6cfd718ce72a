import { distanceToMetres } from '@/math/units/convert';
import { markFromElevationMm, shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { missAtRange, solveElevation } from '@/math/flight/solve-elevation';
import { FitInputError } from '@/math/fit/fit-input-error';

/**
 * How much an arrow drops between two distances, for comparing builds on one
 * sight: held with the near distance's mark, how far below the line of sight
 * it passes at the far distance (mm), and how far the sight must move between
 * the two marks (mm). A flatter build drops less.
 *
 * Units: distances in model.distanceUnit, lengths mm, times s. Level shots.
 * Example: dropBetween(model, 40, 60) → { near: 40, far: 60, dropMm: 660, gapMm: 9.89, nearTimeS: 0.433, farTimeS: 0.659 }
 */
export interface DropBetween {
  near: number;
  far: number;
  /** Below the line of sight at the far distance when aimed for the near one, mm. */
  dropMm: number;
  /** Far mark − near mark, mm. */
  gapMm: number;
  nearTimeS: number;
  farTimeS: number;
}

export function dropBetween(model: SightModel, near = 40, far = 60): DropBetween {
  if (!(far > near)) throw new FitInputError('far', 'The far distance must be beyond the near one');
  const shot = shotParametersOf(model);
  const nearM = distanceToMetres(near, model.distanceUnit);
  const farM = distanceToMetres(far, model.distanceUnit);
  const nearAim = solveElevation(shot, nearM, 0);
  const farAim = solveElevation(shot, farM, 0, nearAim?.elevationRad);
  if (!nearAim || !farAim) throw new FitInputError('far', `The arrow cannot reach ${far} ${model.distanceUnit} with this fit`);
  const heldNear = missAtRange(shot, farM, 0, nearAim.elevationRad);
  return {
    near,
    far,
    dropMm: -heldNear.w * 1000,
    gapMm: markFromElevationMm(model, farAim.elevationRad) - markFromElevationMm(model, nearAim.elevationRad),
    nearTimeS: nearAim.crossing.timeS,
    farTimeS: farAim.crossing.timeS,
  };
}
