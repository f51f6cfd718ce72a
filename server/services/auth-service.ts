/**
 * Accounts: sign-up, password check. Passwords are hashed with bcrypt
 * (bcryptjs, cost 12 by default).
 */
import bcrypt from 'bcryptjs';
import { config } from '@/server/config';
import { ApiError } from '@/server/errors';
import { User, WebSession } from '@/server/models';
import type { SignInInput, SignUpInput } from '@/shared/auth';
import { unitDefaultsFor } from '@/shared/units';

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, config.bcryptCost);
}

export async function signUp(input: SignUpInput, role: User['role'] = 'archer'): Promise<User> {
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    throw ApiError.conflict('An account with this e-mail already exists. Sign in instead.', {
      email: 'An account with this e-mail already exists.',
    });
  }
  const passwordHash = await hashPassword(input.password);
  // The first unit choice sets the rest (yards → inches, feet, °F, fps; metres → mm, m, °C, m/s);
  // without one (an older client), the columns' defaults: yards, mm, m, °C, fps, grains.
  const units = input.distanceUnit ? unitDefaultsFor(input.distanceUnit) : {};
  return User.create({ name: input.name, email: input.email, passwordHash, role, ...units });
}

// A hash to compare against when the e-mail is unknown, so both paths take as long.
const decoyHash = bcrypt
  .hashSync('pinwright-decoy-password', 4)
  .replace(/^\$2b\$04\$/, `$2b$${String(config.bcryptCost).padStart(2, '0')}$`);

export async function checkCredentials(input: SignInInput): Promise<User> {
  const user = await User.findOne({ where: { email: input.email } });
  const ok = await bcrypt.compare(input.password, user?.passwordHash ?? decoyHash);
  if (!user || !ok) throw new ApiError(401, 'unauthorized', 'E-mail or password is wrong.');
  if (user.disabled) throw new ApiError(403, 'disabled', 'This account is disabled. Contact the service administrator.');
  return user;
}

/** End every signed-in session of an account (on disable and on password reset). */
export async function endAllSessions(userId: number): Promise<number> {
  return WebSession.destroy({ where: { userId } });
}
