import { integrateToRange, missAtRange, solveElevation, dragFactorPerM, type ShotParameters } from '@/math/flight';
import { brentRoot } from '@/math/numeric';

const g = 9.80665;

describe('flight, drag-free limit', () => {
  // Closed form: y = x·tan a − g·x²/(2·v0²·cos²a), range v0²·sin(2a)/g
  // (any mechanics textbook; e.g. Boston University PY211 projectile notes).
  it.each([
    [60, 0.05, 30],
    [87, 0.02, 91.44],
    [45, 0.6, 150],
  ])('matches y(x) of the closed-form trajectory (v0 %d m/s, a %f rad, x %d m)', (v0, angle, x) => {
    const crossing = integrateToRange(
      { u: 0, w: 0, vu: v0 * Math.cos(angle), vw: v0 * Math.sin(angle) },
      { dragPerM: 0, gravityMps2: g, losAngleRad: 0 },
      x,
    );
    const closed = x * Math.tan(angle) - (g * x * x) / (2 * v0 * v0 * Math.cos(angle) ** 2);
    expect(Math.abs(crossing.w - closed)).toBeLessThan(1e-9);
    expect(crossing.timeS).toBeCloseTo(x / (v0 * Math.cos(angle)), 10);
    expect(crossing.vu).toBeCloseTo(v0 * Math.cos(angle), 12);
  });

  it('lands at the closed-form range v0²·sin(2a)/g', () => {
    const v0 = 40;
    const angle = 0.5;
    const range = (v0 * v0 * Math.sin(2 * angle)) / g;
    const crossing = integrateToRange(
      { u: 0, w: 0, vu: v0 * Math.cos(angle), vw: v0 * Math.sin(angle) },
      { dragPerM: 0, gravityMps2: g, losAngleRad: 0 },
      range,
    );
    expect(Math.abs(crossing.w)).toBeLessThan(1e-9);
    expect(crossing.vw).toBeCloseTo(-v0 * Math.sin(angle), 8); // symmetric flight
  });

  it('solves the level elevation that the closed form gives, from the nock below the peep', () => {
    const shot: ShotParameters = { speedMps: 86.868, dragPerM: 0, peepHeightM: 0.11, gravityMps2: g };
    for (const range of [9.144, 18.288, 54.864, 91.44]) {
      // The nock starts at (h·sin γ, −h·cos γ); the drag-free flight from there crosses x = S at
      // y = −h·cos γ + (S − h·sin γ)·tan γ − g·(S − h·sin γ)²/(2·v0²·cos²γ).
      const closed = (gamma: number) => {
        const dx = range - 0.11 * Math.sin(gamma);
        return -0.11 * Math.cos(gamma) + dx * Math.tan(gamma) - (g * dx * dx) / (2 * shot.speedMps ** 2 * Math.cos(gamma) ** 2);
      };
      const expected = brentRoot(closed, 0, 0.3, 1e-15);
      const solution = solveElevation(shot, range, 0);
      expect(solution).not.toBeNull();
      expect(Math.abs(solution!.elevationRad - expected)).toBeLessThan(1e-11);
      // And the small-angle intuition tan γ ≈ h/S + g·S/(2v²) holds to a fraction of a per cent.
      const approximate = Math.atan(0.11 / range + (g * range) / (2 * shot.speedMps ** 2));
      expect(Math.abs(solution!.elevationRad / approximate - 1)).toBeLessThan(0.01);
      expect(Math.abs(missAtRange(shot, range, 0, solution!.elevationRad).w)).toBeLessThan(1e-9);
    }
  });
});

describe('flight, quadratic drag without gravity (1-D)', () => {
  // Closed form (Taylor, Classical Mechanics, §2.4): v = v0/(1 + k·v0·t), x = ln(1 + k·v0·t)/k.
  const k = 0.0011462764741461517;
  const v0 = 60;

  it('reproduces the worked case: x = 69.18283393373932 m at t = 1.2 s, v = 55.42561809011685 m/s', () => {
    const crossing = integrateToRange({ u: 0, w: 0, vu: v0, vw: 0 }, { dragPerM: k, gravityMps2: 0, losAngleRad: 0 }, 69.18283393373932);
    expect(Math.abs(crossing.timeS - 1.2)).toBeLessThan(1e-10);
    expect(Math.abs(crossing.vu - 55.42561809011685)).toBeLessThan(1e-9);
    expect(crossing.w).toBe(0);
    expect(crossing.vw).toBe(0);
  });

  it.each([10, 50, 120, 300])('matches v(x) = v0·exp(−k·x) and t(x) at x = %d m', (x) => {
    const crossing = integrateToRange({ u: 0, w: 0, vu: v0, vw: 0 }, { dragPerM: k, gravityMps2: 0, losAngleRad: 0 }, x);
    const t = (Math.exp(k * x) - 1) / (k * v0); // inverting x(t)
    expect(Math.abs(crossing.vu - v0 / (1 + k * v0 * t))).toBeLessThan(1e-9);
    // 1 ns of flight time is under 0.1 µm of travel at these speeds.
    expect(Math.abs(crossing.timeS - t)).toBeLessThan(1e-9);
  });

  it('computes the drag factor k = rho·Cd·A/(2m)', () => {
    const k420 = dragFactorPerM({ airDensityKgM3: 1.225, dragCoefficient: 2, diameterMm: 6.5, massGr: 420 });
    expect(k420).toBeCloseTo((1.225 * 2 * Math.PI * 0.0065 ** 2) / 4 / (2 * 420 * 64.79891e-6), 15);
  });
});

describe('flight, edge cases', () => {
  it('reports a flight that stalls before the target, and a target out of reach', () => {
    const crossing = integrateToRange({ u: 0, w: 0, vu: 20, vw: 0 }, { dragPerM: 0, gravityMps2: g, losAngleRad: 1.0 }, 120);
    expect(Number.isNaN(crossing.w)).toBe(true);
    const slow: ShotParameters = { speedMps: 36, dragPerM: 0.0015, peepHeightM: 0.11, gravityMps2: g };
    expect(solveElevation(slow, 137, 0)).toBeNull();
    expect(solveElevation(slow, 120, 0.78)).toBeNull();
  });
});
