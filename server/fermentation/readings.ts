/**
 * Fermentation readings: each through its instrument's calibration (a snapshot kept with the
 * reading), stored once however often it is sent, and answered with the parts of the log it changes.
 */
import { createHash } from 'node:crypto';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { dedupeMaterial } from '@shared/fermentation';
import { correctReading, defaultSnapshot, type CorrectedReading } from '@shared/instruments';
import {
  methodKind,
  type FermentationMethod,
  type FermentationRaw,
  type FermentationReadingBody,
  type FermentationReadingCreated,
  type FermentationReadingDeleted,
} from '@shared/schemas/fermentation';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor, type StoredBrew } from '../brews/service';
import type { Db, DbOrTx } from '../db/client';
import { fermentationReadings, fermentationReminders } from '../db/schema';
import { isDuplicateKey } from '../lib/db-errors';
import { loadInstrumentSnapshot } from '../instruments/service';
import { BadRequest, Conflict, NotFound } from '../lib/errors';
import { lockAndCheckReadingLimit } from '../lib/reading-limit';
import { scheduleAfterReadings } from './reminders';
import { brewOf, ogReading, toFermentationReading, toScheduled } from './service';
import { derivedParts, derivedRows, expectedFgOf, verdictFor, type DerivedRow } from './verdict';

const iso = (d: Date) => d.toISOString();
const when = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

export function dedupeKey(brewId: number, takenAt: Date, method: FermentationMethod, value: number) {
  return createHash('sha256').update(dedupeMaterial(brewId, takenAt, method, value), 'utf8').digest('hex');
}

export function primaryOf(raw: FermentationRaw): number {
  return raw.method === 'hydrometer' ? raw.sg : raw.method === 'refractometer' ? raw.brix : raw.tempC;
}

/** One reading through its instrument's calibration; impossible input is a 400 under the field typed. */
export function correctRaw(snapshot: InstrumentSnapshot, raw: FermentationRaw): CorrectedReading {
  switch (raw.method) {
    case 'hydrometer': {
      if (snapshot.kind !== 'hydrometer') break;
      // Without a sample temperature (a CSV row) the reading is taken as read at calibration temperature.
      const result = correctReading(snapshot, { sg: raw.sg, sampleTempC: raw.sampleTempC ?? snapshot.calibrationTempC });
      if (raw.sampleTempC === null) {
        result.warnings.push(`No sample temperature was given, so this reading is taken as read at ${snapshot.calibrationTempC} °C, uncorrected.`);
      }
      return result;
    }
    case 'refractometer':
      if (snapshot.kind !== 'refractometer') break;
      return correctReading(snapshot, { brix: raw.brix, originalBrix: raw.originalBrix, fermentationStarted: true });
    case 'thermometer':
      if (snapshot.kind !== 'thermometer') break;
      return correctReading(snapshot, { tempC: raw.tempC });
  }
  throw new BadRequest(`That instrument is a ${snapshot.kind}, not a ${raw.method}.`, { instrumentId: `Choose a ${raw.method}.` });
}

/** The brew must have a pitch time, and a reading must fall between it and now. */
export function requirePitched(stored: StoredBrew): Date {
  const pitchedAt = stored.row.pitchedAt;
  if (!pitchedAt) {
    throw new Conflict('This brew day has no pitch time yet. Log the pitch temperature with "yeast pitched" on the brew day first: fermentation counts its days from there.');
  }
  return pitchedAt;
}

export function checkTakenAt(takenAt: Date, pitchedAt: Date, now: Date, field = 'takenAt') {
  if (takenAt.getTime() < pitchedAt.getTime()) {
    const message = `${when(takenAt)} is before the yeast was pitched (${when(pitchedAt)}). Check the date and time.`;
    throw new BadRequest(message, { [field]: message });
  }
  if (takenAt.getTime() > now.getTime() + 5 * 60_000) {
    const message = 'A reading cannot be taken in the future. Check the date and time.';
    throw new BadRequest(message, { [field]: message });
  }
}

async function snapshotFor(db: DbOrTx, actor: Actor, method: FermentationMethod, instrumentId: number | null): Promise<InstrumentSnapshot> {
  if (instrumentId === null) return defaultSnapshot(method);
  try {
    return await loadInstrumentSnapshot(db, actor, instrumentId, { kind: method, field: 'instrumentId' });
  } catch (error) {
    if (error instanceof NotFound) throw new BadRequest('Pick one of your own instruments.', { instrumentId: 'That instrument was not found; pick one of your own.' });
    throw error;
  }
}

function rawOf(body: FermentationReadingBody): FermentationRaw {
  switch (body.method) {
    case 'hydrometer':
      return { method: 'hydrometer', sg: body.sg, sampleTempC: body.sampleTempC };
    case 'refractometer':
      return { method: 'refractometer', brix: body.brix, originalBrix: body.originalBrix, originalBrixSource: 'entered' };
    case 'thermometer':
      return { method: 'thermometer', tempC: body.tempC };
  }
}

/**
 * The answer to a new reading: the reading and the parts of the log it changes. The whole list
 * is never sent back (a long log is megabytes of JSON); the page adds the reading to what it has.
 */
async function assembleChange(db: DbOrTx, actor: Actor, stored: StoredBrew, readingId: number, duplicate: boolean, rows: readonly DerivedRow[], now: Date): Promise<FermentationReadingCreated> {
  const brewId = stored.row.id;
  const [[row], ogRead, reminderRows] = await Promise.all([
    db.select().from(fermentationReadings).where(eq(fermentationReadings.id, readingId)),
    ogReading(db, brewId),
    db.select().from(fermentationReminders).where(eq(fermentationReminders.brewId, brewId)).orderBy(asc(fermentationReminders.dueAt)),
  ]);
  // Deleted (on another device) between the write and this answer.
  if (!row) throw new NotFound('That reading was deleted just after it was saved.');
  const brew = brewOf(actor, stored, ogRead);
  return {
    reading: toFermentationReading(row, stored.row.pitchedAt),
    duplicate,
    readingCount: rows.length,
    ...derivedParts(stored, brew, ogRead.og, rows, now),
    reminders: reminderRows.map(toScheduled),
    now: iso(now),
  };
}

/**
 * Adds one reading. The same reading sent twice (a retry on a flaky connection) is stored once:
 * the second answer says `duplicate` and returns the first.
 */
export async function addReading(db: Db, actor: Actor, brewId: number, body: FermentationReadingBody, now = new Date()) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  const pitchedAt = requirePitched(stored);
  const takenAt = body.takenAt ? new Date(body.takenAt) : now;
  checkTakenAt(takenAt, pitchedAt, now);
  const snapshot = await snapshotFor(db, actor, body.method, body.instrumentId);
  const raw = rawOf(body);
  const { corrected, correction, warnings } = correctRaw(snapshot, raw);
  const key = dedupeKey(brewId, takenAt, body.method, primaryOf(raw));
  let duplicate = false;
  let id: number;
  try {
    [{ id }] = await db.transaction(async (tx) => {
      await lockAndCheckReadingLimit(tx, brewId, 'fermentation');
      return tx
        .insert(fermentationReadings)
        .values({
          brewId,
          kind: methodKind[body.method],
          method: body.method,
          instrumentId: snapshot.instrumentId,
          instrumentSnapshot: snapshot,
          raw,
          correctedValue: corrected,
          correction,
          warnings,
          estimate: correction.kind === 'wcf-alcohol',
          takenAt,
          note: body.note,
          source: 'manual',
          dedupeKey: key,
          createdBy: actor.id,
        })
        .$returningId();
    });
  } catch (error) {
    if (!isDuplicateKey(error)) throw error;
    duplicate = true;
    const [existing] = await db
      .select({ id: fermentationReadings.id })
      .from(fermentationReadings)
      .where(and(eq(fermentationReadings.brewId, brewId), eq(fermentationReadings.dedupeKey, key)));
    id = existing.id;
  }
  const rows = await derivedRows(db, brewId);
  if (!duplicate) await scheduleAfterReadings(db, stored, verdictFor(rows, pitchedAt, now, expectedFgOf(stored)), now);
  return assembleChange(db, actor, stored, id, duplicate, rows, now);
}

/**
 * Removes one reading and answers what that changed (count, verdict, temperature summary,
 * progress), never the log itself: the page drops the reading from what it holds.
 */
export async function deleteReading(db: Db, actor: Actor, brewId: number, readingId: number): Promise<FermentationReadingDeleted> {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  const [row] = await db
    .select({ id: fermentationReadings.id })
    .from(fermentationReadings)
    .where(and(eq(fermentationReadings.id, readingId), eq(fermentationReadings.brewId, brewId)));
  if (!row) throw new NotFound('That reading was not found.');
  await db.delete(fermentationReadings).where(eq(fermentationReadings.id, readingId));
  const now = new Date();
  const [rows, ogRead] = await Promise.all([derivedRows(db, brewId), ogReading(db, brewId)]);
  const brew = brewOf(actor, stored, ogRead);
  return { readingId, readingCount: rows.length, ...derivedParts(stored, brew, ogRead.og, rows, now), now: iso(now) };
}

export async function existingKeys(db: DbOrTx, brewId: number, keys: string[]): Promise<Set<string>> {
  const found = new Set<string>();
  for (let i = 0; i < keys.length; i += 1000) {
    const chunk = keys.slice(i, i + 1000);
    if (chunk.length === 0) continue;
    const rows = await db
      .select({ key: fermentationReadings.dedupeKey })
      .from(fermentationReadings)
      .where(and(eq(fermentationReadings.brewId, brewId), inArray(fermentationReadings.dedupeKey, chunk)));
    for (const r of rows) found.add(r.key);
  }
  return found;
}
