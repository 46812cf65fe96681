import { Router } from 'express';
import { z } from 'zod';
import { idParamSchema } from '@shared/schemas/common';
import { listRecipesQuerySchema, recipeInputSchema, recipeVersionParamsSchema, recipeUpdateSchema, sharingInputSchema, type RecipeImportResult } from '@shared/schemas/recipes';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { singleUpload } from '../lib/upload';
import { fileSlug, parseRecipeFile, toRecipeCsv, toRecipeFile } from './file-format';
import {
  cloneRecipe,
  createRecipe,
  deleteRecipe,
  getRecipe,
  getRecipeVersion,
  listRecipeVersions,
  listRecipes,
  loadRecipeForActor,
  setRecipeSharing,
  updateRecipe,
} from './service';

const exportQuerySchema = z.object({
  format: z.enum(['json', 'csv'], { error: 'Export as json or csv.' }).default('json'),
});

/** A recipe file is a few kilobytes; kept in memory, never written to disk (no per-instance state). */
const upload = singleUpload({
  field: 'file',
  what: 'recipe file',
  maxBytes: 256 * 1024,
  tooLargeTip: 'A recipe file is a few kilobytes: check that you chose a recipe exported from Wortwise.',
});

/** `/api/recipes`: a brewer's recipes and those shared with their clubs. */
export function recipesRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();
  router.use(requireUser);

  router.get(
    '/',
    handle({ query: listRecipesQuerySchema }, ({ query }, req) => listRecipes(db, currentUser(req), query)),
  );

  router.post(
    '/',
    handle({ body: recipeInputSchema }, async ({ body }, req, res) => {
      const actor = currentUser(req);
      const id = await createRecipe(db, actor, body);
      res.status(201).location(`/api/recipes/${id}`);
      return getRecipe(db, actor, id);
    }),
  );

  router.post(
    '/import',
    upload,
    handle({}, async (_valid, req, res): Promise<RecipeImportResult> => {
      const actor = currentUser(req);
      const { data, ignored } = parseRecipeFile(req.file?.buffer);
      const id = await createRecipe(db, actor, data);
      res.status(201).location(`/api/recipes/${id}`);
      return { recipe: await getRecipe(db, actor, id), ignored };
    }),
  );

  router.get(
    '/:id',
    handle({ params: idParamSchema }, ({ params }, req) => getRecipe(db, currentUser(req), params.id)),
  );

  router.put(
    '/:id',
    handle({ params: idParamSchema, body: recipeUpdateSchema }, ({ params, body }, req) => updateRecipe(db, currentUser(req), params.id, body)),
  );

  router.delete(
    '/:id',
    handle({ params: idParamSchema }, async ({ params }, req, res) => {
      await deleteRecipe(db, currentUser(req), params.id);
      res.status(204).end();
    }),
  );

  router.post(
    '/:id/clone',
    handle({ params: idParamSchema }, async ({ params }, req, res) => {
      const copy = await cloneRecipe(db, currentUser(req), params.id);
      res.status(201).location(`/api/recipes/${copy.id}`);
      return copy;
    }),
  );

  router.get(
    '/:id/versions',
    handle({ params: idParamSchema }, ({ params }, req) => listRecipeVersions(db, currentUser(req), params.id)),
  );

  router.get(
    '/:id/versions/:version',
    handle({ params: recipeVersionParamsSchema }, ({ params }, req) => getRecipeVersion(db, currentUser(req), params.id, params.version)),
  );

  router.put(
    '/:id/sharing',
    handle({ params: idParamSchema, body: sharingInputSchema }, ({ params, body }, req) => setRecipeSharing(db, currentUser(req), params.id, body.clubIds)),
  );

  router.get(
    '/:id/export',
    handle({ params: idParamSchema, query: exportQuerySchema }, async ({ params, query }, req, res) => {
      const { data } = await loadRecipeForActor(db, currentUser(req), params.id, 'read');
      const base = fileSlug(data.name);
      if (query.format === 'csv') {
        res.attachment(`${base}.csv`).type('text/csv; charset=utf-8').send(toRecipeCsv(data));
        return;
      }
      res.attachment(`${base}.wortwise.json`).type('application/json; charset=utf-8').send(JSON.stringify(toRecipeFile(data), null, 2) + '\n');
    }),
  );

  return router;
}
