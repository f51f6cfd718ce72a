import { Router } from 'express';
import { z } from 'zod';
import { paperSchema } from '@/shared/fit';
import { bowIdParamSchema } from '@/shared/common';
import { predictRequestSchema, predictTapeQuerySchema } from '@/shared/predict';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as predictions from '@/server/services/predict-service';
import { send } from './send';

/** The predicted sheet's query: the tape's, and the paper (a4 or letter; default a4). */
const predictSheetQuerySchema = z.intersection(predictTapeQuerySchema, z.object({ paper: paperSchema.optional() }));

/**
 * A build not shot yet: POST /api/bows/:bowId/predict ({buildId} or {build},
 * optional sightInId), GET /api/bows/:bowId/predict/tape.svg and its print
 * sheet GET /api/bows/:bowId/predict/sheet.svg|pdf (see shared/predict.ts).
 */
export function predictRoutes() {
  const router = Router();
  router.post(
    '/bows/:bowId/predict',
    requireUser,
    route({ params: bowIdParamSchema, body: predictRequestSchema }, async (req, res) => {
      res.json(await predictions.predict(currentUser(req), req.params.bowId, req.body));
    }),
  );
  router.get(
    '/bows/:bowId/predict/tape.svg',
    requireUser,
    route({ params: bowIdParamSchema, query: predictTapeQuerySchema }, async (req, res) => {
      send(res, await predictions.predictedTapeDownload(currentUser(req), req.params.bowId, req.query));
    }),
  );
  for (const format of ['svg', 'pdf'] as const) {
    router.get(
      `/bows/:bowId/predict/sheet.${format}`,
      requireUser,
      route({ params: bowIdParamSchema, query: predictSheetQuerySchema }, async (req, res) => {
        send(res, await predictions.predictedSheetDownload(currentUser(req), req.params.bowId, req.query, format));
      }),
    );
  }
  return router;
}
