import { Router } from 'express';
import { buildInputSchema, buildUpdateSchema } from '@/shared/build';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as builds from '@/server/services/build-service';

/** Arrow builds: /api/bows/:bowId/builds and /api/builds/:id. A build with sight-ins is not deleted (409). */
export function buildRoutes() {
  const router = Router();
  router.get('/bows/:bowId/builds', requireUser, validate({ params: bowIdParamSchema }), async (req, res) => {
    res.json({ builds: await builds.listBuilds(currentUser(req), bowIdOf(req)) });
  });
  router.post('/bows/:bowId/builds', requireUser, validate({ params: bowIdParamSchema, body: buildInputSchema }), async (req, res) => {
    res.status(201).json({ build: await builds.createBuild(currentUser(req), bowIdOf(req), req.body) });
  });
  router.get('/builds/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    res.json({ build: await builds.getBuild(currentUser(req), idOf(req)) });
  });
  router.patch('/builds/:id', requireUser, validate({ params: idParamSchema, body: buildUpdateSchema }), async (req, res) => {
    res.json({ build: await builds.updateBuild(currentUser(req), idOf(req), req.body) });
  });
  router.delete('/builds/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    await builds.deleteBuild(currentUser(req), idOf(req));
    res.status(204).end();
  });
  return router;
}

const idOf = (req: { params: unknown }) => (req.params as { id: number }).id;
const bowIdOf = (req: { params: unknown }) => (req.params as { bowId: number }).bowId;
