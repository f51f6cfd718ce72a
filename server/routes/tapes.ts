import { Router } from 'express';
import { idParamSchema, sightInIdParamSchema } from '@/shared/common';
import { tapeLayoutSchema, tapeQuerySchema, tapeUpdateSchema } from '@/shared/tape';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as tapes from '@/server/services/tape-service';
import { send } from './send';

/**
 * Saved tapes (/api/sight-ins/:sightInId/tapes, /api/tapes/:id) and the
 * downloads drawn from a sight-in's fit: tape.svg, sheet.svg, sheet.pdf
 * (query: a saved `tape` id, or layout options; see shared/tape.ts).
 */
export function tapeRoutes() {
  const router = Router();
  router.get(
    '/sight-ins/:sightInId/tapes',
    requireUser,
    route({ params: sightInIdParamSchema }, async (req, res) => {
      res.json({ tapes: await tapes.listTapes(currentUser(req), req.params.sightInId) });
    }),
  );
  router.post(
    '/sight-ins/:sightInId/tapes',
    requireUser,
    route({ params: sightInIdParamSchema, body: tapeLayoutSchema }, async (req, res) => {
      res.status(201).json({ tape: await tapes.createTape(currentUser(req), req.params.sightInId, req.body) });
    }),
  );
  router.get(
    '/tapes/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      res.json({ tape: await tapes.getTape(currentUser(req), req.params.id) });
    }),
  );
  router.patch(
    '/tapes/:id',
    requireUser,
    route({ params: idParamSchema, body: tapeUpdateSchema }, async (req, res) => {
      res.json({ tape: await tapes.updateTape(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.delete(
    '/tapes/:id',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      await tapes.deleteTape(currentUser(req), req.params.id);
      res.status(204).end();
    }),
  );

  const download = { params: idParamSchema, query: tapeQuerySchema };
  router.get(
    '/sight-ins/:id/tape.svg',
    requireUser,
    route(download, async (req, res) => {
      send(res, await tapes.tapeDownload(currentUser(req), req.params.id, req.query));
    }),
  );
  for (const format of ['svg', 'pdf'] as const) {
    router.get(
      `/sight-ins/:id/sheet.${format}`,
      requireUser,
      route(download, async (req, res) => {
        send(res, await tapes.sheetDownload(currentUser(req), req.params.id, req.query, format));
      }),
    );
  }
  return router;
}
