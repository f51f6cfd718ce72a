import { z } from 'zod';
import { emailSchema, signUpSchema } from './auth';

/**
 * Sharing a bow with a technician: the invite body, the accept bodies, and
 * the shapes the API returns. Imports only zod.
 *
 * Example: shareInviteSchema.parse({ email: ' Desmond@Example.test ' }) → { email: 'desmond@example.test' }
 */

/** invited: e-mail sent, not yet accepted; active: the technician sees the bow; revoked: ended by the archer. */
export const shareStateSchema = z.enum(['invited', 'active', 'revoked']);

/** Days an invitation link stays valid. */
export const inviteValidDays = 7;

/** A token from an e-mailed link: 32 random bytes, base64url (43 characters). */
export const linkTokenSchema = z
  .string({
    required_error: 'The link is missing its code; open it again from the e-mail',
    invalid_type_error: 'The link is missing its code; open it again from the e-mail',
  })
  .trim()
  .regex(/^[A-Za-z0-9_-]{43}$/, 'The link is not complete; open it again from the e-mail');

/** POST /api/bows/:bowId/shares — the technician's e-mail address. */
export const shareInviteSchema = z.object({ email: emailSchema });

/** POST /api/invites/accept — signed in as a technician. */
export const inviteAcceptSchema = z.object({ token: linkTokenSchema });

/** POST /api/invites/accept-new — create a technician account and accept in one step. */
export const inviteSignUpSchema = signUpSchema.extend({ token: linkTokenSchema });

/** GET /api/invites/:token params. */
export const inviteTokenParamSchema = z.object({ token: linkTokenSchema });

const personSchema = z.object({ id: z.number().int(), name: z.string() });

/** A share as its archer sees it on the bow. */
export const shareSchema = z.object({
  id: z.number().int().positive(),
  bowId: z.number().int().positive(),
  bowNickname: z.string(),
  invitedEmail: z.string(),
  state: shareStateSchema,
  tech: personSchema.extend({ email: z.string() }).nullable(),
  invitedAt: z.string(),
  acceptedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  /** When the newest invitation link stops working (invited shares only). */
  inviteExpiresAt: z.string().nullable(),
});

/** What the accept page shows before anyone signs in. */
export const invitePreviewSchema = z.object({
  archerName: z.string(),
  bowNickname: z.string(),
  invitedEmail: z.string(),
  expiresAt: z.string(),
});

/** A technician's client: an archer and the bows they share with this technician. */
export const clientSchema = z.object({
  archer: personSchema.extend({ email: z.string() }),
  bows: z.array(
    z.object({
      id: z.number().int().positive(),
      nickname: z.string(),
      sightKind: z.string(),
      shareId: z.number().int().positive(),
      sharedSince: z.string(),
    }),
  ),
});

export const shareListResponseSchema = z.object({ shares: z.array(shareSchema) });
export const shareResponseSchema = z.object({ share: shareSchema });
export const clientListResponseSchema = z.object({ clients: z.array(clientSchema) });
export const invitePreviewResponseSchema = z.object({ invite: invitePreviewSchema });

export type ShareState = z.infer<typeof shareStateSchema>;
export type ShareInvite = z.infer<typeof shareInviteSchema>;
export type InviteSignUp = z.infer<typeof inviteSignUpSchema>;
export type Share = z.infer<typeof shareSchema>;
export type InvitePreview = z.infer<typeof invitePreviewSchema>;
export type Client = z.infer<typeof clientSchema>;
