import { z } from 'zod';
import { addedBySchema } from './added-by';
import { countSchema, distanceUnitSchema, isoDateSchema, measureSchema, refIdSchema, textSchema, timestampsSchema } from './common';
import { distanceToMetres } from '@/math/units/convert';
import { distanceLimits, sightModelSchema } from './fit';

/**
 * Sight-in schemas: a sight-in (bow + build, date, place, air) with its
 * marks. Saving a sight-in saves its whole mark set at once and refits it.
 *
 * Example: sightInInputSchema.parse({ buildId: 3, date: '2026-10-04', marks: [
 *   { distance: 20, unit: 'yd', scaleMm: 12.4 }, { distance: 60, unit: 'yd', scaleMm: 41.9 } ] })
 *   → the same with placeLabel '', altitudeM null, temperatureC null, notes '', each mark arrowsShot null and note ''
 */

/**
 * Fewest marks a sight-in may hold: one, which fits only when the build has a
 * chronographed speed (an estimate from one mark; the server refuses it
 * otherwise, with ONE_MARK_SIGHT_IN_MESSAGE); two or more fit any build.
 */
export const minMarks = 1;
/** The server's refusal of one mark when the build has no chronographed speed (field `marks`). */
export const ONE_MARK_SIGHT_IN_MESSAGE = 'Enter at least 2 marks to fit, or one mark with a chronographed speed on the arrow build';
/** Most marks a sight-in may hold. */
export const maxMarks = 30;

/** One sighted mark: the scale reading where the arrows grouped at a distance. */
export const markInputSchema = z.object({
  distance: measureSchema('Distance', '', distanceLimits.min, distanceLimits.max),
  unit: distanceUnitSchema.default('yd'),
  /** Reading on the sight's scale, mm. */
  scaleMm: measureSchema('Scale reading', 'mm', 0, 200),
  arrowsShot: countSchema('Arrows shot', '', 1, 99).nullable().default(null),
  note: textSchema('Mark note', 200),
});

const sightInFields = z.object({
  buildId: refIdSchema('arrow build'),
  date: isoDateSchema,
  placeLabel: textSchema('Place', 80),
  /** Altitude above sea level, m; null if not known (the fit then assumes sea level). */
  altitudeM: measureSchema('Altitude', 'm', -500, 5000).nullable().default(null),
  /** Air temperature, °C; null if not known (the fit then uses the standard atmosphere). */
  temperatureC: measureSchema('Temperature', '°C', -40, 50).nullable().default(null),
  notes: textSchema('Notes', 2000),
  marks: z
    .array(markInputSchema, { required_error: 'Enter the marks', invalid_type_error: 'Marks must be a list' })
    .min(minMarks, 'Enter at least 2 marks to fit (or one, with a chronographed speed on the arrow build)')
    .max(maxMarks, `Enter at most ${maxMarks} marks`),
});

type SightInFields = z.infer<typeof sightInFields>;

/** Each distance once per sight-in (compared in metres, so 20 yd and 20 m are different). */
function checkDistinctDistances(value: Partial<SightInFields>, ctx: z.RefinementCtx) {
  if (!value.marks) return;
  const seen: number[] = [];
  value.marks.forEach((mark, index) => {
    const metres = distanceToMetres(mark.distance, mark.unit);
    // Numeric care: the same distance typed twice converts to the same double; 1 mm tolerance absorbs yd/m round trips.
    if (seen.some((other) => Math.abs(other - metres) < 0.001)) {
      ctx.addIssue({
        code: z.ZodIssueCode.custom,
        path: ['marks', index, 'distance'],
        message: `${mark.distance} ${mark.unit} is entered twice; each distance once per sight-in`,
      });
    }
    seen.push(metres);
  });
}

/** Body of POST /api/bows/:bowId/sight-ins. */
export const sightInInputSchema = sightInFields.superRefine(checkDistinctDistances);
/**
 * Body of PATCH /api/sight-ins/:id: any subset. `marks`, when given, replaces the
 * whole mark set. The server refits after every change.
 */
export const sightInUpdateSchema = sightInFields.partial().superRefine(checkDistinctDistances);

/** A mark as the API returns it. */
export const markSchema = markInputSchema.extend({ id: z.number().int(), position: z.number().int(), addedBy: addedBySchema.optional() });

/**
 * The fit stored with a sight-in: the math core's fit result (see math/README.md),
 * with readings expressed as the archer reads the scale (for an upward-growing
 * scale the server maps the math's downward-positive readings back), plus
 * `scaleDirection`. `model` is the math core's own serialisable sight model
 * (downward-positive readings); the server evaluates it for tapes and sheets.
 * Distances are in `distanceUnit` (the unit of the sight-in's first mark);
 * a predicted mark the arrow cannot reach has markMm null.
 */
export const storedFitSchema = z
  .object({
    distanceUnit: distanceUnitSchema,
    scaleDirection: z.enum(['down', 'up']),
    speedFps: z.number(),
    dragCoefficient: z.number(),
    peepHeightMm: z.number(),
    sightRadiusMm: z.number(),
    scaleZeroMm: z.number(),
    /** RMS of the residuals, mm (0 for an exact two-mark fit). */
    rmsMm: z.number(),
    /** 'one-mark': one mark and the build's chronographed speed, every other distance an estimate. */
    method: z.enum(['one-mark', 'two-mark', 'least-squares']),
    airDensityKgM3: z.number(),
    /** Predicted marks with one-sigma bands (mm, and in distance); `verify`: confirm at the range. */
    marks: z.array(
      z.object({
        distance: z.number(),
        markMm: z.number().nullable(),
        sigmaMm: z.number().nullable(),
        sigmaDistance: z.number().nullable(),
        verify: z.boolean(),
      }),
    ),
    /** One per sighted mark, nearest first: residual = entered − fitted, mm. */
    residuals: z.array(
      z.object({
        distance: z.number(),
        markMm: z.number(),
        fittedMm: z.number(),
        residualMm: z.number(),
        standardised: z.number(),
        outlier: z.boolean(),
      }),
    ),
    /** The distance whose next mark would shrink the bands most, or null. */
    nextDistance: z.number().nullable(),
    warnings: z.array(z.object({ code: z.string(), message: z.string(), distance: z.number().optional() })),
    /** math's SightModel (shared/fit.ts sightModelSchema), readings growing downward. */
    model: sightModelSchema,
  })
  .passthrough();

/** A sight-in as the API returns it, with its marks (in entry order) and its fit. */
export const sightInSchema = sightInFields
  .omit({ marks: true })
  .extend({
    id: z.number().int(),
    bowId: z.number().int(),
    marks: z.array(markSchema),
    fit: storedFitSchema,
    addedBy: addedBySchema.optional(),
  })
  .merge(timestampsSchema);

/** A sight-in in a list: no mark rows, but a summary of its fit. */
export const sightInFitSummarySchema = z.object({
  speedFps: z.number().nullable(),
  rmsMm: z.number().nullable(),
  markCount: z.number().int(),
  longestDistance: z.number().nullable(),
  longestUnit: distanceUnitSchema.nullable(),
  warningCount: z.number().int(),
});

export const sightInListItemSchema = sightInFields
  .omit({ marks: true })
  .extend({ id: z.number().int(), bowId: z.number().int(), summary: sightInFitSummarySchema, addedBy: addedBySchema.optional() })
  .merge(timestampsSchema);

export type MarkInput = z.infer<typeof markInputSchema>;
export type SightInInput = z.infer<typeof sightInInputSchema>;
export type SightInFormValues = z.input<typeof sightInInputSchema>;
export type SightInUpdate = z.infer<typeof sightInUpdateSchema>;
export type Mark = z.infer<typeof markSchema>;
export type SightIn = z.infer<typeof sightInSchema>;
export type StoredFit = z.infer<typeof storedFitSchema>;
export type SightInFitSummary = z.infer<typeof sightInFitSummarySchema>;
export type SightInListItem = z.infer<typeof sightInListItemSchema>;
