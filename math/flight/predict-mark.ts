import { degToRad, distanceToMetres } from '@/math/units/convert';
import { markFromElevationMm, shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { solveElevation, type ElevationSolution, type ShotParameters } from '@/math/flight/solve-elevation';

/**
 * Predicted sight marks from a fitted model.
 *
 * predictMarkMm solves one shot; predictMarksMm solves many at one slope,
 * warm-starting each from its neighbours (about two flights per distance at
 * one-yard spacing), which is what makes a whole tape cheap.
 *
 * Example: predictMarkMm(model, 40) → 22.74 (mm, for the example model of sight-model.ts)
 */

/**
 * The mark (mm) for a shot at slant `distance` (in model.distanceUnit) on a line
 * of sight `angleDeg` above the horizontal (negative downhill). NaN if out of reach.
 * Example: predictMarkMm(model, 40, -30) → 19.84
 */
export function predictMarkMm(model: SightModel, distance: number, angleDeg = 0): number {
  const solution = solveElevation(shotParametersOf(model), distanceToMetres(distance, model.distanceUnit), degToRad(angleDeg));
  return solution ? markFromElevationMm(model, solution.elevationRad) : NaN;
}

/**
 * Marks (mm) for many slant distances (in model.distanceUnit) at one slope, in
 * the order given; NaN where out of reach.
 * Example: predictMarksMm(model, [20, 30, 40]) → [14.90, 18.36, 22.74]
 */
export function predictMarksMm(model: SightModel, distances: readonly number[], angleDeg = 0): number[] {
  const shot = shotParametersOf(model);
  const metres = distances.map((distance) => distanceToMetres(distance, model.distanceUnit));
  const solutions = solveElevations(shot, metres, degToRad(angleDeg));
  return solutions.map((solution) => (solution ? markFromElevationMm(model, solution.elevationRad) : NaN));
}

/**
 * Elevations for many ranges (m) at one line-of-sight angle (rad), in the order
 * given. Each guess extrapolates q(S) = (tan γ − h/S)/S, which is nearly
 * linear in S (it is g/(2v²) for a drag-free flight), from the two nearest
 * ranges already solved.
 * Example: solveElevations(shot, [18.288, 54.864], 0).map(s => s?.elevationRad) → [0.018118, 0.039720]
 */
export function solveElevations(shot: ShotParameters, rangesM: readonly number[], losAngleRad: number): (ElevationSolution | null)[] {
  const order = rangesM.map((_, index) => index).sort((a, b) => rangesM[a] - rangesM[b]);
  const results: (ElevationSolution | null)[] = new Array(rangesM.length).fill(null);
  const h = shot.peepHeightM;
  let rangeA = NaN;
  let qA = NaN;
  let rangeB = NaN;
  let qB = NaN;
  for (const index of order) {
    const range = rangesM[index];
    let guess: number | undefined;
    if (Number.isFinite(qB)) {
      const q = Number.isFinite(qA) && rangeB !== rangeA ? qB + ((qB - qA) * (range - rangeB)) / (rangeB - rangeA) : qB;
      guess = Math.atan(h / range + q * range);
    }
    const solution = solveElevation(shot, range, losAngleRad, guess);
    results[index] = solution;
    if (solution && range !== rangeB) {
      rangeA = rangeB;
      qA = qB;
      rangeB = range;
      qB = (Math.tan(solution.elevationRad) - h / range) / range;
    }
  }
  return results;
}
