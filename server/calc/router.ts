import { Router } from 'express';
import { boilCorrection } from '@shared/brewmath';
import { boilCorrectionRequestSchema } from '@shared/schemas/boil-check';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';

/**
 * Public calculators: no account needed, so a brewer can try Wortwise before signing up. Nothing
 * is stored. Rate-limited per client address (the `calc` limit of server/lib/rate-limit.ts).
 */
export function calcRouter(ctx: RouterContext) {
  const router = Router();
  router.use(ctx.limits.calc);

  router.post(
    '/boil-correction',
    handle({ body: boilCorrectionRequestSchema }, ({ body }) => boilCorrection(body)),
  );

  return router;
}
