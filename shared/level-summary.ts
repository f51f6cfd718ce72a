import { z } from 'zod';
import { personSchema } from './common';
import { bowChangeKinds, levelStates } from './level-status';

/**
 * A bow's level summary as the API sends it (`readiness.level` in the bow
 * list, GET /api/bows/:bowId/level) and the logged change it lists. Kept apart
 * from ./level (the check's own schemas, re-exported there) so that a screen
 * that only shows a bow's level state, such as the Bench, builds only these.
 */

/** Where a check was done: at the home bench (vise, levels, plumb line) or at the range. */
export const levelPlaceSchema = z.enum(['bench', 'range'], { errorMap: () => ({ message: 'Choose bench or range' }) });

export const bowChangeKindSchema = z.enum(bowChangeKinds, {
  errorMap: () => ({
    message:
      'Choose what changed: string, cables, sight moved, sight re-mounted, rest, peep, arrows, nock height, D-loop, cams, sight radius or other',
  }),
});

export const bowChangeSchema = z.object({
  id: z.number().int(),
  bowId: z.number().int(),
  kind: bowChangeKindSchema,
  changedAt: z.string(),
  note: z.string(),
  loggedBy: personSchema,
  createdAt: z.string(),
});

/** A bow's level state and why: GET /api/bows/:bowId/level, and `readiness.level` in the bows responses. */
export const levelSummarySchema = z.object({
  state: z.enum(levelStates),
  reason: z.string(),
  /** The completed check the state rests on. */
  lastCheck: z
    .object({
      id: z.number().int(),
      place: levelPlaceSchema,
      startedAt: z.string(),
      completedAt: z.string(),
      performedBy: personSchema,
    })
    .nullable(),
  /** Changes logged after that check (all changes when never checked), oldest first. */
  changesSince: z.array(bowChangeSchema),
  /** An unfinished check to resume, if any. */
  openCheckId: z.number().int().nullable(),
  ageDays: z.number().int().nullable(),
  maxAgeDays: z.number().int(),
  rangeConfirmed: z.boolean(),
});

export type LevelPlace = z.infer<typeof levelPlaceSchema>;
export type BowChange = z.infer<typeof bowChangeSchema>;
export type LevelSummary = z.infer<typeof levelSummarySchema>;
