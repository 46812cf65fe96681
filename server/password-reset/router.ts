import { Router } from 'express';
import { tokenParamsSchema } from '@shared/schemas/clubs';
import { passwordResetRequestedMessage, passwordResetRequestSchema, passwordResetSchema } from '@shared/schemas/password-reset';
import { issueSession, loadSessionUser, toMe } from '../auth/session';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { checkResetToken, requestPasswordReset, resetPassword } from './service';

/** `/api/auth/password-reset`: ask for a link, check it, use it. */
export function passwordResetRouter(ctx: RouterContext) {
  const { db, env } = ctx;
  const router = Router();

  router.post(
    '/',
    ctx.limits.passwordReset,
    handle({ body: passwordResetRequestSchema }, async ({ body }, _req, res) => {
      await requestPasswordReset(ctx, body.email);
      res.status(202);
      return { message: passwordResetRequestedMessage };
    }),
  );

  router.get(
    '/:token',
    ctx.limits.passwordReset,
    handle({ params: tokenParamsSchema }, ({ params }) => checkResetToken(db, params.token)),
  );

  router.post(
    '/:token',
    ctx.limits.passwordReset,
    handle({ params: tokenParamsSchema, body: passwordResetSchema }, async ({ params, body }, _req, res) => {
      const user = await resetPassword(db, params.token, body.password);
      // This device gets a fresh session under the new token version; every other one is out.
      issueSession(res, env, user);
      return toMe((await loadSessionUser(db, user.id))!);
    }),
  );

  return router;
}
