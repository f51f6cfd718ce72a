import type { BuildComparison, ComparedBuild, ComparedMark } from '@/shared/compare';
import type { DistanceUnit } from '@/math/units/convert';
import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';
import { kineticEnergy, momentum } from '@/math/arrow/kinetic-energy';
import { dropBetween } from '@/math/field/drop-between';
import { rangeForgiveness } from '@/math/field/range-forgiveness';
import { FitInputError, isFitInputError } from '@/math/fit/fit-input-error';
import { ENERGY_CAUTION } from '@/math/cautions';
import { markSlopeMmPer } from '@/math/compare/mark-slope';

/**
 * Two to four arrow builds on one bow, side by side, each from its own fitted
 * sight-in (its SightModel): the fitted mark curves for an overlay chart; a
 * table by distance of each build's mark and its difference from the first
 * build (the reference) in mm and in distance; and per build the speed, total
 * grains, FOC, kinetic energy and momentum (exact ½mv² and mv, as
 * buildSummary gives them: no legal determination), the drop between `near` and `far` (dropBetween) and the
 * range forgiveness at `at` within ±windowMm (rangeForgiveness).
 *
 * The difference in distance is differenceMm divided by the local slope of the
 * reference build's mark curve (markSlopeMmPer): how far out along the
 * reference build's tape this build's mark sits. It is a first-order figure,
 * good while the difference is small against the curve's bend; it is null
 * where the reference curve is nearly flat (|slope| < 0.05 mm per unit, near
 * the short-range turning point around 14 yd).
 *
 * Air: each model is evaluated in its own sight-in air, unless
 * `airDensityKgM3` is given, when all are evaluated in that one air (a fair
 * comparison of the arrows alone). Units: distances in `unit` (default: the
 * first model's), marks mm as the archer reads the scale (`scaleSign` −1 for
 * a scale that grows upward; the distance figures do not change sign with it).
 *
 * Example (the example model of sight-model.ts, and the same sight with a 520 gr arrow at 262 fps):
 *   compareBuilds([{ label: 'Light', model }, { label: 'Heavy', model: heavy }]).rows[2].marks[1]
 *   → { markMm: 26.28, slopeMmPerUnit: 0.552, differenceMm: 3.54, differenceDistance: 7.65 } (at 40 yd)
 */
export interface CompareEntry {
  label: string;
  model: SightModel;
  /** FOC of the build, %, or null when its balance point is not measured. */
  focPct?: number | null;
}

export interface CompareOptions {
  /** Distances of the table (default 20, 30, … 80, plus `at`). */
  distances?: readonly number[];
  /** Where range forgiveness is measured (default 40). */
  at?: number;
  /** Half-height of the forgiveness window, mm (default 100). */
  windowMm?: number;
  /** Drop between `near` and `far` (default 40 and 60). */
  near?: number;
  far?: number;
  /** Range of the chart curves, every `curveStep` (default 10 to 100 by 1). */
  curveFrom?: number;
  curveTo?: number;
  curveStep?: number;
  unit?: DistanceUnit;
  /** One air for every build, kg/m³ (default: each build's own sight-in air). */
  airDensityKgM3?: number;
  /** +1 (readings grow downward) or −1 (upward). */
  scaleSign?: 1 | -1;
}

/** Below this local slope (mm per distance unit) a mark difference is not turned into distance. */
export const FLAT_SLOPE_MM_PER_UNIT = 0.05;

const DEFAULT_DISTANCES = [20, 30, 40, 50, 60, 70, 80];

export function compareBuilds(entries: readonly CompareEntry[], options: CompareOptions = {}): BuildComparison {
  if (entries.length < 2) throw new FitInputError('builds', 'Choose at least two builds to compare');
  if (entries.length > 4) throw new FitInputError('builds', 'Compare at most four builds at once');
  const unit = options.unit ?? entries[0].model.distanceUnit;
  const at = options.at ?? 40;
  const windowMm = options.windowMm ?? 100;
  const near = options.near ?? 40;
  const far = options.far ?? 60;
  const sign = options.scaleSign ?? 1;
  const distances = [...new Set([...(options.distances ?? DEFAULT_DISTANCES), at])].sort((a, b) => a - b);
  if (distances.some((distance) => !(distance >= 5 && distance <= 150)))
    throw new FitInputError('distances', 'Enter distances between 5 and 150');

  // The model's distances are read in `unit`; its physics is in SI, so changing the unit changes nothing else.
  const models = entries.map((entry) => ({
    ...entry.model,
    distanceUnit: unit,
    airDensityKgM3: options.airDensityKgM3 ?? entry.model.airDensityKgM3,
  }));

  const builds: ComparedBuild[] = models.map((model, i) => {
    const arrow = { massGr: model.arrowMassGr, speedFps: model.speedFps };
    const energy = kineticEnergy(arrow);
    const push = momentum(arrow);
    return {
      label: entries[i].label,
      speedFps: model.speedFps,
      massGr: model.arrowMassGr,
      focPct: entries[i].focPct ?? null,
      kineticEnergyJ: energy.joules,
      kineticEnergyFtLbf: energy.footPounds,
      momentumKgMps: push.kilogramMetresPerSecond,
      momentumSlugFps: push.slugFeetPerSecond,
      airDensityKgM3: model.airDensityKgM3,
      drop: orNull(() => dropBetween(model, near, far)),
      forgiveness: orNull(() => rangeForgiveness(model, at, windowMm)),
    };
  });

  const curveFrom = options.curveFrom ?? 10;
  const curveTo = options.curveTo ?? Math.max(100, distances[distances.length - 1]);
  const curveStep = options.curveStep ?? 1;
  const curveDistances: number[] = [];
  for (let distance = curveFrom; distance <= curveTo + 1e-9; distance += curveStep) curveDistances.push(Number(distance.toFixed(6)));
  const curves = models.map((model, i) => ({
    label: entries[i].label,
    points: predictMarksMm(model, curveDistances).map((markMm, k) => ({ distance: curveDistances[k], markMm: finite(sign * markMm) })),
  }));

  const marks = models.map((model) => predictMarksMm(model, distances));
  const slopes = models.map((model) => distances.map((distance) => markSlopeMmPer(model, distance)));
  const rows = distances.map((distance, k) => ({
    distance,
    marks: models.map((_, i): ComparedMark => {
      const differenceMm = marks[i][k] - marks[0][k];
      const referenceSlope = slopes[0][k];
      const flat = !(Math.abs(referenceSlope) >= FLAT_SLOPE_MM_PER_UNIT);
      return {
        markMm: finite(sign * marks[i][k]),
        slopeMmPerUnit: finite(sign * slopes[i][k]),
        differenceMm: finite(sign * differenceMm),
        differenceDistance: flat ? null : finite(differenceMm / referenceSlope),
      };
    }),
  }));

  return {
    unit,
    commonAirDensityKgM3: options.airDensityKgM3 ?? null,
    at,
    windowMm,
    near,
    far,
    builds,
    curves,
    rows,
    caution: ENERGY_CAUTION,
  };
}

/** NaN and ±Infinity become null (JSON has neither). */
function finite(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/** The result, or null when the arrow cannot make that shot (a FitInputError). */
function orNull<T>(compute: () => T): T | null {
  try {
    return compute();
  } catch (error) {
    if (isFitInputError(error)) return null;
    throw error;
  }
}
