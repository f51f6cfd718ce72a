/**
 * What the fit assumes before it sees the marks: the spread of each measured
 * input, as Gaussian priors of a maximum-a-posteriori fit. Known inputs are
 * priors, not constants, so enough marks can correct them.
 *
 * - Drag: wind-tunnel drag coefficients of arrows span 1.3–2.6 (Miyazaki et al.,
 *   Sports Engineering 16 (2013) 43–54) and 1.56–2.05 by vane size (Ortiz
 *   Enriquez et al., Proceedings 49(1):56, MDPI 2020); default 2.0 ± 30 %.
 * - Peep height ± 5 mm and sight radius ± 2 %: how well they are measured at
 *   full draw with a rule (common practice, no published source).
 * - A chronographed speed ± 2 %: chronograph reading plus the point-mass
 *   model's simplifications (common practice, no published source).
 * - A sighted mark ± 0.2 mm: the scatter of a group's centre read on the scale
 *   (common practice, no published source).
 *
 * Example: FIT_PRIORS.markSigmaMm → 0.2
 */
export const FIT_PRIORS = {
  /** Drag coefficient when none is given. */
  defaultDragCoefficient: 2.0,
  /** One sigma of the drag coefficient, as a fraction of its value. */
  dragSigmaFraction: 0.3,
  /** One sigma of the peep height, mm. */
  peepHeightSigmaMm: 5,
  /** One sigma of the sight radius, as a fraction of its value. */
  sightRadiusSigmaFraction: 0.02,
  /** One sigma of a chronographed speed, as a fraction of its value. */
  speedSigmaFraction: 0.02,
  /** One sigma of a sighted mark, mm. */
  markSigmaMm: 0.2,
} as const;

/** Thresholds for what the fit reports. Example: FIT_THRESHOLDS.verifyBandMm → 0.25 */
export const FIT_THRESHOLDS = {
  /** A predicted mark whose one-sigma band is wider than this (mm) is shown as "verify". */
  verifyBandMm: 0.25,
  /** A mark whose standardised residual exceeds this is flagged as an outlier (4 or more marks). */
  outlierStandardised: 3,
  /** Marks scattering more than this RMS (mm) around the fit draw a warning (3 or more marks). */
  scatterRmsMm: 0.35,
  /** A fitted input this many sigmas from the entered one draws a warning. */
  priorSigmas: 2.5,
} as const;
