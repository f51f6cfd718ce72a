/**
 * Password reset by e-mail (OWASP Forgot Password Cheat Sheet): the same
 * answer and about the same time whether or not the address has an account
 * (the work is done after the answer is sent); a random single-use token,
 * valid one hour, stored as its SHA-256; a successful reset ends every
 * signed-in session of the account and every other reset link; a newer link
 * ends the older ones.
 *
 * Example: startReset('marit@demo.pinwright.test')  // e-mails a link when the account exists
 *          await resetPassword({ token, password: 'a new long password' })
 */
import { config } from '@/server/config';
import { sequelize } from '@/server/db';
import { ApiError } from '@/server/errors';
import { resetMessage } from '@/server/mail/messages';
import { User } from '@/server/models';
import { endAllSessions, hashPassword } from '@/server/services/auth-service';
import { sendMail } from '@/server/services/mail-service';
import { checkToken, consumeToken, issueToken, retireTokens, tokenError, type TokenProblem } from '@/server/services/token-service';
import { resetValidMinutes, type PasswordReset } from '@/shared/password';

const linkWords: Record<TokenProblem, string> = {
  unknown: 'This reset link is not valid. Ask for a new one from the sign-in page.',
  used: 'This reset link has already been used. Ask for a new one if you still need it.',
  expired: 'This reset link has expired (links work for one hour). Ask for a new one.',
};

/** The address of the reset page for a token. */
export function resetLink(raw: string): string {
  return `${config.publicUrl.replace(/\/+$/, '')}/reset-password?token=${raw}`;
}

/** Issues a token and e-mails the link, when an enabled account uses the address. */
export async function sendResetLink(email: string, now = new Date()): Promise<boolean> {
  const user = await User.findOne({ where: { email } });
  if (!user || user.disabled) return false;
  // A new link ends the older ones: only the latest e-mail works.
  await retireTokens({ purpose: 'password-reset', userId: user.id }, now);
  const { raw } = await issueToken({ purpose: 'password-reset', userId: user.id, validMs: resetValidMinutes * 60_000, now });
  await sendMail({ to: user.email, ...resetMessage({ name: user.name, link: resetLink(raw) }) });
  return true;
}

/**
 * POST /api/password/forgot: starts the work and returns at once, so the
 * answer (and its timing) says nothing about whether the account exists.
 * A failure is logged, never shown.
 */
export function startReset(email: string): void {
  sendResetLink(email).catch((err) => {
    console.error(`Password reset for an address could not be sent: ${err instanceof Error ? err.message : err}`);
  });
}

/** POST /api/password/reset: sets the new password, ends every session of the account. */
export async function resetPassword({ token, password }: PasswordReset, now = new Date()): Promise<void> {
  const first = await checkToken('password-reset', token, now);
  if (first.problem) throw tokenError(first.problem, linkWords);
  const passwordHash = await hashPassword(password);
  const userId = await sequelize.transaction(async (transaction) => {
    const { token: row, problem } = await checkToken('password-reset', token, now, transaction);
    if (problem || !row) throw tokenError(problem ?? 'unknown', linkWords);
    const user = row.userId ? await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE }) : null;
    if (!user || user.disabled) throw new ApiError(410, 'link_unknown', linkWords.unknown);
    if (!(await consumeToken(row, now, transaction))) throw tokenError('used', linkWords);
    user.passwordHash = passwordHash;
    await user.save({ transaction });
    await retireTokens({ purpose: 'password-reset', userId: user.id }, now, transaction);
    return user.id;
  });
  await endAllSessions(userId);
}
