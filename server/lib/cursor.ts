/**
 * Keyset page cursors: the last row's sort values and id, base64url JSON, opaque to the client.
 * Every paged list (recipes, brew days, readings) hands them out and reads them back here, so a
 * cursor that was tampered with or belongs to another list is one 400 under `cursor`. Logs read
 * newest first (brew-day and fermentation readings) page by time and id with the TimeKey helpers.
 */
import { and, eq, lt, or, type Column, type SQL } from 'drizzle-orm';
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

/** A row's place in a log read newest first: its time and id. */
export interface TimeKey {
  at: Date;
  id: number;
}

/** The cursor for the rows before `key` in a log tagged `tag` (brew-day readings, fermentation readings…). */
export const encodeTimeCursor = (tag: string, key: TimeKey) => encodeCursor([tag, key.at.toISOString(), key.id]);

/** A time-and-id cursor of the log tagged `tag`; another log's cursor is a 400 under `cursor` like any bad one. */
export function decodeTimeCursor(tag: string, cursor: string): TimeKey {
  return decodeCursor(cursor, (parts) => {
    const at = parts.length === 3 && parts[0] === tag ? cursorInstant(parts[1]) : null;
    return at && isCursorId(parts[2]) ? { at, id: parts[2] } : null;
  });
}

/** Rows strictly before `key` in (time, id) order: the WHERE of a page read backwards along a (parent, time) index. */
export const beforeTimeKey = (time: Column, id: Column, key: TimeKey): SQL => or(lt(time, key.at), and(eq(time, key.at), lt(id, key.id)))!;
