import type { DistanceUnit } from '@/math/units/convert';
import { fpsToMps } from '@/math/units/convert';
import { dragFactorPerM } from '@/math/flight/drag-factor';
import type { ShotParameters } from '@/math/flight/solve-elevation';

/**
 * A fitted sight: everything needed to predict the mark for any distance and
 * slope, as a plain serialisable object (edge units, named in each field). The
 * fit produces it; the tape, the print sheet, the slope table and a UI's dense
 * chart curve all evaluate it with predictMarkMm / predictMarksMm.
 *
 * The scale reading for an aim γ above the line of sight is
 *   mark = scaleZeroMm + sightRadiusMm·tan γ
 * (the pin sits sightRadiusMm ahead of the peep and mark − scaleZeroMm below
 * the peep's parallel to the arrow; readings grow as the pin moves down).
 *
 * Example: { distanceUnit: 'yd', speedFps: 285, dragCoefficient: 2, airDensityKgM3: 1.225, arrowMassGr: 420, arrowDiameterMm: 6.5, peepHeightMm: 110, sightRadiusMm: 820, scaleZeroMm: 0.04, gravityMps2: 9.80665 }
 */
export interface SightModel {
  /** The unit of every distance given to or returned by this model. */
  distanceUnit: DistanceUnit;
  /** Launch speed, ft/s. */
  speedFps: number;
  /** Drag coefficient referenced to the shaft cross-section. */
  dragCoefficient: number;
  /** Air density at the sight-in, kg/m³. */
  airDensityKgM3: number;
  /** Arrow mass, grains. */
  arrowMassGr: number;
  /** Shaft diameter, mm. */
  arrowDiameterMm: number;
  /** Peep centre above the arrow's axis, mm. */
  peepHeightMm: number;
  /** Peep to pin along the arrow, mm. */
  sightRadiusMm: number;
  /** Scale reading where the line of sight is parallel to the arrow, mm. */
  scaleZeroMm: number;
  /** Gravity, m/s². */
  gravityMps2: number;
  /**
   * Posterior covariance of the fitted parameters, in the order of
   * MODEL_PARAMETERS and their units (fps, mm, 1, mm, mm); absent if unknown.
   */
  covariance?: number[][];
  /**
   * Present when the fit had one sighted mark and a chronographed speed: every
   * other distance is an estimate. `distance` is the sighted one, `nextDistance`
   * where to shoot next (both model.distanceUnit). Tapes and sheets mark it.
   */
  oneMark?: { distance: number; nextDistance: number | null };
}

/** The fitted parameters, in covariance order, with their units. */
export const MODEL_PARAMETERS = ['speedFps', 'scaleZeroMm', 'dragCoefficient', 'peepHeightMm', 'sightRadiusMm'] as const;
/** One of MODEL_PARAMETERS. */
export type ModelParameter = (typeof MODEL_PARAMETERS)[number];

/**
 * The model's flight parameters in SI units.
 * Example: shotParametersOf(model).speedMps → 86.868 (285 fps)
 */
export function shotParametersOf(model: SightModel): ShotParameters {
  return {
    speedMps: fpsToMps(model.speedFps),
    dragPerM: dragFactorPerM({
      airDensityKgM3: model.airDensityKgM3,
      dragCoefficient: model.dragCoefficient,
      diameterMm: model.arrowDiameterMm,
      massGr: model.arrowMassGr,
    }),
    peepHeightM: model.peepHeightMm / 1000,
    gravityMps2: model.gravityMps2,
  };
}

/**
 * The scale reading (mm) for an aim `elevationRad` above the line of sight.
 * Example: markFromElevationMm({ scaleZeroMm: 0, sightRadiusMm: 820 }, 0.01811790) → 14.858
 */
export function markFromElevationMm(sight: { scaleZeroMm: number; sightRadiusMm: number }, elevationRad: number): number {
  return sight.scaleZeroMm + sight.sightRadiusMm * Math.tan(elevationRad);
}
