import { Router } from 'express';
import { z } from 'zod';
import { idSchema } from '@shared/schemas/common';
import { CSV_MAX_BYTES, fermentationReadingInputSchema, fermentationReadingsQuerySchema, fermentationSettingsSchema, packagingInputSchema } from '@shared/schemas/fermentation';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { BadRequest } from '../lib/errors';
import { handle } from '../lib/handle';
import { singleUpload } from '../lib/upload';
import { exportCsv } from './csv-export';
import { importReadings, parseMapping, previewImport } from './csv-import';
import { deletePackaging, recordPackaging } from './packaging';
import { addReading, deleteReading } from './readings';
import { getLog, listFermentationReadings, remindersEnabledFor, setRemindersEnabled } from './service';

const idNum = idSchema;
const brewParams = z.object({ brewId: idNum });
const readingParams = z.object({ brewId: idNum, readingId: idNum });
const uploadBody = z.object({ mapping: z.string().max(20_000).optional() });

/** One file in memory, at most 5 MB: CSV is read straight from the buffer and never stored. */
const upload = singleUpload({
  field: 'file',
  what: 'CSV file',
  maxBytes: CSV_MAX_BYTES,
  tooLargeTip: 'Split it into smaller files and import them one after the other.',
  fieldSize: 20_000,
});

function fileOf(req: { file?: Express.Multer.File }) {
  if (!req.file) throw new BadRequest('Choose a CSV file to upload.', { file: 'Choose a CSV file to upload.' });
  return req.file.buffer;
}

/** `/api/fermentation`: the brewer's reminder setting. */
export function fermentationSettingsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();

  router.get(
    '/settings',
    requireUser,
    handle({}, async (_v, req) => ({ remindersEnabled: await remindersEnabledFor(db, currentUser(req).id) })),
  );
  router.put(
    '/settings',
    requireUser,
    handle({ body: fermentationSettingsSchema }, ({ body }, req) => setRemindersEnabled(db, currentUser(req), body.remindersEnabled)),
  );

  return router;
}

/** `/api/brews/:brewId/fermentation.csv`: the log as a CSV download. */
export function fermentationCsvRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requireUser,
    handle({ params: brewParams }, async ({ params }, req, res) => {
      const { filename, body } = await exportCsv(db, currentUser(req), params.brewId);
      res
        .status(200)
        .type('text/csv; charset=utf-8')
        .set('Content-Disposition', `attachment; filename="${filename}"`)
        .set('Cache-Control', 'no-store')
        .send(body);
    }),
  );

  return router;
}

/** `/api/brews/:brewId/fermentation`: the fermentation log of a brew day (its latest readings; older ones page by page), its readings, packaging and CSV import. */
export function fermentationRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requireUser,
    handle({ params: brewParams }, ({ params }, req) => getLog(db, currentUser(req), params.brewId)),
  );

  router.get(
    '/readings',
    requireUser,
    handle({ params: brewParams, query: fermentationReadingsQuerySchema }, ({ params, query }, req) => listFermentationReadings(db, currentUser(req), params.brewId, query)),
  );

  router.post(
    '/readings',
    requireUser,
    handle({ params: brewParams, body: fermentationReadingInputSchema }, async ({ params, body }, req, res) => {
      const result = await addReading(db, currentUser(req), params.brewId, body);
      res.status(result.duplicate ? 200 : 201);
      return result;
    }),
  );

  router.delete(
    '/readings/:readingId',
    requireUser,
    handle({ params: readingParams }, ({ params }, req) => deleteReading(db, currentUser(req), params.brewId, params.readingId)),
  );

  router.post(
    '/packaging',
    requireUser,
    handle({ params: brewParams, body: packagingInputSchema }, async ({ params, body }, req, res) => {
      const log = await recordPackaging(db, currentUser(req), params.brewId, body);
      res.status(201);
      return log;
    }),
  );

  router.delete(
    '/packaging',
    requireUser,
    handle({ params: brewParams }, ({ params }, req) => deletePackaging(db, currentUser(req), params.brewId)),
  );

  router.post(
    '/import/preview',
    requireUser,
    upload,
    handle({ params: brewParams, body: uploadBody }, ({ params, body }, req) =>
      previewImport(db, currentUser(req), params.brewId, fileOf(req), parseMapping(body.mapping)),
    ),
  );

  router.post(
    '/import',
    requireUser,
    upload,
    handle({ params: brewParams, body: uploadBody }, async ({ params, body }, req, res) => {
      const mapping = parseMapping(body.mapping);
      if (!mapping) throw new BadRequest('Confirm the column mapping first.', { mapping: 'Confirm the column mapping first.' });
      const result = await importReadings(db, currentUser(req), params.brewId, fileOf(req), mapping);
      res.status(result.added > 0 ? 201 : 200);
      return result;
    }),
  );

  return router;
}
