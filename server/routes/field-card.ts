import { Router } from 'express';
import { idParamSchema } from '@/shared/common';
import { fieldCardQuerySchema, type FieldCardQuery } from '@/shared/field-card';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as cards from '@/server/services/field-card-service';
import { send } from './tapes';

/**
 * A sight-in's field card: GET /api/sight-ins/:id/field-card (JSON), field-card.svg
 * and field-card.pdf (100 × 150 mm). Query: angles, distances, altitudeM, temperatureC.
 */
export function fieldCardRoutes() {
  const router = Router();
  const guard = [requireUser, validate({ params: idParamSchema, query: fieldCardQuerySchema })];
  router.get('/sight-ins/:id/field-card', ...guard, async (req, res) => {
    res.json(await cards.fieldCard(currentUser(req), idOf(req), queryOf(req)));
  });
  router.get('/sight-ins/:id/field-card.svg', ...guard, async (req, res) => {
    send(res, await cards.fieldCardDownload(currentUser(req), idOf(req), queryOf(req), 'svg'));
  });
  router.get('/sight-ins/:id/field-card.pdf', ...guard, async (req, res) => {
    send(res, await cards.fieldCardDownload(currentUser(req), idOf(req), queryOf(req), 'pdf'));
  });
  return router;
}

const idOf = (req: { params: unknown }) => (req.params as { id: number }).id;
const queryOf = (req: { query: unknown }) => req.query as FieldCardQuery;
