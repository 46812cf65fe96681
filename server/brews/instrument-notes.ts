/**
 * Fills `brew_readings.instrument_note` on readings stored before it was kept (decision 0021).
 * Until then such a brew day is judged from all its readings; afterwards from a few. Resumable and
 * safe to run twice: only rows with no note are read, a batch at a time.
 */
import { asc, eq, gt, and, isNull } from 'drizzle-orm';
import { instrumentNoteKey } from '@shared/brew-deviations';
import type { Db } from '../db/client';
import { brewReadings } from '../db/schema';

export async function backfillInstrumentNotes(db: Db, options: { batch?: number } = {}): Promise<number> {
  const batch = options.batch ?? 500;
  let done = 0;
  let after = 0;
  for (;;) {
    const rows = await db
      .select({ id: brewReadings.id, kind: brewReadings.kind, corrected: brewReadings.correctedValue, volumeL: brewReadings.volumeL, instrument: brewReadings.instrumentSnapshot, takenAt: brewReadings.takenAt })
      .from(brewReadings)
      .where(and(isNull(brewReadings.instrumentNote), gt(brewReadings.id, after)))
      .orderBy(asc(brewReadings.id))
      .limit(batch);
    if (rows.length === 0) return done;
    for (const r of rows) {
      const note = instrumentNoteKey({ ...r, takenAt: r.takenAt.toISOString() });
      // Only a row still without a note: a recompute meanwhile has written the right one.
      await db.update(brewReadings).set({ instrumentNote: note }).where(and(eq(brewReadings.id, r.id), isNull(brewReadings.instrumentNote)));
    }
    done += rows.length;
    after = rows[rows.length - 1].id;
  }
}
