import { z } from 'zod';
import { emailSchema, passwordMaxLength, passwordMinLength } from './auth';
import { linkTokenSchema } from './share';

/**
 * Password reset by e-mail: ask for a link, then choose a new password with
 * the link's code. Imports only zod.
 *
 * Example: passwordForgotSchema.parse({ email: 'Ada@Example.org' }) → { email: 'ada@example.org' }
 */

/** Minutes a reset link stays valid. */
export const resetValidMinutes = 60;

/** POST /api/password/forgot */
export const passwordForgotSchema = z.object({ email: emailSchema });

/** POST /api/password/reset */
export const passwordResetSchema = z.object({
  token: linkTokenSchema,
  password: z
    .string({ required_error: 'Enter a new password', invalid_type_error: 'Enter a new password' })
    .min(passwordMinLength, `Password must be at least ${passwordMinLength} characters`)
    .max(passwordMaxLength, `Password must be at most ${passwordMaxLength} characters`),
});

/** The one answer to a reset request, whether or not the address has an account. */
export const forgotAnswer = 'If an account uses that address, a link to choose a new password is on its way. It works once, for one hour.';

export const messageResponseSchema = z.object({ message: z.string() });

export type PasswordForgot = z.infer<typeof passwordForgotSchema>;
export type PasswordReset = z.infer<typeof passwordResetSchema>;
