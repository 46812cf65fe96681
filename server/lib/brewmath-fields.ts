import { BrewMathError } from '@shared/brewmath';

/**
 * Runs brewing math whose parameter names are not the form's field names. A BrewMathError is
 * answered once, as a 400 under its field, by the error middleware; this only renames the field
 * (`map` first, then `prefix`, e.g. "input." for the boil check nested in a decision).
 */
export function mathFields<T>(compute: () => T, rename: { prefix?: string; map?: Record<string, string> }): T {
  try {
    return compute();
  } catch (error) {
    if (!(error instanceof BrewMathError)) throw error;
    const field = error.field ?? '_';
    throw new BrewMathError(error.message, error.code, `${rename.prefix ?? ''}${rename.map?.[field] ?? field}`);
  }
}
