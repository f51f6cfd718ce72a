import { z } from 'zod';
import { maxRecordId } from './common';
import { emailSchema } from './auth';
import { paperSchema } from './tape';

/**
 * Sending a tape's print sheet by e-mail. Imports only zod.
 *
 * Example: sendTapeSchema.parse({ to: 'Me@Example.test', paper: 'a4' }) → { to: 'me@example.test', paper: 'a4' }
 */

/**
 * Body of POST /api/sight-ins/:id/send-tape. The sheet is laid out like the
 * download GET /api/sight-ins/:id/sheet.pdf: `tape` picks a saved layout of
 * this sight-in, or `layout` carries that download's query string
 * ("from=20&to=80&step=1…"); otherwise the defaults from the fit. `paper` wins over both.
 */
export const sendTapeSchema = z.object({
  to: emailSchema,
  paper: paperSchema.optional(),
  tape: z.number({ invalid_type_error: 'Choose a saved tape' }).int().positive().max(maxRecordId, 'Choose a saved tape').optional(),
  layout: z.string({ invalid_type_error: 'The layout must be a query string' }).max(500, 'The layout is too long').optional(),
});

export type SendTape = z.infer<typeof sendTapeSchema>;
