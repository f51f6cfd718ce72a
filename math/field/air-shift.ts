import { airDensityKgM3, type AirConditions } from '@/math/air/standard-atmosphere';
import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';
import { SLOPE_CAUTION } from '@/math/cautions';

/**
 * How each mark shifts in other air (a hunt at altitude, a cold morning)
 * against the air of the sight-in: the drag factor scales with air density,
 * k = rho·Cd·A/(2m), everything else held (the fitted drag coefficient and
 * launch speed). Thinner air means less drag, so long marks move up the
 * scale (a negative shift). Zero at the sight-in air. An estimate: confirm on
 * real terrain.
 *
 * Units: distances in model.distanceUnit, marks and shifts mm.
 * Example: airShift(model, { altitudeM: 3000, temperatureC: 0 }, [20, 60, 100]).rows.map(r => r.shiftMm) → [−0.049, −0.465, −1.368]
 */
export interface AirShift {
  airDensityKgM3: number;
  sightInAirDensityKgM3: number;
  rows: { distance: number; sightInMarkMm: number; markMm: number; shiftMm: number }[];
  caution: string;
}

export function airShift(model: SightModel, air: AirConditions, distances: readonly number[]): AirShift {
  const density = airDensityKgM3(air);
  const sightIn = predictMarksMm(model, distances);
  const there = predictMarksMm({ ...model, airDensityKgM3: density }, distances);
  return {
    airDensityKgM3: density,
    sightInAirDensityKgM3: model.airDensityKgM3,
    rows: distances.map((distance, i) => ({ distance, sightInMarkMm: sightIn[i], markMm: there[i], shiftMm: there[i] - sightIn[i] })),
    caution: SLOPE_CAUTION,
  };
}
