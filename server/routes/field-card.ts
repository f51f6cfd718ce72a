import { Router } from 'express';
import { idParamSchema } from '@/shared/common';
import { fieldCardQuerySchema } from '@/shared/field-card';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as cards from '@/server/services/field-card-service';
import { send } from './send';

/**
 * A sight-in's field card: GET /api/sight-ins/:id/field-card (JSON), field-card.svg
 * and field-card.pdf (100 × 150 mm). Query: angles, distances, altitudeM, temperatureC.
 */
export function fieldCardRoutes() {
  const router = Router();
  const card = { params: idParamSchema, query: fieldCardQuerySchema };
  router.get(
    '/sight-ins/:id/field-card',
    requireUser,
    route(card, async (req, res) => {
      res.json(await cards.fieldCard(currentUser(req), req.params.id, req.query));
    }),
  );
  for (const format of ['svg', 'pdf'] as const) {
    router.get(
      `/sight-ins/:id/field-card.${format}`,
      requireUser,
      route(card, async (req, res) => {
        send(res, await cards.fieldCardDownload(currentUser(req), req.params.id, req.query, format));
      }),
    );
  }
  return router;
}
