import { Router } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import { profileUpdateSchema, signInSchema, signUpSchema } from '@/shared/auth';
import { ApiError } from '@/server/errors';
import { validate } from '@/server/middleware/validate';
import { requireUser, currentUser } from '@/server/middleware/auth';
import * as auth from '@/server/services/auth-service';

const tooMany = (message: string) => ({
  handler: (_req: unknown, _res: unknown, next: (err: unknown) => void) =>
    next(new ApiError(429, 'rate_limited', message)),
  standardHeaders: 'draft-8' as const,
  legacyHeaders: false,
});

function signInKey(req: { ip?: string; body?: { email?: unknown } }) {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
  return `${ipKeyGenerator(req.ip ?? '')}|${email}`;
}

export function authRoutes() {
  const router = Router();
  // Per address and e-mail: 10 sign-in attempts in 15 minutes.
  const signInLimit = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 10,
    keyGenerator: signInKey,
    ...tooMany('Too many sign-in attempts. Wait 15 minutes and try again.'),
  });
  // Per address: 30 new accounts an hour.
  const signUpLimit = rateLimit({
    windowMs: 60 * 60 * 1000,
    limit: 30,
    ...tooMany('Too many new accounts from this address. Try again in an hour.'),
  });

  const startSession = (req: Express.Request, userId: number) =>
    new Promise<void>((resolve, reject) => {
      // A fresh session id at sign-in defeats session fixation.
      req.session.regenerate((err) => {
        if (err) return reject(err);
        req.session.userId = userId;
        req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
      });
    });

  router.post('/sign-up', signUpLimit, validate({ body: signUpSchema }), async (req, res) => {
    const user = await auth.signUp(req.body);
    await startSession(req, user.id);
    res.status(201).json({ user: user.toPublic() });
  });

  router.post('/sign-in', signInLimit, validate({ body: signInSchema }), async (req, res) => {
    const user = await auth.checkCredentials(req.body);
    await startSession(req, user.id);
    res.json({ user: user.toPublic() });
  });

  router.post('/sign-out', (req, res, next) => {
    if (!req.session) return res.status(204).end();
    req.session.destroy((err) => {
      if (err) return next(err);
      res.clearCookie('pinwright.sid');
      res.status(204).end();
    });
  });

  return router;
}

export function meRoutes() {
  const router = Router();
  router.get('/', requireUser, (req, res) => {
    res.json({ user: currentUser(req).toPublic() });
  });
  router.patch('/', requireUser, validate({ body: profileUpdateSchema }), async (req, res) => {
    const user = await currentUser(req).update(req.body);
    res.json({ user: user.toPublic() });
  });
  return router;
}
