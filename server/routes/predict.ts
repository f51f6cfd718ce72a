import { Router } from 'express';
import { bowIdParamSchema } from '@/shared/common';
import { predictRequestSchema, predictTapeQuerySchema, type PredictTapeQuery } from '@/shared/predict';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as predictions from '@/server/services/predict-service';
import { send } from './tapes';

/**
 * A build not shot yet: POST /api/bows/:bowId/predict ({buildId} or {build},
 * optional sessionId) and GET /api/bows/:bowId/predict/tape.svg (see shared/predict.ts).
 */
export function predictRoutes() {
  const router = Router();
  router.post('/bows/:bowId/predict', requireUser, validate({ params: bowIdParamSchema, body: predictRequestSchema }), async (req, res) => {
    res.json(await predictions.predict(currentUser(req), bowIdOf(req), req.body));
  });
  router.get('/bows/:bowId/predict/tape.svg', requireUser, validate({ params: bowIdParamSchema, query: predictTapeQuerySchema }), async (req, res) => {
    send(res, await predictions.predictedTapeDownload(currentUser(req), bowIdOf(req), req.query as unknown as PredictTapeQuery));
  });
  return router;
}

const bowIdOf = (req: { params: unknown }) => (req.params as { bowId: number }).bowId;
