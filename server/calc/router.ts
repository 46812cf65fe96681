import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { boilCorrection } from '@shared/brewmath';
import { boilCorrectionRequestSchema } from '@shared/schemas/boil-check';
import type { Env } from '../env';
import { handle } from '../lib/handle';

/**
 * Public calculators: no account needed, so a brewer can try Wortwise before signing up. Nothing
 * is stored. Rate-limited per client address; the counts live in memory, per instance (README,
 * "Beyond one machine").
 */
export function calcRouter(env: Env) {
  const router = Router();
  router.use(
    rateLimit({
      windowMs: 60 * 1000,
      limit: env.CALC_RATE_LIMIT_MAX,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      message: { error: 'rate_limited', message: 'Too many calculations in a minute. Please wait a moment and try again.' },
    }),
  );

  router.post(
    '/boil-correction',
    handle({ body: boilCorrectionRequestSchema }, ({ body }) => boilCorrection(body)),
  );

  return router;
}
