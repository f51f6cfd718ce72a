import { Router } from 'express';
import { accountSearchSchema, accountUpdateSchema } from '@/shared/admin';
import { idParamSchema } from '@/shared/common';
import { route } from '@/server/middleware/validate';
import { currentUser, requireRole, requireUser } from '@/server/middleware/auth';
import * as accounts from '@/server/services/account-service';
import * as audit from '@/server/services/audit-service';
import { adminAuditQuerySchema } from '@/shared/audit';

export function adminRoutes() {
  const router = Router();
  router.use(requireUser, requireRole('admin'));
  router.get(
    '/accounts',
    route({ query: accountSearchSchema }, async (req, res) => {
      res.json(await accounts.listAccounts(req.query));
    }),
  );
  router.patch(
    '/accounts/:id',
    route({ params: idParamSchema, body: accountUpdateSchema }, async (req, res) => {
      res.json({ account: await accounts.updateAccount(currentUser(req), req.params.id, req.body) });
    }),
  );
  // ?page=&bowId=&accountId=&kind= (kind: a record kind, e.g. "share", "account", "sight-in-mark").
  router.get(
    '/audit',
    route({ query: adminAuditQuerySchema }, async (req, res) => {
      res.json(await audit.listAllAudit(req.query));
    }),
  );
  return router;
}
