import { z } from 'zod';
import { nameSchema, personSchema, textSchema } from './common';
import { defaultToleranceGr } from './arrow-set-stats';

/**
 * Numbered arrow sets on an arrow build: each arrow's weight (gr), spin check
 * (runout in thousandths of an inch or in mm, or pass / fail), a nock or vane
 * note and a status; the set's tolerance around its median (default ±2 gr,
 * common practice, no published source, from memory). Statistics:
 * shared/arrow-set-stats.ts. Arrows that flew out of the group at a sight-in
 * are counted per arrow (one row per sight-in).
 */

export const arrowStatuses = ['quiver', 'practice', 'retired'] as const;
export type ArrowStatus = (typeof arrowStatuses)[number];
export const arrowStatusNames: Record<ArrowStatus, string> = { quiver: 'In the quiver', practice: 'Practice only', retired: 'Retired' };

export const spinKinds = ['none', 'thou', 'mm', 'pass', 'fail'] as const;
export type SpinKind = (typeof spinKinds)[number];

const arrowFields = z.object({
  number: z
    .number({ required_error: 'Enter the arrow’s number', invalid_type_error: 'Arrow number must be a number' })
    .int('Arrow number must be a whole number')
    .min(1, 'Arrow number must be at least 1')
    .max(99, 'Arrow number must be at most 99'),
  weightGr: z
    .number({ required_error: 'Enter the arrow’s weight', invalid_type_error: 'Weight must be a number' })
    .min(100, 'Weight must be at least 100 gr')
    .max(1500, 'Weight must be at most 1500 gr'),
  /** 'thou': runout in thousandths of an inch; 'mm': runout in mm; pass / fail; none: not spun. */
  spinKind: z.enum(spinKinds, { errorMap: () => ({ message: 'Choose how the spin check is given' }) }).default('none'),
  runout: z.number({ invalid_type_error: 'Runout must be a number' }).nullable().default(null),
  note: textSchema('Nock or vane note', 200),
  status: z.enum(arrowStatuses, { errorMap: () => ({ message: 'Choose in the quiver, practice only or retired' }) }).default('quiver'),
});

function checkRunout(arrow: { spinKind: SpinKind; runout: number | null }, ctx: z.RefinementCtx, prefix: (string | number)[] = []) {
  if (arrow.spinKind !== 'thou' && arrow.spinKind !== 'mm') return;
  const limit = arrow.spinKind === 'thou' ? 50 : 1.5;
  const unit = arrow.spinKind === 'thou' ? 'thousandths' : 'mm';
  if (arrow.runout === null || Number.isNaN(arrow.runout))
    ctx.addIssue({ code: 'custom', path: [...prefix, 'runout'], message: `Enter the runout in ${unit}` });
  else if (arrow.runout < 0 || arrow.runout > limit)
    ctx.addIssue({ code: 'custom', path: [...prefix, 'runout'], message: `Runout must be between 0 and ${limit} ${unit}` });
}

export const arrowInputSchema = arrowFields.superRefine((arrow, ctx) => checkRunout(arrow, ctx));

/** Body of POST /api/builds/:buildId/arrow-sets: a set with its arrows. */
export const arrowSetInputSchema = z
  .object({
    name: nameSchema('Set name', 60),
    toleranceGr: z
      .number({ invalid_type_error: 'Tolerance must be a number' })
      .min(0, 'Tolerance must be at least 0 gr')
      .max(50, 'Tolerance must be at most 50 gr')
      .default(defaultToleranceGr),
    arrows: z.array(arrowFields).min(1, 'Add at least one arrow').max(48, 'A set may have at most 48 arrows'),
  })
  .superRefine((set, ctx) => {
    const seen = new Set<number>();
    set.arrows.forEach((arrow, index) => {
      if (seen.has(arrow.number))
        ctx.addIssue({ code: 'custom', path: ['arrows', index, 'number'], message: `Arrow ${arrow.number} is numbered twice` });
      seen.add(arrow.number);
      checkRunout(arrow, ctx, ['arrows', index]);
    });
  });

/** Body of PATCH /api/arrows/:id (the owner): status, note, spin check, weight. */
export const arrowUpdateSchema = arrowFields.omit({ number: true }).partial();

/** Body of POST /api/arrows/:id/fliers: this arrow flew out of the group at that sight-in. */
export const arrowFlierInputSchema = z.object({
  sightInId: z.number({ invalid_type_error: 'Choose the sight-in' }).int().positive('Choose the sight-in'),
  note: textSchema('Note', 200),
});

export const arrowSchema = z.object({
  id: z.number().int(),
  number: z.number().int(),
  weightGr: z.number(),
  spinKind: z.enum(spinKinds),
  runout: z.number().nullable(),
  note: z.string(),
  status: z.enum(arrowStatuses),
  /** Sight-ins at which it flew out of the group. */
  fliers: z.array(z.object({ id: z.number().int(), sightInId: z.number().int(), note: z.string(), addedBy: personSchema })),
});

export const arrowSetSchema = z.object({
  id: z.number().int(),
  buildId: z.number().int(),
  bowId: z.number().int(),
  name: z.string(),
  toleranceGr: z.number(),
  addedBy: personSchema,
  byTechnician: z.boolean(),
  arrows: z.array(arrowSchema),
  /** The build's computed total grains, for the check. */
  buildTotalGr: z.number().nullable(),
  createdAt: z.string(),
});

export type ArrowInput = z.infer<typeof arrowInputSchema>;
export type ArrowSetInput = z.infer<typeof arrowSetInputSchema>;
export type ArrowUpdate = z.infer<typeof arrowUpdateSchema>;
export type Arrow = z.infer<typeof arrowSchema>;
export type ArrowSet = z.infer<typeof arrowSetSchema>;
