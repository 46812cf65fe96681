import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { z } from 'zod';
import { refuseStrayMultipart } from './cross-site';
import { BadRequest } from './errors';

/** Turns zod issues into `{ "field.path": "message" }`, the shape the forms show inline. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new BadRequest('Some fields need attention.', fieldErrors(parsed.error));
  return parsed.data;
}

interface Schemas<B extends z.ZodType, Q extends z.ZodType, P extends z.ZodType> {
  body?: B;
  query?: Q;
  params?: P;
}

export interface Valid<B, Q, P> {
  body: B;
  query: Q;
  params: P;
}

type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

/**
 * A route handler whose body, query and params were validated by shared zod schemas.
 * Express 5 forwards rejected promises to the error middleware, so no try/catch here.
 */
export function handle<
  B extends z.ZodType = z.ZodUndefined,
  Q extends z.ZodType = z.ZodUndefined,
  P extends z.ZodType = z.ZodUndefined,
>(
  schemas: Schemas<B, Q, P>,
  handler: (valid: Valid<Out<B>, Out<Q>, Out<P>>, req: Request, res: Response) => Promise<unknown> | unknown,
): RequestHandler {
  return async (req: Request, res: Response, _next: NextFunction) => {
    refuseStrayMultipart(req, res);
    const valid = {
      body: schemas.body ? parseOrThrow(schemas.body, req.body ?? {}) : undefined,
      query: schemas.query ? parseOrThrow(schemas.query, req.query) : undefined,
      params: schemas.params ? parseOrThrow(schemas.params, req.params) : undefined,
    } as Valid<Out<B>, Out<Q>, Out<P>>;
    const result = await handler(valid, req, res);
    if (result !== undefined && !res.headersSent) res.json(result);
  };
}
