/**
 * `npm run db:backfill-notes`: gives brew-day readings stored before decision 0021 their
 * instrument note, so long brew days are judged from a few rows. Resumable; prints the count.
 */
import { createDb } from '../server/db/client';
import { loadEnv } from '../server/env';
import { backfillInstrumentNotes } from '../server/brews/instrument-notes';
import { databaseUrl } from './lib/mariadb';

process.env.DATABASE_URL ??= databaseUrl('wortwise');
const env = loadEnv();
const { db, pool } = createDb(env.DATABASE_URL);
try {
  console.log(`Readings given their instrument note: ${await backfillInstrumentNotes(db)}`);
} finally {
  await pool.end();
}
