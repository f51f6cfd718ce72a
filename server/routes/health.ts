import { Router } from 'express';
import type { Sequelize } from 'sequelize';

/** `GET /api/health`: 200 with the database up, 503 when it does not answer. */
export function healthRoutes(sequelize: Sequelize) {
  const router = Router();
  router.get('/', async (_req, res) => {
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        sequelize.query('SELECT 1'),
        new Promise((_r, reject) => {
          timer = setTimeout(() => reject(new Error('timeout')), 3000);
        }),
      ]);
      clearTimeout(timer);
      res.json({ status: 'ok', db: 'up' });
    } catch {
      clearTimeout(timer);
      res.status(503).json({
        status: 'degraded',
        db: 'down',
        error: { code: 'db_unavailable', message: 'The database is not answering.' },
      });
    }
  });
  return router;
}
