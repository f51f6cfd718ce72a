import type { PredictedMark, BuildPrediction } from '@/shared/predict';
import type { SightModel } from '@/math/flight/sight-model';
import { predictMarksMm } from '@/math/flight/predict-mark';
import { FitInputError } from '@/math/fit/fit-input-error';
import { fitVirtualMass, predictBuildSpeedFps, type ChronographedBuild, type VirtualMassFit } from '@/math/builds/virtual-mass';
import { withArrow } from '@/math/builds/build-summary';
import { kineticEnergy, momentum } from '@/math/arrow/kinetic-energy';

/** Printed on every predicted tape and shown beside every predicted mark. */
export const PREDICTED_CAUTION = 'PREDICTED — not sighted. Confirm at the range before relying on it.';

/**
 * What is missing for a speed prediction with `count` chronographed builds, in plain words (the API's 400 message).
 * Example: missingChronographMessage(1) → 'Chronograph at least one more build on this bow (of another weight): …'
 */
export function missingChronographMessage(count: number): string {
  return count === 0
    ? 'Chronograph at least two builds of different weights on this bow: a new arrow’s speed is fitted from two or more chronographed builds.'
    : 'Chronograph at least one more build on this bow (of another weight): a new arrow’s speed is fitted from two or more chronographed builds, and this bow has one.';
}

/**
 * A build not shot yet, predicted on a bow's fitted sight.
 *
 * Speed: the new build's own chronographed speed when it has one; otherwise
 * the virtual-mass model v = √(2E/(m + m_v)) fitted to the bow's other
 * chronographed builds (fitVirtualMass; at least two of different masses, or
 * a FitInputError on `builds` saying what is missing). A mass outside the
 * chronographed range is an extrapolation and says so in `warnings`.
 *
 * Marks: the bow's sight geometry from one fitted sight-in (`sight`: its peep
 * height, sight radius and scale zero, in its air) carrying the new arrow
 * (withArrow: mass, diameter, speed, and its drag coefficient or else the
 * fitted one), at each of `distances` (default 10 to 100 every 5), beside
 * the sighted build's own marks and their difference. Without a sight, only
 * the speed. Everything is marked predicted: not sighted, confirm at the range.
 * Energy and momentum at the predicted speed are exact ½mv² and mv (no legal
 * determination; follow local regulations).
 *
 * Units: masses grains, speeds fps, diameter mm, distances in
 * sight.distanceUnit, marks mm in math's convention (readings growing as the
 * pin moves down; `scaleSign` −1 gives an upward-growing scale's readings).
 *
 * Example: predictBuild({ arrow: { massGr: 520, diameterMm: 6.2 }, chronographed: [{ massGr: 420, speedFps: 290 }, { massGr: 470, speedFps: 276 }], sight: model }).speedFps → 263.85
 */
export interface PredictBuildInput {
  arrow: { massGr: number; diameterMm: number; dragCoefficient?: number | null; speedFps?: number | null };
  /** The bow's chronographed builds (not the new one). */
  chronographed: readonly ChronographedBuild[];
  /** A fitted sight-in on the same bow, or null for the speed alone. */
  sight: SightModel | null;
  distances?: readonly number[];
  scaleSign?: 1 | -1;
}

const DEFAULT_DISTANCES = Array.from({ length: 19 }, (_, i) => 10 + 5 * i);

export function predictBuild(input: PredictBuildInput): BuildPrediction & { model: SightModel | null } {
  const { arrow } = input;
  if (!(arrow.massGr > 0 && Number.isFinite(arrow.massGr))) throw new FitInputError('arrow.massGr', 'Enter the arrow mass in grains');
  if (!(arrow.diameterMm > 0 && Number.isFinite(arrow.diameterMm)))
    throw new FitInputError('arrow.diameterMm', 'Enter the shaft diameter in mm');
  const warnings: string[] = [];

  let virtualMass: VirtualMassFit | null = null;
  if (input.chronographed.length >= 2) virtualMass = fitVirtualMass(input.chronographed);
  let speedFps: number;
  let speedSource: BuildPrediction['speedSource'];
  if (arrow.speedFps != null) {
    speedFps = arrow.speedFps;
    speedSource = 'chronograph';
  } else {
    if (!virtualMass) throw new FitInputError('builds', missingChronographMessage(input.chronographed.length));
    speedFps = predictBuildSpeedFps(virtualMass, arrow.massGr);
    speedSource = 'virtual-mass';
    const masses = input.chronographed.map((build) => build.massGr);
    const lightest = Math.min(...masses);
    const heaviest = Math.max(...masses);
    // Numeric care: within half a grain of the span is no extrapolation.
    if (arrow.massGr > heaviest + 0.5 || arrow.massGr < lightest - 0.5) {
      warnings.push(
        `The new arrow (${Math.round(arrow.massGr)} gr) is ${arrow.massGr > heaviest ? 'heavier' : 'lighter'} than every chronographed build (${Math.round(lightest)}–${Math.round(heaviest)} gr): its speed is extrapolated. Chronograph it first if you can.`,
      );
    }
  }

  const sign = input.scaleSign ?? 1;
  let model: SightModel | null = null;
  let marks: PredictedMark[] | null = null;
  if (input.sight) {
    const sight = input.sight;
    model = withArrow(sight, {
      massGr: arrow.massGr,
      diameterMm: arrow.diameterMm,
      speedFps,
      dragCoefficient: arrow.dragCoefficient ?? undefined,
    });
    const distances = [...(input.distances ?? DEFAULT_DISTANCES)];
    const predicted = predictMarksMm(model, distances);
    const sighted = predictMarksMm(sight, distances);
    const finite = (value: number) => (Number.isFinite(value) ? value : null);
    marks = distances.map((distance, i) => ({
      distance,
      markMm: finite(sign * predicted[i]),
      sightedBuildMarkMm: finite(sign * sighted[i]),
      differenceMm: finite(sign * (predicted[i] - sighted[i])),
    }));
    if (predicted.some((mark) => !Number.isFinite(mark)))
      warnings.push('Some distances are out of reach for the new arrow; they are left off its tape.');
  }

  const energy = kineticEnergy({ massGr: arrow.massGr, speedFps });
  const push = momentum({ massGr: arrow.massGr, speedFps });
  return {
    massGr: arrow.massGr,
    speedFps,
    kineticEnergyJ: energy.joules,
    kineticEnergyFtLbf: energy.footPounds,
    momentumKgMps: push.kilogramMetresPerSecond,
    momentumSlugFps: push.slugFeetPerSecond,
    speedSource,
    virtualMass,
    dragCoefficient: model?.dragCoefficient ?? arrow.dragCoefficient ?? null,
    unit: input.sight?.distanceUnit ?? null,
    marks,
    warnings,
    caution: PREDICTED_CAUTION,
    model,
  };
}
