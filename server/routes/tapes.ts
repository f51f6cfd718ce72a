import { Router, type Response } from 'express';
import { idParamSchema, sightInIdParamSchema } from '@/shared/common';
import { tapeLayoutSchema, tapeQuerySchema, tapeUpdateSchema, type TapeQuery } from '@/shared/tape';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as tapes from '@/server/services/tape-service';

/**
 * Saved tapes (/api/sight-ins/:sightInId/tapes, /api/tapes/:id) and the
 * downloads drawn from a sight-in's fit: tape.svg, sheet.svg, sheet.pdf
 * (query: a saved `tape` id, or layout options; see shared/tape.ts).
 */
export function tapeRoutes() {
  const router = Router();
  router.get('/sight-ins/:sightInId/tapes', requireUser, validate({ params: sightInIdParamSchema }), async (req, res) => {
    res.json({ tapes: await tapes.listTapes(currentUser(req), sightInIdOf(req)) });
  });
  router.post('/sight-ins/:sightInId/tapes', requireUser, validate({ params: sightInIdParamSchema, body: tapeLayoutSchema }), async (req, res) => {
    res.status(201).json({ tape: await tapes.createTape(currentUser(req), sightInIdOf(req), req.body) });
  });
  router.get('/tapes/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    res.json({ tape: await tapes.getTape(currentUser(req), idOf(req)) });
  });
  router.patch('/tapes/:id', requireUser, validate({ params: idParamSchema, body: tapeUpdateSchema }), async (req, res) => {
    res.json({ tape: await tapes.updateTape(currentUser(req), idOf(req), req.body) });
  });
  router.delete('/tapes/:id', requireUser, validate({ params: idParamSchema }), async (req, res) => {
    await tapes.deleteTape(currentUser(req), idOf(req));
    res.status(204).end();
  });

  const downloads = [requireUser, validate({ params: idParamSchema, query: tapeQuerySchema })];
  router.get('/sight-ins/:id/tape.svg', ...downloads, async (req, res) => {
    send(res, await tapes.tapeDownload(currentUser(req), idOf(req), queryOf(req)));
  });
  router.get('/sight-ins/:id/sheet.svg', ...downloads, async (req, res) => {
    send(res, await tapes.sheetDownload(currentUser(req), idOf(req), queryOf(req), 'svg'));
  });
  router.get('/sight-ins/:id/sheet.pdf', ...downloads, async (req, res) => {
    send(res, await tapes.sheetDownload(currentUser(req), idOf(req), queryOf(req), 'pdf'));
  });
  return router;
}

/** A drawn file, as an attachment with its name; never cached (the fit may change on the next save). */
export function send(res: Response, download: tapes.Download) {
  res.attachment(download.fileName);
  res.setHeader('Content-Type', download.contentType);
  res.setHeader('Cache-Control', 'no-store');
  res.send(download.body);
}

const idOf = (req: { params: unknown }) => (req.params as { id: number }).id;
const sightInIdOf = (req: { params: unknown }) => (req.params as { sightInId: number }).sightInId;
const queryOf = (req: { query: unknown }) => req.query as TapeQuery;
