import { z } from 'zod';

/** A numeric id in a URL, e.g. `/api/recipes/:id`: the one schema for every id parameter. */
export const idSchema = z.coerce.number({ error: 'Expected a numeric id.' }).int({ error: 'Expected a numeric id.' }).positive({ error: 'Expected a numeric id.' });

export const idParamSchema = z.object({ id: idSchema });

/** A page cursor as the server handed it out (`nextCursor`); opaque to the client. */
export const pageCursorSchema = z.string().max(300, { error: 'This list has changed since; start again from the top.' }).optional();

/** One page of a list paged by key: ask again with `cursor: nextCursor` for the next (null: the last page). */
export interface Page<T> {
  items: T[];
  nextCursor: string | null;
}

/** The JSON body of every error response. */
export interface ApiErrorBody {
  error: string;
  message: string;
  fields?: Record<string, string>;
}
