import { z } from 'zod';

/** A numeric id in a URL, e.g. `/api/recipes/:id`. */
export const idParamSchema = z.object({
  id: z.coerce.number({ error: 'Expected a numeric id.' }).int().positive({ error: 'Expected a numeric id.' }),
});

/** The JSON body of every error response. */
export interface ApiErrorBody {
  error: string;
  message: string;
  fields?: Record<string, string>;
}
