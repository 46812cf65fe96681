import { Router } from 'express';
import { brewParamsSchema, commentInputSchema, commentParamsSchema, reviewListQuerySchema } from '@shared/schemas/comments';
import { currentUser, requireUser } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { addComment, deleteComment, getReview, listComments, listQueue, listReviewed } from './service';

/** `/api/reviews`: a mentor's queue of shared brew days awaiting a comment, and those already commented on. */
export function reviewsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router();

  router.get(
    '/queue',
    requireUser,
    handle({ query: reviewListQuerySchema }, ({ query }, req) => listQueue(db, currentUser(req), query)),
  );

  router.get(
    '/reviewed',
    requireUser,
    handle({ query: reviewListQuerySchema }, ({ query }, req) => listReviewed(db, currentUser(req), query)),
  );

  return router;
}

/** `/api/brews/:brewId/review`: the review page's data for one shared brew day. */
export function brewReviewRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requireUser,
    handle({ params: brewParamsSchema }, ({ params }, req) => getReview(db, currentUser(req), params.brewId)),
  );

  return router;
}

/** `/api/brews/:brewId/comments`: comments on a brew day, a reading or a decision. */
export function commentsRouter(ctx: RouterContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requireUser,
    handle({ params: brewParamsSchema }, ({ params }, req) => listComments(db, currentUser(req), params.brewId)),
  );

  router.post(
    '/',
    requireUser,
    handle({ params: brewParamsSchema, body: commentInputSchema }, async ({ params, body }, req, res) => {
      const created = await addComment(ctx, currentUser(req), params.brewId, body);
      res.status(201);
      return created;
    }),
  );

  router.delete(
    '/:commentId',
    requireUser,
    handle({ params: commentParamsSchema }, async ({ params }, req, res) => {
      await deleteComment(db, currentUser(req), params.brewId, params.commentId);
      res.status(204).end();
    }),
  );

  return router;
}
