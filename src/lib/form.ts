import type { FormikErrors, FormikHelpers } from 'formik';
import type { z } from 'zod';
import { ApiError } from './api-client';
import { toSaveFailure } from './save-failure';

/**
 * Formik validation from a shared zod schema: the same messages the API would send back.
 * Nested paths become nested error objects, as Formik expects.
 */
export function zodValidate<S extends z.ZodType>(schema: S) {
  return (values: unknown): FormikErrors<z.input<S>> => {
    const parsed = schema.safeParse(values);
    if (parsed.success) return {};
    return issuesToErrors<z.input<S>>(parsed.error.issues);
  };
}

/** Zod issues as Formik's nested error object (for a form that has already parsed its values). */
export function issuesToErrors<T>(issues: readonly z.core.$ZodIssue[]): FormikErrors<T> {
  const errors: Record<string, unknown> = {};
  for (const issue of issues) setIn(errors, issue.path.map(String), issue.message);
  return errors as FormikErrors<T>;
}

function setIn(target: Record<string, unknown>, path: string[], message: string) {
  if (path.length === 0) {
    target._form ??= message;
    return;
  }
  let node = target;
  for (let i = 0; i < path.length - 1; i++) {
    const key = path[i];
    node[key] ??= /^\d+$/.test(path[i + 1]) ? [] : {};
    node = node[key] as Record<string, unknown>;
  }
  node[path[path.length - 1]] ??= message;
}

/** Puts an API error's per-field messages on the form, and the failure (a SaveFailure) in `status`. */
export function applyApiError<V>(error: unknown, helpers: Pick<FormikHelpers<V>, 'setErrors' | 'setStatus'>) {
  if (error instanceof ApiError) {
    const errors: Record<string, unknown> = {};
    for (const [key, message] of Object.entries(error.fields)) setIn(errors, key.split('.'), message);
    helpers.setErrors(errors as FormikErrors<V>);
  }
  helpers.setStatus(toSaveFailure(error));
}
