import { Router } from 'express';
import { bowIdParamSchema, idParamSchema } from '@/shared/common';
import { setupEntryInputSchema } from '@/shared/setup-measures';
import { paperTuneEndSchema, paperTuneShotInputSchema, paperTuneStartSchema } from '@/shared/paper-tune';
import { arrowFlierInputSchema, arrowSetInputSchema, arrowUpdateSchema } from '@/shared/arrow-set';
import { confirmRangeInputSchema } from '@/shared/staleness-api';
import { route } from '@/server/middleware/validate';
import { currentUser, requireUser } from '@/server/middleware/auth';
import * as tuning from '@/server/services/tuning-service';
import * as arrowSets from '@/server/services/arrow-set-service';
import { sightInStaleness } from '@/server/services/staleness-service';
import { exportTuningCsv } from '@/server/services/export-service';
import { send } from './send';

/**
 * Tuning: /bows/:bowId/setup, /bows/:bowId/paper-tunes, /paper-tunes/:id(/shots,/end),
 * /builds/:id/arrow-sets, /arrows/:id(/fliers), /sight-ins/:id/{staleness,confirm-range},
 * /bows/:bowId/tuning.csv.
 */
export function tuningRoutes() {
  const router = Router();
  const bow = { params: bowIdParamSchema };
  const byId = { params: idParamSchema };

  router.get(
    '/bows/:bowId/setup',
    requireUser,
    route(bow, async (req, res) => {
      res.json(await tuning.listSetup(currentUser(req), req.params.bowId));
    }),
  );
  router.post(
    '/bows/:bowId/setup',
    requireUser,
    route({ ...bow, body: setupEntryInputSchema }, async (req, res) => {
      res.status(201).json(await tuning.addSetupEntry(currentUser(req), req.params.bowId, req.body));
    }),
  );

  router.get(
    '/bows/:bowId/paper-tunes',
    requireUser,
    route(bow, async (req, res) => {
      res.json({ runs: await tuning.listRuns(currentUser(req), req.params.bowId) });
    }),
  );
  router.post(
    '/bows/:bowId/paper-tunes',
    requireUser,
    route({ ...bow, body: paperTuneStartSchema }, async (req, res) => {
      res.status(201).json({ run: await tuning.startRun(currentUser(req), req.params.bowId, req.body) });
    }),
  );
  router.get(
    '/paper-tunes/:id',
    requireUser,
    route(byId, async (req, res) => {
      res.json({ run: await tuning.getRun(currentUser(req), req.params.id) });
    }),
  );
  router.post(
    '/paper-tunes/:id/shots',
    requireUser,
    route({ ...byId, body: paperTuneShotInputSchema }, async (req, res) => {
      res.status(201).json({ run: await tuning.addShot(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.post(
    '/paper-tunes/:id/end',
    requireUser,
    route({ ...byId, body: paperTuneEndSchema }, async (req, res) => {
      res.json({ run: await tuning.endRun(currentUser(req), req.params.id, req.body) });
    }),
  );

  router.get(
    '/builds/:id/arrow-sets',
    requireUser,
    route(byId, async (req, res) => {
      res.json({ sets: await arrowSets.listArrowSets(currentUser(req), req.params.id) });
    }),
  );
  router.post(
    '/builds/:id/arrow-sets',
    requireUser,
    route({ ...byId, body: arrowSetInputSchema }, async (req, res) => {
      res.status(201).json({ set: await arrowSets.createArrowSet(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.patch(
    '/arrows/:id',
    requireUser,
    route({ ...byId, body: arrowUpdateSchema }, async (req, res) => {
      res.json({ set: await arrowSets.updateArrow(currentUser(req), req.params.id, req.body) });
    }),
  );
  router.post(
    '/arrows/:id/fliers',
    requireUser,
    route({ ...byId, body: arrowFlierInputSchema }, async (req, res) => {
      res.status(201).json({ set: await arrowSets.addFlier(currentUser(req), req.params.id, req.body) });
    }),
  );

  router.get(
    '/sight-ins/:id/staleness',
    requireUser,
    route(byId, async (req, res) => {
      res.json(await sightInStaleness(currentUser(req), req.params.id));
    }),
  );
  router.post(
    '/sight-ins/:id/confirm-range',
    requireUser,
    route({ ...byId, body: confirmRangeInputSchema }, async (req, res) => {
      const user = currentUser(req);
      await tuning.confirmAtRange(user, req.params.id, req.body.note);
      res.status(201).json(await sightInStaleness(user, req.params.id));
    }),
  );

  router.get(
    '/bows/:bowId/tuning.csv',
    requireUser,
    route(bow, async (req, res) => {
      send(res, await exportTuningCsv(currentUser(req), req.params.bowId));
    }),
  );
  return router;
}
