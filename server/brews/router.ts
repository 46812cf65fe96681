import { Router } from 'express';
import { idParamSchema } from '@shared/schemas/common';
import {
  brewNoteInputSchema,
  brewReadingsQuerySchema,
  brewSharingSchema,
  decisionInputSchema,
  listBrewsQuerySchema,
  noteParamsSchema,
  photoParamsSchema,
  readingInputSchema,
  readingParamsSchema,
  stageActionSchema,
  stageParamsSchema,
  startBrewSchema,
  updateBrewSchema,
} from '@shared/schemas/brews';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { addDecision } from './decisions';
import { createPhotoStore } from './photo-store';
import { addPhoto, deletePhoto, receivePhoto, sendPhoto } from './photos';
import { addReading, deleteReading, recomputeReading } from './readings';
import { addNote, deleteBrew, deleteNote, getBrew, listBrews, listReadings, setBrewSharing, setStage, startBrew, updateBrew } from './service';

/** An entry made offline keeps the time it was made on the device; otherwise the server's clock. */
const at = (iso: string | undefined) => (iso ? new Date(iso) : undefined);

/** `/api/brews`: brew days with their stages, readings, photos, late-boil decisions and notes. */
export function brewsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const photoStore = createPhotoStore(ctx.env);
  const router = Router();
  router.use(requireUser);

  router.get(
    '/',
    handle({ query: listBrewsQuerySchema }, ({ query }, req) => listBrews(db, currentUser(req), query)),
  );

  router.post(
    '/',
    handle({ body: startBrewSchema }, async ({ body }, req, res) => {
      const id = await startBrew(db, currentUser(req), body);
      res.status(201);
      return getBrew(db, currentUser(req), id);
    }),
  );

  router.get(
    '/:id',
    handle({ params: idParamSchema }, ({ params }, req) => getBrew(db, currentUser(req), params.id)),
  );

  router.patch(
    '/:id',
    handle({ params: idParamSchema, body: updateBrewSchema }, async ({ params, body }, req) => {
      await updateBrew(db, currentUser(req), params.id, body);
      return getBrew(db, currentUser(req), params.id);
    }),
  );

  router.delete(
    '/:id',
    handle({ params: idParamSchema }, async ({ params }, req, res) => {
      await deleteBrew(db, currentUser(req), params.id);
      res.status(204).end();
    }),
  );

  router.put(
    '/:id/sharing',
    handle({ params: idParamSchema, body: brewSharingSchema }, ({ params, body }, req) => setBrewSharing(db, currentUser(req), params.id, body.clubIds)),
  );

  router.post(
    '/:id/stages/:stage',
    handle({ params: stageParamsSchema, body: stageActionSchema }, async ({ params, body }, req) => {
      await setStage(db, currentUser(req), params.id, params.stage, body.action, at(body.at));
      return getBrew(db, currentUser(req), params.id);
    }),
  );

  router.get(
    '/:id/readings',
    handle({ params: idParamSchema, query: brewReadingsQuerySchema }, ({ params, query }, req) => listReadings(db, currentUser(req), params.id, query)),
  );

  router.post(
    '/:id/readings',
    handle({ params: idParamSchema, body: readingInputSchema }, async ({ params, body }, req, res) => {
      const reading = await addReading(db, currentUser(req), params.id, body);
      res.status(201);
      return reading;
    }),
  );

  router.delete(
    '/:id/readings/:readingId',
    handle({ params: readingParamsSchema }, ({ params }, req) => deleteReading(db, currentUser(req), params.id, params.readingId)),
  );

  router.post(
    '/:id/readings/:readingId/recompute',
    handle({ params: readingParamsSchema }, ({ params }, req) => recomputeReading(db, currentUser(req), params.id, params.readingId)),
  );

  router.post(
    '/:id/readings/:readingId/photos',
    receivePhoto,
    handle({ params: readingParamsSchema }, async ({ params }, req, res) => {
      const photo = await addPhoto(db, photoStore, currentUser(req), params.id, params.readingId, req.file);
      res.status(201);
      return photo;
    }),
  );

  router.get(
    '/:id/readings/:readingId/photos/:photoId',
    handle({ params: photoParamsSchema }, ({ params }, req, res) => sendPhoto(db, photoStore, currentUser(req), params.id, params.readingId, params.photoId, req, res)),
  );

  router.delete(
    '/:id/readings/:readingId/photos/:photoId',
    handle({ params: photoParamsSchema }, async ({ params }, req, res) => {
      await deletePhoto(db, photoStore, currentUser(req), params.id, params.readingId, params.photoId);
      res.status(204).end();
    }),
  );

  router.post(
    '/:id/decisions',
    handle({ params: idParamSchema, body: decisionInputSchema }, async ({ params, body }, req, res) => {
      const decision = await addDecision(db, currentUser(req), params.id, body, at(body.decidedAt));
      res.status(201);
      return decision;
    }),
  );

  router.post(
    '/:id/notes',
    handle({ params: idParamSchema, body: brewNoteInputSchema }, async ({ params, body }, req, res) => {
      const note = await addNote(db, currentUser(req), params.id, body, at(body.writtenAt));
      res.status(201);
      return note;
    }),
  );

  router.delete(
    '/:id/notes/:noteId',
    handle({ params: noteParamsSchema }, async ({ params }, req, res) => {
      await deleteNote(db, currentUser(req), params.id, params.noteId);
      res.status(204).end();
    }),
  );

  return router;
}
