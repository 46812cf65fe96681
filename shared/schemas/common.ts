import { z } from 'zod';

/** A numeric id in a URL, e.g. `/api/recipes/:id`: the one schema for every id parameter. */
export const idSchema = z.coerce.number({ error: 'Expected a numeric id.' }).int({ error: 'Expected a numeric id.' }).positive({ error: 'Expected a numeric id.' });

export const idParamSchema = z.object({ id: idSchema });

/** The JSON body of every error response. */
export interface ApiErrorBody {
  error: string;
  message: string;
  fields?: Record<string, string>;
}
