import { Router } from 'express';
import type { Sequelize } from 'sequelize';

const DB_CHECK_TIMEOUT_MS = 2_000;

/** `GET /api/health`: 200 when the database answers, 503 when it does not. */
export function healthRouter(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const started = Date.now();
    try {
      await Promise.race([
        sequelize.query('SELECT 1'),
        new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), DB_CHECK_TIMEOUT_MS).unref()),
      ]);
      res.json({ status: 'ok', database: 'up', latencyMs: Date.now() - started });
    } catch {
      res.status(503).json({ status: 'degraded', database: 'down' });
    }
  });
  return router;
}
