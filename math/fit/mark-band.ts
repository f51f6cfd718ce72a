import { degToRad, distanceToMetres } from '@/math/units/convert';
import { quadraticForm } from '@/math/numeric/symmetric-matrix';
import { markGradient } from '@/math/flight/mark-gradient';
import { markFromElevationMm, shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { solveElevation } from '@/math/flight/solve-elevation';

/**
 * A predicted mark with its one-sigma band, from the fitted model's posterior
 * covariance C: σ² = gᵀ·C·g, g the mark's gradient in the fitted parameters
 * (linearised propagation of uncertainty; JCGM 100:2008 "GUM" §5.1.2). The
 * band in distance divides by how fast the mark moves with distance; near the
 * short-range turning point (≈ 13–15 yd, where the 10 and 20 yd marks nearly
 * coincide) the mark hardly moves and the distance band is left null.
 *
 * Units: distance and sigmaDistance in model.distanceUnit, the rest mm.
 * Example: markBand(model, 80) → { distance: 80, markMm: 43.32, sigmaMm: 0.38, sigmaDistance: 0.69, mmPerDistance: 0.55, gradient: […] } (two marks, 20 and 60 yd)
 */
export interface MarkBand {
  distance: number;
  markMm: number;
  /** One sigma of the predicted mark, mm (NaN if the model carries no covariance). */
  sigmaMm: number;
  /** One sigma in distance, model.distanceUnit; null where the mark hardly moves with distance. */
  sigmaDistance: number | null;
  /** How far the mark moves per unit of distance, mm (negative below the turning point). */
  mmPerDistance: number;
  /** The mark's gradient in MODEL_PARAMETERS (mm per parameter unit). */
  gradient: number[];
}

/** Below this many mm of mark per unit of distance, no distance band is given. */
export const FLAT_MM_PER_DISTANCE = 0.05;

export function markBand(model: SightModel, distance: number, angleDeg = 0, guessRad?: number): MarkBand | null {
  const rangeM = distanceToMetres(distance, model.distanceUnit);
  const losAngleRad = degToRad(angleDeg);
  const shot = shotParametersOf(model);
  const solution = solveElevation(shot, rangeM, losAngleRad, guessRad);
  if (!solution) return null;
  const gradient = markGradient(model, shot, rangeM, losAngleRad, solution.elevationRad);
  const sigmaMm = model.covariance ? Math.sqrt(Math.max(0, quadraticForm(model.covariance, gradient.parameters))) : NaN;
  const mmPerDistance = gradient.perRangeMmPerM * distanceToMetres(1, model.distanceUnit);
  return {
    distance,
    markMm: markFromElevationMm(model, solution.elevationRad),
    sigmaMm,
    sigmaDistance: Math.abs(mmPerDistance) >= FLAT_MM_PER_DISTANCE && Number.isFinite(sigmaMm) ? sigmaMm / Math.abs(mmPerDistance) : null,
    mmPerDistance,
    gradient: gradient.parameters,
  };
}
