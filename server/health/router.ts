import { Router } from 'express';
import type { RouterContext } from '../context';
import { databaseIsUp } from './service';

/** `/api/health`: 200 with db "up", or 503 with db "down". */
export function healthRouter(ctx: RouterContext) {
  const router = Router();
  router.get('/', async (_req, res) => {
    if (await databaseIsUp(ctx)) res.json({ status: 'ok', db: 'up' });
    else res.status(503).json({ status: 'degraded', db: 'down' });
  });
  return router;
}
