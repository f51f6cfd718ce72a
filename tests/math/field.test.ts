import {
  fitSight,
  dropBetween,
  rangeForgiveness,
  fieldCard,
  airShift,
  slopeShot,
  predictMarkMm,
  missAtRange,
  shotParametersOf,
  solveElevation,
  distanceToMetres,
  buildSummary,
  withArrow,
  fitVirtualMass,
  predictBuildSpeedFps,
  SLOPE_CAUTION,
  ENERGY_CAUTION,
  FIELD_CARD_ANGLES_DEG,
  FIELD_CARD_DISTANCES,
  type SightModel,
} from '@/math';
import { TRUE_MODEL, inputWith, marksOf } from './helpers';

const g = 9.80665;
const fit = fitSight(inputWith(marksOf(TRUE_MODEL, [20, 40, 60])));
/** The same sight without drag and without peep height: the textbook projectile. */
const dragFree = (model: SightModel, speedFps = model.speedFps): SightModel => ({
  ...model,
  dragCoefficient: 0,
  peepHeightMm: 0,
  speedFps,
  covariance: undefined,
});

describe('drop between 40 and 60 yd', () => {
  it('is how far below the line of sight the arrow passes at 60 when held for 40, and the mark gap', () => {
    const drop = dropBetween(fit.model, 40, 60);
    const shot = shotParametersOf(fit.model);
    const held = solveElevation(shot, distanceToMetres(40, 'yd'), 0)!;
    expect(drop.dropMm).toBeCloseTo(-1000 * missAtRange(shot, distanceToMetres(60, 'yd'), 0, held.elevationRad).w, 9);
    expect(drop.gapMm).toBeCloseTo(predictMarkMm(fit.model, 60) - predictMarkMm(fit.model, 40), 8);
    expect(drop.dropMm).toBeGreaterThan(0);
    expect(drop.farTimeS).toBeGreaterThan(drop.nearTimeS);
    expect(() => dropBetween(fit.model, 60, 40)).toThrow(/beyond/);
  });

  it('matches the closed-form parabola without drag (any mechanics textbook: y = x·tan a − g·x²/(2v²cos²a))', () => {
    const model = { ...dragFree(fit.model), peepHeightMm: 110 };
    const drop = dropBetween(model, 40, 60);
    const speed = shotParametersOf(model).speedMps;
    const gamma = solveElevation(shotParametersOf(model), distanceToMetres(40, 'yd'), 0)!.elevationRad;
    const dx = distanceToMetres(60, 'yd') - 0.11 * Math.sin(gamma);
    const y = -0.11 * Math.cos(gamma) + dx * Math.tan(gamma) - (g * dx * dx) / (2 * speed ** 2 * Math.cos(gamma) ** 2);
    expect(drop.dropMm).toBeCloseTo(-1000 * y, 6);
  });
});

describe('range forgiveness', () => {
  it('finds the stretch of range within ±100 mm around the aimed distance', () => {
    const shot = shotParametersOf(fit.model);
    for (const distance of [20, 40, 60]) {
      const forgiveness = rangeForgiveness(fit.model, distance);
      const aim = solveElevation(shot, distanceToMetres(distance, 'yd'), 0)!.elevationRad;
      const height = (d: number) => missAtRange(shot, distanceToMetres(d, 'yd'), 0, aim).w * 1000;
      expect(forgiveness.nearEdge).toBeLessThan(distance);
      expect(forgiveness.farEdge).toBeGreaterThan(distance);
      expect(forgiveness.span).toBeCloseTo(forgiveness.farEdge - forgiveness.nearEdge, 12);
      expect(Math.abs(height(forgiveness.farEdge) + 100)).toBeLessThan(0.5);
      for (let d = forgiveness.nearEdge + 0.01; d < forgiveness.farEdge; d += (forgiveness.farEdge - forgiveness.nearEdge) / 20)
        expect(Math.abs(height(d))).toBeLessThanOrEqual(100.5);
      expect(height(forgiveness.farEdge + 0.5)).toBeLessThan(-100);
    }
    // Longer shots forgive less.
    expect(rangeForgiveness(fit.model, 60).span).toBeLessThan(rangeForgiveness(fit.model, 40).span);
  });

  it('matches the closed-form parabola without drag or peep height', () => {
    const model = dragFree(fit.model);
    const forgiveness = rangeForgiveness(model, 50, 100);
    const speed = shotParametersOf(model).speedMps;
    const gamma = solveElevation(shotParametersOf(model), distanceToMetres(50, 'yd'), 0)!.elevationRad;
    // w(x) = x·tan γ − a·x², a = g/(2v²cos²γ): the far edge solves w = −0.1 m, the near edge w = +0.1 m on the way down.
    const a = g / (2 * speed ** 2 * Math.cos(gamma) ** 2);
    const root = (c: number) => (Math.tan(gamma) + Math.sqrt(Math.tan(gamma) ** 2 + 4 * a * c)) / (2 * a);
    expect(distanceToMetres(forgiveness.farEdge, 'yd')).toBeCloseTo(root(0.1), 2);
    expect(distanceToMetres(forgiveness.nearEdge, 'yd')).toBeCloseTo(root(-0.1), 2);
    expect(forgiveness.peakAboveMm / 1000).toBeCloseTo(Math.tan(gamma) ** 2 / (4 * a), 5);
  });
});

describe('slope in the drag-free limit', () => {
  // Range along an incline of a drag-free projectile launched α above the
  // horizontal: R = 2v²·cos α·sin(α − θ)/(g·cos²θ) (S. K. Singh, "Projectile
  // motion on an incline", OpenStax CNX m14614; derived from the parabola).
  // With α = θ + γ this gives sin(2γ + θ) = g·R·cos²θ/v² + sin θ.
  const model = dragFree(fit.model, 285);
  const speed = shotParametersOf(model).speedMps;

  it.each([-40, -25, -10, 0, 10, 25, 40])('matches the inclined-plane range at %d°', (angleDeg) => {
    const theta = (angleDeg * Math.PI) / 180;
    for (const distance of [20, 45, 80]) {
      const range = distanceToMetres(distance, 'yd');
      const gamma = (Math.asin((g * range * Math.cos(theta) ** 2) / speed ** 2 + Math.sin(theta)) - theta) / 2;
      const shot = slopeShot(model, distance, angleDeg);
      expect(shot.markMm).toBeCloseTo(model.scaleZeroMm + model.sightRadiusMm * Math.tan(gamma), 7);
    }
  });

  it('is symmetric up and down as the elevation goes to zero, where the rifleman’s rule becomes exact', () => {
    const asymmetry = (speedFps: number) => {
      const fast = dragFree(fit.model, speedFps);
      const up = slopeShot(fast, 60, 30);
      const down = slopeShot(fast, 60, -30);
      expect(up.horizontal).toBeCloseTo(down.horizontal, 12);
      // Uphill needs slightly more than the rule gives, downhill slightly less …
      expect(up.aimAsIfMinusHorizontal!).toBeGreaterThan(0);
      expect(down.aimAsIfMinusHorizontal!).toBeLessThan(0);
      return {
        // … the spread between them, relative to the distance, and …
        spread: (up.aimAsIf! - down.aimAsIf!) / up.horizontal,
        // … the imbalance between the two corrections (0 when symmetric).
        imbalance:
          (up.aimAsIfMinusHorizontal! + down.aimAsIfMinusHorizontal!) / (up.aimAsIfMinusHorizontal! - down.aimAsIfMinusHorizontal!),
      };
    };
    const slow = asymmetry(250);
    const fast = asymmetry(500);
    // Both vanish with the elevation, ∝ 1/v²: a quarter at twice the speed.
    expect(fast.spread / slow.spread).toBeCloseTo(0.25, 1);
    expect(fast.imbalance / slow.imbalance).toBeCloseTo(0.25, 1);
    expect(Math.abs(fast.imbalance)).toBeLessThan(0.02);
  });
});

describe('field card', () => {
  it('tabulates mark, aim-as-if, horizontal and difference for −40°…+40° and each slant range', () => {
    const card = fieldCard(fit.model);
    expect(card.anglesDeg).toEqual(FIELD_CARD_ANGLES_DEG);
    expect(card.rows).toHaveLength(FIELD_CARD_ANGLES_DEG.length * FIELD_CARD_DISTANCES.length);
    expect(card.caution).toBe(SLOPE_CAUTION);
    for (const row of card.rows) {
      expect(row.markMm).toBeCloseTo(predictMarkMm(fit.model, row.distance, row.angleDeg), 9);
      if (row.angleDeg === 0) expect(row.aimAsIf!).toBeCloseTo(row.distance, 3);
      expect(row.markMm).toBeLessThanOrEqual(predictMarkMm(fit.model, row.distance) + 1e-9);
    }
    expect(() => fieldCard(fit.model, { anglesDeg: [70] })).toThrow(/angle/);
  });
});

describe('altitude and temperature shift', () => {
  const distances = [20, 40, 60, 80, 100];

  it('is zero in the air of the sight-in', () => {
    const same = airShift(fit.model, { altitudeM: 0 }, distances);
    same.rows.forEach((row) => expect(Math.abs(row.shiftMm)).toBeLessThan(1e-9));
  });

  it('moves long marks up the scale in thinner air and down in denser air, more with distance', () => {
    const high = airShift(fit.model, { altitudeM: 3000 }, distances);
    expect(high.airDensityKgM3).toBeLessThan(high.sightInAirDensityKgM3);
    high.rows.forEach((row) => expect(row.shiftMm).toBeLessThan(0));
    high.rows.slice(1).forEach((row, i) => expect(row.shiftMm).toBeLessThan(high.rows[i].shiftMm));
    const cold = airShift(fit.model, { altitudeM: 0, temperatureC: -20 }, distances);
    cold.rows.forEach((row) => expect(row.shiftMm).toBeGreaterThan(0));
    expect(high.caution).toBe(SLOPE_CAUTION);
  });
});

describe('build comparison', () => {
  it('puts a heavier, slower build on the same sight: more drop, less forgiveness, more momentum', () => {
    const bow = fitVirtualMass([
      { massGr: 420, speedFps: 285 },
      { massGr: 350, speedFps: 309 },
    ]);
    const heavy = withArrow(fit.model, { massGr: 520, diameterMm: 6.5, speedFps: predictBuildSpeedFps(bow, 520) });
    const light = buildSummary(fit.model);
    const heavier = buildSummary(heavy);
    expect(heavier.speedFps).toBeLessThan(light.speedFps);
    expect(heavier.drop.dropMm).toBeGreaterThan(light.drop.dropMm);
    expect(heavier.forgiveness.span).toBeLessThan(light.forgiveness.span);
    expect(heavier.momentumKgMps).toBeGreaterThan(light.momentumKgMps);
    expect(heavier.caution).toBe(ENERGY_CAUTION);
    expect(heavy.covariance).toBeUndefined(); // the fit's bands do not carry over to another arrow
  });
});
