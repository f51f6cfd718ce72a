import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { bowChangeInputSchema, checkStartSchema, checkUpdateSchema } from '@/shared/level';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as level from '@/server/services/level-service';
import { tripReadiness } from '@/server/services/readiness-service';

/** Level checks, the change log, the level state and the before-a-trip readiness of a bow. */
export function levelRoutes() {
  const router = Router();
  const bow = { params: bowIdParamSchema };
  const byId = { params: idParamSchema };

  router.get(
    '/bows/:bowId/level',
    requireUser,
    route(bow, async (req, res) => {
      res.json(await level.levelForBow(currentUser(req), req.params.bowId));
    }),
  );
  router.get(
    '/bows/:bowId/readiness',
    requireUser,
    route(bow, async (req, res) => {
      res.json(await tripReadiness(currentUser(req), req.params.bowId));
    }),
  );

  router.get(
    '/bows/:bowId/checks',
    requireUser,
    route(bow, async (req, res) => {
      res.json({ checks: await level.listChecks(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/checks',
    requireUser,
    route({ ...bow, body: checkStartSchema }, async (req, res) => {
      res.status(201).json({ check: await level.startCheck(currentUser(req), req.params.bowId, req.body.place) });
    }),
  );
  router.get(
    '/checks/:id',
    requireUser,
    route(byId, async (req, res) => {
      res.json({ check: await level.getCheck(currentUser(req), req.params.id) });
    }),
  );
  router.patch(
    '/checks/:id',
    requireUser,
    route({ ...byId, body: checkUpdateSchema }, async (req, res) => {
      res.json({ check: await level.updateCheck(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.delete(
    '/checks/:id',
    requireUser,
    route(byId, async (req, res) => {
      await level.discardCheck(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );

  router.get(
    '/bows/:bowId/changes',
    requireUser,
    route(bow, async (req, res) => {
      res.json({ changes: await level.listChanges(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/changes',
    requireUser,
    route({ ...bow, body: bowChangeInputSchema }, async (req, res) => {
      res.status(201).json(await level.logChange(currentUser(req), req.params.bowId, req.body));
    }),
  );
  router.delete(
    '/changes/:id',
    requireUser,
    route(byId, async (req, res) => {
      await level.deleteChange(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );
  return router;
}
