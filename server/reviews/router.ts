import { Router } from 'express';
import { brewParamsSchema, commentInputSchema, commentParamsSchema, reviewListQuerySchema } from '@shared/schemas/comments';
import { currentUser, requireUser } from '../auth/session';
import type { AppContext } from '../context';
import { handle } from '../lib/handle';
import { addComment, deleteComment, getReview, listComments, listQueue, listReviewed } from './service';

/**
 * A mentor's review: `/api/reviews/queue` and `/api/reviews/reviewed`, and `/api/brews/:brewId/review` and `…/comments` beside
 * the brew-day routes. Mounted on the API root before the brew-day router; it answers only its own paths.
 */
export function reviewsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();

  router.get(
    '/reviews/queue',
    requireUser,
    handle({ query: reviewListQuerySchema }, ({ query }, req) => listQueue(db, currentUser(req), query)),
  );

  router.get(
    '/reviews/reviewed',
    requireUser,
    handle({ query: reviewListQuerySchema }, ({ query }, req) => listReviewed(db, currentUser(req), query)),
  );

  router.get(
    '/brews/:brewId/review',
    requireUser,
    handle({ params: brewParamsSchema }, ({ params }, req) => getReview(db, currentUser(req), params.brewId)),
  );

  router.get(
    '/brews/:brewId/comments',
    requireUser,
    handle({ params: brewParamsSchema }, ({ params }, req) => listComments(db, currentUser(req), params.brewId)),
  );

  router.post(
    '/brews/:brewId/comments',
    requireUser,
    handle({ params: brewParamsSchema, body: commentInputSchema }, async ({ params, body }, req, res) => {
      const created = await addComment(ctx, currentUser(req), params.brewId, body);
      res.status(201);
      return created;
    }),
  );

  router.delete(
    '/brews/:brewId/comments/:commentId',
    requireUser,
    handle({ params: commentParamsSchema }, async ({ params }, req, res) => {
      await deleteComment(db, currentUser(req), params.brewId, params.commentId);
      res.status(204).end();
    }),
  );

  return router;
}
