import { Router, type RequestHandler } from 'express';
import { eq } from 'drizzle-orm';
import { loginSchema, preferencesSchema, signupSchema } from '@shared/schemas/auth';
import type { Db } from '../db/client';
import { users } from '../db/schema';
import type { Env } from '../env';
import { handle } from '../lib/handle';
import { createUser, verifyLogin } from './service';
import { clearSession, currentUser, issueSession, loadSessionUser, requireUser, revokeAllSessions, revokeSession, toMe } from './session';

/** `authLimiter`: the sign-up and sign-in limit from server/lib/rate-limit.ts. */
export function authRouter(db: Db, env: Env, authLimiter: RequestHandler) {
  const router = Router();

  router.post(
    '/signup',
    authLimiter,
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
    authLimiter,
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
      const user = currentUser(req);
      if (Object.keys(body).length > 0) await db.update(users).set(body).where(eq(users.id, user.id));
      return toMe((await loadSessionUser(db, user.id))!);
    }),
  );

  return router;
}
