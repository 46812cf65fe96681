import { BrewMathError } from '@shared/brewmath';
import { BadRequest } from '../lib/errors';

/**
 * Runs brewing math for a request: an impossible input becomes a 400 whose message sits under
 * the field the brewer typed (`fieldMap` renames the math's parameter names to the form's).
 */
export function asBadRequest<T>(fn: () => T, fieldMap: Record<string, string> = {}): T {
  try {
    return fn();
  } catch (error) {
    if (error instanceof BrewMathError) {
      const field = error.field ? (fieldMap[error.field] ?? error.field) : '_';
      throw new BadRequest(error.message, { [field]: error.message });
    }
    throw error;
  }
}
