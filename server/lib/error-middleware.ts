import type { ErrorRequestHandler, RequestHandler } from 'express';
import { isDatabaseUnavailable } from '../db/unavailable';
import { HttpError, NotFound } from './errors';

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new NotFound(`No API route ${req.method} ${req.path}.`));
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

/** The one place errors become responses. No stack trace ever reaches a client. */
export const errorMiddleware: ErrorRequestHandler = (err: unknown, _req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: err.code, message: err.message, ...(err.fields && { fields: err.fields }) });
    return;
  }
  const parserError = err as BodyParserError;
  if (parserError?.type === 'entity.parse.failed') {
    res.status(400).json({ error: 'bad_json', message: 'The request body is not valid JSON.' });
    return;
  }
  if (parserError?.type === 'entity.too.large' || parserError?.status === 413) {
    res.status(413).json({ error: 'too_large', message: 'The request is too large.' });
    return;
  }
  if (parserError?.name === 'MulterError') {
    const code = (err as { code?: string }).code;
    const status = code === 'LIMIT_FILE_SIZE' ? 413 : 400;
    res.status(status).json({ error: code?.toLowerCase() ?? 'upload', message: parserError.message });
    return;
  }
  if (typeof parserError?.status === 'number' && parserError.status >= 400 && parserError.status < 500) {
    res.status(parserError.status).json({ error: 'bad_request', message: 'The request could not be read.' });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    console.warn(`Database unavailable: ${(err as Error).message}`);
    res.status(503).set('Retry-After', '2').json({ error: 'unavailable', message: 'Wortwise cannot reach its database just now. Please try again in a moment.' });
    return;
  }
  console.error('Unhandled error', err);
  res.status(500).json({ error: 'internal', message: 'Something went wrong on our side. Please try again.' });
};
