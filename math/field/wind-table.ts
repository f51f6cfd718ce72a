import type { SightModel } from '@/math/flight/sight-model';
import { windHold } from '@/math/flight/crosswind';
import { WIND_CAUTION } from '@/math/cautions';

/**
 * A compact crosswind table for a field card: for each wind speed (5, 10 and
 * 15 mph for an archer in yards; 8, 16 and 24 km/h, the round metric
 * neighbours, for one in metres) at full value (from 3 or 9 o'clock) and each
 * distance, the drift at the target (cm and in) and the hold as a sideways pin
 * offset at the sight (mm; drift × sight radius / distance). Level shots, in
 * the model's air (give the hunt's air in the model). Winds from other hours
 * push by their cross component: half at 1, 5, 7 and 11 o'clock, 0.87 at 2, 4,
 * 8 and 10 (sin 30°, sin 60°). An estimate: wind varies along the path.
 *
 * Units: distances in model.distanceUnit; 1 mph = 0.44704 m/s exactly
 * (international mile, 1959), 1 km/h = 1/3.6 m/s.
 * Example: windTable(model, [20, 40, 60]).rows[1].cells[2] → { distance: 60, driftCm: ≈ 11.9, driftIn: ≈ 4.7, holdMm: ≈ 1.8 } (10 mph, the example bow)
 */
export interface WindTable {
  speedUnit: 'mph' | 'km/h';
  rows: {
    speed: number;
    crossMps: number;
    cells: { distance: number; driftCm: number | null; driftIn: number | null; holdMm: number | null }[];
  }[];
  caution: string;
}

/** Wind speeds of the table, by the archer's distance unit. */
export const WIND_SPEEDS = {
  yd: { unit: 'mph', speeds: [5, 10, 15], mps: 0.44704 },
  m: { unit: 'km/h', speeds: [8, 16, 24], mps: 1 / 3.6 },
} as const;

export function windTable(model: SightModel, distances: readonly number[]): WindTable {
  const scale = WIND_SPEEDS[model.distanceUnit];
  const finite = (value: number) => (Number.isFinite(value) ? value : null);
  return {
    speedUnit: scale.unit,
    rows: scale.speeds.map((speed) => {
      const crossMps = speed * scale.mps;
      return {
        speed,
        crossMps,
        cells: distances.map((distance) => {
          const hold = windHold(model, distance, crossMps);
          return { distance, driftCm: finite(hold.driftCm), driftIn: finite(hold.driftIn), holdMm: finite(hold.holdMm) };
        }),
      };
    }),
    caution: WIND_CAUTION,
  };
}
