/**
 * Readings on a brew day. Each keeps what the brewer typed, the instrument's calibration at that
 * moment (a snapshot) and the correction it gave, through the same correctReading the form
 * shows live. A later calibration never rewrites a stored reading; recompute re-applies the
 * instrument's current calibration only when the brewer asks, and logs the old and new values.
 */
import { and, eq, isNull, sql } from 'drizzle-orm';
import { instrumentNoteKey } from '@shared/brew-deviations';
import { correctReading, defaultSnapshot, type RawByKind } from '@shared/instruments';
import { readingInstrumentKinds, readingKindLabels, readingQuantity, readingStage, type BrewReading, type ReadingBody, type ReadingCreated, type ReadingDeleted, type ReadingKind, type ReadingRaw } from '@shared/schemas/brews';
import type { InstrumentKind, InstrumentSnapshot } from '@shared/schemas/instruments';
import type { Actor } from '../auth/permissions';
import type { Db, DbOrTx } from '../db/client';
import { lockBrewRow } from '../db/locks';
import { prepared } from '../db/prepared';
import { brewNotes, brewReadings, brews } from '../db/schema';
import { loadInstrumentSnapshot } from '../instruments/service';
import { BadRequest, NotFound } from '../lib/errors';
import { brewDayChange, loadBrewForActor, touchStage, toReading } from './service';
import { lockAndCheckReadingLimit } from '../lib/reading-limit';

/** The instrument a reading is taken with: fixed by its kind, or the gravity method the brewer chose. */
function instrumentKindFor(body: ReadingBody): InstrumentKind {
  if (body.kind === 'pre_boil_gravity' || body.kind === 'late_boil_gravity') return body.method;
  return readingInstrumentKinds[body.kind][0];
}

/** What the brewer typed, kept as is, and the part of it the instrument corrects. */
function splitRaw(body: ReadingBody): { raw: ReadingRaw; volumeL: number | null } {
  switch (body.kind) {
    case 'mash_temp':
      return { raw: { tempC: body.tempC }, volumeL: null };
    case 'mash_ph':
    case 'souring_ph':
      return { raw: { ph: body.ph }, volumeL: null };
    case 'pitch_temp':
      return { raw: { tempC: body.tempC, pitched: body.pitched }, volumeL: null };
    case 'og':
      return { raw: { sg: body.sg, sampleTempC: body.sampleTempC, ...(body.volumeL !== undefined && { volumeL: body.volumeL }) }, volumeL: body.volumeL ?? null };
    case 'pre_boil_gravity':
    case 'late_boil_gravity': {
      const raw: ReadingRaw = { method: body.method };
      if (body.method === 'refractometer') raw.brix = body.brix!;
      else Object.assign(raw, { sg: body.sg!, sampleTempC: body.sampleTempC! });
      if (body.volumeL !== undefined) raw.volumeL = body.volumeL;
      if (body.kind === 'late_boil_gravity') raw.minutesLeft = body.minutesLeft;
      return { raw, volumeL: body.volumeL ?? null };
    }
  }
}

function instrumentRaw(kind: InstrumentKind, raw: ReadingRaw): RawByKind[InstrumentKind] {
  switch (kind) {
    case 'thermometer':
      return { tempC: raw.tempC as number };
    case 'ph_meter':
      return { ph: raw.ph as number };
    case 'refractometer':
      return { brix: raw.brix as number };
    case 'hydrometer':
      return { sg: raw.sg as number, sampleTempC: raw.sampleTempC as number };
  }
}

/** The brewer's own units for the stored warnings; only readings' owners add or recompute them. */
const unitSystemOf = (actor: Actor): 'metric' | 'us' => ((actor as Actor & { unitSystem?: string }).unitSystem === 'us' ? 'us' : 'metric');

/** An impossible reading is a BrewMathError: the error middleware answers 400 under its field. */
function correct(snapshot: InstrumentSnapshot, raw: ReadingRaw, at: Date, unitSystem: 'metric' | 'us') {
  return correctReading(snapshot, instrumentRaw(snapshot.kind, raw), at, { unitSystem });
}

async function snapshotFor(db: Db, actor: Actor, kind: InstrumentKind, instrumentId: number | null, allowArchived = false): Promise<InstrumentSnapshot> {
  if (instrumentId === null) return defaultSnapshot(kind);
  try {
    return await loadInstrumentSnapshot(db, actor, instrumentId, { kind, allowArchived, field: 'instrumentId' });
  } catch (error) {
    // Another brewer's instrument, or one deleted meanwhile: a field error on this form, not a missing brew day.
    if (error instanceof NotFound) throw new BadRequest('Pick one of your own instruments.', { instrumentId: 'That instrument was not found; pick one of your own.' });
    throw error;
  }
}

/** The stored reading a write answers with, built once per database handle (server/db/prepared.ts). */
const readingById = (db: DbOrTx) => db.select().from(brewReadings).where(eq(brewReadings.id, sql.placeholder('id')));

/** A new brew-day reading, every column a placeholder (the values pass through each column's own encoding). */
const insertReading = (db: DbOrTx) =>
  db
    .insert(brewReadings)
    .values({
      brewId: sql.placeholder('brewId'),
      stage: sql.placeholder('stage'),
      kind: sql.placeholder('kind'),
      instrumentId: sql.placeholder('instrumentId'),
      instrumentSnapshot: sql.placeholder('instrumentSnapshot'),
      raw: sql.placeholder('raw'),
      correctedValue: sql.placeholder('correctedValue'),
      correction: sql.placeholder('correction'),
      warnings: sql.placeholder('warnings'),
      volumeL: sql.placeholder('volumeL'),
      takenAt: sql.placeholder('takenAt'),
      note: sql.placeholder('note'),
      instrumentNote: sql.placeholder('instrumentNote'),
    })
    .$returningId();

export async function addReading(db: Db, actor: Actor, brewId: number, body: ReadingBody): Promise<ReadingCreated> {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  if (body.kind === 'souring_ph' && stored.row.targetsSnapshot.souringTargetPh == null) {
    const message = 'This brew day has no souring stage: its recipe sets no souring target pH.';
    throw new BadRequest(message, { kind: message });
  }
  const kind = instrumentKindFor(body);
  const snapshot = await snapshotFor(db, actor, kind, body.instrumentId);
  const takenAt = body.takenAt ? new Date(body.takenAt) : new Date();
  const { raw, volumeL } = splitRaw(body);
  const { corrected, correction, warnings } = correct(snapshot, raw, takenAt, unitSystemOf(actor));
  const stage = readingStage[body.kind];

  const id = await db.transaction(async (tx) => {
    // The brew row first (inside lockAndCheckReadingLimit): the stage and updatedAt written below
    // would otherwise deadlock with a reading posted at the same moment (see server/db/locks.ts).
    await lockAndCheckReadingLimit(tx, brewId, 'brew');
    const [{ id }] = await prepared(tx, insertReading).execute({
      brewId,
      stage,
      kind: body.kind,
      instrumentId: snapshot.instrumentId,
      instrumentSnapshot: snapshot,
      raw,
      correctedValue: corrected,
      correction,
      warnings,
      volumeL,
      takenAt,
      note: body.note ?? null,
      instrumentNote: instrumentNoteKey({ id: 0, kind: body.kind, corrected, volumeL, instrument: snapshot, takenAt: takenAt.toISOString() }),
    });
    await touchStage(tx, brewId, stage, takenAt);
    // The yeast went in: fermentation counts its days from here (the first pitch wins).
    if (body.kind === 'pitch_temp' && body.pitched && !stored.row.pitchedAt) {
      await tx.update(brews).set({ pitchedAt: takenAt }).where(and(eq(brews.id, brewId), isNull(brews.pitchedAt)));
    }
    return id;
  });
  // Read after the commit, so the brew row's lock is not held for it.
  const [[row], brewDay] = await Promise.all([prepared(db, readingById).execute({ id }), brewDayChange(db, brewId)]);
  // Deleted (on another device) between the commit and this read.
  if (!row) throw new NotFound('That reading was deleted just after it was saved.');
  return { ...toReading(row), brewDay };
}

export async function loadReading(db: Db, brewId: number, readingId: number) {
  const [row] = await db
    .select()
    .from(brewReadings)
    .where(and(eq(brewReadings.id, readingId), eq(brewReadings.brewId, brewId)));
  if (!row) throw new NotFound('That reading was not found.');
  return row;
}

/** Removes one reading and answers what that changed on the day (OG, count, deviations…), not the day itself. */
export async function deleteReading(db: Db, actor: Actor, brewId: number, readingId: number): Promise<ReadingDeleted> {
  await loadBrewForActor(db, actor, brewId, 'update');
  await loadReading(db, brewId, readingId);
  await db.delete(brewReadings).where(eq(brewReadings.id, readingId));
  return { readingId, brewDay: await brewDayChange(db, brewId) };
}

const showValue = (kind: ReadingKind, value: number) => {
  switch (readingQuantity[kind]) {
    case 'gravity':
      return value.toFixed(3);
    case 'temperature':
      return `${value.toFixed(1)} °C`;
    case 'ph':
      return `pH ${value.toFixed(2)}`;
  }
};

/**
 * Re-applies the instrument's current calibration to a stored reading, on the brewer's request:
 * the reading keeps where it came from, and the log says what changed.
 */
export async function recomputeReading(db: Db, actor: Actor, brewId: number, readingId: number): Promise<BrewReading> {
  await loadBrewForActor(db, actor, brewId, 'update');
  const row = await loadReading(db, brewId, readingId);
  if (row.instrumentId === null) {
    const message = 'This reading used common-practice defaults, not an instrument of yours, so there is no newer calibration to apply.';
    throw new BadRequest(message, { instrumentId: message });
  }
  const oldSnapshot = row.instrumentSnapshot;
  const snapshot = await snapshotFor(db, actor, oldSnapshot.kind, row.instrumentId, true);
  const { corrected, correction, warnings } = correct(snapshot, row.raw, row.takenAt, unitSystemOf(actor));
  const now = new Date();
  await db.transaction(async (tx) => {
    await lockBrewRow(tx, brewId);
    await tx
      .update(brewReadings)
      .set({
        instrumentSnapshot: snapshot,
        correctedValue: corrected,
        correction,
        warnings,
        recomputedAt: now,
        recomputedFrom: { corrected: row.correctedValue, instrument: oldSnapshot, correction: row.correction },
        instrumentNote: instrumentNoteKey({ id: row.id, kind: row.kind, corrected, volumeL: row.volumeL, instrument: snapshot, takenAt: row.takenAt.toISOString() }),
      })
      .where(eq(brewReadings.id, readingId));
    await tx.insert(brewNotes).values({
      brewId,
      kind: 'recompute',
      stage: row.stage,
      authorId: actor.id,
      body: `${readingKindLabels[row.kind]} recomputed with the current calibration of ${snapshot.name}: ${showValue(row.kind, row.correctedValue)} became ${showValue(row.kind, corrected)}.`,
      details: {
        readingId,
        kind: row.kind,
        old: { corrected: row.correctedValue, instrument: oldSnapshot, correction: row.correction },
        new: { corrected, instrument: snapshot, correction },
      },
    });
    await tx.update(brews).set({ updatedAt: now }).where(eq(brews.id, brewId));
  });
  const [updated] = await db.select().from(brewReadings).where(eq(brewReadings.id, readingId));
  return toReading(updated);
}
