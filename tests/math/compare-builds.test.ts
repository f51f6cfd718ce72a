import {
  compareBuilds,
  markSlopeMmPer,
  predictMarkMm,
  predictMarksMm,
  kineticEnergy,
  momentum,
  airDensityKgM3,
  brentRoot,
  FitInputError,
  ENERGY_CAUTION,
  type SightModel,
} from '@/math';
import { TRUE_MODEL } from './helpers';

const g = 9.80665;
const YARD_M = 0.9144; // exact (international yard and pound, 1959)

/** The same sight without drag or peep height: the textbook projectile. */
const dragFree = (model: SightModel): SightModel => ({ ...model, dragCoefficient: 0, peepHeightMm: 0, covariance: undefined });
/** A second build on the same sight: heavier and slower (invented). */
const heavier: SightModel = { ...TRUE_MODEL, arrowMassGr: 520, speedFps: 262 };

describe('local slope of the mark curve', () => {
  it('matches the derivative of the drag-free level range without peep height', () => {
    // Drag-free level range S = v²·sin(2γ)/g (any mechanics textbook, e.g. Boston University PY211 notes on projectile motion),
    // so γ = ½·asin(g·S/v²) and d(mark)/dS = R·sec²γ · dγ/dS = R·sec²γ · g/(2·v²·cos 2γ) per metre.
    const model = dragFree(TRUE_MODEL);
    const speed = TRUE_MODEL.speedFps * 0.3048;
    for (const distance of [20, 40, 70, 100]) {
      const rangeM = distance * YARD_M;
      const gamma = 0.5 * Math.asin((g * rangeM) / speed ** 2);
      const perMetre = (model.sightRadiusMm / Math.cos(gamma) ** 2) * (g / (2 * speed ** 2 * Math.cos(2 * gamma)));
      expect(markSlopeMmPer(model, distance)).toBeCloseTo(perMetre * YARD_M, 6);
    }
  });

  it('is nearly flat at the short-range turning point and positive beyond it (with peep height and drag)', () => {
    // Turning point of tan γ ≈ h/S + g·S/(2v²): S = v·√(2h/g) ≈ 13 m ≈ 14 yd for 285 fps and 110 mm.
    const turningYd = (285 * 0.3048 * Math.sqrt((2 * 0.11) / g)) / YARD_M;
    expect(Math.abs(markSlopeMmPer(TRUE_MODEL, turningYd))).toBeLessThan(0.02);
    expect(markSlopeMmPer(TRUE_MODEL, 10)).toBeLessThan(0);
    expect(markSlopeMmPer(TRUE_MODEL, 30)).toBeGreaterThan(0);
  });
});

describe('compareBuilds', () => {
  it('tabulates each build’s marks, the difference from the first in mm, and in distance along the first build’s tape', () => {
    const result = compareBuilds([
      { label: 'Light', model: TRUE_MODEL, focPct: 11.2 },
      { label: 'Heavy', model: heavier, focPct: null },
    ]);
    expect(result.rows.map((row) => row.distance)).toEqual([20, 30, 40, 50, 60, 70, 80]);
    for (const row of result.rows) {
      const [reference, other] = row.marks;
      // Numeric care: warm-started and cold solves agree to about 1e-9 mm; 1e-6 mm is far below print.
      expect(reference.markMm!).toBeCloseTo(predictMarkMm(TRUE_MODEL, row.distance), 6);
      expect(other.markMm!).toBeCloseTo(predictMarkMm(heavier, row.distance), 6);
      expect(reference.differenceMm).toBe(0);
      expect(reference.differenceDistance).toBe(0);
      expect(other.differenceMm!).toBeCloseTo(other.markMm! - reference.markMm!, 12);
      expect(other.differenceDistance!).toBeCloseTo(other.differenceMm! / reference.slopeMmPerUnit!, 12);
      expect(other.differenceDistance!).toBeGreaterThan(0);
    }
    expect(result.curves.map((curve) => curve.label)).toEqual(['Light', 'Heavy']);
    expect(result.curves[1].points).toHaveLength(91);
    expect(result.curves[1].points[30].markMm!).toBeCloseTo(predictMarkMm(heavier, 40), 6);
    expect(result.builds[0].focPct).toBe(11.2);
    expect(result.builds[1].focPct).toBeNull();
    expect(result.caution).toBe(ENERGY_CAUTION);
  });

  it('turns a small difference into distance to first order: close to where the reference tape has that mark', () => {
    const close: SightModel = { ...TRUE_MODEL, speedFps: 281 };
    const result = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: close },
      ],
      { distances: [30, 50, 70] },
    );
    for (const row of result.rows) {
      const wanted = predictMarkMm(close, row.distance);
      // Exactly: the reference distance whose mark is this build's mark.
      const exact =
        brentRoot((distance) => predictMarkMm(TRUE_MODEL, distance) - wanted, row.distance, row.distance + 10, 1e-9) - row.distance;
      expect(exact).toBeGreaterThan(0.2);
      expect(Math.abs(row.marks[1].differenceDistance! - exact)).toBeLessThan(0.02 * exact);
    }
  });

  it('gives no distance figure near the turning point, where the reference curve is flat', () => {
    const turningYd = (285 * 0.3048 * Math.sqrt((2 * 0.11) / g)) / YARD_M;
    const result = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: heavier },
      ],
      { distances: [turningYd] },
    );
    expect(result.rows[0].marks[1].differenceMm!).toBeGreaterThan(0);
    expect(result.rows[0].marks[1].differenceDistance).toBeNull();
  });

  it('gives exact energy and momentum, drop and forgiveness per build, null where the arrow cannot reach', () => {
    const slow: SightModel = { ...TRUE_MODEL, speedFps: 125 };
    const result = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'Slow', model: slow },
      ],
      { at: 60, near: 60, far: 150, windowMm: 50 },
    );
    const [fast, crawl] = result.builds;
    expect(fast.kineticEnergyJ).toBeCloseTo(kineticEnergy({ massGr: 420, speedFps: 285 }).joules, 12);
    expect(fast.momentumSlugFps).toBeCloseTo(momentum({ massGr: 420, speedFps: 285 }).slugFeetPerSecond, 12);
    expect(fast.drop).toMatchObject({ near: 60, far: 150 });
    expect(fast.forgiveness).toMatchObject({ distance: 60, windowMm: 50 });
    expect(crawl.drop).toBeNull();
    expect(result.rows.find((row) => row.distance === 60)!.marks[1].markMm).not.toBeNull();
  });

  it('evaluates every build in one air when asked, each in its own otherwise', () => {
    const highSightIn: SightModel = { ...heavier, airDensityKgM3: airDensityKgM3({ altitudeM: 2280, temperatureC: -2 }) };
    const at60 = (result: ReturnType<typeof compareBuilds>) => result.rows.find((row) => row.distance === 60)!.marks[1].markMm!;
    const own = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: highSightIn },
      ],
      { distances: [60] },
    );
    expect(own.commonAirDensityKgM3).toBeNull();
    expect(own.builds.map((build) => build.airDensityKgM3)).toEqual([TRUE_MODEL.airDensityKgM3, highSightIn.airDensityKgM3]);
    expect(at60(own)).toBeCloseTo(predictMarkMm(highSightIn, 60), 6);
    const sea = airDensityKgM3({ altitudeM: 0 });
    const common = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: highSightIn },
      ],
      { distances: [60], airDensityKgM3: sea },
    );
    expect(common.commonAirDensityKgM3).toBe(sea);
    expect(common.builds[1].airDensityKgM3).toBe(sea);
    expect(at60(common)).toBeCloseTo(predictMarkMm({ ...highSightIn, airDensityKgM3: sea }, 60), 6);
    // Denser air, more drag: the long mark moves down the scale.
    expect(at60(common)).toBeGreaterThan(at60(own));
  });

  it('reads distances in the unit asked and marks as an upward-growing scale reads them', () => {
    // (40 is also the default forgiveness distance, so the table has that one row.)
    const metres = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: heavier },
      ],
      { unit: 'm', distances: [40], scaleSign: -1 },
    );
    expect(metres.rows).toHaveLength(1);
    expect(metres.unit).toBe('m');
    const [markA, markB] = [TRUE_MODEL, heavier].map((model) => predictMarksMm({ ...model, distanceUnit: 'm' }, [40])[0]);
    expect(metres.rows[0].marks[0].markMm!).toBeCloseTo(-markA, 9);
    expect(metres.rows[0].marks[1].differenceMm!).toBeCloseTo(-(markB - markA), 9);
    // The distance figure does not depend on which way the scale grows.
    const down = compareBuilds(
      [
        { label: 'A', model: TRUE_MODEL },
        { label: 'B', model: heavier },
      ],
      { unit: 'm', distances: [40] },
    );
    expect(metres.rows[0].marks[1].differenceDistance!).toBeCloseTo(down.rows[0].marks[1].differenceDistance!, 12);
  });

  it('refuses fewer than two builds, more than four, and distances out of range', () => {
    expect(() => compareBuilds([{ label: 'A', model: TRUE_MODEL }])).toThrow(FitInputError);
    expect(() => compareBuilds(Array.from({ length: 5 }, (_, i) => ({ label: String(i), model: TRUE_MODEL })))).toThrow(/at most four/);
    expect(() =>
      compareBuilds(
        [
          { label: 'A', model: TRUE_MODEL },
          { label: 'B', model: heavier },
        ],
        { distances: [200] },
      ),
    ).toThrow(/between 5 and 150/);
  });
});
