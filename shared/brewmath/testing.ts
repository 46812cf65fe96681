import { BrewMathError } from './errors';

/** Test helper: runs fn, expecting a BrewMathError, and returns it for inspection. */
export function brewError(fn: () => unknown): BrewMathError {
  try {
    fn();
  } catch (error) {
    if (error instanceof BrewMathError) return error;
    throw error;
  }
  throw new Error('Expected a BrewMathError, but nothing was thrown.');
}

/** Test helper: every number anywhere in a result is finite, and no text shows NaN or Infinity. */
export function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (typeof value === 'string') return !value.includes('NaN') && !value.includes('Infinity');
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}
