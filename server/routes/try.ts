import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { fitInputSchema, sheetInputSchema, tapeInputSchema } from '@/shared/fit';
import { ApiError } from '@/server/errors';
import { route } from '@/server/middleware/validate';
import * as fits from '@/server/services/fit-service';
import { send } from './send';

/** Requests per address per minute on the public try-it routes (each one runs a fit). */
export const TRY_LIMIT_PER_MINUTE = 60;

/**
 * /api/try: a one-off fit, tape or sheet for a visitor without an account.
 * Nothing is stored. Rate-limited per address (one limiter for all three).
 */
export function tryRoutes() {
  const router = Router();
  const limit = rateLimit({
    windowMs: 60 * 1000,
    limit: TRY_LIMIT_PER_MINUTE,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new ApiError(429, 'rate_limited', 'Too many tries from this address. Wait a minute and try again.')),
  });
  router.post(
    '/try/fit',
    limit,
    route({ body: fitInputSchema }, (req, res) => {
      res.json({ fit: fits.tryFit(req.body) });
    }),
  );
  router.post(
    '/try/tape.svg',
    limit,
    route({ body: tapeInputSchema }, (req, res) => {
      send(res, { body: fits.tryTapeSvg(req.body), contentType: 'image/svg+xml; charset=utf-8', fileName: 'pinwright-tape.svg' });
    }),
  );
  router.post(
    '/try/sheet.svg',
    limit,
    route({ body: sheetInputSchema }, (req, res) => {
      send(res, { body: fits.trySheetSvg(req.body), contentType: 'image/svg+xml; charset=utf-8', fileName: 'pinwright-sheet.svg' });
    }),
  );
  router.post(
    '/try/sheet.pdf',
    limit,
    route({ body: sheetInputSchema }, async (req, res) => {
      send(res, { body: await fits.trySheetPdf(req.body), contentType: 'application/pdf', fileName: 'pinwright-sheet.pdf' });
    }),
  );
  return router;
}
