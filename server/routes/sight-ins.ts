import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { sightInInputSchema, sightInUpdateSchema } from '@/shared/sight-in';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as sightIns from '@/server/services/sight-in-service';

/** Sight-ins with their marks: /api/bows/:bowId/sight-ins and /api/sight-ins/:id. Each save refits. */
export function sightInRoutes() {
  const router = Router();
  router.get(
    '/bows/:bowId/sight-ins',
    requireUser,
    route({ params: bowIdParamSchema }, async (req, res) => {
      res.json({ sightIns: await sightIns.listSightIns(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/sight-ins',
    requireUser,
    route({ params: bowIdParamSchema, body: sightInInputSchema }, async (req, res) => {
      res.status(201).json({ sightIn: await sightIns.createSightIn(currentUser(req), req.params.bowId, req.body) });
    }),
  );
  router.get(
    '/sight-ins/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      res.json({ sightIn: await sightIns.getSightIn(currentUser(req), req.params.id) });
    }),
  );
  router.patch(
    '/sight-ins/:id',
    requireUser,
    route({ params: idParamSchema, body: sightInUpdateSchema }, async (req, res) => {
      res.json({ sightIn: await sightIns.updateSightIn(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.delete(
    '/sight-ins/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      await sightIns.deleteSightIn(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );
  return router;
}
