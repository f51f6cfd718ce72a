import { Router } from 'express';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { route } from '@/server/middleware/validate';
import * as audit from '@/server/services/audit-service';
import { auditQuerySchema } from '@/shared/audit';
import { idParamSchema } from '@/shared/common';

/** `GET /api/bows/:id/audit?page=`: the bow's audit log (technicians' writes, shares), for its archer. */
export function auditRoutes() {
  const router = Router();
  router.get(
    '/bows/:id/audit',
    requireUser,
    route({ params: idParamSchema, query: auditQuerySchema }, async (req, res) => {
      res.json(await audit.listBowAudit(currentUser(req), req.params.id, req.query.page));
    }),
  );
  return router;
}
