import { z } from 'zod';
import { pageSchema } from './common';

/**
 * The audit log as the API returns it (a bow's log for its archer, the whole
 * log for an administrator). Imports only zod.
 *
 * Example: auditQuerySchema.parse({ page: '2' }) → { page: 2 }
 */

export const auditEntrySchema = z.object({
  id: z.number().int().positive(),
  /** Who did it (null when that account was deleted). */
  actor: z.object({ id: z.number().int(), name: z.string(), role: z.string() }).nullable(),
  /** What kind of change: created, updated, deleted, invited, accepted, revoked, role-changed, disabled, enabled. */
  action: z.string(),
  bowId: z.number().int().nullable(),
  /** The bow it is about, by name, with its archer (null: no bow, or the bow has since been deleted). */
  bow: z.object({ id: z.number().int(), nickname: z.string(), ownerId: z.number().int(), ownerName: z.string() }).nullable().optional(),
  /** For an entry about an account (role changed, disabled…): that account (null once it is deleted). */
  account: z.object({ id: z.number().int(), name: z.string(), email: z.string() }).nullable().optional(),
  /** The kind of record, e.g. "level-check", "sight-in-mark", "share", "account". */
  recordType: z.string(),
  recordId: z.number().int().nullable(),
  summary: z.string(),
  at: z.string(),
});

export const auditQuerySchema = z.object({
  page: pageSchema,
});

const optionalId = (what: string) =>
  z.coerce
    .number({ invalid_type_error: `The ${what} id must be a number` })
    .int(`The ${what} id must be a whole number`)
    .positive(`The ${what} id must be a positive number`)
    .optional();

/** The administrator's log: a page, narrowed to one bow, one account (what it did, what was done to it or its bows) and one kind of record. */
export const adminAuditQuerySchema = auditQuerySchema.extend({
  bowId: optionalId('bow'),
  accountId: optionalId('account'),
  kind: z
    .string()
    .trim()
    .regex(/^[a-z-]{1,40}$/, 'The kind is a record kind such as "share" or "sight-in-mark"')
    .optional(),
});

export const auditListResponseSchema = z.object({
  entries: z.array(auditEntrySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  /** The kinds of record the log holds (the administrator's filter choices). */
  kinds: z.array(z.string()).optional(),
  /** The bow and account the list is narrowed to, by name (absent when not filtered or not found). */
  filters: z
    .object({
      bow: z.object({ id: z.number().int(), nickname: z.string() }).nullable(),
      account: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    })
    .optional(),
});

export type AuditEntry = z.infer<typeof auditEntrySchema>;
export type AuditList = z.infer<typeof auditListResponseSchema>;
export type AdminAuditQuery = z.infer<typeof adminAuditQuerySchema>;
