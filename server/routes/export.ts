import express, { Router, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { ApiError } from '@/server/errors';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { route } from '@/server/middleware/validate';
import * as csvImport from '@/server/services/csv-import-service';
import * as exporter from '@/server/services/export-service';
import { idParamSchema } from '@/shared/common';
import { markImportQuerySchema, markImportSchema } from '@/shared/csv';
import { sendTapeSchema } from '@/shared/export';
import { send } from './send';

/** A raw `text/csv` body becomes `{ csv, unit }` (unit from ?unit=), so the same schema checks both kinds of request. */
const csvBody: RequestHandler[] = [
  express.text({ type: ['text/csv', 'text/plain'], limit: '1mb' }),
  (req, _res, next) => {
    if (typeof req.body === 'string') req.body = { csv: req.body, unit: req.query.unit ?? 'yd' };
    next();
  },
];

/**
 * Records in and out.
 *   GET  /api/bows/:id/export.csv              builds, sight-ins and marks, one row per mark
 *   GET  /api/bows/:id/export.json             the same as a JSON document
 *   POST /api/sight-ins/:id/marks/import?dryRun=1   {csv, unit} (or a text/csv body): per-row preview
 *   POST /api/sight-ins/:id/marks/import        add the file's marks, all or nothing
 *   POST /api/sight-ins/:id/send-tape           {to, paper, tape?}: the print sheet as a PDF attachment
 */
export function exportRoutes() {
  const router = Router();
  const sendLimit = rateLimit({
    windowMs: 60 * 60 * 1000,
    limit: 20,
    keyGenerator: (req) => `user:${req.session?.userId ?? 'none'}`,
    handler: (_req, _res, next) => next(new ApiError(429, 'rate_limited', 'You have sent 20 tapes in the last hour. Try again later.')),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
  });

  router.get(
    '/bows/:id/export.csv',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      send(res, await exporter.exportBowCsv(currentUser(req), req.params.id));
    }),
  );
  router.get(
    '/bows/:id/export.json',
    requireUser,
    route({ params: idParamSchema }, async (req, res) => {
      send(res, await exporter.exportBowJson(currentUser(req), req.params.id));
    }),
  );
  router.post(
    '/sight-ins/:id/marks/import',
    requireUser,
    ...csvBody,
    route({ params: idParamSchema, query: markImportQuerySchema, body: markImportSchema }, async (req, res) => {
      const { dryRun } = req.query;
      const result = await csvImport.importMarks(currentUser(req), req.params.id, req.body, dryRun);
      res.status(dryRun ? 200 : 201).json(result);
    }),
  );
  router.post(
    '/sight-ins/:id/send-tape',
    requireUser,
    sendLimit,
    route({ params: idParamSchema, body: sendTapeSchema }, async (req, res) => {
      const { fileName } = await exporter.sendTape(currentUser(req), req.params.id, req.body);
      res.json({ message: `The print sheet (${fileName}) was sent to ${req.body.to}.` });
    }),
  );
  return router;
}
