import { z } from 'zod';
import { distanceUnitSchema, isoDateSchema, measureSchema, personSchema, textSchema } from './common';
import { tearValues } from './paper-tune-rules';

/**
 * Paper-tune runs: a distance to the paper, then one entry per shot (the tear
 * read on the diagram, its length, arrows shot, a note, and what was changed
 * before that shot), ending "clean" or "left for the pro shop". The advice is
 * shared/paper-tune-rules.ts. Paper at about 5 yd is common practice (no
 * published source).
 */

export const tuneAdjustmentKinds = ['none', 'nock-height', 'rest', 'cams', 'string', 'd-loop', 'other'] as const;
export type TuneAdjustmentKind = (typeof tuneAdjustmentKinds)[number];
export const tuneAdjustmentNames: Record<TuneAdjustmentKind, string> = {
  none: 'Nothing',
  'nock-height': 'Nock height',
  rest: 'Rest',
  cams: 'Cams or yoke',
  string: 'String',
  'd-loop': 'D-loop',
  other: 'Other',
};

export const runOutcomes = ['open', 'clean', 'pro-shop'] as const;
export type RunOutcome = (typeof runOutcomes)[number];
export const runOutcomeNames: Record<RunOutcome, string> = { open: 'In progress', clean: 'Clean', 'pro-shop': 'Left for the pro shop' };

/** Body of POST /api/bows/:bowId/paper-tunes. */
export const paperTuneStartSchema = z.object({
  distance: measureSchema('Distance to the paper', '', 1, 30),
  unit: distanceUnitSchema,
  startedOn: isoDateSchema,
  buildId: z.number().int().positive().nullable().default(null),
  note: textSchema('Note', 300),
});

export const tearSchema = z.enum(tearValues, { errorMap: () => ({ message: 'Tap the tear on the diagram (or choose a clean hole)' }) });

/** Body of POST /api/paper-tunes/:id/shots. */
export const paperTuneShotInputSchema = z
  .object({
    tear: tearSchema,
    lengthMm: z.number({ invalid_type_error: 'Tear length must be a number' }).nullable().default(null),
    arrows: z
      .number({ invalid_type_error: 'Arrows must be a number' })
      .int('Arrows must be a whole number')
      .min(1, 'Arrows must be at least 1')
      .max(12, 'Arrows must be at most 12')
      .default(1),
    note: textSchema('Note', 300),
    changedBefore: z
      .enum(tuneAdjustmentKinds, { errorMap: () => ({ message: 'Choose what you changed before this shot' }) })
      .default('none'),
    changeNote: textSchema('What you changed', 300),
  })
  .superRefine((shot, ctx) => {
    if (shot.tear === 'clean') return;
    if (shot.lengthMm === null || Number.isNaN(shot.lengthMm))
      ctx.addIssue({ code: 'custom', path: ['lengthMm'], message: 'Enter the tear length' });
    else if (shot.lengthMm <= 0 || shot.lengthMm > 150)
      ctx.addIssue({ code: 'custom', path: ['lengthMm'], message: 'Tear length must be more than 0 and at most 150 mm' });
  })
  .transform((shot) => (shot.tear === 'clean' ? { ...shot, lengthMm: null } : shot));

/** Body of POST /api/paper-tunes/:id/end. */
export const paperTuneEndSchema = z.object({
  outcome: z.enum(['clean', 'pro-shop'], { errorMap: () => ({ message: 'Choose how the run ended: clean, or left for the pro shop' }) }),
  note: textSchema('Note', 300),
});

export const paperTuneShotSchema = z.object({
  id: z.number().int(),
  position: z.number().int(),
  tear: tearSchema,
  lengthMm: z.number().nullable(),
  arrows: z.number().int(),
  note: z.string(),
  changedBefore: z.enum(tuneAdjustmentKinds),
  changeNote: z.string(),
  addedBy: personSchema,
  createdAt: z.string(),
});

export const paperTuneRunSchema = z.object({
  id: z.number().int(),
  bowId: z.number().int(),
  buildId: z.number().int().nullable(),
  distance: z.number(),
  unit: distanceUnitSchema,
  startedOn: z.string(),
  outcome: z.enum(runOutcomes),
  endedAt: z.string().nullable(),
  note: z.string(),
  endNote: z.string(),
  addedBy: personSchema,
  byTechnician: z.boolean(),
  shots: z.array(paperTuneShotSchema),
  createdAt: z.string(),
});

export type PaperTuneStart = z.infer<typeof paperTuneStartSchema>;
export type PaperTuneShotInput = z.infer<typeof paperTuneShotInputSchema>;
export type PaperTuneEnd = z.infer<typeof paperTuneEndSchema>;
export type PaperTuneShot = z.infer<typeof paperTuneShotSchema>;
export type PaperTuneRun = z.infer<typeof paperTuneRunSchema>;
