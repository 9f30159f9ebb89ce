import { Router } from 'express';
import type { HealthResponse } from '@cairn/schema';
import type { Database } from '../db/database';
import { serverVersion } from '../version';

/** GET /api/health: 200 when PostgreSQL answers a real query, 503 with the reason when it does not. */
export function healthRouter(db: Database): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    try {
      await db.ping();
      const body: HealthResponse = { status: 'ok', db: 'ok', version: serverVersion };
      res.json(body);
    } catch (err) {
      const reason = err instanceof Error ? err.message : String(err);
      const body: HealthResponse = { status: 'degraded', db: 'down', reason: `database unreachable: ${reason}`, version: serverVersion };
      res.status(503).json(body);
    }
  });
  return router;
}
