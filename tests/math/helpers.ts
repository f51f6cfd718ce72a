import type { FitInput } from '@/shared/fit';
import { airDensityKgM3 } from '@/math/air/standard-atmosphere';
import { predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';

/**
 * Shared set-up for the math tests: an invented bow and arrow (no real
 * product), a "true" model to make marks from, and a seeded random generator.
 */

/** The bow and arrow of the worked example: R 820 mm, h 110 mm, 420 gr, 6.5 mm, 285 fps, Cd 2.0, sea level. */
export const TRUE_MODEL: SightModel = {
  distanceUnit: 'yd',
  speedFps: 285,
  dragCoefficient: 2.0,
  airDensityKgM3: airDensityKgM3({ altitudeM: 0 }),
  arrowMassGr: 420,
  arrowDiameterMm: 6.5,
  peepHeightMm: 110,
  sightRadiusMm: 820,
  scaleZeroMm: 1.5,
  gravityMps2: 9.80665,
};

/** Marks the true model gives at `distances` (plus optional per-mark errors, mm). */
export function marksOf(model: SightModel, distances: number[], errorsMm: number[] = []): { distance: number; markMm: number }[] {
  const marks = predictMarksMm(model, distances);
  return distances.map((distance, i) => ({ distance, markMm: marks[i] + (errorsMm[i] ?? 0) }));
}

/** A fit input for the true model's bow with the given marks and arrow/sight overrides. */
export function inputWith(marks: { distance: number; markMm: number }[], overrides: Partial<FitInput> = {}): FitInput {
  return {
    distanceUnit: 'yd',
    sight: { radiusMm: 820, peepHeightMm: 110 },
    arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2.0 },
    air: { altitudeM: 0 },
    marks,
    ...overrides,
  };
}

/**
 * Deterministic uniform numbers in [0, 1): mulberry32 (a public-domain 32-bit
 * generator by Tommy Ettinger), so noisy-mark tests are repeatable.
 */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
