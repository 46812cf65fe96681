import { Router } from 'express';
import { loginSchema, preferencesSchema, signupSchema } from '@shared/schemas/auth';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { createUser, updatePreferences, verifyLogin } from './service';
import { clearSession, currentUser, issueSession, loadSessionUser, requireUser, revokeAllSessions, revokeSession, toMe } from './session';

/** `/api/auth`: sign-up, sign-in (both under the `auth` rate limit), sign-out and the brewer's own settings. */
export function authRouter(ctx: RouterContext) {
  const { db, env } = ctx;
  const router = Router();

  router.post(
    '/signup',
    ctx.limits.auth,
    handle({ body: signupSchema }, async ({ body }, _req, res) => {
      const id = await createUser(db, body);
      const user = await loadSessionUser(db, id);
      issueSession(res, env, { id, tokenVersion: 0 });
      res.status(201);
      return toMe(user!);
    }),
  );

  router.post(
    '/login',
    ctx.limits.auth,
    handle({ body: loginSchema }, async ({ body }, _req, res) => {
      const user = await verifyLogin(db, body);
      issueSession(res, env, user);
      return toMe((await loadSessionUser(db, user.id))!);
    }),
  );

  // Signing out revokes the session on the server too: a copy of the cookie stops working.
  router.post('/logout', async (req, res) => {
    await revokeSession(db, req);
    clearSession(res, env);
    res.status(204).end();
  });

  router.post('/logout-everywhere', requireUser, async (req, res) => {
    await revokeAllSessions(db, currentUser(req).id);
    clearSession(res, env);
    res.status(204).end();
  });

  router.get('/me', requireUser, (req, res) => {
    res.json(toMe(currentUser(req)));
  });

  router.patch(
    '/me',
    requireUser,
    handle({ body: preferencesSchema }, async ({ body }, req) => {
      return toMe(await updatePreferences(db, currentUser(req).id, body));
    }),
  );

  return router;
}
