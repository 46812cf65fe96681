import { Router, type RequestHandler } from 'express';
import { adminUsersQuerySchema } from '@shared/schemas/admin';
import { requireSiteAdmin } from '../auth/permissions';
import type { RouterContext } from '../context';
import { handle } from '../lib/handle';
import { NotFound } from '../lib/errors';
import { caughtMail, listUsers } from './service';

/** `/api/admin`: site admins only; everyone else gets the same 404 as for a route that does not exist. */
export function adminRouter(ctx: RouterContext) {
  const router = Router();
  const onlyAdmins: RequestHandler = (req, _res, next) => {
    requireSiteAdmin(req.user);
    next();
  };
  router.use(onlyAdmins);

  router.get(
    '/users',
    handle({ query: adminUsersQuerySchema }, ({ query }) => listUsers(ctx.db, query)),
  );

  // Only where the fake SMTP server runs (development, tests): production mail is not ours to list.
  router.get(
    '/mail',
    handle({}, () => {
      if (!ctx.env.FAKE_SMTP_API_URL) throw new NotFound('No local mail catcher is configured.');
      return caughtMail(ctx.env.FAKE_SMTP_API_URL);
    }),
  );

  return router;
}
