/**
 * Every call from the server into the math core (math/), in one file, so a
 * change in math's interface is a one-file fix here. Builds math's inputs from
 * stored records, maps its results to what we store and send, and turns its
 * input errors (FitInputError) into 400s naming our own fields.
 *
 * The sight-in fit's rules (predicted distances, bow + build + marks → math's
 * input, math's result → the stored fit, readings' sign) live in
 * shared/sight-in-fit.ts, which the sight-in screen's live table uses too; a
 * layout's tape options in shared/tape.ts (tapeOptionsOf).
 */
import {
  STANDARD_GRAVITY_MPS2,
  airDensityKgM3,
  fitSight,
  focPercent,
  isFitInputError,
  kineticEnergy,
  mmToInches,
  momentum,
  predictMarksMm,
  printSheetSvg,
  tapeSvg as mathTapeSvg,
  totalArrowGrains,
  type FitResult,
  type SightModel,
} from '@/math';
import type { DistanceUnit } from '@/math/units/convert';
import { sheetPdf } from '@/server/print/sheet-pdf';
import { ApiError } from '@/server/errors';
import type { ArrowBuild } from '@/server/models';
import type { FitInput, SheetInput, SheetLabels, TapeInput } from '@/shared/fit';
import type { BuildDerived, BuildInput } from '@/shared/build';
import { ONE_MARK_SIGHT_IN_MESSAGE, type StoredFit } from '@/shared/sight-in';
import { sightInFitInput, storedFitOf, type FitBow, type FitSightIn } from '@/shared/sight-in-fit';
import { tapeOptionsOf, type TapeLayout } from '@/shared/tape';

/** A math field path ("marks[1].markMm", "sight.radiusMm") as one of our API's fields. */
function apiFieldOf(field: string, names: Record<string, string> = {}): string {
  const mark = /^marks\[(\d+)\]\.(\w+)$/.exec(field);
  if (mark) return `marks.${mark[1]}.${names[mark[2]] ?? mark[2]}`;
  return names[field] ?? field.replace(/\[(\d+)\]/g, '.$1');
}

/** Runs `compute`; a FitInputError becomes a 400 whose field is mapped with `names`. */
function refusingInputErrors<T>(compute: () => T, names: Record<string, string> = {}, prefix = ''): T {
  try {
    return compute();
  } catch (error) {
    if (isFitInputError(error)) {
      const message = prefix ? `${prefix}${error.detail.charAt(0).toLowerCase()}${error.detail.slice(1)}` : error.detail;
      throw ApiError.badRequest(message, { [apiFieldOf(error.field, names)]: message });
    }
    throw error;
  }
}

/** Our sight-in fields for math's fit-input fields, for error messages. */
const SIGHT_IN_FIELDS: Record<string, string> = {
  markMm: 'scaleMm',
  'sight.radiusMm': 'sightRadiusMm',
  'sight.peepHeightMm': 'peepHeightMm',
  'arrow.massGr': 'buildId',
  'arrow.diameterMm': 'buildId',
  'arrow.dragCoefficient': 'buildId',
  'arrow.speedFps': 'buildId',
  'air.altitudeM': 'altitudeM',
  'air.temperatureC': 'temperatureC',
};

/**
 * Fits a sight-in's marks with its bow and build; a fit the marks cannot give
 * (e.g. an impossible gap) is a 400 with the fit's own field message. One mark
 * fits only when the build has a chronographed speed (method 'one-mark': every
 * other distance an estimate); without one it is a 400 on `marks`.
 * Example: fitSightIn(bow, build, { altitudeM: null, temperatureC: null, marks }).speedFps → ≈ 283
 */
export function fitSightIn(
  bow: FitBow,
  build: Pick<ArrowBuild, 'totalGr' | 'diameterMm' | 'dragCoefficient' | 'speedFps'>,
  sightIn: FitSightIn,
): StoredFit {
  if (sightIn.marks.length === 1 && build.speedFps === null)
    throw ApiError.badRequest(ONE_MARK_SIGHT_IN_MESSAGE, { marks: ONE_MARK_SIGHT_IN_MESSAGE });
  const input = sightInFitInput(bow, build, sightIn);
  const fit = refusingInputErrors(() => fitSight(input), SIGHT_IN_FIELDS);
  return storedFitOf(fit, bow.scaleDirection);
}

/** The public try-it fit: math's input as sent, math's result as returned (NaN → null by JSON). */
export function tryFit(input: FitInput): FitResult {
  return refusingInputErrors(() => fitSight(input));
}

const TAPE_FIELDS: Record<string, string> = {
  'tape.from': 'fromDistance',
  'tape.to': 'toDistance',
  'tape.step': 'step',
  'tape.unit': 'unit',
  'tape.widthMm': 'widthMm',
  'tape.orientation': 'orientation',
  'tape.mirror': 'mirror',
};

/** The tape SVG for a stored fit (its model) and a layout; a tape the fit cannot give is a 400. */
export function tapeSvgFor(fit: StoredFit, layout: Parameters<typeof tapeOptionsOf>[0]): string {
  return refusingInputErrors(() => mathTapeSvg({ model: fit.model }, tapeOptionsOf(layout)), TAPE_FIELDS);
}

const SHEET_FIELDS: Record<string, string> = { ...TAPE_FIELDS, tape: 'toDistance', paper: 'paper' };

/** Labels printed on a sheet (bow, build, date; each at most 60 characters). */
export type SheetLabelsIn = SheetLabels;

/** Math's sheet options for a layout and labels. */
function sheetOptionsOf(layout: TapeLayout, labels: SheetLabelsIn) {
  const clip = (text: string | undefined) => (text ? text.slice(0, 60) : undefined);
  return {
    paper: layout.paper,
    labels: {
      bow: clip(labels.bow),
      build: clip(labels.build),
      date: clip(labels.date),
      note: labels.note ? labels.note.slice(0, 300) : undefined,
    },
    variants: true,
    tape: tapeOptionsOf(layout),
  };
}

/** The print sheet SVG (tape at 100 % and its ±0.5/1/2 % variants, calibration bars, labels, caution). */
export function sheetSvgFor(fit: StoredFit, layout: TapeLayout, labels: SheetLabelsIn): string {
  return refusingInputErrors(
    () => printSheetSvg({ model: fit.model, residuals: fit.residuals, rmsMm: fit.rmsMm }, sheetOptionsOf(layout, labels)),
    SHEET_FIELDS,
  );
}

/** The print sheet as a PDF of the paper's size. */
export async function sheetPdfFor(fit: StoredFit, layout: TapeLayout, labels: SheetLabelsIn): Promise<Buffer> {
  return sheetPdf(sheetSvgFor(fit, layout, labels), layout.paper);
}

/** Try-it: the tape SVG straight from a fit input with tape options (math's `tape` input). */
export function tryTapeSvg(input: TapeInput): string {
  const { tape, ...fitInput } = input;
  const fit = tryFit(fitInput);
  return refusingInputErrors(() => mathTapeSvg(fit, tape ?? {}));
}

/** Try-it: the print sheet SVG from a fit input with tape and sheet options (math's `sheet` input). */
export function trySheetSvg(input: SheetInput): string {
  const { tape, paper, labels, variants, ...fitInput } = input;
  const fit = tryFit(fitInput);
  return refusingInputErrors(() => printSheetSvg(fit, { tape, paper, labels, variants }));
}

/** Try-it: the print sheet as a PDF. */
export async function trySheetPdf(input: SheetInput): Promise<Buffer> {
  return sheetPdf(trySheetSvg(input), input.paper ?? 'a4');
}

/**
 * Total grains, FOC, kinetic energy and momentum of a build, from the math
 * core. Shaft mass = grains per inch × cut length (mm → in exactly). FOC uses
 * the cut length as the arrow's length from the nock throat; null without a
 * balance point. Energy and momentum use the chronographed speed; null without
 * one. (Energy figures are no legal determination; follow local regulations.)
 * Example: arrowQuantities({ grainsPerInch: 9.3, cutLengthMm: 736.6, pointGr: 125, … }).totalGr → ≈ 470
 */
export function arrowQuantities(
  build: Pick<
    BuildInput,
    | 'grainsPerInch'
    | 'cutLengthMm'
    | 'pointGr'
    | 'insertGr'
    | 'collarGr'
    | 'nockGr'
    | 'vaneCount'
    | 'vaneWeightGr'
    | 'wrapGr'
    | 'balancePointMm'
    | 'speedFps'
  >,
): BuildDerived {
  const totalGr = totalArrowGrains({
    shaftGpi: build.grainsPerInch,
    cutLengthIn: mmToInches(build.cutLengthMm),
    pointGr: build.pointGr,
    insertGr: build.insertGr,
    nockGr: build.nockGr,
    vaneCount: build.vaneCount,
    vaneGr: build.vaneWeightGr,
    wrapGr: build.wrapGr,
    collarGr: build.collarGr,
  });
  const focPct = build.balancePointMm === null ? null : focPercent({ balancePoint: build.balancePointMm, arrowLength: build.cutLengthMm });
  const speedFps = build.speedFps;
  const energy = speedFps === null ? null : kineticEnergy({ massGr: totalGr, speedFps });
  const impulse = speedFps === null ? null : momentum({ massGr: totalGr, speedFps });
  return {
    totalGr,
    focPct,
    kineticEnergyFtLb: energy?.footPounds ?? null,
    kineticEnergyJ: energy?.joules ?? null,
    momentumSlugFtPerS: impulse?.slugFeetPerSecond ?? null,
    momentumKgMPerS: impulse?.kilogramMetresPerSecond ?? null,
  };
}

/** A sight whose every parameter is known: what simulatedReadings draws marks from. */
export interface KnownSight {
  distanceUnit: DistanceUnit;
  speedFps: number;
  dragCoefficient: number;
  arrowMassGr: number;
  arrowDiameterMm: number;
  peepHeightMm: number;
  sightRadiusMm: number;
  /** Scale reading where the line of sight is parallel to the arrow, mm. */
  scaleZeroMm: number;
  altitudeM?: number;
  temperatureC?: number;
}

/**
 * The exact scale readings (mm, growing as the pin moves down) a sight with
 * these parameters needs at each distance, from the math core's flight model:
 * for the demo scenario and tests, which add their own scatter and rounding.
 * Example: simulatedReadings({ distanceUnit: 'yd', speedFps: 282, dragCoefficient: 2, arrowMassGr: 470, arrowDiameterMm: 6.2,
 *   peepHeightMm: 112, sightRadiusMm: 838, scaleZeroMm: 3 }, [20, 60]) → [≈ 18.46, ≈ 36.67]
 */
export function simulatedReadings(sight: KnownSight, distances: number[]): number[] {
  const air: { altitudeM?: number; temperatureC?: number } = {};
  if (sight.altitudeM !== undefined) air.altitudeM = sight.altitudeM;
  if (sight.temperatureC !== undefined) air.temperatureC = sight.temperatureC;
  const model: SightModel = {
    distanceUnit: sight.distanceUnit,
    speedFps: sight.speedFps,
    dragCoefficient: sight.dragCoefficient,
    airDensityKgM3: airDensityKgM3(air),
    arrowMassGr: sight.arrowMassGr,
    arrowDiameterMm: sight.arrowDiameterMm,
    peepHeightMm: sight.peepHeightMm,
    sightRadiusMm: sight.sightRadiusMm,
    scaleZeroMm: sight.scaleZeroMm,
    gravityMps2: STANDARD_GRAVITY_MPS2,
  };
  return predictMarksMm(model, distances);
}

/**
 * The marks (mm) a stored fit predicts at each distance (in the fit's unit),
 * in math's downward-growing convention, from its model: what a tape's ticks
 * are spaced by. NaN where out of reach.
 * Example: fittedReadings(sightIn.fit, [20, 30]) → [≈ 18.46, ≈ 22.03]
 */
export function fittedReadings(fit: Pick<StoredFit, 'model'>, distances: number[]): number[] {
  return predictMarksMm(fit.model, distances);
}
