import { integrateToRange, type RangeCrossing } from '@/math/flight/integrate-to-range';

/**
 * The launch elevation that puts the arrow on a target at slant range S along a
 * line of sight at angle θ.
 *
 * Geometry (origin at the peep, u along the line of sight, w perpendicular):
 * the arrow points γ above the line of sight and leaves from the nock, which is
 * the peep height h below the peep, perpendicular to the arrow:
 *   start = (h·sin γ, −h·cos γ),  velocity = v0·(cos γ, sin γ)
 * It hits when its height above the line of sight is zero where it crosses
 * u = S. That miss distance rises monotonically with γ over the useful range,
 * so a bracketed secant search converges in three or four flights.
 *
 * Example: solveElevation({ speedMps: 86.868, dragPerM: 0.0014937, peepHeightM: 0.11, gravityMps2: 9.80665 }, 18.288, 0)?.elevationRad → 0.018118 rad
 */

/** What the bow and arrow give every shot, in SI units. */
export interface ShotParameters {
  /** Launch speed, m/s. */
  speedMps: number;
  /** Drag factor k, 1/m (see dragFactorPerM). */
  dragPerM: number;
  /** Peep height above the arrow's axis, m. */
  peepHeightM: number;
  /** Gravity, m/s². */
  gravityMps2: number;
}

/** A solved aim: the elevation above the line of sight (rad) and the flight it gives at the target. */
export interface ElevationSolution {
  elevationRad: number;
  crossing: RangeCrossing;
  /** Flights integrated to find it (for tuning and benchmarks). */
  flights: number;
}

/** Largest elevation above the line of sight tried, rad (beyond it the target is out of reach). */
export const MAX_ELEVATION_RAD = 0.7;
/** Smallest elevation tried, rad. */
export const MIN_ELEVATION_RAD = -0.3;
/**
 * Miss tolerance, m. Numeric care: a miss of 1e-10 m at 5 m range is an
 * elevation error of 2e-11 rad, about 2e-8 mm of mark: far below print resolution.
 */
export const MISS_TOLERANCE_M = 1e-10;

/**
 * The arrow's height above the line of sight (m) where it crosses slant range
 * `rangeM`, launched `elevationRad` above a line of sight at `losAngleRad`.
 * Example: missAtRange(shot, 18.288, 0, 0.018118).w → ≈ 0 m (a hit)
 */
export function missAtRange(shot: ShotParameters, rangeM: number, losAngleRad: number, elevationRad: number): RangeCrossing {
  const sin = Math.sin(elevationRad);
  const cos = Math.cos(elevationRad);
  return integrateToRange(
    { u: shot.peepHeightM * sin, w: -shot.peepHeightM * cos, vu: shot.speedMps * cos, vw: shot.speedMps * sin },
    { dragPerM: shot.dragPerM, gravityMps2: shot.gravityMps2, losAngleRad },
    rangeM,
  );
}

/**
 * A first guess at the elevation from the small-angle flight:
 * tan γ ≈ h/S + g·cos θ·S·(1 + k·S)/(2·v0²) (drag-free drop, stretched by the
 * slower average speed under drag).
 * Example: guessElevationRad(shot, 18.288, 0) → 0.01822 (solved: 0.01812)
 */
export function guessElevationRad(shot: ShotParameters, rangeM: number, losAngleRad: number): number {
  const drop = (shot.gravityMps2 * Math.cos(losAngleRad) * rangeM * (1 + shot.dragPerM * rangeM)) / (2 * shot.speedMps * shot.speedMps);
  return Math.atan(shot.peepHeightM / rangeM + drop);
}

/**
 * Solve the elevation for a hit at slant range `rangeM` (m) on a line of sight
 * at `losAngleRad`, starting from `guessRad` (default guessElevationRad).
 * Secant steps, kept inside the bracket [low, high] once both signs of the miss
 * have been seen; a step that leaves the bracket is replaced by bisection.
 * Returns null when no elevation up to MAX_ELEVATION_RAD reaches the target.
 * Example: see the module comment.
 */
export function solveElevation(shot: ShotParameters, rangeM: number, losAngleRad: number, guessRad?: number): ElevationSolution | null {
  let flights = 0;
  const miss = (elevation: number): RangeCrossing => {
    flights++;
    return missAtRange(shot, rangeM, losAngleRad, elevation);
  };
  let low = NaN; // largest elevation seen to miss below
  let high = NaN; // smallest elevation seen to miss above
  let previous = NaN;
  let previousMiss = NaN;
  let elevation = clampElevation(guessRad ?? guessElevationRad(shot, rangeM, losAngleRad));

  for (let iteration = 0; iteration < 100; iteration++) {
    const crossing = miss(elevation);
    const missM = crossing.w;
    const finite = Number.isFinite(missM);
    if (finite && Math.abs(missM) <= MISS_TOLERANCE_M) return { elevationRad: elevation, crossing, flights };
    // A flight that stalls before the target (non-finite miss) says nothing of
    // the sign; step back halfway toward the last useful elevation.
    if (finite) {
      if (missM < 0) low = Number.isNaN(low) ? elevation : Math.max(low, elevation);
      else high = Number.isNaN(high) ? elevation : Math.min(high, elevation);
    }
    const bracketed = !Number.isNaN(low) && !Number.isNaN(high);
    if (bracketed && high - low < 1e-15) return finite ? { elevationRad: elevation, crossing, flights } : null;

    let next: number;
    if (finite && Number.isFinite(previousMiss) && missM !== previousMiss)
      next = elevation - (missM * (elevation - previous)) / (missM - previousMiss);
    else if (finite)
      next = elevation - missM / rangeM; // turning the launch by dγ moves the arrow about S·dγ at range S
    else next = Number.isFinite(previous) ? 0.5 * (elevation + previous) : 0.5 * (elevation + MIN_ELEVATION_RAD);

    if (bracketed && !(next > low && next < high)) next = 0.5 * (low + high);
    if (next >= MAX_ELEVATION_RAD && Number.isNaN(high)) {
      const top = miss(MAX_ELEVATION_RAD);
      if (!(top.w > 0)) return null; // out of reach
      high = MAX_ELEVATION_RAD;
      next = Number.isNaN(low) ? 0.5 * (elevation + MAX_ELEVATION_RAD) : 0.5 * (low + high);
    }
    if (finite) {
      previous = elevation;
      previousMiss = missM;
    }
    elevation = clampElevation(next);
  }
  return null;
}

function clampElevation(elevationRad: number): number {
  return Math.min(MAX_ELEVATION_RAD, Math.max(MIN_ELEVATION_RAD, elevationRad));
}
