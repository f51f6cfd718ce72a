import { Solver } from 'odex';
import ode45 from 'ode45-cash-karp';
import { integrateToRange, missAtRange, solveElevation, dragFactorPerM, type ShotParameters } from '@/math/flight';

// References: two independent adaptive integrators from the npm registry,
// odex 2.0.4 (Hairer & Wanner's Gragg–Bulirsch–Stoer extrapolation code) and
// ode45-cash-karp 1.1.0 (Cash–Karp RK45), both run in time in the world frame
// on the plain equations a = −k·v·velocity − g·ŷ.
const g = 9.80665;
const k = dragFactorPerM({ airDensityKgM3: 1.225, dragCoefficient: 2, diameterMm: 6.5, massGr: 420 });
const derivative = (x: number, y: number[]) => {
  const speed = Math.hypot(y[2], y[3]);
  return [y[2], y[3], -k * speed * y[2], -g - k * speed * y[3]];
};

function odexAt(state: number[], timeS: number): number[] {
  const solver = new Solver(4);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.maxSteps = 100000;
  return solver.solve(derivative, 0, state, timeS).y;
}

function cashKarpAt(state: number[], timeS: number): number[] {
  const integrator = ode45(
    state.slice(),
    (dydt: number[], y: number[], t: number) => {
      const d = derivative(t, y);
      for (let i = 0; i < 4; i++) dydt[i] = d[i];
    },
    0,
    1e-4,
    { tol: 1e-12, verbose: false },
  );
  integrator.steps(Infinity, timeS);
  return integrator.y;
}

/** The launch of a shot in both frames: LOS frame for our integrator, world frame for the references. */
function launch(shot: ShotParameters, theta: number, gamma: number) {
  const los = {
    u: shot.peepHeightM * Math.sin(gamma),
    w: -shot.peepHeightM * Math.cos(gamma),
    vu: shot.speedMps * Math.cos(gamma),
    vw: shot.speedMps * Math.sin(gamma),
  };
  const rotate = (a: number, b: number) => [a * Math.cos(theta) - b * Math.sin(theta), a * Math.sin(theta) + b * Math.cos(theta)];
  return { los, world: [...rotate(los.u, los.w), ...rotate(los.vu, los.vw)] };
}

const toLos = (world: number[], theta: number) => ({
  u: world[0] * Math.cos(theta) + world[1] * Math.sin(theta),
  w: -world[0] * Math.sin(theta) + world[1] * Math.cos(theta),
});

const shot: ShotParameters = { speedMps: 86.868, dragPerM: k, peepHeightM: 0.11, gravityMps2: g };
const cases: [number, number, number][] = [];
for (const theta of [0, 0.52, -0.52, -0.78])
  for (const range of [9.144, 54.864, 91.44, 137.16]) cases.push([theta, range, 0.02 + range * 0.0005]);

describe('2-D flight against independent integrators', () => {
  it.each(cases)('θ %f rad, S %f m: position at our time of flight matches odex and ode45-cash-karp to 1e-6 m', (theta, range, gamma) => {
    const { los, world } = launch(shot, theta, gamma);
    const ours = integrateToRange(los, { dragPerM: k, gravityMps2: g, losAngleRad: theta }, range);
    for (const reference of [odexAt(world, ours.timeS), cashKarpAt(world, ours.timeS)]) {
      const position = toLos(reference, theta);
      expect(Math.abs(position.u - range)).toBeLessThan(1e-6);
      expect(Math.abs(position.w - ours.w)).toBeLessThan(1e-6);
      const velocity = toLos([reference[2], reference[3]], theta);
      expect(Math.abs(velocity.u - ours.vu)).toBeLessThan(1e-6);
      expect(Math.abs(velocity.w - ours.vw)).toBeLessThan(1e-6);
    }
  });

  it.each(cases)('θ %f rad, S %f m: the step error in the solved mark is far below 0.01 mm', (theta, range) => {
    const solution = solveElevation(shot, range, theta)!;
    const { world } = launch(shot, theta, solution.elevationRad);
    const reference = odexAt(world, solution.crossing.timeS);
    const position = toLos(reference, theta);
    // The reference's miss where it crosses u = S (first-order step from its position at our time).
    const velocity = toLos([reference[2], reference[3]], theta);
    const referenceMiss = position.w + ((range - position.u) * velocity.w) / velocity.u;
    const dMissDElevation = (missAtRange(shot, range, theta, solution.elevationRad + 1e-7).w - solution.crossing.w) / 1e-7;
    const markErrorMm = (820 * Math.abs(referenceMiss / dMissDElevation)) / Math.cos(solution.elevationRad) ** 2;
    expect(markErrorMm).toBeLessThan(1e-4);
  });
});
