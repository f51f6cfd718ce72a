import type { SightModel } from '@/math/flight/sight-model';
import { kineticEnergy, momentum } from '@/math/arrow/kinetic-energy';
import { dropBetween, type DropBetween } from '@/math/field/drop-between';
import { rangeForgiveness, type RangeForgiveness } from '@/math/field/range-forgiveness';
import { ENERGY_CAUTION } from '@/math/cautions';

/**
 * Builds side by side on one bow and sight: `withArrow` swaps the arrow of a
 * fitted sight model (same peep, radius and scale zero; new mass, diameter,
 * drag coefficient and speed, e.g. from predictBuildSpeedFps), and
 * `buildSummary` gives what a comparison shows: energy and momentum (exact,
 * no legal determination), the drop between two distances and the range
 * forgiveness at one.
 *
 * Example: buildSummary(withArrow(model, { massGr: 500, diameterMm: 6.5, speedFps: 262 })).drop.dropMm → 779
 */
export function withArrow(
  model: SightModel,
  arrow: { massGr: number; diameterMm: number; speedFps: number; dragCoefficient?: number },
): SightModel {
  const { covariance: _covariance, ...rest } = model;
  return {
    ...rest,
    arrowMassGr: arrow.massGr,
    arrowDiameterMm: arrow.diameterMm,
    speedFps: arrow.speedFps,
    dragCoefficient: arrow.dragCoefficient ?? model.dragCoefficient,
  };
}

export interface BuildSummary {
  speedFps: number;
  massGr: number;
  kineticEnergyJ: number;
  kineticEnergyFtLbf: number;
  momentumKgMps: number;
  momentumSlugFps: number;
  drop: DropBetween;
  forgiveness: RangeForgiveness;
  caution: string;
}

/** Units: distances in model.distanceUnit, window mm. Example: see the module comment. */
export function buildSummary(
  model: SightModel,
  options: { near?: number; far?: number; forgivenessAt?: number; windowMm?: number } = {},
): BuildSummary {
  const arrow = { massGr: model.arrowMassGr, speedFps: model.speedFps };
  const energy = kineticEnergy(arrow);
  const push = momentum(arrow);
  return {
    speedFps: model.speedFps,
    massGr: model.arrowMassGr,
    kineticEnergyJ: energy.joules,
    kineticEnergyFtLbf: energy.footPounds,
    momentumKgMps: push.kilogramMetresPerSecond,
    momentumSlugFps: push.slugFeetPerSecond,
    drop: dropBetween(model, options.near ?? 40, options.far ?? 60),
    forgiveness: rangeForgiveness(model, options.forgivenessAt ?? 40, options.windowMm ?? 100),
    caution: ENERGY_CAUTION,
  };
}
