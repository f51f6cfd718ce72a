import { crossComponentMps, crosswindDriftM, solveElevation, shotParametersOf, windHold } from '@/math';
import { referenceCrossing } from './reference-flight';
import { TRUE_MODEL } from './helpers';

// 1 mph = 0.44704 m/s exactly (international mile 1609.344 m / 3600 s).
const MPH = 0.44704;
const yd = (distance: number) => distance * 0.9144;

describe('crosswind drift', () => {
  it('is zero with no wind, and in the drag-free limit', () => {
    expect(crosswindDriftM(TRUE_MODEL, 60, 0)).toBe(0);
    expect(crosswindDriftM({ ...TRUE_MODEL, dragCoefficient: 0 }, 60, 10 * MPH)).toBe(0);
    // Toward the limit the drift falls in proportion to the drag.
    const full = crosswindDriftM(TRUE_MODEL, 60, 10 * MPH);
    const tiny = crosswindDriftM({ ...TRUE_MODEL, dragCoefficient: 0.002 }, 60, 10 * MPH);
    expect(Math.abs(tiny)).toBeLessThan(Math.abs(full) / 500);
  });

  it('grows with distance and with wind speed', () => {
    const drifts = [20, 30, 40, 50, 60, 80, 100].map((distance) => crosswindDriftM(TRUE_MODEL, distance, 10 * MPH));
    for (let i = 1; i < drifts.length; i++) expect(drifts[i]).toBeGreaterThan(drifts[i - 1]);
    const bySpeed = [5, 10, 15].map((mph) => crosswindDriftM(TRUE_MODEL, 50, mph * MPH));
    expect(bySpeed[1]).toBeGreaterThan(bySpeed[0]);
    expect(bySpeed[2]).toBeGreaterThan(bySpeed[1]);
    // Nearly linear in the wind (the wind is small against the arrow's speed).
    expect(bySpeed[2] / bySpeed[0]).toBeCloseTo(3, 1);
  });

  it('changes sign with the wind direction; clock hours give their cross component', () => {
    const fromLeft = crosswindDriftM(TRUE_MODEL, 50, crossComponentMps(10 * MPH, 9));
    const fromRight = crosswindDriftM(TRUE_MODEL, 50, crossComponentMps(10 * MPH, 3));
    expect(fromLeft).toBeGreaterThan(0); // from 9 o'clock (the left) the arrow drifts right
    expect(fromRight).toBeCloseTo(-fromLeft, 9);
    expect(crossComponentMps(10, 9)).toBeCloseTo(10, 12);
    expect(crossComponentMps(10, 3)).toBeCloseTo(-10, 12);
    expect(crossComponentMps(10, 12)).toBe(0);
    expect(crossComponentMps(10, 6)).toBe(0);
    expect(crossComponentMps(10, 1)).toBeCloseTo(-5, 12); // sin 30° = 1/2
    expect(crossComponentMps(10, 10)).toBeCloseTo((10 * Math.sqrt(3)) / 2, 12); // sin 60°
  });

  it.each([
    [20, 5],
    [40, 10],
    [60, 10],
    [60, -15],
    [100, 15],
  ])('at %i yd in %i mph matches an independent 3-D integration (odex and ode45-cash-karp) to 0.1 mm at the target', (distance, mph) => {
    const ours = crosswindDriftM(TRUE_MODEL, distance, mph * MPH);
    // The same aim: our solved level elevation, checked to hit by our own flight.
    const gamma = solveElevation(shotParametersOf(TRUE_MODEL), yd(distance), 0)!.elevationRad;
    for (const integrator of ['odex', 'cash-karp'] as const) {
      const reference = referenceCrossing(TRUE_MODEL, gamma, yd(distance), mph * MPH, integrator);
      expect(Math.abs(reference[2] - ours)).toBeLessThan(1e-4);
    }
  });

  it('the hold at the sight is the drift scaled by sight radius over distance, in cm, in and mm', () => {
    const hold = windHold(TRUE_MODEL, 60, 10 * MPH);
    const drift = crosswindDriftM(TRUE_MODEL, 60, 10 * MPH);
    expect(hold.driftCm).toBeCloseTo(drift * 100, 9);
    expect(hold.driftIn).toBeCloseTo((drift * 1000) / 25.4, 9); // 1 in = 25.4 mm exactly
    expect(hold.holdMm).toBeCloseTo((drift * 820) / yd(60), 9);
    // For scale: 10 mph full value at 60 yd moves this 285 fps, 420 gr arrow about 12 cm (measured, both integrators).
    expect(hold.driftCm).toBeGreaterThan(10);
    expect(hold.driftCm).toBeLessThan(14);
  });
});
