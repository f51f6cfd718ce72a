import { max, median, min, sampleStandardDeviation } from 'simple-statistics';

/**
 * A numbered arrow set's weights: median, spread, and which arrows lie
 * outside the archer's tolerance around the median. A hunting set is commonly
 * kept within ±2 gr (common practice, no published source; the figure is from
 * memory). Median and standard deviation from simple-statistics.
 *
 * The tolerance is inclusive: an arrow exactly `toleranceGr` from the median
 * is in (a 1e-9 gr allowance absorbs floating-point noise in the difference).
 *
 * Example: arrowSetStats([{ number: 1, weightGr: 420 }, { number: 2, weightGr: 421 }, { number: 3, weightGr: 425 }], 2)
 *   → { medianGr: 421, spreadGr: 5, flags: [{ number: 3, side: 'heavy', offGr: 4 }], … }
 */

export const defaultToleranceGr = 2;

export interface ArrowWeight {
  number: number;
  weightGr: number;
}

export interface ArrowFlag {
  number: number;
  side: 'heavy' | 'light';
  /** Weight minus median, gr (positive when heavy). */
  offGr: number;
}

export interface ArrowSetStats {
  count: number;
  medianGr: number | null;
  /** Heaviest minus lightest, gr. */
  spreadGr: number | null;
  /** Sample standard deviation, gr (null below two arrows). */
  sdGr: number | null;
  flags: ArrowFlag[];
}

const noise = 1e-9;

export function arrowSetStats(arrows: readonly ArrowWeight[], toleranceGr: number = defaultToleranceGr): ArrowSetStats {
  if (!Number.isFinite(toleranceGr) || toleranceGr < 0) throw new RangeError('toleranceGr must be a number of grains >= 0');
  const weights = arrows.map((a) => a.weightGr).filter((w) => Number.isFinite(w));
  if (weights.length === 0) return { count: 0, medianGr: null, spreadGr: null, sdGr: null, flags: [] };
  const mid = median(weights);
  const flags: ArrowFlag[] = [];
  for (const arrow of arrows) {
    const off = arrow.weightGr - mid;
    if (Math.abs(off) > toleranceGr + noise) flags.push({ number: arrow.number, side: off > 0 ? 'heavy' : 'light', offGr: off });
  }
  return {
    count: weights.length,
    medianGr: mid,
    spreadGr: max(weights) - min(weights),
    sdGr: weights.length >= 2 ? sampleStandardDeviation(weights) : null,
    flags,
  };
}

/**
 * The set's median weighed against the build's computed total grains: the
 * difference in gr, and whether it is outside the tolerance.
 * Example: buildWeightCheck(421, 415, 2) → { differenceGr: 6, outside: true }
 */
export function buildWeightCheck(medianGr: number | null, computedTotalGr: number | null, toleranceGr: number = defaultToleranceGr) {
  if (medianGr === null || computedTotalGr === null || !Number.isFinite(computedTotalGr)) return null;
  const differenceGr = medianGr - computedTotalGr;
  return { differenceGr, outside: Math.abs(differenceGr) > toleranceGr + noise };
}
