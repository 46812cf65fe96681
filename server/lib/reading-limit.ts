/**
 * At most this many readings per brew day in each log (brew day, fermentation): far beyond any
 * real brew (a logger every 15 minutes for seven weeks is about 4,700), small enough that one log
 * never stalls the server for everyone. Counted inside the writer's transaction after locking the
 * brew day's row, so concurrent writes cannot slip past it (and they queue on the brew day rather
 * than deadlock on its `updated_at`).
 */
import { count, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { prepared } from '../db/prepared';
import { brewReadings, brews, fermentationReadings } from '../db/schema';
import { Conflict } from './errors';

export const MAX_READINGS_PER_LOG = 5_000;

const words = {
  brew: 'brew-day log',
  fermentation: 'fermentation log',
} as const;

export function readingLimitMessage(log: keyof typeof words, adding = 1) {
  const what = adding === 1 ? 'This reading was not saved' : `These ${adding.toLocaleString('en')} readings were not saved`;
  return `${what}: the ${words[log]} of a brew day holds at most ${MAX_READINGS_PER_LOG.toLocaleString('en')} readings. Delete readings you no longer need, or start a new brew day.`;
}

const lockBrew = (db: DbOrTx) => db.select({ id: brews.id }).from(brews).where(eq(brews.id, sql.placeholder('brewId'))).for('update');
const readingCounts = {
  brew: (db: DbOrTx) => db.select({ n: count() }).from(brewReadings).where(eq(brewReadings.brewId, sql.placeholder('brewId'))),
  fermentation: (db: DbOrTx) => db.select({ n: count() }).from(fermentationReadings).where(eq(fermentationReadings.brewId, sql.placeholder('brewId'))),
};

/** Locks the brew day's row for the rest of the transaction and refuses (409) when `adding` more would pass the limit. */
export async function lockAndCheckReadingLimit(tx: DbOrTx, brewId: number, log: keyof typeof words, adding = 1) {
  await prepared(tx, lockBrew).execute({ brewId });
  const [{ n }] = await prepared(tx, readingCounts[log]).execute({ brewId });
  if (n + adding > MAX_READINGS_PER_LOG) throw new Conflict(readingLimitMessage(log, adding));
}
