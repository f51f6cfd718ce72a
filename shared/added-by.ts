import { z } from 'zod';

/**
 * Who added a record (a build, a sight-in, a mark): an account's id and name,
 * or null once that account has been deleted ("a former account").
 */
export const addedBySchema = z.object({ id: z.number().int(), name: z.string() }).nullable();

export type AddedBy = z.infer<typeof addedBySchema>;
