import type { ErrorRequestHandler, RequestHandler } from 'express';
import { BrewMathError } from '@shared/brewmath';
import { describeDbError, isDatabaseUnavailable, isRetryableTransactionError } from './db-errors';
import { HttpError, NotFound } from './errors';

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new NotFound(`No API route ${req.method} ${req.path}.`));
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

/** Seconds a client should wait before trying again when MariaDB is away or too busy. */
export const RETRY_AFTER_SECONDS = 5;

const unavailableMessage = 'Wortwise cannot reach its database just now. Nothing was changed; please try again in a few seconds.';

/** The one place errors become responses. No stack trace ever reaches a client. */
export const errorMiddleware: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: err.code, message: err.message, ...(err.fields && { fields: err.fields }) });
    return;
  }
  // Brewing math refusing an input: a 400 under the field it names (see lib/brewmath-fields.ts to rename it).
  if (err instanceof BrewMathError) {
    const field = err.field ?? '_';
    res.status(400).json({ error: 'bad_request', message: err.message, fields: { [field]: err.message } });
    return;
  }
  // MariaDB away (or a deadlock that outlived its retries): say so, and when to try again; one log line.
  if (isDatabaseUnavailable(err) || isRetryableTransactionError(err)) {
    console.warn(`503 ${req.method} ${req.originalUrl}: database unavailable (${describeDbError(err)})`);
    res.status(503).set('Retry-After', String(RETRY_AFTER_SECONDS)).json({ error: 'unavailable', message: unavailableMessage });
    return;
  }
  // Uploads go through lib/upload.ts, which words multer's errors; this is only a safety net.
  if ((err as Error)?.name === 'MulterError') {
    const code = (err as { code?: string }).code;
    res.status(code === 'LIMIT_FILE_SIZE' ? 413 : 400).json({ error: code === 'LIMIT_FILE_SIZE' ? 'too_large' : 'bad_request', message: 'The upload could not be read: send one file.' });
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
  if (typeof parserError?.status === 'number' && parserError.status >= 400 && parserError.status < 500) {
    res.status(parserError.status).json({ error: 'bad_request', message: 'The request could not be read.' });
    return;
  }
  console.error('Unhandled error', err);
  res.status(500).json({ error: 'internal', message: 'Something went wrong on our side. Please try again.' });
};
