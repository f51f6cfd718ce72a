/**
 * Who is signed in. `requireUser` loads the account on each request (so a
 * disabled account loses access at once); `requireRole` is the one role guard.
 */
import type { RequestHandler } from 'express';
import { ApiError } from '@/server/errors';
import { User } from '@/server/models';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
  }
}

declare global {
  namespace Express {
    interface Request {
      user?: User;
    }
  }
}

export type Role = 'archer' | 'tech' | 'admin';

export const requireUser: RequestHandler = async (req, _res, next) => {
  const userId = req.session?.userId;
  if (!userId) throw ApiError.unauthorized();
  const user = await User.findByPk(userId);
  if (!user || user.disabled) {
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    throw ApiError.unauthorized(user?.disabled ? 'This account is disabled.' : undefined);
  }
  req.user = user;
  next();
};

export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw ApiError.unauthorized();
    if (!roles.includes(req.user.role)) throw ApiError.forbidden();
    next();
  };
}

/** The signed-in user; for handlers behind requireUser. */
export function currentUser(req: Express.Request): User {
  if (!req.user) throw ApiError.unauthorized();
  return req.user;
}
