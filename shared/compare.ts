import { z } from 'zod';
import { distanceUnitSchema, maxRecordId, measureSchema } from './common';

/**
 * Build comparison schemas: the query of GET /api/bows/:bowId/compare and the
 * comparison it returns (computed by math/compare from each build's latest
 * fitted sight-in). Energy and momentum figures are no legal determination;
 * follow local regulations.
 *
 * Example: compareQuerySchema.parse({ builds: '3,5', at: '40' })
 *   → { builds: [3, 5], at: 40, windowMm: 100 }
 */

/** Fewest and most builds one comparison shows. */
export const compareBuildLimits = { min: 2, max: 4 } as const;

/** A query-string number: '' or absent is undefined, anything else goes through Number(). */
export const queryNumber = <T extends z.ZodTypeAny>(schema: T) =>
  z.preprocess((raw) => (raw === '' || raw === undefined ? undefined : Number(raw)), schema.optional());

/** A comma-separated list of numbers in a query string ("20,30,40"); '' or absent is undefined. */
export const queryNumberList = <T extends z.ZodTypeAny>(schema: T) =>
  z.preprocess((raw) => {
    if (raw === '' || raw === undefined) return undefined;
    const text = Array.isArray(raw) ? raw.join(',') : String(raw);
    return text
      .split(',')
      .map((part) => part.trim())
      .filter((part) => part !== '')
      .map(Number);
  }, schema.optional());

const buildIdSchema = z
  .number({ invalid_type_error: 'Each build id must be a number' })
  .int('Each build id must be a whole number')
  .positive('Each build id must be a positive number')
  .max(maxRecordId, 'There is no build with so large an id');

/**
 * Query of GET /api/bows/:bowId/compare: `builds` (2–4 build ids, comma
 * separated, each once), `at` (where range forgiveness is measured; default
 * 40), `windowMm` (the vertical window, default ±100 mm), optional `unit`
 * (default: the first build's sight-in unit) and an optional common air
 * (`altitudeM`, `temperatureC`): without it each build is shown in the air it
 * was sighted in; with it every build is evaluated in that air.
 */
export const compareQuerySchema = z
  .object({
    builds: z.preprocess(
      (raw) => (raw === undefined || raw === '' ? [] : raw),
      queryNumberList(
        z
          .array(buildIdSchema)
          .min(compareBuildLimits.min, `Choose at least ${compareBuildLimits.min} builds to compare`)
          .max(compareBuildLimits.max, `Compare at most ${compareBuildLimits.max} builds at once`),
      ),
    ),
    at: queryNumber(measureSchema('Forgiveness distance', '', 10, 100)).default(40),
    windowMm: queryNumber(measureSchema('Window', 'mm', 10, 500)).default(100),
    unit: distanceUnitSchema.optional(),
    altitudeM: queryNumber(measureSchema('Altitude', 'm', -500, 5000)),
    temperatureC: queryNumber(measureSchema('Temperature', '°C', -40, 50)),
  })
  .superRefine((value, ctx) => {
    if (!value.builds || value.builds.length < compareBuildLimits.min) {
      if (!value.builds)
        ctx.addIssue({
          code: z.ZodIssueCode.custom,
          path: ['builds'],
          message: `Choose at least ${compareBuildLimits.min} builds to compare`,
        });
      return;
    }
    const seen = new Set<number>();
    value.builds.forEach((id, index) => {
      if (seen.has(id)) ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['builds', index], message: `Build ${id} is listed twice` });
      seen.add(id);
    });
    if (value.temperatureC !== undefined && value.altitudeM === undefined) {
      ctx.addIssue({
        code: z.ZodIssueCode.custom,
        path: ['altitudeM'],
        message: 'Enter the altitude for a common air (the temperature alone is not enough)',
      });
    }
  });

const finiteOrNull = z.number().nullable();

/** Held for `near`, how far below the line of sight the arrow passes at `far` (mm), and the mark gap (mm). */
export const compareDropSchema = z.object({
  near: z.number(),
  far: z.number(),
  dropMm: z.number(),
  gapMm: z.number(),
  nearTimeS: z.number(),
  farTimeS: z.number(),
});

/** The stretch of range within ±windowMm of the line of sight when aimed for `distance`. */
export const compareForgivenessSchema = z.object({
  distance: z.number(),
  windowMm: z.number(),
  nearEdge: z.number(),
  farEdge: z.number(),
  span: z.number(),
  peakAboveMm: z.number(),
});

/** One build's figures, side by side with the others. */
export const comparedBuildSchema = z.object({
  label: z.string(),
  /** Launch speed of the fit, fps. */
  speedFps: z.number(),
  /** Total arrow mass, grains. */
  massGr: z.number(),
  /** Front of centre, %; null when the balance point is not measured. */
  focPct: finiteOrNull,
  kineticEnergyJ: z.number(),
  kineticEnergyFtLbf: z.number(),
  momentumKgMps: z.number(),
  momentumSlugFps: z.number(),
  /** Air the build's marks are evaluated in, kg/m³. */
  airDensityKgM3: z.number(),
  /** Null when the arrow cannot reach the far distance. */
  drop: compareDropSchema.nullable(),
  /** Null when the arrow cannot reach the forgiveness distance. */
  forgiveness: compareForgivenessSchema.nullable(),
});

/** One build's mark at one distance, and its difference from the first (reference) build. */
export const comparedMarkSchema = z.object({
  /** Scale reading as the archer reads it, mm; null when out of reach. */
  markMm: finiteOrNull,
  /** Local slope of this build's mark curve, mm per distance unit. */
  slopeMmPerUnit: finiteOrNull,
  /** This mark − the reference build's mark, mm (0 for the reference). */
  differenceMm: finiteOrNull,
  /**
   * The difference in distance: differenceMm over the reference curve's local
   * slope, i.e. how far out along the reference build's tape this build's mark
   * sits (positive: it needs the reference's mark for a longer shot). Null near
   * the short-range turning point, where the slope is nearly flat.
   */
  differenceDistance: finiteOrNull,
});

/** What math's compareBuilds returns. */
export const buildComparisonSchema = z.object({
  unit: distanceUnitSchema,
  /** The common air of the comparison (kg/m³), or null when each build is in its own sight-in air. */
  commonAirDensityKgM3: finiteOrNull,
  at: z.number(),
  windowMm: z.number(),
  near: z.number(),
  far: z.number(),
  builds: z.array(comparedBuildSchema),
  /** Dense fitted mark curves for the overlay chart, one per build. */
  curves: z.array(z.object({ label: z.string(), points: z.array(z.object({ distance: z.number(), markMm: finiteOrNull })) })),
  /** The table by distance: one entry per build in `marks`, in the order of `builds`. */
  rows: z.array(z.object({ distance: z.number(), marks: z.array(comparedMarkSchema) })),
  caution: z.string(),
});

/** Which record each compared build came from. */
export const compareSourceSchema = z.object({
  buildId: z.number().int(),
  name: z.string(),
  sightInId: z.number().int(),
  sightInDate: z.string(),
  placeLabel: z.string(),
  altitudeM: finiteOrNull,
  temperatureC: finiteOrNull,
  markCount: z.number().int(),
  chronographedSpeedFps: finiteOrNull,
});

/** GET /api/bows/:bowId/compare → this. */
export const compareResponseSchema = z.object({
  bowId: z.number().int(),
  scaleDirection: z.enum(['down', 'up']),
  comparison: buildComparisonSchema,
  sources: z.array(compareSourceSchema),
});

export type CompareQuery = z.infer<typeof compareQuerySchema>;
export type ComparedBuild = z.infer<typeof comparedBuildSchema>;
export type ComparedMark = z.infer<typeof comparedMarkSchema>;
export type BuildComparison = z.infer<typeof buildComparisonSchema>;
export type CompareSource = z.infer<typeof compareSourceSchema>;
export type CompareResponse = z.infer<typeof compareResponseSchema>;
