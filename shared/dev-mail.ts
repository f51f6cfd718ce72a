import { z } from 'zod';

/**
 * Shapes of the development mail reader (GET /api/dev/mail): what the local
 * fake SMTP service received. Imports only zod.
 *
 * Example: mailSummarySchema.parse({ id: '20270101T120000000Z-ab12cd', receivedAt: '2027-01-01T12:00:00.000Z',
 *   to: ['tech@example.test'], subject: 'A bow was shared with you', attachmentCount: 0 })
 */

/** A stored message's id: a time stamp and a random suffix (safe as a file name). */
export const mailIdSchema = z.string().regex(/^[0-9TZ]{19}-[a-f0-9]{12}$/, 'That is not a message id');

export const mailSummarySchema = z.object({
  id: mailIdSchema,
  receivedAt: z.string(),
  /** Envelope recipients. */
  to: z.array(z.string()),
  subject: z.string(),
  attachmentCount: z.number().int().min(0),
});

export const mailLinkSchema = z.object({
  href: z.string(),
  /** Path inside this app when the link points at it (e.g. "/invite?token=…"), else null. */
  appPath: z.string().nullable(),
});

export const mailMessageSchema = mailSummarySchema.extend({
  from: z.string(),
  text: z.string().nullable(),
  html: z.string().nullable(),
  links: z.array(mailLinkSchema),
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), sizeBytes: z.number().int().min(0) })),
});

export const mailListQuerySchema = z.object({
  to: z.string().trim().toLowerCase().max(254, 'The address must be at most 254 characters').optional(),
});

export const mailParamsSchema = z.object({ id: mailIdSchema });
export const mailAttachmentParamsSchema = z.object({
  id: mailIdSchema,
  index: z.coerce
    .number({ invalid_type_error: 'The attachment number must be a number' })
    .int()
    .min(0)
    .max(999, 'No message has that many attachments'),
});

export type MailSummary = z.infer<typeof mailSummarySchema>;
export type MailMessage = z.infer<typeof mailMessageSchema>;
export type MailLink = z.infer<typeof mailLinkSchema>;
