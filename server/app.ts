import { existsSync } from 'node:fs';
import path from 'node:path';
import { constants as zlibConstants } from 'node:zlib';
import compression from 'compression';
import cookieParser from 'cookie-parser';
import express from 'express';
import expressStaticGzip from 'express-static-gzip';
import helmet from 'helmet';
import { adminRouter } from './admin/router';
import { authRouter } from './auth/router';
import { brewsRouter } from './brews/router';
import { loadUser, SESSION_COOKIE } from './auth/session';
import type { AppContext, RouterContext } from './context';
import { clubsRouter, invitationsRouter } from './clubs/router';
import { calcRouter } from './calc/router';
import { equipmentRouter } from './equipment/router';
import { fermentationCsvRouter, fermentationRouter, fermentationSettingsRouter } from './fermentation/router';
import { healthRouter } from './health/router';
import { instrumentsRouter } from './instruments/router';
import { apiSecurityHeaders } from './lib/security-headers';
import { crossSiteGuard, noStoreWhenSignedIn } from './lib/cross-site';
import { apiNotFound, errorMiddleware } from './lib/error-middleware';
import { idempotency } from './lib/idempotency';
import { createRateLimits } from './lib/rate-limit';
import { passwordResetRouter } from './password-reset/router';
import { recipesRouter } from './recipes/router';
import { brewReviewRouter, commentsRouter, reviewsRouter } from './reviews/router';

const defaultClientDist = path.resolve(import.meta.dirname, '..', 'dist');

/** Whether a request's Cookie header carries the session cookie (whatever its value). */
const hasSessionCookie = (header: string | undefined) => header !== undefined && header.split(';').some((part) => part.trimStart().startsWith(`${SESSION_COOKIE}=`));

export function createApp(ctx: AppContext) {
  const { env, db } = ctx;
  const clientDist = env.CLIENT_DIST ?? defaultClientDist;
  const app = express();
  app.disable('x-powered-by');
  if (env.TRUST_PROXY) app.set('trust proxy', env.TRUST_PROXY);

  // JSON answers carry their own ETag-free, no-store semantics: hashing every body for an ETag
  // nobody revalidates is waste (the built files keep theirs, from serve-static).
  app.set('etag', false);

  // The whole URL map of the API: every router takes the one RouterContext and answers under its
  // own prefix. Those under /brews/:brewId come before the brew-day router, which they extend.
  // The pipeline is ordered cheapest-first: the health check and the public calculators pass only
  // what they need, the signed-in routes the rest (issue 14: per-request cost).
  const rc: RouterContext = { ...ctx, limits: createRateLimits(env, ctx.redis) };
  const api = express.Router();
  api.use(apiSecurityHeaders());
  api.use(crossSiteGuard(env));
  api.use('/health', healthRouter(rc));
  api.use(express.json({ limit: '100kb' }));
  // JSON is compressed on the fly (brotli when the browser takes it) above 1 kB; a client that
  // accepts no encoding (a probe, a script) skips the wrapper altogether.
  const compressJson = compression({ threshold: 1024, brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } } });
  api.use((req, res, next) => (req.headers['accept-encoding'] ? compressJson(req, res, next) : next()));
  api.use('/calc', calcRouter(rc));
  api.use(cookieParser());
  api.use(loadUser(db, env));
  api.use(noStoreWhenSignedIn);
  api.use(idempotency(db));
  api.use('/auth/password-reset', passwordResetRouter(rc));
  api.use('/auth', authRouter(rc));
  api.use('/clubs', clubsRouter(rc));
  api.use('/invitations', invitationsRouter(rc));
  api.use('/admin', adminRouter(rc));
  api.use('/recipes', recipesRouter(rc));
  api.use('/instruments', instrumentsRouter(rc));
  api.use('/equipment', equipmentRouter(rc));
  api.use('/fermentation', fermentationSettingsRouter(rc));
  api.use('/reviews', reviewsRouter(rc));
  api.use('/brews/:brewId/fermentation.csv', fermentationCsvRouter(rc));
  api.use('/brews/:brewId/fermentation', fermentationRouter(rc));
  api.use('/brews/:brewId/review', brewReviewRouter(rc));
  api.use('/brews/:brewId/comments', commentsRouter(rc));
  api.use('/brews', brewsRouter(rc));
  api.use(apiNotFound);
  app.use('/api', api);

  // Pages and files: helmet's defaults, and the HTML fallback compressed on the fly; the built
  // files come precompressed (the precompress plugin in vite.config.ts) and are left alone.
  app.use(helmet());
  app.use(compression({ threshold: 1024, brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } } }));

  // The built client, with every other GET falling back to index.html for client-side routing.
  if (existsSync(path.join(clientDist, 'index.html'))) {
    // Source maps are built for us, not published.
    app.use((req, res, next) => (req.path.endsWith('.map') ? res.status(404).end() : next()));
    // The service worker and the manifest are checked for a new version on every visit: never
    // cached for long, or a fixed release would reach installed apps only an hour (or a year) later.
    app.get(['/sw.js', '/registerSW.js', '/manifest.webmanifest'], (req, res, next) => {
      if (!existsSync(path.join(clientDist, req.path))) return next();
      if (req.path.endsWith('.webmanifest')) res.type('application/manifest+json');
      else res.type('text/javascript');
      res.set('Cache-Control', 'no-cache').sendFile(req.path.slice(1), { root: clientDist });
    });
    // Hashed file names never change content: cached for a year. Answered before the general
    // handler below, whose hour would otherwise win; a missing asset is a 404, not the app's page.
    const precompressed = { enableBrotli: true, orderPreference: ['br', 'gzip'], index: false };
    app.use(
      '/assets',
      expressStaticGzip(path.join(clientDist, 'assets'), { ...precompressed, serveStatic: { immutable: true, maxAge: '1y', index: false, fallthrough: false } }),
    );
    app.use(expressStaticGzip(clientDist, { ...precompressed, serveStatic: { maxAge: '1h', index: false } }));
    // A visitor without a session gets the public late-boil check as its own small page (no router,
    // no app shell: decision 0026); with a session cookie, the app's page. Two pages at one address:
    // caches keep them apart by the cookie, and neither is ever answered "not modified" for the other.
    if (existsSync(path.join(clientDist, 'late-boil-check.html'))) {
      app.get('/late-boil-check', (req, res) => {
        const page = hasSessionCookie(req.headers.cookie) ? 'index.html' : 'late-boil-check.html';
        res.vary('Cookie');
        res.set('Cache-Control', 'no-cache').sendFile(page, { root: clientDist, lastModified: false });
      });
    }
    app.get('/{*path}', (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile('index.html', { root: clientDist });
    });
  }

  app.use(errorMiddleware);
  return app;
}
