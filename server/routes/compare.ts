import { Router } from 'express';
import { bowIdParamSchema } from '@/shared/common';
import { compareQuerySchema } from '@/shared/compare';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as compare from '@/server/services/compare-service';

/** Builds side by side: GET /api/bows/:bowId/compare?builds=3,4&at=40 (see shared/compare.ts). */
export function compareRoutes() {
  const router = Router();
  router.get(
    '/bows/:bowId/compare',
    requireUser,
    route({ params: bowIdParamSchema, query: compareQuerySchema }, async (req, res) => {
      res.json(await compare.compareBowBuilds(currentUser(req), req.params.bowId, req.query));
    }),
  );
  return router;
}
