import { Router } from 'express';
import type { Pool } from 'mysql2/promise';

/** 200 with db "up", or 503 with db "down"; the pool reconnects by itself when MariaDB is back. */
export function healthRouter(pool: Pool) {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await pool.query({ sql: 'SELECT 1', timeout: 2_000 });
      res.json({ status: 'ok', db: 'up' });
    } catch {
      res.status(503).json({ status: 'degraded', db: 'down' });
    }
  });
  return router;
}
