import { z } from 'zod';
import {
  countSchema,
  distanceUnitSchema,
  isoDateSchema,
  measureSchema,
  refIdSchema,
  textSchema,
  timestampsSchema,
} from './common';

/**
 * Sight-in session schemas: a session (bow + build, date, place, air) with its
 * marks. Saving a session saves its whole mark set at once and refits it.
 *
 * Example: sessionInputSchema.parse({ buildId: 3, date: '2026-10-04', marks: [
 *   { distance: 20, unit: 'yd', scaleMm: 12.4 }, { distance: 60, unit: 'yd', scaleMm: 41.9 } ] })
 *   → the same with placeLabel '', altitudeM null, temperatureC null, notes '', each mark arrowsShot null and note ''
 */

/** Fewest marks a session may hold: two marks are the least a fit can use. */
export const minMarks = 2;
/** Most marks a session may hold. */
export const maxMarks = 30;

/** One sighted mark: the scale reading where the arrows grouped at a distance. */
export const markInputSchema = z.object({
  distance: measureSchema('Distance', '', 1, 150),
  unit: distanceUnitSchema.default('yd'),
  /** Reading on the sight's scale, mm. */
  scaleMm: measureSchema('Scale reading', 'mm', 0, 200),
  arrowsShot: countSchema('Arrows shot', '', 1, 99).nullable().default(null),
  note: textSchema('Mark note', 200),
});

/** Yards → metres (exact: 1 yd = 0.9144 m, international yard and pound, 1959). */
const toMetres = (distance: number, unit: 'yd' | 'm') => (unit === 'yd' ? distance * 0.9144 : distance);

const sessionFields = z.object({
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
    .min(minMarks, `Enter at least ${minMarks} marks to fit`)
    .max(maxMarks, `Enter at most ${maxMarks} marks`),
});

type SessionFields = z.infer<typeof sessionFields>;

/** Each distance once per session (compared in metres, so 20 yd and 20 m are different). */
function checkDistinctDistances(value: Partial<SessionFields>, ctx: z.RefinementCtx) {
  if (!value.marks) return;
  const seen: number[] = [];
  value.marks.forEach((mark, index) => {
    const metres = toMetres(mark.distance, mark.unit);
    // Numeric care: the same distance typed twice converts to the same double; 1 mm tolerance absorbs yd/m round trips.
    if (seen.some((other) => Math.abs(other - metres) < 0.001)) {
      ctx.addIssue({
        code: z.ZodIssueCode.custom,
        path: ['marks', index, 'distance'],
        message: `${mark.distance} ${mark.unit} is entered twice; each distance once per session`,
      });
    }
    seen.push(metres);
  });
}

/** Body of POST /api/bows/:bowId/sessions. */
export const sessionInputSchema = sessionFields.superRefine(checkDistinctDistances);
/**
 * Body of PATCH /api/sessions/:id: any subset. `marks`, when given, replaces the
 * whole mark set. The server refits after every change.
 */
export const sessionUpdateSchema = sessionFields.partial().superRefine(checkDistinctDistances);

/** A mark as the API returns it. */
export const markSchema = markInputSchema.extend({ id: z.number().int(), position: z.number().int() });

/**
 * The stored fit (math's fit result). Its exact shape is the math core's
 * `FitResult`; see shared/fit.ts.
 */
export const storedFitSchema = z.unknown();

/** A session as the API returns it, with its marks (in entry order) and its fit. */
export const sessionSchema = sessionFields
  .omit({ marks: true })
  .extend({
    id: z.number().int(),
    bowId: z.number().int(),
    marks: z.array(markSchema),
    fit: storedFitSchema,
  })
  .merge(timestampsSchema);

/** A session in a list: no mark rows, but a summary of its fit. */
export const sessionFitSummarySchema = z.object({
  speedFps: z.number().nullable(),
  rmsMm: z.number().nullable(),
  markCount: z.number().int(),
  longestDistance: z.number().nullable(),
  longestUnit: distanceUnitSchema.nullable(),
  warningCount: z.number().int(),
});

export const sessionListItemSchema = sessionFields
  .omit({ marks: true })
  .extend({ id: z.number().int(), bowId: z.number().int(), summary: sessionFitSummarySchema })
  .merge(timestampsSchema);

export type MarkInput = z.infer<typeof markInputSchema>;
export type SessionInput = z.infer<typeof sessionInputSchema>;
export type SessionFormValues = z.input<typeof sessionInputSchema>;
export type SessionUpdate = z.infer<typeof sessionUpdateSchema>;
export type Mark = z.infer<typeof markSchema>;
export type Session = z.infer<typeof sessionSchema>;
export type SessionFitSummary = z.infer<typeof sessionFitSummarySchema>;
export type SessionListItem = z.infer<typeof sessionListItemSchema>;
