import { existsSync } from 'node:fs';
import path from 'node:path';
import cookieParser from 'cookie-parser';
import express from 'express';
import helmet from 'helmet';
import { adminRouter } from './admin/router';
import { authRouter } from './auth/router';
import { brewsRouter } from './brews/router';
import { loadUser } from './auth/session';
import type { AppContext } from './context';
import { clubsRouter, invitationsRouter } from './clubs/router';
import { calcRouter } from './calc/router';
import { equipmentRouter } from './equipment/router';
import { fermentationRouter } from './fermentation/router';
import { healthRouter } from './health/router';
import { instrumentsRouter } from './instruments/router';
import { crossSiteGuard, noStoreWhenSignedIn } from './lib/cross-site';
import { apiNotFound, errorMiddleware } from './lib/error-middleware';
import { idempotency } from './lib/idempotency';
import { passwordResetRouter } from './password-reset/router';
import { recipesRouter } from './recipes/router';
import { reviewsRouter } from './reviews/router';

const defaultClientDist = path.resolve(import.meta.dirname, '..', 'dist');

export function createApp(ctx: AppContext) {
  const { env, db, pool } = ctx;
  const clientDist = env.CLIENT_DIST ?? defaultClientDist;
  const app = express();
  app.disable('x-powered-by');
  if (env.TRUST_PROXY) app.set('trust proxy', env.TRUST_PROXY);

  app.use(helmet());
  app.use(express.json({ limit: '100kb' }));
  app.use(cookieParser());

  const api = express.Router();
  api.use(crossSiteGuard(env));
  api.use('/health', healthRouter(pool));
  api.use('/calc', calcRouter(env));
  api.use(loadUser(db, env));
  api.use(noStoreWhenSignedIn);
  api.use(idempotency(db));
  api.use('/auth/password-reset', passwordResetRouter(ctx));
  api.use('/auth', authRouter(db, env));
  api.use('/clubs', clubsRouter(ctx));
  api.use('/invitations', invitationsRouter(ctx));
  api.use('/admin', adminRouter(ctx));
  api.use('/recipes', recipesRouter(ctx));
  api.use('/instruments', instrumentsRouter(db));
  api.use('/equipment', equipmentRouter(db));
  api.use(fermentationRouter(ctx));
  api.use(reviewsRouter(ctx));
  api.use('/brews', brewsRouter(ctx));
  api.use(apiNotFound);
  app.use('/api', api);

  // The built client, with every other GET falling back to index.html for client-side routing.
  if (existsSync(path.join(clientDist, 'index.html'))) {
    app.use(express.static(clientDist, { index: false, maxAge: '1h' }));
    app.use('/assets', express.static(path.join(clientDist, 'assets'), { immutable: true, maxAge: '1y' }));
    app.get('/{*path}', (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile('index.html', { root: clientDist });
    });
  }

  app.use(errorMiddleware);
  return app;
}
