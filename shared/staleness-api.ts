import { z } from 'zod';
import { personSchema, textSchema } from './common';

/**
 * What the API sends about the staleness rule (shared/staleness.ts): the
 * Bench's one line per bow, and one sight-in's state with its confirmations.
 */

/** A bow's tape (or latest sight-in) that must be confirmed at the range, with the reason. */
export const bowConfirmSchema = z.object({
  reason: z.string(),
  /** When the first change that counts happened (ISO). */
  since: z.string().nullable(),
  sightInId: z.number().int(),
  tapeId: z.number().int().nullable(),
});

export const sightInStalenessSchema = z.object({
  sightInId: z.number().int(),
  state: z.enum(['current', 'confirm']),
  reason: z.string(),
  since: z.string().nullable(),
  changeIds: z.array(z.union([z.number(), z.string()])),
  /** True when the user may record a confirmation (the archer, or a technician with the share). */
  canConfirm: z.boolean(),
  confirmations: z.array(z.object({ id: z.number().int(), confirmedAt: z.string(), note: z.string(), confirmedBy: personSchema })),
});

/** Body of POST /api/sight-ins/:id/confirm-range. */
export const confirmRangeInputSchema = z.object({ note: textSchema('Note', 300) });

export type BowConfirm = z.infer<typeof bowConfirmSchema>;
export type SightInStaleness = z.infer<typeof sightInStalenessSchema>;
