/**
 * Keyset page cursors: the last row's sort values and id, base64url JSON, opaque to the client.
 * Every paged list (recipes, brew days, readings) hands them out and reads them back here, so a
 * cursor that was tampered with or belongs to another list is one 400 under `cursor`.
 */
import { BadRequest } from './errors';

export const BAD_CURSOR = 'This list has changed since; start again from the top.';

export function encodeCursor(parts: readonly (string | number)[]): string {
  return Buffer.from(JSON.stringify(parts), 'utf8').toString('base64url');
}

/** The cursor's parts when `accept` takes them (it returns null otherwise); a 400 naming `cursor` for anything else. */
export function decodeCursor<T>(cursor: string, accept: (parts: unknown[]) => T | null): T {
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    parsed = null;
  }
  const accepted = Array.isArray(parsed) ? accept(parsed) : null;
  if (accepted === null) throw new BadRequest(BAD_CURSOR, { cursor: BAD_CURSOR });
  return accepted;
}

/** An ISO instant a cursor carried, or null when it is not one. */
export function cursorInstant(value: unknown): Date | null {
  if (typeof value !== 'string') return null;
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? null : date;
}

export const isCursorId = (value: unknown): value is number => Number.isSafeInteger(value) && (value as number) > 0;
