import { Router, type RequestHandler } from 'express';
import { boilCorrection } from '@shared/brewmath';
import { boilCorrectionRequestSchema } from '@shared/schemas/boil-check';
import { handle } from '../lib/handle';

/**
 * Public calculators: no account needed, so a brewer can try Wortwise before signing up. Nothing
 * is stored. Rate-limited per client address (`limit`, from server/lib/rate-limit.ts).
 */
export function calcRouter(limit: RequestHandler) {
  const router = Router();
  router.use(limit);

  router.post(
    '/boil-correction',
    handle({ body: boilCorrectionRequestSchema }, ({ body }) => boilCorrection(body)),
  );

  return router;
}
