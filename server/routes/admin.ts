import { Router } from 'express';
import { accountSearchSchema, accountUpdateSchema } from '@/shared/admin';
import { idParamSchema } from '@/shared/common';
import { validate } from '@/server/middleware/validate';
import { currentUser, requireRole, requireUser } from '@/server/middleware/auth';
import * as accounts from '@/server/services/account-service';
import * as audit from '@/server/services/audit-service';
import { adminAuditQuerySchema, type AdminAuditQuery } from '@/shared/audit';

export function adminRoutes() {
  const router = Router();
  router.use(requireUser, requireRole('admin'));
  router.get('/accounts', validate({ query: accountSearchSchema }), async (req, res) => {
    res.json(await accounts.listAccounts(req.query as never));
  });
  router.patch('/accounts/:id', validate({ params: idParamSchema, body: accountUpdateSchema }), async (req, res) => {
    const { id } = req.params as unknown as { id: number };
    res.json({ account: await accounts.updateAccount(currentUser(req), id, req.body) });
  });
  // ?page=&bowId=&accountId=&kind= (kind: a record kind, e.g. "share", "account", "sight-in-mark").
  router.get('/audit', validate({ query: adminAuditQuerySchema }), async (req, res) => {
    res.json(await audit.listAllAudit(req.query as unknown as AdminAuditQuery));
  });
  return router;
}
