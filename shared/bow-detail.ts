import { z } from 'zod';
import { bowSummarySchema } from './bow';
import { buildSchema } from './build';
import { sightInListItemSchema } from './sight-in';
import { tapeSchema } from './tape';

/**
 * One bow's full record as the API returns it. Apart from ./bow so that the
 * Bench, which lists bows only, does not build the build, sight-in and tape
 * schemas as well.
 *
 * GET /api/bows/:id → { bow: BowDetail }: the bow with its builds, sight-ins
 * (newest first, with fit summaries) and tapes, and its owner's name (so a
 * technician it is shared with sees whose records they are).
 */
export const bowDetailSchema = bowSummarySchema.extend({
  /** The archer who owns the bow (User.name of `userId`). */
  ownerName: z.string(),
  builds: z.array(buildSchema),
  sightIns: z.array(sightInListItemSchema),
  tapes: z.array(tapeSchema),
});

export type BowDetail = z.infer<typeof bowDetailSchema>;
