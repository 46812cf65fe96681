import { Router } from 'express';
import { idParamSchema } from '@shared/schemas/common';
import { equipmentProfileInputSchema, equipmentProfileUpdateSchema } from '@shared/schemas/equipment';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { createEquipment, deleteEquipment, getEquipment, getEquipmentProfile, listEquipment, updateEquipment } from './service';

/** /api/equipment: the signed-in brewer's kettle profiles. */
export function equipmentRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();
  router.use(requireUser);

  router.get(
    '/',
    handle({}, (_valid, req) => listEquipment(db, currentUser(req))),
  );

  /** The profile a new brew day starts from: the default, or common-practice values marked as such. */
  router.get(
    '/default',
    handle({}, (_valid, req) => getEquipmentProfile(db, currentUser(req).id)),
  );

  router.post(
    '/',
    handle({ body: equipmentProfileInputSchema }, async ({ body }, req, res) => {
      const profile = await createEquipment(db, currentUser(req), body);
      res.status(201);
      return profile;
    }),
  );

  router.get(
    '/:id',
    handle({ params: idParamSchema }, ({ params }, req) => getEquipment(db, currentUser(req), params.id)),
  );

  router.patch(
    '/:id',
    handle({ params: idParamSchema, body: equipmentProfileUpdateSchema }, ({ params, body }, req) => updateEquipment(db, currentUser(req), params.id, body)),
  );

  router.delete(
    '/:id',
    handle({ params: idParamSchema }, async ({ params }, req, res) => {
      await deleteEquipment(db, currentUser(req), params.id);
      res.status(204).end();
    }),
  );

  return router;
}
