import { Router } from 'express';
import { currentUser, requireRole, requireUser } from '@/server/middleware/auth';
import * as shares from '@/server/services/share-service';

/** `GET /api/clients`: for a technician, the archers who share bows with them, and those bows. */
export function clientRoutes() {
  const router = Router();
  router.get('/', requireUser, requireRole('tech'), async (req, res) => {
    res.json({ clients: await shares.listClients(currentUser(req)) });
  });
  return router;
}
