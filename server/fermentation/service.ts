/**
 * The fermentation log of a brew day: readings from pitching to packaging, the verdict on final
 * gravity, and the packaging record. Access goes through the brew day (loadBrewForActor, which
 * asks server/auth/permissions.ts): club members of a shared brew read the log, only its owner
 * writes, everyone else gets a 404.
 */
import { createHash } from 'node:crypto';
import { and, asc, desc, eq, gt, inArray, sql } from 'drizzle-orm';
import { expectedFinalGravity, residualCo2Volumes, primingSugarG } from '@shared/brewmath';
import { dedupeMaterial, fermentationProgress, fermentationVerdict, temperatureSummary } from '@shared/fermentation';
import { findFermentationDeviations, type FermentationDeviation } from '@shared/brew-deviations';
import type { BrewDeviation } from '@shared/schemas/brews';
import { correctReading, defaultSnapshot, type CorrectedReading } from '@shared/instruments';
import {
  EXCURSIONS_LISTED,
  methodKind,
  type FermentationBrew,
  type FermentationLog,
  type FermentationMethod,
  type FermentationRaw,
  type FermentationReading,
  type FermentationReadingBody,
  type FermentationReadingCreated,
  type FermentationVerdict,
  type PackagingBody,
  type PackagingRecord,
  type ScheduledReminder,
  type TemperatureSummary,
} from '@shared/schemas/fermentation';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import type { RecipeTargets } from '@shared/schemas/recipes';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor, type StoredBrew } from '../brews/service';
import type { Db, DbOrTx } from '../db/client';
import {
  brewNotes,
  brewReadings,
  brews,
  fermentationReadings,
  fermentationReminders,
  fermentationSettings,
  packagingRecords,
  type FermentationReadingRow,
  type PackagingRecordRow,
} from '../db/schema';
import { lockBrewRow } from '../db/locks';
import { isDuplicateKey } from '../lib/db-errors';
import { loadInstrumentSnapshot } from '../instruments/service';
import { BadRequest, Conflict, NotFound } from '../lib/errors';
import { scheduleAfterReadings } from './reminders';
import { lockAndCheckReadingLimit } from '../lib/reading-limit';
import { DAY_MS } from '@shared/dates';

const iso = (d: Date) => d.toISOString();
const when = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

export function dedupeKey(brewId: number, takenAt: Date, method: FermentationMethod, value: number) {
  return createHash('sha256').update(dedupeMaterial(brewId, takenAt, method, value), 'utf8').digest('hex');
}

// ---------------------------------------------------------------------------------------------
// Reading rows

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

function toPackaging(row: PackagingRecordRow): PackagingRecord {
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

// ---------------------------------------------------------------------------------------------
// The log

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
async function ogReading(db: DbOrTx, brewId: number): Promise<{ og: number | null; volumeL: number | null }> {
  const [row] = await db
    .select({ value: brewReadings.correctedValue, volumeL: brewReadings.volumeL })
    .from(brewReadings)
    .where(and(eq(brewReadings.brewId, brewId), eq(brewReadings.kind, 'og')))
    .orderBy(desc(brewReadings.takenAt), desc(brewReadings.id))
    .limit(1);
  return { og: row?.value ?? null, volumeL: row?.volumeL ?? null };
}

export async function remindersEnabledFor(db: DbOrTx, userId: number): Promise<boolean> {
  const [row] = await db.select({ on: fermentationSettings.remindersEnabled }).from(fermentationSettings).where(eq(fermentationSettings.userId, userId));
  return row?.on ?? true;
}

export async function setRemindersEnabled(db: Db, actor: Actor, enabled: boolean) {
  await db
    .insert(fermentationSettings)
    .values({ userId: actor.id, remindersEnabled: enabled })
    .onDuplicateKeyUpdate({ set: { remindersEnabled: enabled, updatedAt: new Date() } });
  return { remindersEnabled: enabled };
}

function targetsOf(stored: StoredBrew): Partial<RecipeTargets> {
  return stored.row.targetsSnapshot ?? {};
}

function brewOf(actor: Actor, stored: StoredBrew, { og, volumeL }: { og: number | null; volumeL: number | null }): FermentationBrew {
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

/** Where the recipe should finish, from the targets the brew day started with. */
export function expectedFgOf(stored: StoredBrew): number | null {
  const t = targetsOf(stored);
  return expectedFinalGravity({ fgSg: typeof t.targetFg === 'number' ? t.targetFg : null });
}

/** The columns the verdict and the temperature summary read: a write asks for these, not whole rows. */
export type DerivedRow = Pick<FermentationReadingRow, 'id' | 'kind' | 'takenAt' | 'correctedValue' | 'estimate'> &
  (Pick<FermentationReadingRow, 'instrumentSnapshot'> | { resolutionSg: number | null });

function resolutionOf(row: DerivedRow): number | null {
  if ('resolutionSg' in row) return row.resolutionSg;
  const snapshot = row.instrumentSnapshot as InstrumentSnapshot | null;
  return snapshot?.kind === 'hydrometer' ? (snapshot.resolutionSg ?? null) : null;
}

export function verdictFor(rows: readonly DerivedRow[], pitchedAt: Date | null, now: Date, expectedFgSg: number | null = null): FermentationVerdict | null {
  if (!pitchedAt) return null;
  const gravity = rows
    .filter((r) => r.kind === 'gravity')
    .map((r) => ({ takenAt: r.takenAt, sg: r.correctedValue, estimate: r.estimate, resolutionSg: resolutionOf(r) }));
  return fermentationVerdict(gravity, pitchedAt, now, { expectedFgSg });
}

export async function readingRows(db: DbOrTx, brewId: number) {
  return db.select().from(fermentationReadings).where(eq(fermentationReadings.brewId, brewId)).orderBy(asc(fermentationReadings.takenAt), asc(fermentationReadings.id));
}

async function derivedRows(db: DbOrTx, brewId: number): Promise<DerivedRow[]> {
  return db
    .select({
      id: fermentationReadings.id,
      kind: fermentationReadings.kind,
      takenAt: fermentationReadings.takenAt,
      correctedValue: fermentationReadings.correctedValue,
      estimate: fermentationReadings.estimate,
      // The one figure the verdict reads from the snapshot, not thousands of snapshots parsed.
      resolutionSg: sql<number | null>`CAST(JSON_VALUE(${fermentationReadings.instrumentSnapshot}, '$.resolutionSg') AS DOUBLE)`,
    })
    .from(fermentationReadings)
    .where(eq(fermentationReadings.brewId, brewId))
    .orderBy(asc(fermentationReadings.takenAt), asc(fermentationReadings.id));
}

function rangeOf(brew: FermentationBrew): { minC: number; maxC: number } | null {
  return brew.fermentationTempMinC !== null && brew.fermentationTempMaxC !== null ? { minC: brew.fermentationTempMinC, maxC: brew.fermentationTempMaxC } : null;
}

function temperatureOf(rows: readonly DerivedRow[], range: { minC: number; maxC: number } | null, now: Date) {
  const temps = rows.filter((r) => r.kind === 'temperature').map((r) => ({ id: r.id, takenAt: r.takenAt, tempC: r.correctedValue }));
  return temperatureSummary(temps, range, now);
}

/**
 * Fermentation's deviations from its rows alone (no query), as the review shows them after the
 * brew day's own: the mentor's queue counts them for many brew days loaded at once.
 */
export function fermentationDeviations(
  actor: Actor,
  stored: StoredBrew,
  rows: readonly FermentationReadingRow[],
  packagingRow: PackagingRecordRow | null,
  brewDay: readonly BrewDeviation[],
  now: Date,
): FermentationDeviation[] {
  const brew = brewOf(actor, stored, { og: null, volumeL: null });
  const range = rangeOf(brew);
  const temperature = temperatureOf(rows, range, now);
  return findFermentationDeviations({
    range: temperature.target,
    readings: rows.map((r) => toFermentationReading(r, stored.row.pitchedAt)),
    excursions: temperature.excursions,
    packaging: packagingRow ? toPackaging(packagingRow) : null,
    pitchedAt: brew.pitchedAt,
    brewDay,
  });
}

export async function assembleLog(db: DbOrTx, actor: Actor, stored: StoredBrew, now = new Date()): Promise<FermentationLog> {
  const brewId = stored.row.id;
  const isOwner = stored.row.ownerId === actor.id;
  const [rows, ogRead, [packagingRow], reminderRows, enabled] = await Promise.all([
    readingRows(db, brewId),
    ogReading(db, brewId),
    db.select().from(packagingRecords).where(eq(packagingRecords.brewId, brewId)),
    isOwner
      ? db.select().from(fermentationReminders).where(eq(fermentationReminders.brewId, brewId)).orderBy(asc(fermentationReminders.dueAt))
      : Promise.resolve([]),
    isOwner ? remindersEnabledFor(db, actor.id) : Promise.resolve(null),
  ]);
  const pitchedAt = stored.row.pitchedAt;
  const brew = brewOf(actor, stored, ogRead);
  const og = ogRead.og;
  const reminders = reminderRows;
  return {
    brew,
    readings: rows.map((r) => toFermentationReading(r, pitchedAt)),
    ...derivedParts(stored, brew, og, rows, now),
    packaging: packagingRow ? toPackaging(packagingRow) : null,
    remindersEnabled: enabled,
    reminders: reminders.map(toScheduled),
    now: iso(now),
  };
}

const toScheduled = (r: { kind: ScheduledReminder['kind']; dueAt: Date; sentAt: Date | null; outcome: ScheduledReminder['outcome'] }): ScheduledReminder => ({
  kind: r.kind,
  dueAt: iso(r.dueAt),
  sentAt: r.sentAt ? iso(r.sentAt) : null,
  outcome: r.outcome,
});

/** A logger left in a warm room can put thousands of readings out of range: the answer lists the latest few and counts them all. */
function listedOnly(summary: TemperatureSummary): TemperatureSummary {
  return summary.excursions.length <= EXCURSIONS_LISTED ? summary : { ...summary, excursions: summary.excursions.slice(-EXCURSIONS_LISTED) };
}

/** What the readings decide: the verdict, the temperature summary and the progress figures. */
function derivedParts(stored: StoredBrew, brew: FermentationBrew, og: number | null, rows: readonly DerivedRow[], now: Date) {
  let latest: DerivedRow | null = null;
  for (const r of rows) if (r.kind === 'gravity') latest = r;
  return {
    verdict: verdictFor(rows, stored.row.pitchedAt, now, expectedFgOf(stored)),
    temperature: listedOnly(temperatureOf(rows, rangeOf(brew), now)),
    progress: fermentationProgress({
      og,
      targetOg: brew.targetOg,
      targetFg: brew.targetFg,
      current: latest ? { sg: latest.correctedValue, estimate: latest.estimate, takenAt: iso(latest.takenAt) } : null,
    }),
  };
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
  const brew = brewOf(actor, stored, ogRead);
  return {
    reading: toFermentationReading(row, stored.row.pitchedAt),
    duplicate,
    ...derivedParts(stored, brew, ogRead.og, rows, now),
    reminders: reminderRows.map(toScheduled),
    now: iso(now),
  };
}

export async function getLog(db: Db, actor: Actor, brewId: number): Promise<FermentationLog> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  return assembleLog(db, actor, stored);
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

export async function deleteReading(db: Db, actor: Actor, brewId: number, readingId: number) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  const [row] = await db
    .select({ id: fermentationReadings.id })
    .from(fermentationReadings)
    .where(and(eq(fermentationReadings.id, readingId), eq(fermentationReadings.brewId, brewId)));
  if (!row) throw new NotFound('That reading was not found.');
  await db.delete(fermentationReadings).where(eq(fermentationReadings.id, readingId));
  return assembleLog(db, actor, stored);
}

// ---------------------------------------------------------------------------------------------
// Packaging

/**
 * Records how the beer was packaged. Before the verdict is "stable" the brewer must say so
 * explicitly (`override` and a reason); the override is kept with the record and written to the
 * brew day's log, where a club mentor reads it.
 */
export async function recordPackaging(db: Db, actor: Actor, brewId: number, body: PackagingBody, now = new Date()) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  const pitchedAt = requirePitched(stored);
  const packagedAt = body.packagedAt ? new Date(body.packagedAt) : now;
  checkTakenAt(packagedAt, pitchedAt, now, 'packagedAt');
  const rows = await readingRows(db, brewId);
  const verdict = verdictFor(rows, pitchedAt, now, expectedFgOf(stored))!;
  if (verdict.state === 'stuck' && !body.override) {
    throw new Conflict('The gravity is steady but well above where this recipe should finish: a stuck fermentation can restart in the bottle and burst it.', {
      override: `Stuck, not finished: ${verdict.reason} To package anyway, tick the override and say why.`,
    });
  }
  if (verdict.state !== 'stable' && !body.override) {
    throw new Conflict('The final gravity is not proven stable yet: bottles filled before fermentation ends can burst.', {
      override: `Not stable yet: ${verdict.reason} To package anyway, tick the override and say why.`,
    });
  }
  // The math's parameter names are the form's field names: a BrewMathError is a 400 under them as is.
  const residual = residualCo2Volumes(body.warmestTempC);
  const grams =
    body.sugar === 'none'
      ? null
      : primingSugarG({ volumeL: body.volumeL, warmestTempC: body.warmestTempC, targetCo2Volumes: body.targetCo2Volumes, sugar: body.sugar as 'sucrose' });
  const override = verdict.state !== 'stable' && body.override;
  try {
    await db.transaction(async (tx) => {
      await lockBrewRow(tx, brewId);
      await tx.insert(packagingRecords).values({
        brewId,
        container: body.container,
        volumeL: body.volumeL,
        warmestTempC: body.warmestTempC,
        targetCo2Volumes: body.targetCo2Volumes,
        sugar: body.sugar,
        primingSugarG: grams,
        residualCo2Volumes: residual,
        verdictState: verdict.state,
        verdictReason: verdict.reason,
        override,
        overrideReason: override ? body.overrideReason : '',
        note: body.note,
        packagedAt,
        createdBy: actor.id,
      });
      await tx.update(brews).set({ status: 'packaged', updatedAt: now }).where(eq(brews.id, brewId));
      if (override) {
        await tx.insert(brewNotes).values({
          brewId,
          kind: 'note',
          stage: null,
          body: `Packaged before the final gravity was proven stable (verdict: ${verdict.state}). Reason given: ${body.overrideReason}`,
          details: { source: 'fermentation', packagingOverride: true, verdict: verdict.state, verdictReason: verdict.reason },
          authorId: actor.id,
        });
      }
    });
  } catch (error) {
    if (isDuplicateKey(error)) throw new Conflict('This brew is already packaged. Undo that record first to change it.');
    throw error;
  }
  return assembleLog(db, actor, { ...stored, row: { ...stored.row, status: 'packaged' } }, now);
}

export async function deletePackaging(db: Db, actor: Actor, brewId: number) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  await db.transaction(async (tx) => {
    await lockBrewRow(tx, brewId);
    const deleted = await tx.delete(packagingRecords).where(eq(packagingRecords.brewId, brewId));
    if ((deleted[0] as { affectedRows?: number }).affectedRows === 0) throw new NotFound('This brew has no packaging record.');
    await tx.update(brews).set({ status: 'fermenting', updatedAt: new Date() }).where(eq(brews.id, brewId));
  });
  return assembleLog(db, actor, { ...stored, row: { ...stored.row, status: 'fermenting' } });
}

/** Gravity readings taken after a moment: did the brewer read again since a reminder was set? */
export async function gravityReadAfter(db: DbOrTx, brewId: number, after: Date): Promise<boolean> {
  const [row] = await db
    .select({ id: fermentationReadings.id })
    .from(fermentationReadings)
    .where(and(eq(fermentationReadings.brewId, brewId), eq(fermentationReadings.kind, 'gravity'), gt(fermentationReadings.takenAt, after)))
    .limit(1);
  return Boolean(row);
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
