import { Router } from 'express';
import { profileUpdateSchema, signInSchema, signUpSchema } from '@/shared/auth';
import { limit } from '@/server/middleware/rate-limits';
import { route } from '@/server/middleware/validate';
import { requireUser, currentUser } from '@/server/middleware/auth';
import * as auth from '@/server/services/auth-service';
import { startSession } from '@/server/session';

export function authRoutes() {
  const router = Router();
  // Limits (server/middleware/rate-limits.ts, numbers in config.limits): sign-in three ways; sign-up shared with invitation acceptance.
  router.post(
    '/sign-up',
    limit('signUp'),
    route({ body: signUpSchema }, async (req, res) => {
      const user = await auth.signUp(req.body);
      await startSession(req, user.id);
      res.status(201).json({ user: user.toPublic() });
    }),
  );

  router.post(
    '/sign-in',
    limit('signIn'),
    route({ body: signInSchema }, async (req, res) => {
      const user = await auth.checkCredentials(req.body);
      await startSession(req, user.id);
      res.json({ user: user.toPublic() });
    }),
  );

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
  router.patch(
    '/',
    requireUser,
    route({ body: profileUpdateSchema }, async (req, res) => {
      const user = await currentUser(req).update(req.body);
      res.json({ user: user.toPublic() });
    }),
  );
  return router;
}
