import { z } from 'zod';
import { tripMarksSchema, tripReadinessSchema, tripTapeSchema } from './level';

/** One arrow build's part of Before a trip: its latest sight-in, its latest tape (from its own sight-ins only) and what to look at. */
export const tripBuildSchema = z.object({
  build: z.object({ id: z.number().int(), name: z.string() }),
  /** The build's latest sight-in (each mark shot at the range, so confirmed), or null when it has none. */
  marks: tripMarksSchema
    .extend({
      /** The sight-in's name (shared/sight-in-name.ts). */
      name: z.string(),
    })
    .nullable(),
  /** The last saved tape of the newest of this build's sight-ins that has one. */
  tape: tripTapeSchema.extend({ sightInName: z.string() }).nullable(),
  warnings: z.array(z.string()),
});

/**
 * GET /api/bows/:bowId/readiness: the bow's level, then each arrow build on
 * its own (a build's tape is only ever compared with that build's sight-ins).
 * The older fields (marks, tape, warnings) stay for the build of the latest
 * sight-in; `bowWarnings` are the bow's own (level, no sight-in yet).
 */
export const tripByBuildSchema = tripReadinessSchema.extend({
  bowWarnings: z.array(z.string()),
  /** Builds with sight-ins first (latest sight-in first), then those never sighted in. */
  builds: z.array(tripBuildSchema),
});

export type TripBuild = z.infer<typeof tripBuildSchema>;
export type TripByBuild = z.infer<typeof tripByBuildSchema>;
