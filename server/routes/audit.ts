import { Router } from 'express';
import { currentUser, requireUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import * as audit from '@/server/services/audit-service';
import { auditQuerySchema } from '@/shared/audit';
import { idParamSchema } from '@/shared/common';

/** `GET /api/bows/:id/audit?page=`: the bow's audit log (technicians' writes, shares), for its archer. */
export function auditRoutes() {
  const router = Router();
  router.get('/bows/:id/audit', requireUser, validate({ params: idParamSchema, query: auditQuerySchema }), async (req, res) => {
    const { id } = req.params as unknown as { id: number };
    res.json(await audit.listBowAudit(currentUser(req), id, (req.query as unknown as { page: number }).page));
  });
  return router;
}
