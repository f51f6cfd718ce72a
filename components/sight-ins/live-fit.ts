import { optionalTextToNumber, textToNumber } from '@/components/forms/form-numbers';
import type { MarkRowText } from '@/components/sight-ins/sight-in-form-values';
import { attemptSightFit, type FitResult } from '@/math/fit/fit-sight';
import { predictMarksMm } from '@/math/flight/predict-mark';
import type { DistanceUnit } from '@/shared/auth';
import type { Build } from '@/shared/build';
import type { FitInput } from '@/shared/fit';
import { scaleSignOf, sightInFitInput, type FitBow } from '@/shared/sight-in-fit';

/** What the live fit reads from the form (a subset of SightInFormText). */
export interface LiveFitText {
  buildId: string;
  altitudeM: string;
  temperatureC: string;
  unit: DistanceUnit;
  marks: MarkRowText[];
}

/** A sighted mark the fit can use: its table row, distance (table unit) and reading as the archer reads it (mm). */
export interface UsableMark {
  row: number;
  distance: number;
  scaleMm: number;
}

/** The live fit: the math core's result with readings as the archer reads them, or why there is none yet. */
export type LiveFit =
  | { state: 'fit'; fit: FitResult; marks: UsableMark[]; sign: 1 | -1 }
  | { state: 'waiting'; message: string; marks: UsableMark[] }
  | { state: 'refused'; message: string; field: string; marks: UsableMark[] };

/** Rows with a numeric distance and reading, in table order. */
export function usableMarks(rows: readonly (MarkRowText | undefined)[]): UsableMark[] {
  return rows.flatMap((row, index) => {
    if (!row) return [];
    const distance = textToNumber(row.distance);
    const scaleMm = textToNumber(row.scaleMm);
    if (distance === undefined || scaleMm === undefined || !Number.isFinite(distance) || !Number.isFinite(scaleMm)) return [];
    return [{ row: index, distance, scaleMm }];
  });
}

/**
 * The math core's fit input for the marks typed so far: the saved fit's own
 * mapping (shared/sight-in-fit.ts sightInFitInput), so the live table predicts
 * the distances and marks the saved fit will (the bow's fixed pins included).
 * Example: liveFitInput(text, bow, build, marks).sight → { radiusMm: 840, peepHeightMm: 112 }
 */
export function liveFitInput(text: LiveFitText, bow: FitBow, build: Build, marks: UsableMark[]): FitInput {
  const altitudeM = optionalTextToNumber(text.altitudeM);
  const temperatureC = optionalTextToNumber(text.temperatureC);
  return sightInFitInput(
    bow,
    { totalGr: build.derived.totalGr, diameterMm: build.diameterMm, dragCoefficient: build.dragCoefficient, speedFps: build.speedFps },
    {
      altitudeM: altitudeM !== null && Number.isFinite(altitudeM) ? altitudeM : null,
      temperatureC: temperatureC !== null && Number.isFinite(temperatureC) ? temperatureC : null,
      marks: marks.map((mark) => ({ distance: mark.distance, unit: text.unit, scaleMm: mark.scaleMm })),
    },
  );
}

/**
 * Refits the marks typed so far (pure; call it from a memo). Fewer than two
 * usable marks → 'waiting', except one mark with a build that has a
 * chronographed speed (fit.method 'one-mark', an estimate); marks no arrow can give → 'refused' with the math
 * core's plain message (e.g. an impossible gap).
 * Example: liveFit(text, bow, builds).state → 'fit'
 */
export function liveFit(text: LiveFitText, bow: FitBow, builds: readonly Build[]): LiveFit {
  const marks = usableMarks(text.marks ?? []);
  const build = builds.find((item) => String(item.id) === text.buildId);
  if (!build) return { state: 'waiting', message: 'Choose the arrow build you shot.', marks };
  // One mark fits when the build has a chronographed speed: an estimate from one mark (the fit says so).
  const chronographed = build.speedFps !== null;
  if (marks.length === 0 || (marks.length === 1 && !chronographed)) {
    return {
      state: 'waiting',
      message:
        marks.length === 0
          ? chronographed
            ? 'Enter a mark to see an estimate from it and the build’s chronographed speed; two marks (a short and a long distance) make a fit.'
            : 'Enter two marks (a short and a long distance) to see the fit.'
          : 'Enter one more mark, at another distance, to see the fit (or give the build a chronographed speed for an estimate from one mark).',
      marks,
    };
  }
  try {
    const attempt = attemptSightFit(liveFitInput(text, bow, build, marks));
    if (!attempt.ok) return { state: 'refused', message: attempt.error.message, field: attempt.error.field, marks };
    return { state: 'fit', fit: attempt.fit, marks, sign: scaleSignOf(bow.scaleDirection) };
  } catch (error) {
    return { state: 'refused', message: error instanceof Error ? error.message : 'The fit failed.', field: 'marks', marks };
  }
}

/**
 * The fitted curve for a chart: (distance, reading as the archer reads it)
 * every `step` from `from` to `to`; unreachable points are left out.
 * Example: fittedCurve(fit, 1, 10, 100, 1).length → 91
 */
export function fittedCurve(fit: FitResult, sign: 1 | -1, from: number, to: number, step = 1): { x: number; y: number }[] {
  const distances: number[] = [];
  for (let distance = from; distance <= to + 1e-9; distance += step) distances.push(distance);
  const marks = predictMarksMm(fit.model, distances);
  return distances.flatMap((distance, index) => (Number.isFinite(marks[index]) ? [{ x: distance, y: sign * marks[index] }] : []));
}
