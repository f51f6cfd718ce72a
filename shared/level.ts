import { z } from 'zod';
import { distanceUnitSchema, isoDateSchema, maxRecordId, personSchema, textSchema } from './common';
import { levelResults, levelStepKeys, levelStepNames, type LevelStepKey } from './level-status';
import { bowChangeKindSchema, bowChangeSchema, levelPlaceSchema, levelSummarySchema } from './level-summary';

/**
 * Level-check schemas: starting and working a check step by step, logging a
 * change on a bow, and the shapes the API returns (a check, a change, a bow's
 * level summary, the before-a-trip readiness sheet). The state rule itself is
 * in ./level-status (pure, no imports). Imports only zod and its siblings.
 *
 * Example: stepUpdateSchema.parse({ step: 'second-axis', result: 'adjusted',
 *   reading: 0.5, readingUnit: 'deg', adjustment: 'Rotated the housing a hair clockwise' })
 *   → the same (adjustment trimmed)
 */

export { bowChangeKinds, bowChangeLabels, levelStepKeys, levelStepNames, levelStates } from './level-status';
export type { BowChangeKind, LevelResult, LevelState, LevelStepKey } from './level-status';
// The Bench's cards need only these; they live in a module of their own so the Bench does not build every check schema.
export { bowChangeKindSchema, bowChangeSchema, levelPlaceSchema, levelSummarySchema } from './level-summary';
export type { BowChange, LevelPlace, LevelSummary } from './level-summary';

export const levelStepKeySchema = z.enum(levelStepKeys, {
  errorMap: () => ({ message: 'Choose one of the steps: set-up, first axis, second axis, third axis or range' }),
});

export const levelResultSchema = z.enum(levelResults, {
  errorMap: () => ({ message: 'Choose pass, adjusted, fail or skipped' }),
});

/**
 * Unit of a step's optional reading: degrees of tilt, millimetres of bubble
 * (or plumb-line) offset, or bubble widths off centre.
 */
export const readingUnitSchema = z.enum(['deg', 'mm', 'bubble'], {
  errorMap: () => ({ message: 'Choose the reading unit: degrees, mm or bubble widths' }),
});

/** Largest reading accepted per unit (a bigger one is a typing slip, not a tilt). */
export const readingLimits: Record<z.infer<typeof readingUnitSchema>, number> = { deg: 45, mm: 50, bubble: 5 };

/** Unit labels for the reading field. */
export const readingUnitLabels: Record<z.infer<typeof readingUnitSchema>, string> = {
  deg: 'degrees',
  mm: 'mm offset',
  bubble: 'bubble widths',
};

/** Longest adjustment note, in characters. */
export const adjustmentMaxLength = 500;

/** Body of POST /api/bows/:bowId/checks: start a check. */
export const checkStartSchema = z.object({ place: levelPlaceSchema.default('bench') });

/** One step's result as entered. `result` null clears it (the step is not worked yet). */
export const stepUpdateSchema = z
  .object({
    step: levelStepKeySchema,
    result: levelResultSchema.nullable(),
    reading: z.number({ invalid_type_error: 'Reading must be a number' }).finite('Reading must be a number').nullable().default(null),
    readingUnit: readingUnitSchema.nullable().default(null),
    adjustment: textSchema('Adjustment', adjustmentMaxLength),
  })
  .superRefine((value, ctx) => {
    if (value.reading !== null && value.readingUnit === null) {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['readingUnit'], message: 'Choose the unit of the reading' });
    }
    if (value.reading !== null && value.readingUnit !== null) {
      const limit = readingLimits[value.readingUnit];
      if (Math.abs(value.reading) > limit) {
        ctx.addIssue({
          code: z.ZodIssueCode.custom,
          path: ['reading'],
          message: `Reading must be between -${limit} and ${limit} ${readingUnitLabels[value.readingUnit]}`,
        });
      }
    }
    if (value.result === 'adjusted' && value.adjustment === '') {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['adjustment'], message: 'Say what you adjusted' });
    }
  });

/** One step as the guided check saves it: like stepUpdateSchema, but a result must be chosen. */
export const stepEntrySchema = stepUpdateSchema.refine((value) => value.result !== null, {
  path: ['result'],
  message: 'Choose a result: pass, adjusted, fail or skipped',
});

/**
 * Body of PATCH /api/checks/:id: results for some steps, the check's note or
 * place, and/or `complete: true` to finish it (every step must then have a
 * result). A completed check is a record and cannot be changed.
 */
export const checkUpdateSchema = z
  .object({
    steps: z
      .array(stepUpdateSchema, { invalid_type_error: 'Steps must be a list' })
      .max(levelStepKeys.length, `Give at most ${levelStepKeys.length} steps`)
      .optional(),
    place: levelPlaceSchema.optional(),
    note: z.string({ invalid_type_error: 'Note must be text' }).trim().max(1000, 'Note must be at most 1000 characters').optional(),
    complete: z.literal(true, { errorMap: () => ({ message: 'Complete may only be true' }) }).optional(),
  })
  .superRefine((value, ctx) => {
    if (value.steps === undefined && value.place === undefined && value.note === undefined && value.complete === undefined) {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: [], message: 'Give step results, a note, a place or complete' });
    }
    const seen = new Set<string>();
    value.steps?.forEach((step, index) => {
      if (seen.has(step.step)) {
        ctx.addIssue({
          code: z.ZodIssueCode.custom,
          path: ['steps', index, 'step'],
          message: `The ${levelStepNames[step.step]} is listed twice`,
        });
      }
      seen.add(step.step);
    });
  });

/** Params of /api/checks/:id/steps/:step/photo. */
export const stepPhotoParamsSchema = z.object({
  id: z.coerce
    .number({ invalid_type_error: 'The check id must be a number' })
    .int('The check id must be a whole number')
    .positive('The check id must be a positive number')
    .max(maxRecordId, 'There is no check with so large an id'),
  step: levelStepKeySchema,
});

/** Body of POST /api/bows/:bowId/changes. `changedAt` is a full ISO 8601 timestamp with zone. */
export const bowChangeInputSchema = z.object({
  kind: bowChangeKindSchema,
  changedAt: z
    .string({ required_error: 'Enter when it changed', invalid_type_error: 'Enter when it changed' })
    .datetime({ offset: true, message: 'Enter when it changed as a date and time' }),
  note: textSchema('Note', 500),
});

/**
 * The change form: a date and an optional time of day (HH:MM, local). The
 * client turns it into `changedAt` with `changedAtFrom` below.
 */
export const bowChangeFormSchema = z.object({
  kind: bowChangeKindSchema,
  date: isoDateSchema,
  time: z
    .string()
    .trim()
    .regex(/^$|^([01]\d|2[0-3]):[0-5]\d$/, 'Enter the time as HH:MM (24-hour), or leave it empty')
    .default(''),
  note: textSchema('Note', 500),
});

/**
 * The timestamp of a change entered as a local date and optional time. Without
 * a time: now when the date is today, otherwise the end of that day (23:59:59.999
 * local), so a change logged for the day of a check counts as after it — when in
 * doubt, check again.
 * Example: changedAtFrom('2026-11-20', '14:05', new Date(...)) → Date of 2026-11-20 14:05 local
 */
export function changedAtFrom(date: string, time: string, now: Date): Date {
  const [year, month, day] = date.split('-').map(Number);
  if (time) {
    const [hours, minutes] = time.split(':').map(Number);
    return new Date(year, month - 1, day, hours, minutes, 0, 0);
  }
  const isToday = now.getFullYear() === year && now.getMonth() === month - 1 && now.getDate() === day;
  return isToday ? now : new Date(year, month - 1, day, 23, 59, 59, 999);
}

// ---- Shapes the API returns ----

export const photoSchema = z.object({
  id: z.number().int(),
  /** Where to fetch it (same-origin, owner only). */
  url: z.string(),
  mimeType: z.enum(['image/jpeg', 'image/png', 'image/webp']),
  sizeBytes: z.number().int(),
});

export const levelStepSchema = z.object({
  step: levelStepKeySchema,
  result: levelResultSchema.nullable(),
  reading: z.number().nullable(),
  readingUnit: readingUnitSchema.nullable(),
  adjustment: z.string(),
  photo: photoSchema.nullable(),
  updatedAt: z.string(),
});

export const levelCheckSchema = z.object({
  id: z.number().int(),
  bowId: z.number().int(),
  performedBy: personSchema,
  place: levelPlaceSchema,
  status: z.enum(['open', 'complete']),
  startedAt: z.string(),
  completedAt: z.string().nullable(),
  note: z.string(),
  /** In the order of levelStepKeys. */
  steps: z.array(levelStepSchema),
});

export const checkResponseSchema = z.object({ check: levelCheckSchema });
export const checkListResponseSchema = z.object({ checks: z.array(levelCheckSchema) });
export const changeListResponseSchema = z.object({ changes: z.array(bowChangeSchema) });
export const changeResponseSchema = z.object({ change: bowChangeSchema, level: levelSummarySchema });
export const photoResponseSchema = z.object({ photo: photoSchema });

/** A sight-in's marks as Before a trip lists them (each shot at the range, so confirmed). */
export const tripMarksSchema = z.object({
  sightInId: z.number().int(),
  date: z.string(),
  placeLabel: z.string(),
  marks: z.array(z.object({ distance: z.number(), unit: distanceUnitSchema, scaleMm: z.number() })),
  longestDistance: z.number().nullable(),
  longestUnit: distanceUnitSchema.nullable(),
});

/** A saved tape as Before a trip lists it, with the sight-in it was printed from. */
export const tripTapeSchema = z.object({
  id: z.number().int(),
  sightInId: z.number().int(),
  sightInDate: z.string(),
  fromDistance: z.number(),
  toDistance: z.number(),
  unit: distanceUnitSchema,
  label: z.string(),
  savedAt: z.string(),
  fromLatestSightIn: z.boolean(),
});

/** GET /api/bows/:bowId/readiness: what to know before a trip, on one page. */
export const tripReadinessSchema = z.object({
  bow: z.object({ id: z.number().int(), nickname: z.string(), sightDescription: z.string() }),
  level: levelSummarySchema,
  /** The latest sight-in's marks (each shot at the range), or null without a sight-in. */
  marks: tripMarksSchema.extend({ buildName: z.string().nullable() }).nullable(),
  /** The most recently saved tape and the sight-in it was printed from. */
  tape: tripTapeSchema.nullable(),
  /** Plain sentences: what to look at before leaving. */
  warnings: z.array(z.string()),
  generatedAt: z.string(),
});

export type ReadingUnit = z.infer<typeof readingUnitSchema>;
export type CheckStart = z.infer<typeof checkStartSchema>;
export type StepUpdate = z.infer<typeof stepUpdateSchema>;
export type StepEntry = z.infer<typeof stepEntrySchema>;
export type CheckUpdate = z.infer<typeof checkUpdateSchema>;
export type BowChangeInput = z.infer<typeof bowChangeInputSchema>;
export type BowChangeFormValues = z.input<typeof bowChangeFormSchema>;
export type Photo = z.infer<typeof photoSchema>;
export type LevelStep = z.infer<typeof levelStepSchema>;
export type LevelCheck = z.infer<typeof levelCheckSchema>;
export type TripReadiness = z.infer<typeof tripReadinessSchema>;

/** Position of a step in the check (0-based). */
export function stepIndex(step: LevelStepKey): number {
  return levelStepKeys.indexOf(step);
}
