/**
 * Single-use, expiring tokens for e-mailed links (password reset, share
 * invite). A token is 32 random bytes (base64url, 43 characters); only its
 * SHA-256 is stored (OWASP Forgot Password Cheat Sheet: random, single use,
 * expiring, stored securely), so a copy of the table cannot be used.
 *
 * Example: const raw = await issueToken({ purpose: 'password-reset', userId: 7, validMs: 3600_000 });
 *          (await checkToken('password-reset', raw)).problem → null
 */
import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { ApiError } from '@/server/errors';
import { Token } from '@/server/models';
import type { TokenPurpose } from '@/server/models/token';

/** SHA-256 of the token text, hex (64 characters). */
export function hashToken(raw: string): string {
  return crypto.createHash('sha256').update(raw, 'utf8').digest('hex');
}

/** Creates a token and returns its text (the only copy; put it in the e-mail). */
export async function issueToken(
  {
    purpose,
    userId = null,
    shareId = null,
    validMs,
    now = new Date(),
  }: { purpose: TokenPurpose; userId?: number | null; shareId?: number | null; validMs: number; now?: Date },
  transaction?: Transaction,
): Promise<{ raw: string; token: Token }> {
  const raw = crypto.randomBytes(32).toString('base64url');
  const token = await Token.create(
    { purpose, tokenHash: hashToken(raw), userId, shareId, expiresAt: new Date(now.getTime() + validMs), usedAt: null },
    { transaction },
  );
  return { raw, token };
}

export type TokenProblem = 'unknown' | 'used' | 'expired';

/** Looks a token up: the row, and why it cannot be used (null when it can). */
export async function checkToken(
  purpose: TokenPurpose,
  raw: string,
  now = new Date(),
  transaction?: Transaction,
): Promise<{ token: Token | null; problem: TokenProblem | null }> {
  const token = await Token.findOne({
    where: { purpose, tokenHash: hashToken(raw) },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!token) return { token: null, problem: 'unknown' };
  if (token.usedAt) return { token, problem: 'used' };
  if (token.expiresAt.getTime() <= now.getTime()) return { token, problem: 'expired' };
  return { token, problem: null };
}

/** The error for a token that cannot be used, in words for the person holding the link. */
export function tokenError(problem: TokenProblem, { used, expired, unknown }: Record<TokenProblem, string>): ApiError {
  if (problem === 'unknown') return new ApiError(404, 'link_unknown', unknown);
  return new ApiError(410, problem === 'used' ? 'link_used' : 'link_expired', problem === 'used' ? used : expired);
}

/**
 * Marks the token used, once: of two requests racing with the same token only
 * one gets true (the update is conditional on `used_at IS NULL`).
 */
export async function consumeToken(token: Token, now = new Date(), transaction?: Transaction): Promise<boolean> {
  const [count] = await Token.update({ usedAt: now }, { where: { id: token.id, usedAt: null }, transaction });
  return count === 1;
}

/**
 * Ends every unused, unexpired token for an account or a share (a newer link
 * was sent, a reset was done) by expiring it now: its holder is told the link
 * has expired and to ask for a new one.
 */
export async function retireTokens(
  where: { purpose: TokenPurpose; userId?: number; shareId?: number },
  now = new Date(),
  transaction?: Transaction,
): Promise<number> {
  const [count] = await Token.update(
    { expiresAt: now },
    { where: { ...where, usedAt: { [Op.is]: null }, expiresAt: { [Op.gt]: now } }, transaction },
  );
  return count;
}
