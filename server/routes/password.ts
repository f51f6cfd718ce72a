import { Router } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import { ApiError } from '@/server/errors';
import { route } from '@/server/middleware/validate';
import * as passwords from '@/server/services/password-service';
import { forgotAnswer, passwordForgotSchema, passwordResetSchema } from '@/shared/password';

const limited = (message: string) => ({
  handler: (_req: unknown, _res: unknown, next: (err: unknown) => void) => next(new ApiError(429, 'rate_limited', message)),
  standardHeaders: 'draft-8' as const,
  legacyHeaders: false,
});

/** Password reset: `POST /api/password/forgot {email}`, `POST /api/password/reset {token, password}`. */
export function passwordRoutes() {
  const router = Router();
  // Per address and e-mail: 5 reset requests an hour (keeps an inbox from being flooded).
  const forgotPerEmail = rateLimit({
    windowMs: 60 * 60 * 1000,
    limit: 5,
    keyGenerator: (req) =>
      `${ipKeyGenerator(req.ip ?? '')}|${typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : ''}`,
    ...limited('Too many reset requests for this address. Wait an hour and try again.'),
  });
  // Per address: 30 reset attempts in 15 minutes (tokens cannot be guessed, but there is no reason to allow more).
  const resetPerIp = rateLimit({ windowMs: 15 * 60 * 1000, limit: 30, ...limited('Too many attempts. Wait 15 minutes and try again.') });

  router.post(
    '/forgot',
    forgotPerEmail,
    route({ body: passwordForgotSchema }, (req, res) => {
      passwords.startReset(req.body.email);
      res.status(202).json({ message: forgotAnswer });
    }),
  );

  router.post(
    '/reset',
    resetPerIp,
    route({ body: passwordResetSchema }, async (req, res) => {
      await passwords.resetPassword(req.body);
      res.json({ message: 'Your password is changed and you are signed out everywhere. Sign in with the new password.' });
    }),
  );

  return router;
}
