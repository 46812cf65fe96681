/**
 * Security headers, from helmet. Pages and built files get helmet's defaults, set per response as
 * usual. JSON answers are never rendered as a document, so they get the policy OWASP's REST
 * Security Cheat Sheet gives for APIs (`default-src 'none'; frame-ancestors 'none'`) with helmet's
 * other headers; those never depend on the request, so helmet works them out once at start-up and
 * each answer gets them in one pass instead of twelve middleware calls (issue 14: per-request cost).
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import helmet from 'helmet';

/** Helmet's options for a JSON answer. */
const apiPolicy = {
  contentSecurityPolicy: { useDefaults: false, directives: { defaultSrc: ["'none'"], frameAncestors: ["'none'"] } },
  frameguard: { action: 'deny' },
  referrerPolicy: { policy: 'no-referrer' },
} as const;

/** The headers helmet sets with `options`, read off one run against a recording response. */
export function helmetHeaders(options: Parameters<typeof helmet>[0]): [string, string][] {
  const headers = new Map<string, string>();
  const recorder = {
    setHeader: (name: string, value: string) => headers.set(name, String(value)),
    removeHeader: (name: string) => headers.delete(name),
  } as unknown as ServerResponse;
  let passed = false;
  helmet(options)({} as IncomingMessage, recorder, () => {
    passed = true;
  });
  // Every helmet middleware is synchronous: anything else means a setting made the policy per request.
  if (!passed) throw new Error('helmet did not finish synchronously; these headers cannot be computed once');
  return [...headers];
}

/** Sets the API's security headers (computed once) on every answer under /api. */
export function apiSecurityHeaders(): RequestHandler {
  const headers = helmetHeaders(apiPolicy);
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}
