import { Solver } from 'odex';
import ode45 from 'ode45-cash-karp';
import { dragFactorPerM } from '@/math/flight/drag-factor';
import { grainsToKg } from '@/math/units/convert';

/**
 * An independent reference for the flight: the plain equations of a point
 * mass with quadratic drag on the velocity relative to the air, in time, in
 * the world frame (x downrange, y up, z right), integrated by odex 2.0.4
 * (Hairer & Wanner's Gragg–Bulirsch–Stoer extrapolation code) or by
 * ode45-cash-karp 1.1.0 (Cash–Karp RK45), both from the npm registry at tight
 * tolerance. The crossing of the target plane x = S is found by Newton steps
 * in time from the integrated state (no code of math/flight is used, only
 * the drag factor formula, itself checked against its definition).
 *
 *   a = −k·|v − w|·(v − w) − g·ŷ,   w = (0, 0, W) the air's sideways speed
 */

const G = 9.80665;

export interface ReferenceSight {
  speedFps: number;
  dragCoefficient: number;
  peepHeightMm: number;
  sightRadiusMm: number;
  scaleZeroMm: number;
  arrowMassGr: number;
  arrowDiameterMm: number;
  airDensityKgM3: number;
}

export type ReferenceIntegrator = 'odex' | 'cash-karp';

function derivativeOf(k: number, wind: number) {
  return (y: number[]) => {
    const rz = y[5] - wind;
    const speed = Math.sqrt(y[3] * y[3] + y[4] * y[4] + rz * rz);
    return [y[3], y[4], y[5], -k * speed * y[3], -G - k * speed * y[4], -k * speed * rz];
  };
}

function advance(integrator: ReferenceIntegrator, f: (y: number[]) => number[], state: number[], timeS: number): number[] {
  if (timeS === 0) return state.slice();
  if (integrator === 'odex') {
    const solver = new Solver(6);
    solver.absoluteTolerance = 1e-12;
    solver.relativeTolerance = 1e-12;
    solver.maxSteps = 100000;
    return solver.solve((_x: number, y: number[]) => f(y), 0, state.slice(), timeS).y;
  }
  const run = ode45(
    state.slice(),
    (dydt: number[], y: number[]) => {
      const d = f(y);
      for (let i = 0; i < 6; i++) dydt[i] = d[i];
    },
    0,
    Math.min(1e-3, timeS),
    { tol: 1e-12, verbose: false },
  );
  run.steps(Infinity, timeS);
  return run.y;
}

/** State [x, y, z, vx, vy, vz] (m, m/s) where the arrow crosses x = rangeM, launched γ above the horizontal from the nock. */
export function referenceCrossing(
  sight: ReferenceSight,
  gammaRad: number,
  rangeM: number,
  crossWindMps = 0,
  integrator: ReferenceIntegrator = 'odex',
): number[] {
  const k = dragFactorPerM({
    airDensityKgM3: sight.airDensityKgM3,
    dragCoefficient: sight.dragCoefficient,
    diameterMm: sight.arrowDiameterMm,
    massGr: sight.arrowMassGr,
  });
  const v0 = sight.speedFps * 0.3048;
  const h = sight.peepHeightMm / 1000;
  const f = derivativeOf(k, crossWindMps);
  let state = [h * Math.sin(gammaRad), -h * Math.cos(gammaRad), 0, v0 * Math.cos(gammaRad), v0 * Math.sin(gammaRad), 0];
  // First guess of the time of flight: the 1-D quadratic-drag range x = ln(1 + k·v0·t)/k (Taylor §2.4), solved for t.
  const t0 = (Math.exp(k * (rangeM - state[0])) - 1) / (k * v0);
  state = advance(integrator, f, state, 0.999 * t0);
  for (let i = 0; i < 8 && Math.abs(rangeM - state[0]) > 1e-12; i++) {
    state = advance(integrator, f, state, (rangeM - state[0]) / state[3]);
  }
  return state;
}

/** The elevation (rad) that hits at height 0 (the peep's level line) at rangeM, no wind, by secant steps on the reference. */
export function referenceElevation(sight: ReferenceSight, rangeM: number, integrator: ReferenceIntegrator = 'odex'): number {
  const miss = (gamma: number) => referenceCrossing(sight, gamma, rangeM, 0, integrator)[1];
  let a = 0.01;
  let b = 0.05;
  let fa = miss(a);
  let fb = miss(b);
  for (let i = 0; i < 30 && Math.abs(fb) > 1e-11; i++) {
    const c = b - (fb * (b - a)) / (fb - fa);
    a = b;
    fa = fb;
    b = c;
    fb = miss(b);
  }
  return b;
}

/** The level mark (mm) at rangeM by the reference: s0 + R·tan γ. */
export function referenceMarkMm(sight: ReferenceSight, rangeM: number, integrator: ReferenceIntegrator = 'odex'): number {
  return sight.scaleZeroMm + sight.sightRadiusMm * Math.tan(referenceElevation(sight, rangeM, integrator));
}

/** Kept for the checks of the formula only: k by its definition, rho·Cd·(π·d²/4)/(2m). */
export function dragFactorByDefinition(sight: ReferenceSight): number {
  const d = sight.arrowDiameterMm / 1000;
  return (sight.airDensityKgM3 * sight.dragCoefficient * Math.PI * d * d) / 4 / (2 * grainsToKg(sight.arrowMassGr));
}
