import { z } from 'zod';
import { emailSchema } from './auth';
import { paperSchema } from './tape';

/**
 * Sending a tape's print sheet by e-mail. Imports only zod.
 *
 * Example: sendTapeSchema.parse({ to: 'Me@Example.test' }) → { to: 'me@example.test', paper: 'letter' }
 */

/** Body of POST /api/sessions/:id/send-tape; `tape` picks a saved layout of this session. */
export const sendTapeSchema = z.object({
  to: emailSchema,
  paper: paperSchema.default('letter'),
  tape: z.number({ invalid_type_error: 'Choose a saved tape' }).int().positive().optional(),
});

export type SendTape = z.infer<typeof sendTapeSchema>;
