import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { sessionInputSchema, sessionUpdateSchema } from '@/shared/session';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as sessions from '@/server/services/session-service';

/** Sight-in sessions with their marks: /api/bows/:bowId/sessions and /api/sessions/:id. Each save refits. */
export function sessionRoutes() {
  const router = Router();
  router.get('/bows/:bowId/sessions', requireUser, validate({ params: bowIdParamSchema }), async (req, res) => {
    res.json({ sessions: await sessions.listSessions(currentUser(req), bowIdOf(req)) });
  });
  router.post('/bows/:bowId/sessions', requireUser, validate({ params: bowIdParamSchema, body: sessionInputSchema }), async (req, res) => {
    res.status(201).json({ session: await sessions.createSession(currentUser(req), bowIdOf(req), req.body) });
  });
  router.get('/sessions/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    res.json({ session: await sessions.getSession(currentUser(req), idOf(req)) });
  });
  router.patch('/sessions/:id', requireUser, validate({ params: idParamSchema, body: sessionUpdateSchema }), async (req, res) => {
    res.json({ session: await sessions.updateSession(currentUser(req), idOf(req), req.body) });
  });
  router.delete('/sessions/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    await sessions.deleteSession(currentUser(req), idOf(req));
    res.status(204).end();
  });
  return router;
}

const idOf = (req: { params: unknown }) => (req.params as { id: number }).id;
const bowIdOf = (req: { params: unknown }) => (req.params as { bowId: number }).bowId;
