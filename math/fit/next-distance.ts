import { matrixVector } from '@/math/numeric/symmetric-matrix';
import type { MarkBand } from '@/math/fit/mark-band';

/**
 * The distance whose next mark would shrink the band most: for each candidate
 * c, adding one mark of noise σ there updates the covariance by the rank-one
 * rule C' = C − (C·g_c)(C·g_c)ᵀ/(σ² + g_cᵀ·C·g_c); the summed variance over the
 * evaluation distances e falls by Σ_e (g_eᵀ·C·g_c)²/(σ² + g_cᵀ·C·g_c). The
 * candidate with the largest fall wins (an I-optimal design; A. C. Atkinson,
 * A. N. Donev, Optimum Experimental Designs, Oxford 1992, ch. 10).
 *
 * Arguments: covariance (MODEL_PARAMETERS order), bands at the evaluation
 * distances (with gradients), which of them may be chosen, the mark sigma (mm).
 * Example: nextDistance(covariance, bands, (band) => band.distance !== 20, 0.2) → 100
 */
export function nextDistance(
  covariance: number[][],
  bands: readonly MarkBand[],
  eligible: (band: MarkBand) => boolean,
  markSigmaMm: number,
): number | null {
  const spread = bands.map((band) => matrixVector(covariance, band.gradient));
  let best: number | null = null;
  let bestFall = 0;
  bands.forEach((candidate, c) => {
    if (!eligible(candidate)) return;
    const candidateVariance = dot(candidate.gradient, spread[c]);
    let fall = 0;
    for (const band of bands) fall += dot(band.gradient, spread[c]) ** 2;
    fall /= markSigmaMm ** 2 + candidateVariance;
    if (fall > bestFall) {
      bestFall = fall;
      best = candidate.distance;
    }
  });
  return best;
}

function dot(a: readonly number[], b: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}
