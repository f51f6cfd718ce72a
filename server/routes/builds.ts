import { Router } from 'express';
import { buildInputSchema, buildUpdateSchema } from '@/shared/build';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as builds from '@/server/services/build-service';

/** Arrow builds: /api/bows/:bowId/builds and /api/builds/:id. A build with sight-ins is not deleted (409). */
export function buildRoutes() {
  const router = Router();
  router.get(
    '/bows/:bowId/builds',
    requireUser,
    route({ params: bowIdParamSchema }, async (req, res) => {
      res.json({ builds: await builds.listBuilds(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/builds',
    requireUser,
    route({ params: bowIdParamSchema, body: buildInputSchema }, async (req, res) => {
      res.status(201).json({ build: await builds.createBuild(currentUser(req), req.params.bowId, req.body) });
    }),
  );
  router.get(
    '/builds/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      res.json({ build: await builds.getBuild(currentUser(req), req.params.id) });
    }),
  );
  router.patch(
    '/builds/:id',
    requireUser,
    route({ params: idParamSchema, body: buildUpdateSchema }, async (req, res) => {
      res.json({ build: await builds.updateBuild(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.delete(
    '/builds/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      await builds.deleteBuild(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );
  return router;
}
