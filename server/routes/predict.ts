import { Router } from 'express';
import { z } from 'zod';
import { paperSchema } from '@/shared/fit';
import { bowIdParamSchema } from '@/shared/common';
import { predictRequestSchema, predictTapeQuerySchema, type PredictTapeQuery } from '@/shared/predict';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as predictions from '@/server/services/predict-service';
import { send } from './tapes';

/** The predicted sheet's query: the tape's, and the paper (a4 or letter; default a4). */
const predictSheetQuerySchema = z.intersection(predictTapeQuerySchema, z.object({ paper: paperSchema.optional() }));
type PredictSheetQuery = PredictTapeQuery & { paper?: 'a4' | 'letter' };

/**
 * A build not shot yet: POST /api/bows/:bowId/predict ({buildId} or {build},
 * optional sightInId), GET /api/bows/:bowId/predict/tape.svg and its print
 * sheet GET /api/bows/:bowId/predict/sheet.svg|pdf (see shared/predict.ts).
 */
export function predictRoutes() {
  const router = Router();
  router.post('/bows/:bowId/predict', requireUser, validate({ params: bowIdParamSchema, body: predictRequestSchema }), async (req, res) => {
    res.json(await predictions.predict(currentUser(req), bowIdOf(req), req.body));
  });
  router.get('/bows/:bowId/predict/tape.svg', requireUser, validate({ params: bowIdParamSchema, query: predictTapeQuerySchema }), async (req, res) => {
    send(res, await predictions.predictedTapeDownload(currentUser(req), bowIdOf(req), req.query as unknown as PredictTapeQuery));
  });
  for (const format of ['svg', 'pdf'] as const) {
    router.get(`/bows/:bowId/predict/sheet.${format}`, requireUser, validate({ params: bowIdParamSchema, query: predictSheetQuerySchema }), async (req, res) => {
      send(res, await predictions.predictedSheetDownload(currentUser(req), bowIdOf(req), req.query as unknown as PredictSheetQuery, format));
    });
  }
  return router;
}

const bowIdOf = (req: { params: unknown }) => (req.params as { bowId: number }).bowId;
