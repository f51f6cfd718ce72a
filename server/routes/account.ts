import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { ApiError } from '@/server/errors';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { route } from '@/server/middleware/validate';
import { send } from './send';
import * as accounts from '@/server/services/account-service';
import { exportAccountJson } from '@/server/services/account-export-service';
import { accountDeleteSchema, passwordChangeSchema } from '@/shared/account';

/**
 * The signed-in account's own basics (beside GET/PATCH /api/me in auth.ts).
 *   POST /api/me/password      {currentPassword, newPassword}: other sign-ins end, this one stays
 *   GET  /api/me/export.json   everything of the account in one JSON file
 *   POST /api/me/delete        {password}: the account and all of it, then signed out
 */
export function accountRoutes() {
  const router = Router();
  // A password typed again is a password guess: 10 in 15 minutes per account.
  const passwordChecks = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 10,
    keyGenerator: (req) => `user:${req.session?.userId ?? 'none'}`,
    handler: (_req, _res, next) => next(new ApiError(429, 'rate_limited', 'Too many password attempts. Wait 15 minutes and try again.')),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
  });

  router.post(
    '/password',
    requireUser,
    passwordChecks,
    route({ body: passwordChangeSchema }, async (req, res) => {
      const { endedSessions } = await accounts.changePassword(currentUser(req), req.sessionID, req.body);
      const others = endedSessions === 1 ? 'Your 1 other sign-in was ended' : `Your ${endedSessions} other sign-ins were ended`;
      res.json({
        message: `Password changed. ${endedSessions ? others : 'You were signed in nowhere else'}; this one stays.`,
        endedSessions,
      });
    }),
  );

  router.get('/export.json', requireUser, async (req, res) => {
    send(res, await exportAccountJson(currentUser(req)));
  });

  router.post(
    '/delete',
    requireUser,
    passwordChecks,
    route({ body: accountDeleteSchema }, async (req, res, next) => {
      await accounts.deleteOwnAccount(currentUser(req), req.body);
      req.session.destroy((err) => {
        if (err) return next(err);
        res.clearCookie('pinwright.sid');
        res.json({ message: 'Your account and everything in it were deleted.' });
      });
    }),
  );
  return router;
}
