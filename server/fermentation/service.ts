/**
 * The fermentation log of a brew day: readings from pitching to packaging, the verdict on final
 * gravity, and the packaging record. Access goes through the brew day (loadBrewForActor, which
 * asks server/auth/permissions.ts): club members of a shared brew read the log, only its owner
 * writes, everyone else gets a 404. Adding and removing readings is in readings.ts, packaging in
 * packaging.ts, what the readings decide in verdict.ts.
 */
import { and, asc, desc, eq, or, sql } from 'drizzle-orm';
import { findFermentationDeviations, type FermentationDeviation } from '@shared/fermentation-deviations';
import type { BrewDeviation } from '@shared/schemas/brews';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import { READINGS_WINDOW } from '@shared/schemas/brews';
import type {
  FermentationBrew,
  FermentationLog,
  FermentationPoint,
  FermentationReading,
  FermentationReadingPage,
  PackagingRecord,
  ScheduledReminder,
} from '@shared/schemas/fermentation';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor, type StoredBrew } from '../brews/service';
import type { Db, DbOrTx } from '../db/client';
import { inList, prepared } from '../db/prepared';
import {
  brewReadings,
  fermentationReadings,
  fermentationReminders,
  fermentationSettings,
  packagingRecords,
  type FermentationReadingRow,
  type PackagingRecordRow,
} from '../db/schema';
import { beforeTimeKey, decodeTimeCursor, encodeTimeCursor } from '../lib/cursor';
import { derivedParts, derivedRows, rangeOf, targetsOf, temperatureOf, type DerivedRow } from './verdict';
import { DAY_MS } from '@shared/dates';

const iso = (d: Date) => d.toISOString();

export function toFermentationReading(row: FermentationReadingRow, pitchedAt: Date | null): FermentationReading {
  return {
    id: row.id,
    brewId: row.brewId,
    kind: row.kind,
    method: row.method,
    instrumentId: row.instrumentId,
    instrument: row.instrumentSnapshot,
    raw: row.raw,
    corrected: row.correctedValue,
    correction: row.correction,
    estimate: row.estimate,
    warnings: row.warnings,
    takenAt: iso(row.takenAt),
    day: pitchedAt ? (row.takenAt.getTime() - pitchedAt.getTime()) / DAY_MS : 0,
    note: row.note,
    source: row.source,
    createdAt: iso(row.createdAt),
  };
}

export function toPackaging(row: PackagingRecordRow): PackagingRecord {
  return {
    id: row.id,
    brewId: row.brewId,
    container: row.container,
    volumeL: row.volumeL,
    warmestTempC: row.warmestTempC,
    targetCo2Volumes: row.targetCo2Volumes,
    sugar: row.sugar,
    primingSugarG: row.primingSugarG,
    residualCo2Volumes: row.residualCo2Volumes,
    verdictState: row.verdictState,
    verdictReason: row.verdictReason,
    override: row.override,
    overrideReason: row.overrideReason,
    note: row.note,
    packagedAt: iso(row.packagedAt),
    createdAt: iso(row.createdAt),
  };
}

export const toScheduled = (r: { kind: ScheduledReminder['kind']; dueAt: Date; sentAt: Date | null; outcome: ScheduledReminder['outcome'] }): ScheduledReminder => ({
  kind: r.kind,
  dueAt: iso(r.dueAt),
  sentAt: r.sentAt ? iso(r.sentAt) : null,
  outcome: r.outcome,
});

// The log's reads, built once per database handle (server/db/prepared.ts).
const latestOg = (db: DbOrTx) =>
  db
    .select({ value: brewReadings.correctedValue, volumeL: brewReadings.volumeL })
    .from(brewReadings)
    .where(and(eq(brewReadings.brewId, sql.placeholder('brewId')), eq(brewReadings.kind, 'og')))
    .orderBy(desc(brewReadings.takenAt), desc(brewReadings.id))
    .limit(1);
const reminderSetting = (db: DbOrTx) => db.select({ on: fermentationSettings.remindersEnabled }).from(fermentationSettings).where(eq(fermentationSettings.userId, sql.placeholder('userId')));
const packagingOfBrew = (db: DbOrTx) => db.select().from(packagingRecords).where(eq(packagingRecords.brewId, sql.placeholder('brewId')));
const remindersOfBrew = (db: DbOrTx) =>
  db.select().from(fermentationReminders).where(eq(fermentationReminders.brewId, sql.placeholder('brewId'))).orderBy(asc(fermentationReminders.dueAt));
const latestFermentationReadings = (db: DbOrTx) =>
  db
    .select()
    .from(fermentationReadings)
    .where(eq(fermentationReadings.brewId, sql.placeholder('brewId')))
    .orderBy(desc(fermentationReadings.takenAt), desc(fermentationReadings.id))
    .limit(sql.placeholder('limit'));

export async function measuredOg(db: DbOrTx, brewId: number): Promise<number | null> {
  const [row] = await db
    .select({ value: brewReadings.correctedValue })
    .from(brewReadings)
    .where(and(eq(brewReadings.brewId, brewId), eq(brewReadings.kind, 'og')))
    .orderBy(desc(brewReadings.takenAt), desc(brewReadings.id))
    .limit(1);
  return row?.value ?? null;
}

/** The brew day's latest OG reading: its corrected gravity and the volume measured into the fermenter with it. */
export async function ogReading(db: DbOrTx, brewId: number): Promise<{ og: number | null; volumeL: number | null }> {
  const [row] = await prepared(db, latestOg).execute({ brewId });
  return { og: row?.value ?? null, volumeL: row?.volumeL ?? null };
}

export async function remindersEnabledFor(db: DbOrTx, userId: number): Promise<boolean> {
  const [row] = await prepared(db, reminderSetting).execute({ userId });
  return row?.on ?? true;
}

export async function setRemindersEnabled(db: Db, actor: Actor, enabled: boolean) {
  await db
    .insert(fermentationSettings)
    .values({ userId: actor.id, remindersEnabled: enabled })
    .onDuplicateKeyUpdate({ set: { remindersEnabled: enabled, updatedAt: new Date() } });
  return { remindersEnabled: enabled };
}

export function brewOf(actor: Actor, stored: StoredBrew, { og, volumeL }: { og: number | null; volumeL: number | null }): FermentationBrew {
  const t = targetsOf(stored);
  const n = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : null);
  return {
    id: stored.row.id,
    name: stored.row.name,
    status: stored.row.status,
    ownerId: stored.row.ownerId,
    ownerName: stored.ownerName,
    isOwner: stored.row.ownerId === actor.id,
    pitchedAt: stored.row.pitchedAt ? iso(stored.row.pitchedAt) : null,
    brewedOn: stored.row.brewedOn ?? null,
    targetOg: n(t.targetOg),
    targetFg: n(t.targetFg),
    fermentationTempMinC: n(t.fermentationTempMinC),
    fermentationTempMaxC: n(t.fermentationTempMaxC),
    batchVolumeL: n(t.batchVolumeL),
    fermenterVolumeL: n(volumeL),
    og,
  };
}

export async function readingRows(db: DbOrTx, brewId: number) {
  return db.select().from(fermentationReadings).where(eq(fermentationReadings.brewId, brewId)).orderBy(asc(fermentationReadings.takenAt), asc(fermentationReadings.id));
}

/**
 * What fermentation's deviations read of a reading: every temperature reading's value and time
 * (its spells), and the instrument snapshot of the first reading of each distinct snapshot (null
 * on the others: the same snapshot calls out the same instrument, once).
 */
export interface DeviationRow {
  id: number;
  brewId: number;
  kind: FermentationReading['kind'];
  takenAt: Date;
  correctedValue: number;
  instrumentSnapshot: InstrumentSnapshot | null;
}

/** deviationRowsOf's one statement, built once per database handle (server/db/prepared.ts). */
const deviationRows = (db: DbOrTx) => {
  const r = fermentationReadings;
  const ranked = db
    .select({
      id: r.id,
      brewId: r.brewId,
      kind: r.kind,
      takenAt: r.takenAt,
      correctedValue: r.correctedValue,
      snapshot: sql<string>`${r.instrumentSnapshot}`.as('snapshot'),
      // MD5 groups equal snapshots without sorting whole JSON documents.
      rank: sql<number>`ROW_NUMBER() OVER (PARTITION BY ${r.brewId}, MD5(${r.instrumentSnapshot}) ORDER BY ${r.takenAt}, ${r.id})`.as('snapshot_rank'),
    })
    .from(r)
    .where(inList(r.brewId, 'brewIds'))
    .as('ranked');
  return db
    .select({
      id: ranked.id,
      brewId: ranked.brewId,
      kind: ranked.kind,
      takenAt: ranked.takenAt,
      correctedValue: ranked.correctedValue,
      snapshot: sql<string | InstrumentSnapshot | null>`CASE WHEN ${ranked.rank} = 1 THEN ${ranked.snapshot} END`,
    })
    .from(ranked)
    .where(or(eq(ranked.kind, 'temperature'), eq(ranked.rank, 1)))
    .orderBy(asc(ranked.takenAt), asc(ranked.id));
};

/**
 * The rows fermentation's deviations need, for many brew days in one statement: temperature
 * readings narrow, and of the gravity readings only those that first show a snapshot, so a long
 * log sends its temperatures and a handful of snapshots, never thousands of whole rows.
 */
export async function deviationRowsOf(db: DbOrTx, brewIds: readonly number[]): Promise<Map<number, DeviationRow[]>> {
  const byBrew = new Map<number, DeviationRow[]>();
  if (brewIds.length === 0) return byBrew;
  const rows = await prepared(db, deviationRows).execute({ brewIds });
  for (const row of rows) {
    const { snapshot, ...rest } = row;
    // The driver hands a JSON document back parsed or as text, depending on how MariaDB typed the CASE.
    const instrumentSnapshot = snapshot === null ? null : ((typeof snapshot === 'string' ? JSON.parse(snapshot) : snapshot) as InstrumentSnapshot);
    const parsed: DeviationRow = { ...rest, instrumentSnapshot };
    const list = byBrew.get(row.brewId);
    if (list) list.push(parsed);
    else byBrew.set(row.brewId, [parsed]);
  }
  return byBrew;
}

/**
 * Fermentation's deviations from its deviation rows alone (no query), as the review shows them
 * after the brew day's own: the mentor's queue counts them for many brew days loaded at once.
 */
export function fermentationDeviations(
  actor: Actor,
  stored: StoredBrew,
  rows: readonly DeviationRow[],
  packaging: PackagingRecord | null,
  brewDay: readonly BrewDeviation[],
  now: Date,
): FermentationDeviation[] {
  const brew = brewOf(actor, stored, { og: null, volumeL: null });
  const temperature = temperatureOf(rows, rangeOf(brew), now);
  const asReading = (row: DeviationRow) => ({ id: row.id, kind: row.kind, instrument: row.instrumentSnapshot, takenAt: iso(row.takenAt) });
  return findFermentationDeviations({
    range: temperature.target,
    readings: rows.filter((row) => row.kind === 'temperature').map(asReading),
    instrumentReadings: rows.filter((row) => row.instrumentSnapshot !== null).map(asReading),
    excursions: temperature.excursions,
    packaging,
    pitchedAt: brew.pitchedAt,
    brewDay,
  });
}

/** A cursor into one brew day's fermentation readings (server/lib/cursor.ts); a brew-day readings cursor is refused. */
const CURSOR_TAG = 'fermentation-readings';

/**
 * The readings before `cursor` (the latest when absent), oldest first: read backwards along the
 * (brew, time) index, so a page costs the same however long the log.
 */
export async function fermentationReadingPage(db: DbOrTx, stored: StoredBrew, query: { cursor?: string; pageSize: number }): Promise<FermentationReadingPage> {
  const brewId = stored.row.id;
  const before = query.cursor ? decodeTimeCursor(CURSOR_TAG, query.cursor) : null;
  const rows = before
    ? await db
        .select()
        .from(fermentationReadings)
        .where(and(eq(fermentationReadings.brewId, brewId), beforeTimeKey(fermentationReadings.takenAt, fermentationReadings.id, before)))
        .orderBy(desc(fermentationReadings.takenAt), desc(fermentationReadings.id))
        .limit(query.pageSize + 1)
    : await prepared(db, latestFermentationReadings).execute({ brewId, limit: query.pageSize + 1 });
  const page = rows.slice(0, query.pageSize).reverse();
  const first = page[0];
  return {
    items: page.map((r) => toFermentationReading(r, stored.row.pitchedAt)),
    nextCursor: rows.length > query.pageSize && first ? encodeTimeCursor(CURSOR_TAG, { at: first.takenAt, id: first.id }) : null,
    pageSize: query.pageSize,
  };
}

/** GET /api/brews/:brewId/fermentation/readings: older readings of a log the actor may read. */
export async function listFermentationReadings(db: DbOrTx, actor: Actor, brewId: number, query: { cursor?: string; pageSize: number }): Promise<FermentationReadingPage> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  return fermentationReadingPage(db, stored, query);
}

/** Every reading as the chart draws it, from the rows the verdict already read (no statement of its own). */
export const seriesOf = (rows: readonly DerivedRow[]): FermentationPoint[] =>
  rows.map((r) => ({ id: r.id, kind: r.kind, takenAt: iso(r.takenAt), corrected: r.correctedValue, estimate: r.estimate }));

async function allReadingsPage(db: DbOrTx, stored: StoredBrew): Promise<FermentationReadingPage> {
  const rows = await readingRows(db, stored.row.id);
  return { items: rows.map((r) => toFermentationReading(r, stored.row.pitchedAt)), nextCursor: null, pageSize: rows.length };
}

/**
 * The log as its page opens: the latest READINGS_WINDOW readings with the cursor for older ones,
 * and what every reading decides (verdict, temperature, progress, the chart's series) from their
 * narrow columns only, so it costs the same statements with 10 readings as with 2,000.
 * `allReadings` sends every reading whole (a mentor's review anchors comments to any of them).
 */
export async function assembleLog(db: DbOrTx, actor: Actor, stored: StoredBrew, now = new Date(), options: { allReadings?: boolean } = {}): Promise<FermentationLog> {
  const brewId = stored.row.id;
  const isOwner = stored.row.ownerId === actor.id;
  const [latest, rows, ogRead, [packagingRow], reminderRows, enabled] = await Promise.all([
    options.allReadings ? allReadingsPage(db, stored) : fermentationReadingPage(db, stored, { pageSize: READINGS_WINDOW }),
    derivedRows(db, brewId),
    ogReading(db, brewId),
    prepared(db, packagingOfBrew).execute({ brewId }),
    isOwner ? prepared(db, remindersOfBrew).execute({ brewId }) : Promise.resolve([]),
    isOwner ? remindersEnabledFor(db, actor.id) : Promise.resolve(null),
  ]);
  const brew = brewOf(actor, stored, ogRead);
  return {
    brew,
    readings: latest.items,
    readingCount: rows.length,
    olderReadings: latest.nextCursor,
    series: seriesOf(rows),
    ...derivedParts(stored, brew, ogRead.og, rows, now),
    packaging: packagingRow ? toPackaging(packagingRow) : null,
    remindersEnabled: enabled,
    reminders: reminderRows.map(toScheduled),
    now: iso(now),
  };
}

export async function getLog(db: Db, actor: Actor, brewId: number): Promise<FermentationLog> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  return assembleLog(db, actor, stored);
}
