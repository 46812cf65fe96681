import { Router, type RequestHandler } from 'express';
import { BrewMathError, boilCorrection } from '@shared/brewmath';
import { boilCorrectionRequestSchema } from '@shared/schemas/boil-check';
import { BadRequest } from '../lib/errors';
import { handle } from '../lib/handle';

/** A BrewMathError names the input it refuses; it becomes the same per-field 400 as a zod error. */
function brewMath<T>(compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    if (error instanceof BrewMathError) {
      throw new BadRequest('Some fields need attention.', { [error.field ?? '_']: error.message });
    }
    throw error;
  }
}

/**
 * Public calculators: no account needed, so a brewer can try Wortwise before signing up. Nothing
 * is stored. Rate-limited per client address (`limit`, from server/lib/rate-limit.ts).
 */
export function calcRouter(limit: RequestHandler) {
  const router = Router();
  router.use(limit);

  router.post(
    '/boil-correction',
    handle({ body: boilCorrectionRequestSchema }, ({ body }) => brewMath(() => boilCorrection(body))),
  );

  return router;
}
