import { Router } from 'express';
import { bowInputSchema, bowUpdateSchema } from '@/shared/bow';
import { idParamSchema } from '@/shared/common';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as bows from '@/server/services/bow-service';

/** /api/bows: the signed-in account's bows. Another account's bow is a 404. */
export function bowRoutes() {
  const router = Router();
  router.get('/bows', requireUser, async (req, res) => {
    res.json({ bows: await bows.listBows(currentUser(req)) });
  });
  router.post(
    '/bows',
    requireUser,
    route({ body: bowInputSchema }, async (req, res) => {
      res.status(201).json({ bow: await bows.createBow(currentUser(req), req.body) });
    }),
  );
  router.get(
    '/bows/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      res.json({ bow: await bows.getBow(currentUser(req), req.params.id) });
    }),
  );
  router.patch(
    '/bows/:id',
    requireUser,
    route({ params: idParamSchema, body: bowUpdateSchema }, async (req, res) => {
      res.json({ bow: await bows.updateBow(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.delete(
    '/bows/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      await bows.deleteBow(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );
  return router;
}
