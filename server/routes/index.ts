/**
 * The API's table of contents: every router and where it is mounted.
 * Feature routers add one line here.
 */
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { authRoutes, meRoutes } from './auth';
import { accountRoutes } from './account';
import { healthRoutes } from './health';
import { adminRoutes } from './admin';
import { bowRoutes } from './bows';
import { buildRoutes } from './builds';
import { sightInRoutes } from './sight-ins';
import { tapeRoutes } from './tapes';
import { tryRoutes } from './try';
import { passwordRoutes } from './password';
import { devMailRoutes } from './dev-mail';
import { shareRoutes } from './shares';
import { clientRoutes } from './clients';
import { auditRoutes } from './audit';
import { exportRoutes } from './export';
import { auditTrail } from '@/server/services/audit-service';
import { config } from '@/server/config';
import { levelRoutes } from './level';
import { photoRoutes } from './photos';
import { compareRoutes } from './compare';
import { fieldCardRoutes } from './field-card';
import { predictRoutes } from './predict';
import { tuningRoutes } from './tuning';
import { idempotency } from '@/server/middleware/idempotency';

export function apiRoutes(sequelize: Sequelize) {
  const api = Router();
  api.use(auditTrail()); // who is acting, for the audit log of technicians' writes (before every router)
  api.use(idempotency()); // a write sent again with the same Idempotency-Key is answered from the first (the phone's outbox)
  api.use('/health', healthRoutes(sequelize));
  api.use('/auth', authRoutes());
  api.use('/me', meRoutes());
  api.use('/me', accountRoutes()); // /me/password, /me/export.json, /me/delete
  api.use('/admin', adminRoutes());
  api.use(bowRoutes()); // /bows, /bows/:id
  api.use(buildRoutes()); // /bows/:bowId/builds, /builds/:id
  api.use(sightInRoutes()); // /bows/:bowId/sight-ins, /sight-ins/:id
  api.use(tapeRoutes()); // /sight-ins/:sightInId/tapes, /tapes/:id, /sight-ins/:id/{tape.svg,sheet.svg,sheet.pdf}
  api.use(tryRoutes()); // public, rate-limited: /try/fit, /try/tape.svg, /try/sheet.svg, /try/sheet.pdf
  api.use('/password', passwordRoutes());
  if (config.devMail) api.use('/dev/mail', devMailRoutes()); // development only: what the fake SMTP service received
  api.use('/clients', clientRoutes());
  api.use(shareRoutes()); // /bows/:bowId/shares, /shares, /shares/:id/revoke, /invites/:token, /invites/accept(-new)
  api.use(auditRoutes()); // /bows/:id/audit
  api.use(exportRoutes()); // /bows/:id/export.{csv,json}, /sight-ins/:id/marks/import, /sight-ins/:id/send-tape
  api.use(levelRoutes()); // /bows/:bowId/{level,readiness,checks,changes}, /checks/:id, /changes/:id
  api.use(photoRoutes()); // /checks/:id/steps/:step/photo, /photos/:id
  api.use(compareRoutes()); // /bows/:bowId/compare
  api.use(fieldCardRoutes()); // /sight-ins/:id/field-card, field-card.svg, field-card.pdf
  api.use(predictRoutes()); // /bows/:bowId/predict, /bows/:bowId/predict/tape.svg
  api.use(tuningRoutes()); // /bows/:bowId/{setup,paper-tunes,tuning.csv}, /paper-tunes/:id, /builds/:id/arrow-sets, /arrows/:id, /sight-ins/:id/{staleness,confirm-range}
  return api;
}
