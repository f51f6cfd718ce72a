import { fpsToMps } from '@/math/units/convert';
import { brentRoot } from '@/math/numeric/brent-root';
import { solveElevation, type ShotParameters } from '@/math/flight/solve-elevation';
import { FitInputError } from '@/math/fit/fit-input-error';

/**
 * Speed and scale zero from two level marks, exactly.
 *
 * With drag, peep height and sight radius fixed, the gap between the far and
 * the near mark, R·(tan γ_far − tan γ_near), falls monotonically as the launch
 * speed rises, toward R·h·(1/D_far − 1/D_near) at infinite speed. Bracketing the
 * speed between the slowest and fastest arrow accepted and solving the gap by
 * Brent's method in x = 1/v² (in which the gap is nearly linear, g·ΔD/2 per unit
 * x for a drag-free flight) gives v; then scale zero = near mark − R·tan γ_near.
 * A gap outside the bracket is an input error, said plainly.
 *
 * Arguments: the two marks (range m, reading mm, and a label such as "60 yd"
 * for messages), the flight without its speed, the sight radius (mm), and the
 * speed bracket (ft/s). Result: speed m/s and scale zero mm.
 * Example: solveTwoMarks({ near: { rangeM: 18.288, markMm: 14.9, label: '20 yd' }, far: { rangeM: 54.864, markMm: 32.6, label: '60 yd' } },
 *   { dragPerM: 0.0014937, peepHeightM: 0.11, gravityMps2: 9.80665 }, 820, { min: 120, max: 500 }) → { speedMps: 86.93, scaleZeroMm: 0.055 }
 */

/** A level mark as the two-mark solve needs it. */
export interface RangeMark {
  rangeM: number;
  markMm: number;
  /** The distance as the archer wrote it, e.g. "60 yd", for messages. */
  label: string;
}

/** What an out-of-reach flight counts as, mm of gap (any finite gap is smaller). */
const UNREACHABLE_GAP_MM = 1e6;

export function solveTwoMarks(
  marks: { near: RangeMark; far: RangeMark },
  flight: Omit<ShotParameters, 'speedMps'>,
  sightRadiusMm: number,
  speedLimitsFps: { min: number; max: number },
): { speedMps: number; scaleZeroMm: number } {
  const { near, far } = marks;
  const gapMm = far.markMm - near.markMm;
  let nearGuess: number | undefined;
  let farGuess: number | undefined;
  let nearElevation = NaN;

  const gapAt = (inverseSpeedSquared: number): number => {
    const shot = { ...flight, speedMps: 1 / Math.sqrt(inverseSpeedSquared) };
    const nearSolution = solveElevation(shot, near.rangeM, 0, nearGuess);
    const farSolution = solveElevation(shot, far.rangeM, 0, farGuess);
    if (!nearSolution || !farSolution) return UNREACHABLE_GAP_MM;
    nearGuess = nearSolution.elevationRad;
    farGuess = farSolution.elevationRad;
    nearElevation = nearSolution.elevationRad;
    return sightRadiusMm * (Math.tan(farSolution.elevationRad) - Math.tan(nearSolution.elevationRad));
  };

  const fastest = 1 / fpsToMps(speedLimitsFps.max) ** 2;
  const slowest = 1 / fpsToMps(speedLimitsFps.min) ** 2;
  const gapFastest = gapAt(fastest);
  const gapSlowest = gapAt(slowest);

  if (!(gapMm > gapFastest)) {
    const detail =
      gapMm < 0 && gapFastest >= 0
        ? `The ${far.label} mark (${mm(far.markMm)}) reads less than the ${near.label} mark (${mm(near.markMm)}); readings must grow as the pin moves down for longer shots. Check the order of the marks and the direction of your sight's scale`
        : `The ${far.label} mark is ${gapMm >= 0 ? 'only ' : ''}${describeGap(gapMm)} the ${near.label} mark; no arrow speed gives so small a gap (even ${speedLimitsFps.max} fps puts it ${describeGap(gapFastest)}). Check the readings`;
    throw new FitInputError('marks', detail);
  }
  if (!(gapMm < gapSlowest)) {
    throw new FitInputError(
      'marks',
      `The ${far.label} mark is ${mm(gapMm)} below the ${near.label} mark; so large a gap needs an arrow slower than ${speedLimitsFps.min} fps. Check the readings`,
    );
  }
  // Numeric care: a tolerance of 1e-16 in x = 1/v² is about 1e-12 of v (x ≈ 1e-4 s²/m²).
  const inverseSpeedSquared = brentRoot((x) => gapAt(x) - gapMm, fastest, slowest, 1e-16, 100, gapFastest - gapMm, gapSlowest - gapMm);
  gapAt(inverseSpeedSquared); // leave nearElevation at the root
  return { speedMps: 1 / Math.sqrt(inverseSpeedSquared), scaleZeroMm: near.markMm - sightRadiusMm * Math.tan(nearElevation) };
}

function describeGap(gapMm: number): string {
  return gapMm >= 0 ? `${mm(gapMm)} below` : `${mm(-gapMm)} above`;
}

function mm(value: number): string {
  return `${value.toFixed(1)} mm`;
}
