import { z } from 'zod';
import { distanceUnitSchema, measureSchema, refIdSchema } from './common';
import { buildInputSchema } from './build';
import { distanceLimits, sightModelSchema } from './fit';
import { tapeOrientationSchema, tickSteps } from './tape';
import { queryNumber } from './compare';

/**
 * Predicting a build not shot yet, on a bow with chronographed builds and a
 * fitted sight-in: POST /api/bows/:bowId/predict (a saved build's id, or a
 * new build's components) and its predicted tape GET
 * /api/bows/:bowId/predict/tape.svg. Predicted marks are not sighted marks:
 * confirm them at the range before relying on them.
 *
 * Example: predictRequestSchema.parse({ buildId: 7 }) → { buildId: 7 }
 */

/**
 * Body of POST /api/bows/:bowId/predict: either `buildId` (a saved build on
 * this bow) or `build` (a new build's components, as the build form sends
 * them; its chronographed speed, if given, is used instead of a prediction),
 * and optionally `sightInId`, the sight-in whose sight geometry carries the
 * new arrow (default: the bow's most recent).
 */
export const predictRequestSchema = z
  .object({
    buildId: refIdSchema('arrow build').optional(),
    build: buildInputSchema.optional(),
    sightInId: refIdSchema('sight-in').optional(),
  })
  .strict('Send a buildId or a build, and optionally a sightInId')
  .superRefine((value, ctx) => {
    if ((value.buildId === undefined) === (value.build === undefined)) {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['buildId'], message: 'Choose a saved build or enter a new one (one of the two)' });
    }
  });

/**
 * The build's number fields, under the build input's (and build form's) names,
 * in form order: the ones a tape query carries as text. Units as in
 * buildInputSchema (mm, gr, fps).
 * Example: buildNumberFields[0] → 'spine'
 */
export const buildNumberFields = [
  'spine',
  'grainsPerInch',
  'cutLengthMm',
  'diameterMm',
  'pointGr',
  'insertGr',
  'collarGr',
  'nockGr',
  'vaneCount',
  'vaneWeightGr',
  'wrapGr',
  'balancePointMm',
  'speedFps',
  'dragCoefficient',
] as const;

const componentNumber = z.number({ invalid_type_error: 'Build fields must be numbers' }).nullable().optional();
/** Component numbers as the query carries them; checked against buildInputSchema by the server. */
const componentShape = {
  spine: componentNumber,
  grainsPerInch: componentNumber,
  cutLengthMm: componentNumber,
  diameterMm: componentNumber,
  pointGr: componentNumber,
  insertGr: componentNumber,
  collarGr: componentNumber,
  nockGr: componentNumber,
  vaneCount: componentNumber,
  vaneWeightGr: componentNumber,
  wrapGr: componentNumber,
  balancePointMm: componentNumber,
  speedFps: componentNumber,
  dragCoefficient: componentNumber,
} satisfies Record<(typeof buildNumberFields)[number], typeof componentNumber>;

const stepSchema = z
  .number({ invalid_type_error: 'Tick step must be a number' })
  .refine((step) => tickSteps.some((allowed) => Math.abs(allowed - step) < 1e-9), 'Tick step must be 0.5, 1, 2.5 or 5');

/**
 * Query of GET /api/bows/:bowId/predict/tape.svg: `buildId`, or a new build's
 * components under their build-form names (name, grainsPerInch, cutLengthMm,
 * diameterMm, pointGr, …), optional `sightInId`, and the tape's layout:
 * `from`, `to` (default 20 to 80 in the sight-in's unit), `step`, `width`
 * (default the bow's tape width), `orientation`, `mirror`.
 * Example: ?buildId=7&from=20&to=70
 */
export const predictTapeQuerySchema = z.preprocess(
  (raw) => {
    if (!raw || typeof raw !== 'object') return raw;
    const query = { ...(raw as Record<string, unknown>) };
    for (const key of buildNumberFields) {
      const value = query[key];
      if (value === '' || value === undefined) delete query[key];
      else if (value === 'null') query[key] = null;
      else query[key] = Number(value);
    }
    return query;
  },
  z
    .object({
      buildId: queryNumber(refIdSchema('arrow build')),
      sightInId: queryNumber(refIdSchema('sight-in')),
      name: z.string().trim().max(60, 'Build name must be at most 60 characters').optional(),
      shaftLabel: z.string().trim().max(80, 'Shaft label must be at most 80 characters').optional(),
      ...componentShape,
      from: queryNumber(measureSchema('From distance', '', distanceLimits.min, distanceLimits.max)),
      to: queryNumber(measureSchema('To distance', '', distanceLimits.min, distanceLimits.max)),
      step: queryNumber(stepSchema),
      width: queryNumber(measureSchema('Tape width', 'mm', 6, 40)),
      orientation: tapeOrientationSchema.optional(),
      mirror: z.preprocess((raw) => (raw === undefined || raw === '' ? undefined : raw === 'true' || raw === '1'), z.boolean().optional()),
    })
    .superRefine((value, ctx) => {
      if (value.from !== undefined && value.to !== undefined && value.to <= value.from) {
        ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['to'], message: 'To distance must be beyond the from distance' });
      }
    }),
);

const finiteOrNull = z.number().nullable();

/** A predicted mark beside the sighted build's mark at the same distance (mm, as the archer reads the scale). */
export const predictedMarkSchema = z.object({
  distance: z.number(),
  markMm: finiteOrNull,
  sightedBuildMarkMm: finiteOrNull,
  /** markMm − sightedBuildMarkMm. */
  differenceMm: finiteOrNull,
});

/** The virtual-mass fit of the bow: energy (J), virtual mass (gr), RMS of the speed residuals (fps). */
export const virtualMassSchema = z.object({ energyJ: z.number(), virtualMassGr: z.number(), rmsFps: z.number() });

/** What math's predictBuild returns (less the model). */
export const buildPredictionSchema = z.object({
  massGr: z.number(),
  speedFps: z.number(),
  /** 'chronograph': the build's own measured speed; 'virtual-mass': predicted from the bow's other builds. */
  speedSource: z.enum(['chronograph', 'virtual-mass']),
  kineticEnergyJ: z.number(),
  kineticEnergyFtLbf: z.number(),
  momentumKgMps: z.number(),
  momentumSlugFps: z.number(),
  virtualMass: virtualMassSchema.nullable(),
  dragCoefficient: finiteOrNull,
  /** Unit of the marks' distances (the sight-in's), or null without marks. */
  unit: distanceUnitSchema.nullable(),
  marks: z.array(predictedMarkSchema).nullable(),
  warnings: z.array(z.string()),
  caution: z.string(),
});

/** POST /api/bows/:bowId/predict → this. */
export const predictResponseSchema = z.object({
  bowId: z.number().int(),
  scaleDirection: z.enum(['down', 'up']),
  build: z.object({
    /** The saved build, or null for components. */
    buildId: z.number().int().nullable(),
    name: z.string(),
    totalGr: z.number(),
    focPct: finiteOrNull,
    diameterMm: z.number(),
    chronographedSpeedFps: finiteOrNull,
  }),
  /** The chronographed builds the speed was fitted from. */
  chronographed: z.array(z.object({ buildId: z.number().int(), name: z.string(), massGr: z.number(), speedFps: z.number() })),
  /** The sight-in whose geometry carries the new arrow, or null. */
  sightIn: z
    .object({
      id: z.number().int(),
      date: z.string(),
      placeLabel: z.string(),
      buildName: z.string(),
      altitudeM: finiteOrNull,
      temperatureC: finiteOrNull,
    })
    .nullable(),
  /** Why there are no marks (no fitted sight-in on the bow), or null. */
  marksMissing: z.string().nullable(),
  prediction: buildPredictionSchema,
  /** The predicted sight model (math's, readings growing downward), for drawing the tape; null without marks. */
  model: sightModelSchema.nullable(),
  energyCaution: z.string(),
});

export type PredictRequest = z.infer<typeof predictRequestSchema>;
export type PredictTapeQuery = z.infer<typeof predictTapeQuerySchema>;
export type PredictedMark = z.infer<typeof predictedMarkSchema>;
export type BuildPrediction = z.infer<typeof buildPredictionSchema>;
export type PredictResponse = z.infer<typeof predictResponseSchema>;
