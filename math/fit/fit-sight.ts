import { fitInputSchema, fitIssueOf, speedLimitsFps, type FitInput } from '@/shared/fit';
import { distanceToMetres, fpsToMps, mpsToFps, type DistanceUnit } from '@/math/units/convert';
import { STANDARD_GRAVITY_MPS2 } from '@/math/units/constants';
import { airDensityKgM3 } from '@/math/air/standard-atmosphere';
import { dragFactorPerM } from '@/math/flight/drag-factor';
import { type SightModel } from '@/math/flight/sight-model';
import { solveElevation } from '@/math/flight/solve-elevation';
import { inverseSpd, quadraticForm } from '@/math/numeric/symmetric-matrix';
import { FitInputError, isFitInputError } from '@/math/fit/fit-input-error';
import { FIT_PRIORS, FIT_THRESHOLDS } from '@/math/fit/priors';
import { solveTwoMarks } from '@/math/fit/solve-two-marks';
import { mapFit, modelOf, type MapProblem, type Prior } from '@/math/fit/map-fit';
import { markBand, type MarkBand } from '@/math/fit/mark-band';
import { nextDistance } from '@/math/fit/next-distance';
import { slopeShot, type SlopeShot } from '@/math/slope/slope-shot';
import { ONE_MARK_CAUTION, SLOPE_CAUTION } from '@/math/cautions';

/**
 * From two or more sighted marks, the fitted sight and the mark for every
 * distance asked, with its one-sigma band.
 *
 * - One mark and a chronographed speed: the MAP fit below with the mark fixing
 *   the scale zero and the speed, drag, peep height and sight radius as priors
 *   (their means are the answer; the mark's only redundancy-free job is s0).
 *   Every other distance is an estimate with its band; the model carries
 *   `oneMark` so tapes and sheets say so, with the distance to shoot next.
 * - Two marks: speed and scale zero solved exactly (solveTwoMarks), drag, peep
 *   height and sight radius as entered.
 * - Three or more (or a chronographed speed): the maximum-a-posteriori fit of
 *   mapFit with the priors of FIT_PRIORS, started from the two-mark solution of
 *   the nearest and farthest marks. With two marks and no chronograph the two
 *   agree exactly (the priors are met with zero residual).
 * - Bands from the posterior covariance (JᵀJ/σ² + P)⁻¹; with four or more marks
 *   σ is raised to the marks' own scatter when that is larger.
 * - Outlier: with four or more marks, the mark whose standardised residual
 *   r/√(σ² − g·C·gᵀ) is largest, if above FIT_THRESHOLDS.outlierStandardised.
 *
 * Input: FitInput (shared/fit.ts), parsed here; throws FitInputError naming the
 * field for anything no sight can have. Distances are in input.distanceUnit,
 * readings mm. Use attemptSightFit for a result instead of an exception.
 * Example: fitSight({ distanceUnit: 'yd', sight: { radiusMm: 820, peepHeightMm: 110 }, arrow: { massGr: 420, diameterMm: 6.5, dragCoefficient: 2 },
 *   marks: [{ distance: 20, markMm: 14.9 }, { distance: 60, markMm: 32.6 }] }).speedFps → ≈ 285
 */

/** A predicted mark: distance (input unit), mark and one-sigma band (mm), band in distance, and whether to confirm it. */
export interface PredictedMark {
  distance: number;
  /** NaN (null in JSON) if the arrow cannot reach. */
  markMm: number;
  sigmaMm: number;
  sigmaDistance: number | null;
  /** True when the band is wider than FIT_THRESHOLDS.verifyBandMm: confirm at the range. */
  verify: boolean;
}

/** A sighted mark against the fit: residual = entered − fitted (mm). */
export interface MarkResidual {
  distance: number;
  markMm: number;
  fittedMm: number;
  residualMm: number;
  /** Residual over its own standard deviation (0 when the mark has no redundancy). */
  standardised: number;
  outlier: boolean;
}

/** Something the archer should know, in plain words; `distance` when it concerns one. */
export interface FitWarning {
  code:
    | 'one-mark'
    | 'verify'
    | 'outlier'
    | 'scatter'
    | 'chronograph'
    | 'peep-height'
    | 'sight-radius'
    | 'drag'
    | 'out-of-reach'
    | 'slope-estimate';
  message: string;
  distance?: number;
}

/** The fit, as the command line prints it (see math/README.md). */
export interface FitResult {
  distanceUnit: DistanceUnit;
  speedFps: number;
  dragCoefficient: number;
  peepHeightMm: number;
  sightRadiusMm: number;
  scaleZeroMm: number;
  /** RMS of the residuals, mm (0 for an exact two-mark fit). */
  rmsMm: number;
  /** 'one-mark': one mark and a chronographed speed (an estimate); 'two-mark': exact solve; 'least-squares': the MAP fit. */
  method: 'one-mark' | 'two-mark' | 'least-squares';
  airDensityKgM3: number;
  marks: PredictedMark[];
  /** One per sighted mark, nearest first. */
  residuals: MarkResidual[];
  /** The distance (a multiple of 5, not yet marked) whose mark would shrink the bands most. */
  nextDistance: number | null;
  shots: SlopeShot[];
  warnings: FitWarning[];
  /** The fitted model, serialisable: evaluate with predictMarkMm / predictMarksMm / markBand. */
  model: SightModel;
}

/** How many marks' worth of belief the assumed mark sigma carries when pooled with the marks' own scatter. */
const POOLED_PRIOR_DOF = 4;

/** Distances predicted when the input asks for none: every 10 from 10 to 100 (input unit). */
export const DEFAULT_PREDICT = [10, 20, 30, 40, 50, 60, 70, 80, 90, 100];

export function fitSight(input: FitInput): FitResult {
  const parsed = fitInputSchema.safeParse(input);
  if (!parsed.success) {
    const { field, message } = fitIssueOf(parsed.error.issues[0]);
    throw new FitInputError(field, message);
  }
  const data = parsed.data;
  const unit = data.distanceUnit;
  const label = (distance: number) => `${formatDistance(distance)} ${unit}`;
  const marks = [...data.marks].sort((a, b) => a.distance - b.distance);
  const rangesM = marks.map((mark) => distanceToMetres(mark.distance, unit));
  const density = airDensityKgM3(data.air ?? {});
  const dragCoefficient = data.arrow.dragCoefficient ?? FIT_PRIORS.defaultDragCoefficient;
  const base: MapProblem['base'] = {
    distanceUnit: unit,
    airDensityKgM3: density,
    arrowMassGr: data.arrow.massGr,
    arrowDiameterMm: data.arrow.diameterMm,
    gravityMps2: STANDARD_GRAVITY_MPS2,
  };

  const chronograph = data.arrow.speedFps;
  const peepHeightM = data.sight.peepHeightMm / 1000;
  const dragPerM = dragFactorPerM({
    airDensityKgM3: density,
    dragCoefficient,
    diameterMm: data.arrow.diameterMm,
    massGr: data.arrow.massGr,
  });
  const oneMark = marks.length === 1;
  let start: { speedMps: number; scaleZeroMm: number };
  if (oneMark) {
    // One mark and a chronographed speed (the schema refuses one mark without):
    // the mark fixes the scale zero, the priors carry everything else.
    const shot = { speedMps: fpsToMps(chronograph!), dragPerM, peepHeightM, gravityMps2: STANDARD_GRAVITY_MPS2 };
    const solved = solveElevation(shot, rangesM[0], 0);
    if (!solved)
      throw new FitInputError(
        'marks[0].distance',
        `At ${chronograph} fps the arrow cannot reach ${label(marks[0].distance)}; check the speed and the distance`,
      );
    start = { speedMps: shot.speedMps, scaleZeroMm: marks[0].markMm - data.sight.radiusMm * Math.tan(solved.elevationRad) };
  } else {
    // Start (and, for two marks, answer): speed and scale zero from the nearest and farthest marks.
    const near = marks[0];
    const far = marks[marks.length - 1];
    start = solveTwoMarks(
      {
        near: { rangeM: rangesM[0], markMm: near.markMm, label: label(near.distance) },
        far: { rangeM: rangesM[rangesM.length - 1], markMm: far.markMm, label: label(far.distance) },
      },
      { dragPerM, peepHeightM, gravityMps2: STANDARD_GRAVITY_MPS2 },
      data.sight.radiusMm,
      speedLimitsFps,
    );
  }

  const priors: (Prior | null)[] = [
    chronograph === undefined ? null : { mean: chronograph, sigma: FIT_PRIORS.speedSigmaFraction * chronograph },
    null,
    { mean: dragCoefficient, sigma: FIT_PRIORS.dragSigmaFraction * dragCoefficient },
    { mean: data.sight.peepHeightMm, sigma: FIT_PRIORS.peepHeightSigmaMm },
    { mean: data.sight.radiusMm, sigma: FIT_PRIORS.sightRadiusSigmaFraction * data.sight.radiusMm },
  ];
  const speedFps = mpsToFps(start.speedMps);
  const solution = mapFit({
    rangesM,
    marksMm: marks.map((mark) => mark.markMm),
    markSigmaMm: FIT_PRIORS.markSigmaMm,
    base,
    priors,
    start: [speedFps, start.scaleZeroMm, dragCoefficient, data.sight.peepHeightMm, data.sight.radiusMm],
    lower: [speedLimitsFps.min, -1e4, 0.05 * dragCoefficient, 20, 100],
    upper: [speedLimitsFps.max, 1e4, 10 * dragCoefficient, 300, 2500],
  });
  const method = oneMark ? 'one-mark' : marks.length === 2 && chronograph === undefined ? 'two-mark' : 'least-squares';
  const parameters = solution.parameters;

  // Residuals and the posterior covariance.
  const residualsMm = marks.map((mark, i) => mark.markMm - solution.fittedMm[i]);
  const rmsMm = Math.sqrt(residualsMm.reduce((sum, r) => sum + r * r, 0) / residualsMm.length);
  const sigma = FIT_PRIORS.markSigmaMm;
  const chiSquare = residualsMm.reduce((sum, r) => sum + (r / sigma) ** 2, 0);
  const covarianceAt = (markSigma: number) => {
    const size = parameters.length;
    const information = Array.from({ length: size }, (_, j) =>
      Array.from({ length: size }, (_, k) => solution.jacobian.reduce((sum, row) => sum + (row[j] * row[k]) / markSigma ** 2, 0)),
    );
    priors.forEach((prior, j) => {
      if (prior) information[j][j] += 1 / prior.sigma ** 2;
    });
    const inverse = inverseSpd(information);
    if (!inverse) throw new FitInputError('marks', 'These marks do not pin down a fit; add a mark at another distance');
    return inverse;
  };
  const unscaled = covarianceAt(sigma);
  const leverages = solution.jacobian.map((row) => quadraticForm(unscaled, row));
  const standardised = residualsMm.map((residual, i) => {
    const variance = sigma * sigma - leverages[i];
    // Numeric care: a mark the fit passes through exactly has no residual variance.
    return variance > 1e-6 * sigma * sigma ? residual / Math.sqrt(variance) : 0;
  });
  // With four or more marks, let the marks' own scatter speak: the mark sigma
  // pooled from the assumed one (worth POOLED_PRIOR_DOF marks) and the
  // residuals' χ² over their effective degrees of freedom ν = n − Σ leverage/σ²
  // (a scaled-inverse-χ² prior on σ², A. Gelman et al., Bayesian Data
  // Analysis, 3rd ed., §2.6). Raising σ only when the scatter is larger, as
  // before, gave 75 % one-sigma coverage for four marks (tests/math/band-coverage.test.ts).
  const freedom = marks.length - leverages.reduce((sum, leverage) => sum + leverage, 0) / (sigma * sigma);
  const sigmaEffective =
    marks.length >= 4 && freedom > 0.5 ? sigma * Math.sqrt((POOLED_PRIOR_DOF + chiSquare) / (POOLED_PRIOR_DOF + freedom)) : sigma;
  const covariance = sigmaEffective === sigma ? unscaled : covarianceAt(sigmaEffective);
  let outlierIndex = -1;
  if (marks.length >= 4) {
    standardised.forEach((z, i) => {
      if (Math.abs(z) > FIT_THRESHOLDS.outlierStandardised && (outlierIndex < 0 || Math.abs(z) > Math.abs(standardised[outlierIndex])))
        outlierIndex = i;
    });
  }

  const model: SightModel = { ...modelOf(base, parameters), covariance };
  const warnings: FitWarning[] = [];

  // Bands, each distance solved once: the predictions and the next-distance grid share them.
  const bands = new Map<number, MarkBand | null>();
  const bandAt = (distance: number): MarkBand | null => {
    if (!bands.has(distance)) bands.set(distance, markBand(model, distance));
    return bands.get(distance) ?? null;
  };

  // Predicted marks with bands.
  const predict = data.predict ?? DEFAULT_PREDICT;
  const predicted: PredictedMark[] = predict.map((distance) => {
    const band = bandAt(distance);
    if (!band) {
      warnings.push({ code: 'out-of-reach', distance, message: `The arrow cannot reach ${label(distance)} with this fit` });
      return { distance, markMm: NaN, sigmaMm: NaN, sigmaDistance: null, verify: true };
    }
    const verify = band.sigmaMm > FIT_THRESHOLDS.verifyBandMm;
    if (verify && !oneMark) {
      warnings.push({
        code: 'verify',
        distance,
        message: `Confirm at ${label(distance)}: the predicted mark there is uncertain by ±${band.sigmaMm.toFixed(1)} mm`,
      });
    }
    return { distance, markMm: band.markMm, sigmaMm: band.sigmaMm, sigmaDistance: band.sigmaDistance, verify };
  });

  // Where the next mark helps most: multiples of 5 up to the longest distance in play.
  const longest = Math.max(...predict, ...marks.map((mark) => mark.distance));
  const grid: MarkBand[] = [];
  for (let distance = 10; distance <= longest + 1e-9; distance += 5) {
    const band = bandAt(distance);
    if (band) grid.push(band);
  }
  const marked = (distance: number) => marks.some((mark) => Math.abs(mark.distance - distance) < 1e-9);
  const next = nextDistance(covariance, grid, (band) => !marked(band.distance), sigmaEffective);

  if (oneMark) {
    // The band where the archer will shoot next (or the widest predicted one).
    const nextBand = next !== null ? bandAt(next) : null;
    const widest = predicted
      .filter((mark) => Number.isFinite(mark.sigmaMm))
      .reduce<PredictedMark | null>((a, b) => (a && a.sigmaMm >= b.sigmaMm ? a : b), null);
    const shown = nextBand && Number.isFinite(nextBand.sigmaMm) ? nextBand : widest;
    model.oneMark = { distance: marks[0].distance, nextDistance: next };
    warnings.unshift({
      code: 'one-mark',
      message: `${ONE_MARK_CAUTION} Only ${label(marks[0].distance)} is sighted${
        shown ? `; at ${label(shown.distance)} the mark is uncertain by ±${shown.sigmaMm.toFixed(1)} mm` : ''
      }${next !== null ? `. Shoot ${label(next)} next` : ''}`,
      ...(next !== null ? { distance: next } : {}),
    });
  }

  const residuals: MarkResidual[] = marks.map((mark, i) => ({
    distance: mark.distance,
    markMm: mark.markMm,
    fittedMm: solution.fittedMm[i],
    residualMm: residualsMm[i],
    standardised: standardised[i],
    outlier: i === outlierIndex,
  }));
  if (outlierIndex >= 0) {
    const mark = marks[outlierIndex];
    warnings.push({
      code: 'outlier',
      distance: mark.distance,
      message: `The ${label(mark.distance)} mark is ${Math.abs(residualsMm[outlierIndex]).toFixed(1)} mm off the fit, more than the other marks allow: check the reading or shoot it again`,
    });
  }
  if (marks.length >= 3 && rmsMm > FIT_THRESHOLDS.scatterRmsMm) {
    warnings.push({
      code: 'scatter',
      message: `The marks scatter by ${rmsMm.toFixed(2)} mm (RMS) around the fit: check the readings and shoot the worst again`,
    });
  }
  const strays = (value: number, prior: Prior | null) =>
    prior !== null && Math.abs(value - prior.mean) > FIT_THRESHOLDS.priorSigmas * prior.sigma;
  if (chronograph !== undefined && strays(parameters[0], priors[0])) {
    warnings.push({
      code: 'chronograph',
      message: `The marks fit best with ${parameters[0].toFixed(0)} fps; the chronograph gave ${chronograph.toFixed(0)} fps. Check the chronograph reading and the marks`,
    });
  }
  if (strays(parameters[2], priors[2])) {
    warnings.push({
      code: 'drag',
      message: `The marks need a drag coefficient of ${parameters[2].toFixed(2)}, far from the ${dragCoefficient.toFixed(2)} assumed: check the long marks`,
    });
  }
  if (strays(parameters[3], priors[3])) {
    warnings.push({
      code: 'peep-height',
      message: `The marks fit best with a peep height of ${parameters[3].toFixed(0)} mm, not the ${data.sight.peepHeightMm} mm entered: measure it again at full draw`,
    });
  }
  if (strays(parameters[4], priors[4])) {
    warnings.push({
      code: 'sight-radius',
      message: `The marks fit best with a sight radius of ${parameters[4].toFixed(0)} mm, not the ${data.sight.radiusMm} mm entered: measure it again at full draw`,
    });
  }

  const shots = (data.shots ?? []).map((shot) => slopeShot(model, shot.distance, shot.angleDeg));
  shots.forEach((shot) => {
    if (!Number.isFinite(shot.markMm))
      warnings.push({
        code: 'out-of-reach',
        distance: shot.distance,
        message: `The arrow cannot reach ${label(shot.distance)} at ${shot.angleDeg}° with this fit`,
      });
  });
  if (shots.length > 0) warnings.push({ code: 'slope-estimate', message: SLOPE_CAUTION });

  return {
    distanceUnit: unit,
    speedFps: parameters[0],
    dragCoefficient: parameters[2],
    peepHeightMm: parameters[3],
    sightRadiusMm: parameters[4],
    scaleZeroMm: parameters[1],
    rmsMm,
    method,
    airDensityKgM3: density,
    marks: predicted,
    residuals,
    nextDistance: next,
    shots,
    warnings,
    model,
  };
}

/** fitSight without exceptions for input errors: { ok: true, fit } or { ok: false, error: { field, message } }. Other errors still throw. */
export type FitAttempt = { ok: true; fit: FitResult } | { ok: false; error: { field: string; message: string } };

/**
 * For a UI refitting on every keystroke: the fit, or the field at fault and a plain message.
 * Example: attemptSightFit({ ...input, marks: [input.marks[0]] }) → { ok: false, error: { field: 'marks', message: 'Enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)' } } (no speed given)
 */
export function attemptSightFit(input: FitInput): FitAttempt {
  try {
    return { ok: true, fit: fitSight(input) };
  } catch (error) {
    if (isFitInputError(error)) return { ok: false, error: { field: error.field, message: error.detail } };
    throw error;
  }
}

function formatDistance(distance: number): string {
  return Number.isInteger(distance) ? String(distance) : String(Number(distance.toFixed(2)));
}
