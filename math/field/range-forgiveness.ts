import { distanceToMetres, metresToDistance } from '@/math/units/convert';
import { brentRoot } from '@/math/numeric/brent-root';
import { shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { missAtRange, solveElevation } from '@/math/flight/solve-elevation';
import { FitInputError } from '@/math/fit/fit-input-error';

/**
 * Range forgiveness: aimed for `distance` on level ground, over what stretch
 * of range the arrow stays within ±windowMm of the line of sight (by default
 * ±100 mm, a vital zone's half-height). A misjudged range inside
 * [nearEdge, farEdge] still hits inside the window. The arrow's height above
 * the line of sight, w(u), is concave (gravity and drag only bend it down), so
 * {w ≥ −window} is one interval and the stretch is the part of it around the
 * aimed distance where w ≤ +window too.
 *
 * Units: distances in model.distanceUnit, window and peak mm.
 * Example: rangeForgiveness(model, 40) → { distance: 40, windowMm: 100, nearEdge: 34.16, farEdge: 44.30, span: 10.14, peakAboveMm: 178.5 }
 */
export interface RangeForgiveness {
  distance: number;
  windowMm: number;
  nearEdge: number;
  farEdge: number;
  span: number;
  /** Highest the arrow rises above the line of sight on the way, mm. */
  peakAboveMm: number;
}

export function rangeForgiveness(model: SightModel, distance: number, windowMm = 100): RangeForgiveness {
  if (!(windowMm > 0)) throw new FitInputError('windowMm', 'Enter a window of more than 0 mm');
  const shot = shotParametersOf(model);
  const aimedM = distanceToMetres(distance, model.distanceUnit);
  const aim = solveElevation(shot, aimedM, 0);
  if (!aim) throw new FitInputError('distance', `The arrow cannot reach ${distance} ${model.distanceUnit} with this fit`);
  const window = windowMm / 1000;
  const startM = shot.peepHeightM * Math.sin(aim.elevationRad) + 1e-3;
  const height = (rangeM: number) => missAtRange(shot, rangeM, 0, aim.elevationRad).w;
  const slope = (rangeM: number) => {
    const crossing = missAtRange(shot, rangeM, 0, aim.elevationRad);
    return crossing.vw / crossing.vu;
  };
  // Numeric care: edges to 1 mm of range are far finer than any range estimate.
  const tolerance = 1e-3;
  // The peak of the flight above the line of sight (where it stops rising).
  let farthestM = Math.max(2 * aimedM, aimedM + 20);
  while (height(farthestM) > -window && farthestM < 1000) farthestM *= 1.5;
  const peakM = slope(startM) <= 0 ? startM : slope(farthestM) >= 0 ? farthestM : brentRoot(slope, startM, farthestM, tolerance);
  const peak = height(peakM);
  // Far edge: the arrow falls through −window beyond the peak.
  const farM = brentRoot((rangeM) => height(rangeM) + window, Math.max(peakM, aimedM), farthestM, tolerance);
  let nearM: number;
  if (peak > window && aimedM > peakM) {
    nearM = brentRoot((rangeM) => height(rangeM) - window, peakM, aimedM, tolerance); // falling back into the window
  } else if (peak > window) {
    // Aimed before the peak: the window closes where the rising arrow passes +window.
    const closeM = brentRoot((rangeM) => height(rangeM) - window, aimedM, peakM, tolerance);
    const openM = height(startM) >= -window ? startM : brentRoot((rangeM) => height(rangeM) + window, startM, aimedM, tolerance);
    return result(openM, closeM);
  } else {
    nearM = height(startM) >= -window ? startM : brentRoot((rangeM) => height(rangeM) + window, startM, Math.min(peakM, aimedM), tolerance);
  }
  return result(nearM, farM);

  function result(nearEdgeM: number, farEdgeM: number): RangeForgiveness {
    const nearEdge = metresToDistance(nearEdgeM, model.distanceUnit);
    const farEdge = metresToDistance(farEdgeM, model.distanceUnit);
    return { distance, windowMm, nearEdge, farEdge, span: farEdge - nearEdge, peakAboveMm: peak * 1000 };
  }
}
