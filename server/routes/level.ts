import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { bowChangeInputSchema, checkStartSchema, checkUpdateSchema } from '@/shared/level';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as level from '@/server/services/level-service';
import { tripReadiness } from '@/server/services/readiness-service';

type BowParams = { bowId: number };
type IdParams = { id: number };
const bowParams = (req: { params: unknown }) => req.params as BowParams;
const idParams = (req: { params: unknown }) => req.params as IdParams;

/** Level checks, the change log, the level state and the before-a-trip readiness of a bow. */
export function levelRoutes() {
  const router = Router();
  const bow = validate({ params: bowIdParamSchema });
  const byId = validate({ params: idParamSchema });

  router.get('/bows/:bowId/level', requireUser, bow, async (req, res) => {
    res.json(await level.levelForBow(currentUser(req), bowParams(req).bowId));
  });
  router.get('/bows/:bowId/readiness', requireUser, bow, async (req, res) => {
    res.json(await tripReadiness(currentUser(req), bowParams(req).bowId));
  });

  router.get('/bows/:bowId/checks', requireUser, bow, async (req, res) => {
    res.json({ checks: await level.listChecks(currentUser(req), bowParams(req).bowId) });
  });
  router.post('/bows/:bowId/checks', requireUser, validate({ params: bowIdParamSchema, body: checkStartSchema }), async (req, res) => {
    res.status(201).json({ check: await level.startCheck(currentUser(req), bowParams(req).bowId, req.body.place) });
  });
  router.get('/checks/:id', requireUser, byId, async (req, res) => {
    res.json({ check: await level.getCheck(currentUser(req), idParams(req).id) });
  });
  router.patch('/checks/:id', requireUser, validate({ params: idParamSchema, body: checkUpdateSchema }), async (req, res) => {
    res.json({ check: await level.updateCheck(currentUser(req), idParams(req).id, req.body) });
  });
  router.delete('/checks/:id', requireUser, byId, async (req, res) => {
    await level.discardCheck(currentUser(req), idParams(req).id);
    res.status(204).end();
  });

  router.get('/bows/:bowId/changes', requireUser, bow, async (req, res) => {
    res.json({ changes: await level.listChanges(currentUser(req), bowParams(req).bowId) });
  });
  router.post('/bows/:bowId/changes', requireUser, validate({ params: bowIdParamSchema, body: bowChangeInputSchema }), async (req, res) => {
    res.status(201).json(await level.logChange(currentUser(req), bowParams(req).bowId, req.body));
  });
  router.delete('/changes/:id', requireUser, byId, async (req, res) => {
    await level.deleteChange(currentUser(req), idParams(req).id);
    res.status(204).end();
  });
  return router;
}
