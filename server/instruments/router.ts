import { Router } from 'express';
import { idParamSchema } from '@shared/schemas/common';
import { calibrateInstrumentSchema, createInstrumentSchema, listInstrumentsQuerySchema, updateInstrumentSchema } from '@shared/schemas/instruments';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { calibrateInstrument, createInstrument, getInstrument, listCalibrations, listInstruments, updateInstrument } from './service';

/** /api/instruments: the signed-in brewer's own instruments and their calibration log. */
export function instrumentsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();
  router.use(requireUser);

  router.get(
    '/',
    handle({ query: listInstrumentsQuerySchema }, ({ query }, req) => listInstruments(db, currentUser(req), query)),
  );

  router.post(
    '/',
    handle({ body: createInstrumentSchema }, async ({ body }, req, res) => {
      const instrument = await createInstrument(db, currentUser(req), body);
      res.status(201);
      return instrument;
    }),
  );

  router.get(
    '/:id',
    handle({ params: idParamSchema }, ({ params }, req) => getInstrument(db, currentUser(req), params.id)),
  );

  router.patch(
    '/:id',
    handle({ params: idParamSchema, body: updateInstrumentSchema }, ({ params, body }, req) => updateInstrument(db, currentUser(req), params.id, body)),
  );

  router.get(
    '/:id/calibrations',
    handle({ params: idParamSchema }, ({ params }, req) => listCalibrations(db, currentUser(req), params.id)),
  );

  // Saving a calibration is the brewer accepting it; the page previews with the same shared math first.
  router.post(
    '/:id/calibrations',
    handle({ params: idParamSchema, body: calibrateInstrumentSchema }, async ({ params, body }, req, res) => {
      const saved = await calibrateInstrument(db, currentUser(req), params.id, body);
      res.status(201);
      return saved;
    }),
  );

  return router;
}
