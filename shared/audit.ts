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
  /** The kind of record, e.g. "level-check", "session-mark", "share", "account". */
  recordType: z.string(),
  recordId: z.number().int().nullable(),
  summary: z.string(),
  at: z.string(),
});

export const auditQuerySchema = z.object({
  page: pageSchema,
});

export const auditListResponseSchema = z.object({
  entries: z.array(auditEntrySchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});

export type AuditEntry = z.infer<typeof auditEntrySchema>;
export type AuditList = z.infer<typeof auditListResponseSchema>;
