import { z } from 'zod';

import { passwordMaxLength, passwordMinLength } from './auth';

/**
 * The signed-in archer's own account: changing the password, downloading
 * everything, deleting the account. Imports only zod (and shared/auth's limits).
 *
 * Example: passwordChangeSchema.safeParse({ currentPassword: 'old one', newPassword: 'short' }).error.issues[0].message
 *   → 'New password must be at least 10 characters'
 */

/** POST /api/me/password: the password now, and the new one (the same rules as at sign-up). */
export const passwordChangeSchema = z
  .object({
    currentPassword: z
      .string({ required_error: 'Enter your current password', invalid_type_error: 'Enter your current password' })
      .min(1, 'Enter your current password')
      .max(passwordMaxLength, `Password must be at most ${passwordMaxLength} characters`),
    newPassword: z
      .string({ required_error: 'Enter a new password', invalid_type_error: 'Enter a new password' })
      .min(passwordMinLength, `New password must be at least ${passwordMinLength} characters`)
      .max(passwordMaxLength, `New password must be at most ${passwordMaxLength} characters`),
  })
  .refine((value) => value.newPassword !== value.currentPassword, {
    message: 'The new password is the same as the current one',
    path: ['newPassword'],
  });

/** POST /api/me/delete: the password typed again, and the words that say it is meant. */
export const accountDeleteSchema = z.object({
  password: z
    .string({
      required_error: 'Enter your password to delete the account',
      invalid_type_error: 'Enter your password to delete the account',
    })
    .min(1, 'Enter your password to delete the account')
    .max(passwordMaxLength, `Password must be at most ${passwordMaxLength} characters`),
});

/** What a password change answers: how many other sign-ins were ended. */
export const passwordChangedSchema = z.object({ message: z.string(), endedSessions: z.number().int() });

/** What an account deletion answers. */
export const accountDeletedSchema = z.object({ message: z.string() });

/** The name shown for an account that has been deleted, where its name used to be. */
export const formerAccountName = 'a former account';

export type PasswordChange = z.infer<typeof passwordChangeSchema>;
export type AccountDelete = z.infer<typeof accountDeleteSchema>;
