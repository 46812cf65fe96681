import { ApiError, NetworkError } from './api-client';

/**
 * The one shape of a failed save, kept in a Formik form's `status`:
 * - offline: the server could not be reached (or answered 503); nothing was saved, what was
 *   typed stays and a retry is safe;
 * - conflict: someone else saved first (409);
 * - error: refused, with the server's words (field messages sit under the inputs).
 */
export interface SaveFailure {
  kind: 'offline' | 'conflict' | 'error';
  message: string;
}

export function toSaveFailure(error: unknown): SaveFailure {
  if (error instanceof NetworkError) return { kind: 'offline', message: error.message };
  if (error instanceof ApiError && error.status === 409) return { kind: 'conflict', message: error.message };
  return { kind: 'error', message: (error as Error)?.message ?? 'Something went wrong. Please try again.' };
}

/** A Formik status that is a SaveFailure (forms keep nothing else there). */
export function saveFailureOf(status: unknown): SaveFailure | null {
  if (status && typeof status === 'object' && 'kind' in status && 'message' in status) return status as SaveFailure;
  return null;
}
