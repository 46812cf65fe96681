/**
 * Requests from other sites. The session cookie is SameSite=Lax, which still lets another site's
 * form POST reach us in some browsers and does nothing for same-site subdomains; so a
 * state-changing request whose browser says it came from elsewhere (a foreign `Origin`, or
 * `Sec-Fetch-Site: cross-site`) is refused with 403, and the API takes JSON (or a file upload
 * where a route accepts one), never the form encodings a cross-site form can send (415).
 * Signed-in answers are never stored by caches (`Cache-Control: no-store`).
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Env } from '../env';
import { Forbidden, HttpError } from './errors';

class UnsupportedMediaType extends HttpError {
  constructor(message: string) {
    super(415, 'unsupported_media_type', message);
  }
}

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

function hasBody(req: Request) {
  const length = req.get('content-length');
  return (length !== undefined && length !== '0') || req.get('transfer-encoding') !== undefined;
}

export function crossSiteGuard(env: Env): RequestHandler {
  const appOrigin = new URL(env.APP_URL).origin;
  return (req: Request, _res: Response, next: NextFunction) => {
    if (safeMethods.has(req.method)) return next();
    if (req.get('sec-fetch-site') === 'cross-site') throw new Forbidden('Requests from other sites are not accepted.');
    const origin = req.get('origin');
    if (origin !== undefined) {
      const own = `${req.protocol}://${req.get('host')}`;
      if (origin !== appOrigin && origin !== own) throw new Forbidden('Requests from other sites are not accepted.');
    }
    if (hasBody(req) && !req.is('application/json') && !req.is('multipart/form-data')) {
      throw new UnsupportedMediaType('Send JSON (Content-Type: application/json).');
    }
    next();
  };
}

/** Multipart only where a route takes a file (lib/upload.ts marks it); elsewhere 415. */
export function refuseStrayMultipart(req: Request, res: Response) {
  if (!res.locals.acceptsUpload && req.is('multipart/form-data')) throw new UnsupportedMediaType('Send JSON (Content-Type: application/json).');
}

/** Answers to signed-in requests hold someone's data: no cache keeps them. */
export const noStoreWhenSignedIn: RequestHandler = (req, res, next) => {
  if (req.user || req.cookies?.wortwise_session) res.set('Cache-Control', 'no-store');
  next();
};
