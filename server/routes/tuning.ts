import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { setupEntryInputSchema } from '@/shared/setup-measures';
import { paperTuneEndSchema, paperTuneShotInputSchema, paperTuneStartSchema } from '@/shared/paper-tune';
import { arrowFlierInputSchema, arrowSetInputSchema, arrowUpdateSchema } from '@/shared/arrow-set';
import { confirmRangeInputSchema } from '@/shared/staleness-api';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as tuning from '@/server/services/tuning-service';
import * as arrowSets from '@/server/services/arrow-set-service';
import { sightInStaleness } from '@/server/services/staleness-service';
import { exportTuningCsv } from '@/server/services/export-service';

const bowIdOf = (req: { params: unknown }) => (req.params as { bowId: number }).bowId;
const idOf = (req: { params: unknown }) => (req.params as { id: number }).id;

/**
 * Tuning: /bows/:bowId/setup, /bows/:bowId/paper-tunes, /paper-tunes/:id(/shots,/end),
 * /builds/:id/arrow-sets, /arrows/:id(/fliers), /sight-ins/:id/{staleness,confirm-range},
 * /bows/:bowId/tuning.csv.
 */
export function tuningRoutes() {
  const router = Router();
  const bow = validate({ params: bowIdParamSchema });
  const byId = validate({ params: idParamSchema });

  router.get('/bows/:bowId/setup', requireUser, bow, async (req, res) => {
    res.json(await tuning.listSetup(currentUser(req), bowIdOf(req)));
  });
  router.post('/bows/:bowId/setup', requireUser, validate({ params: bowIdParamSchema, body: setupEntryInputSchema }), async (req, res) => {
    res.status(201).json(await tuning.addSetupEntry(currentUser(req), bowIdOf(req), req.body));
  });

  router.get('/bows/:bowId/paper-tunes', requireUser, bow, async (req, res) => {
    res.json({ runs: await tuning.listRuns(currentUser(req), bowIdOf(req)) });
  });
  router.post('/bows/:bowId/paper-tunes', requireUser, validate({ params: bowIdParamSchema, body: paperTuneStartSchema }), async (req, res) => {
    res.status(201).json({ run: await tuning.startRun(currentUser(req), bowIdOf(req), req.body) });
  });
  router.get('/paper-tunes/:id', requireUser, byId, async (req, res) => {
    res.json({ run: await tuning.getRun(currentUser(req), idOf(req)) });
  });
  router.post('/paper-tunes/:id/shots', requireUser, validate({ params: idParamSchema, body: paperTuneShotInputSchema }), async (req, res) => {
    res.status(201).json({ run: await tuning.addShot(currentUser(req), idOf(req), req.body) });
  });
  router.post('/paper-tunes/:id/end', requireUser, validate({ params: idParamSchema, body: paperTuneEndSchema }), async (req, res) => {
    res.json({ run: await tuning.endRun(currentUser(req), idOf(req), req.body) });
  });

  router.get('/builds/:id/arrow-sets', requireUser, byId, async (req, res) => {
    res.json({ sets: await arrowSets.listArrowSets(currentUser(req), idOf(req)) });
  });
  router.post('/builds/:id/arrow-sets', requireUser, validate({ params: idParamSchema, body: arrowSetInputSchema }), async (req, res) => {
    res.status(201).json({ set: await arrowSets.createArrowSet(currentUser(req), idOf(req), req.body) });
  });
  router.patch('/arrows/:id', requireUser, validate({ params: idParamSchema, body: arrowUpdateSchema }), async (req, res) => {
    res.json({ set: await arrowSets.updateArrow(currentUser(req), idOf(req), req.body) });
  });
  router.post('/arrows/:id/fliers', requireUser, validate({ params: idParamSchema, body: arrowFlierInputSchema }), async (req, res) => {
    res.status(201).json({ set: await arrowSets.addFlier(currentUser(req), idOf(req), req.body) });
  });

  router.get('/sight-ins/:id/staleness', requireUser, byId, async (req, res) => {
    res.json(await sightInStaleness(currentUser(req), idOf(req)));
  });
  router.post('/sight-ins/:id/confirm-range', requireUser, validate({ params: idParamSchema, body: confirmRangeInputSchema }), async (req, res) => {
    const user = currentUser(req);
    await tuning.confirmAtRange(user, idOf(req), req.body.note);
    res.status(201).json(await sightInStaleness(user, idOf(req)));
  });

  router.get('/bows/:bowId/tuning.csv', requireUser, bow, async (req, res) => {
    const file = await exportTuningCsv(currentUser(req), bowIdOf(req));
    res.attachment(file.fileName);
    res.setHeader('Content-Type', file.contentType);
    res.setHeader('Cache-Control', 'no-store');
    res.send(file.body);
  });
  return router;
}
