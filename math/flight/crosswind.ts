import { distanceToMetres } from '@/math/units/convert';
import { shotParametersOf, type SightModel } from '@/math/flight/sight-model';
import { solveElevation } from '@/math/flight/solve-elevation';
import { DEFAULT_STEP_M, MIN_STEPS } from '@/math/flight/integrate-to-range';

/**
 * Sideways drift of an arrow in a steady crosswind, on a level shot.
 *
 * Model (3-D point mass, the same drag law as the 2-D flight): the air moves
 * sideways at a steady speed W (the cross component of the wind); the drag
 * acts on the velocity relative to the air, v_r = (vx, vy, vz − W):
 *   a = −k·|v_r|·v_r − g·ŷ,   k = rho·Cd·A/(2m)
 * x downrange, y up, z to the archer's right. The archer aims as for no wind
 * (the level mark solved by solveElevation), launches from the nock with no
 * sideways velocity, and the drift is z where the arrow crosses x = S.
 * Integrated like integrate-to-range.ts: x as the independent variable,
 * classical RK4, the same step rule. No wind, or no drag, gives no drift
 * (without drag the air cannot push the arrow). The head or tail component of
 * the wind is left out: it changes the drop by far less than a mark's band.
 *
 * Clock directions (the wind comes FROM that hour; 12 o'clock from the target):
 * the cross component is W·sin(30°·hour) toward the archer's left for winds
 * from the right (1–5 o'clock), toward the right for winds from the left
 * (7–11): full at 3 and 9, half at 1, 5, 7 and 11, 0.87 at 2, 4, 8 and 10.
 *
 * The hold: aim the drift into the wind at the target; at the sight that is a
 * sideways pin offset of drift × R / S (similar triangles, peep to pin R,
 * peep to target S).
 *
 * Units: distance in model.distanceUnit, wind m/s, drift m (+ right).
 * Example: crosswindDriftM(model, 60, 4.4704) → ≈ 0.11 m (285 fps, 420 gr, 6.5 mm, Cd 2, 10 mph from 9 o'clock)
 */

/** The cross component (m/s, + blowing toward the archer's right) of a wind of `speedMps` from `clockHour` (12: from the target). Example: crossComponentMps(10, 9) → 10; crossComponentMps(10, 2) → −8.66 */
export function crossComponentMps(speedMps: number, clockHour: number): number {
  // From 3 o'clock (the right) the air moves left: −sin(90°).
  const value = -speedMps * Math.sin((clockHour * Math.PI) / 6);
  // Numeric care: sin(π) is 1.2e-16, not 0; a wind from 12 or 6 has no cross component.
  return Math.abs(value) < 1e-12 * Math.max(1, Math.abs(speedMps)) ? 0 : value;
}

/** The drift at the target (m, + right) of a level shot at `distance` in a cross wind of `crossMps` (+ toward the right). NaN if out of reach. */
export function crosswindDriftM(model: SightModel, distance: number, crossMps: number): number {
  const rangeM = distanceToMetres(distance, model.distanceUnit);
  const shot = shotParametersOf(model);
  const solution = solveElevation(shot, rangeM, 0);
  if (!solution) return NaN;
  const gamma = solution.elevationRad;
  return integrateDrift(
    {
      x: shot.peepHeightM * Math.sin(gamma),
      y: -shot.peepHeightM * Math.cos(gamma),
      vx: shot.speedMps * Math.cos(gamma),
      vy: shot.speedMps * Math.sin(gamma),
    },
    shot.dragPerM,
    shot.gravityMps2,
    crossMps,
    rangeM,
  );
}

/** A crosswind figure for one distance: drift at the target (cm, in) and the hold at the sight (mm). */
export interface WindHold {
  distance: number;
  crossMps: number;
  driftCm: number;
  driftIn: number;
  /** Sideways pin offset at the sight: drift × sight radius / distance, mm. */
  holdMm: number;
}

/** Drift and hold for a level shot at `distance` in a cross wind (m/s, + toward the right). */
export function windHold(model: SightModel, distance: number, crossMps: number): WindHold {
  const driftM = crosswindDriftM(model, distance, crossMps);
  const rangeM = distanceToMetres(distance, model.distanceUnit);
  return {
    distance,
    crossMps,
    driftCm: driftM * 100,
    driftIn: (driftM * 1000) / 25.4,
    holdMm: (driftM * model.sightRadiusMm) / rangeM,
  };
}

function integrateDrift(
  start: { x: number; y: number; vx: number; vy: number },
  k: number,
  g: number,
  wind: number,
  rangeM: number,
): number {
  const count = Math.max(MIN_STEPS, Math.ceil(Math.abs(rangeM) / DEFAULT_STEP_M));
  const dx = (rangeM - start.x) / count;
  // State: y, z, vx, vy, vz; derivatives with respect to x.
  let s = [start.y, 0, start.vx, start.vy, 0];
  const derivative = (state: number[]): number[] => {
    const [, , vx, vy, vz] = state;
    const rz = vz - wind;
    const relative = Math.sqrt(vx * vx + vy * vy + rz * rz);
    const inv = 1 / vx;
    return [vy * inv, vz * inv, -k * relative, (-k * relative * vy - g) * inv, -k * relative * rz * inv];
  };
  const add = (a: number[], b: number[], h: number) => a.map((value, i) => value + h * b[i]);
  for (let i = 0; i < count; i++) {
    const k1 = derivative(s);
    const k2 = derivative(add(s, k1, dx / 2));
    const k3 = derivative(add(s, k2, dx / 2));
    const k4 = derivative(add(s, k3, dx));
    s = s.map((value, j) => value + (dx / 6) * (k1[j] + 2 * k2[j] + 2 * k3[j] + k4[j]));
    if (!(s[2] > 0)) return NaN;
  }
  return s[1];
}
