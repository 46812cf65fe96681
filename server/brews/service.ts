/**
 * Brew days: started from a recipe (a snapshot of its targets and of the brewer's equipment),
 * walked through stage by stage, shared with clubs. Every read and write goes through
 * loadBrewForActor, which asks server/auth/permissions.ts; writes of several rows run in one
 * transaction.
 */
import { and, asc, count, desc, eq, inArray, isNull, lt, ne, or, sql, type SQL } from 'drizzle-orm';
import { findDeviations } from '@shared/brew-deviations';
import {
  stagesFor,
  readingQuantity,
  type BrewDayChange,
  type BrewDecision,
  type BrewDeviation,
  type BrewDetail,
  type BrewList,
  type BrewNote,
  type BrewReading,
  type BrewReadingPage,
  type BrewSharing,
  type BrewStage,
  type BrewStageAction,
  type BrewStageState,
  type BrewSummary,
  type ReadingPhoto,
  type StartBrewInput,
  type UpdateBrewInput,
  READINGS_WINDOW,
} from '@shared/schemas/brews';
import { can, requireAccess, type Actor, type ResourceAction } from '../auth/permissions';
import { checkShareTargets, diffShares, lockShareTargets } from '../lib/sharing';
import type { DbOrTx } from '../db/client';
import {
  brewClubShares,
  brewDecisions,
  brewNotes,
  brewReadings,
  brews,
  brewStagesTable,
  readingPhotos,
  users,
  type BrewDecisionRow,
  type BrewNoteRow,
  type BrewReadingRow,
  type BrewRow,
} from '../db/schema';
import { lockBrewRow } from '../db/locks';
import { inList, prepared } from '../db/prepared';
import { getEquipmentProfile } from '../equipment/service';
import { BadRequest, NotFound } from '../lib/errors';
import { beforeTimeKey, decodeCursor, decodeTimeCursor, encodeCursor, encodeTimeCursor, isCursorId } from '../lib/cursor';
import { getRecipeTargets, loadRecipeForActor } from '../recipes/service';
import type { RecipeTargets } from '@shared/schemas/recipes';
import { utcDay } from '@shared/dates';

export interface StoredBrew {
  row: BrewRow;
  ownerName: string;
  sharedWithClubIds: number[];
}

// The brew day's reads, built once per database handle (server/db/prepared.ts).
const brewById = (db: DbOrTx) =>
  db
    .select({ row: brews, ownerName: users.displayName })
    .from(brews)
    .innerJoin(users, eq(users.id, brews.ownerId))
    .where(eq(brews.id, sql.placeholder('id')));
const sharesOfBrew = (db: DbOrTx) =>
  db.select({ clubId: brewClubShares.clubId }).from(brewClubShares).where(eq(brewClubShares.brewId, sql.placeholder('id'))).orderBy(asc(brewClubShares.clubId));
const brewRowById = (db: DbOrTx) => db.select().from(brews).where(eq(brews.id, sql.placeholder('id')));
const stagesOfBrew = (db: DbOrTx) => db.select().from(brewStagesTable).where(eq(brewStagesTable.brewId, sql.placeholder('id')));
const decisionsOfBrew = (db: DbOrTx) =>
  db.select().from(brewDecisions).where(eq(brewDecisions.brewId, sql.placeholder('id'))).orderBy(asc(brewDecisions.decidedAt), asc(brewDecisions.id));
const notesOfBrew = (db: DbOrTx) => db.select().from(brewNotes).where(eq(brewNotes.brewId, sql.placeholder('id'))).orderBy(asc(brewNotes.createdAt), asc(brewNotes.id));
const latestReadings = (db: DbOrTx) =>
  db.select().from(brewReadings).where(eq(brewReadings.brewId, sql.placeholder('id'))).orderBy(desc(brewReadings.takenAt), desc(brewReadings.id)).limit(sql.placeholder('limit'));
const photosOfReadings = (db: DbOrTx) =>
  db
    .select({ id: readingPhotos.id, readingId: readingPhotos.readingId, mime: readingPhotos.mime, sizeBytes: readingPhotos.sizeBytes, sha256: readingPhotos.sha256, createdAt: readingPhotos.createdAt })
    .from(readingPhotos)
    .where(and(eq(readingPhotos.brewId, sql.placeholder('brewId')), inList(readingPhotos.readingId, 'readingIds')))
    .orderBy(asc(readingPhotos.id));
const readingGroups = (db: DbOrTx) =>
  db
    .select({ brewId: brewReadings.brewId, note: brewReadings.instrumentNote, firstAt: sql<string | Date>`min(${brewReadings.takenAt})`.as('first_at'), n: count() })
    .from(brewReadings)
    .where(inList(brewReadings.brewId, 'brewIds'))
    .groupBy(brewReadings.brewId, brewReadings.instrumentNote);

async function findBrew(db: DbOrTx, id: number): Promise<StoredBrew | null> {
  const [found] = await prepared(db, brewById).execute({ id });
  if (!found) return null;
  const shares = await prepared(db, sharesOfBrew).execute({ id });
  return { row: found.row, ownerName: found.ownerName, sharedWithClubIds: shares.map((s) => s.clubId) };
}

/**
 * Loads a brew day for what the actor wants to do with it: 404 when they may not see it, 403 when
 * they may see it but not do this (a club member writing to a shared brew day).
 */
export async function loadBrewForActor(db: DbOrTx, actor: Actor | null, id: number, action: ResourceAction): Promise<StoredBrew> {
  const stored = await findBrew(db, id);
  requireAccess(actor, action, stored && { ownerId: stored.row.ownerId, sharedWithClubIds: stored.sharedWithClubIds }, 'Brew day');
  return stored!;
}

/** Only the clubs the viewer is in: a member never learns which other clubs see the brew day. */
function visibleClubIds(actor: Actor, ownerId: number, clubIds: number[]) {
  if (actor.id === ownerId) return clubIds;
  return clubIds.filter((id) => actor.memberships.some((m) => m.clubId === id));
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function photoUrl(brewId: number, readingId: number, photoId: number) {
  return `/api/brews/${brewId}/readings/${readingId}/photos/${photoId}`;
}

export function toReading(row: BrewReadingRow, photos: ReadingPhoto[] = []): BrewReading {
  return {
    id: row.id,
    brewId: row.brewId,
    stage: row.stage,
    kind: row.kind,
    quantity: readingQuantity[row.kind],
    instrumentId: row.instrumentId,
    instrument: row.instrumentSnapshot,
    raw: row.raw,
    corrected: row.correctedValue,
    correction: row.correction,
    warnings: row.warnings,
    volumeL: row.volumeL,
    takenAt: row.takenAt.toISOString(),
    note: row.note,
    recomputedAt: iso(row.recomputedAt),
    recomputedFrom: row.recomputedFrom,
    photos,
  };
}

export function toDecision(row: BrewDecisionRow): BrewDecision {
  // The option types (shared/brewmath) are interfaces, so `chosen` is narrowed here, where it is read.
  const stored = row.result as { chosen?: BrewDecision['chosen'] } & Record<string, unknown>;
  const { chosen = null, ...result } = stored;
  return {
    id: row.id,
    brewId: row.brewId,
    input: row.input,
    result,
    choice: row.choice,
    chosen,
    note: row.note,
    decidedAt: row.decidedAt.toISOString(),
  };
}

export function toNote(row: BrewNoteRow): BrewNote {
  return {
    id: row.id,
    brewId: row.brewId,
    kind: row.kind,
    stage: row.stage,
    body: row.body,
    details: row.details,
    authorId: row.authorId,
    createdAt: row.createdAt.toISOString(),
  };
}

function toSummary(actor: Actor, stored: StoredBrew, og: number | null): BrewSummary {
  const { row } = stored;
  const targets = row.targetsSnapshot;
  return {
    id: row.id,
    name: row.name,
    status: row.status,
    brewedOn: row.brewedOn,
    recipeId: row.recipeId,
    recipeName: targets.name,
    ownerId: row.ownerId,
    ownerName: stored.ownerName,
    isOwner: row.ownerId === actor.id,
    currentStage: row.currentStage,
    targetOg: targets.targetOg,
    og,
    pitchedAt: iso(row.pitchedAt),
    sharedWithClubIds: visibleClubIds(actor, row.ownerId, stored.sharedWithClubIds),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The predicted OG of a decision's chosen option ("leave as is" is the projection); null for the brewer's own action. */
function predictedSg(decision: BrewDecision): number | null {
  const sg = decision.chosen?.endSg;
  return typeof sg === 'number' ? sg : null;
}

/** Bitterness and colour of the chosen option (the as-is figures for the brewer's own action), as recomputed with the decision. */
function predictedBalance(decision: BrewDecision): { predictedIbu: number | null; predictedColourSrm: number | null } {
  type Figures = { ibu?: unknown; colourSrm?: unknown } | null | undefined;
  const result = decision.result as { chosenBalance?: Figures; balance?: { asIs?: Figures } | null };
  const figures = decision.chosen ? result.chosenBalance : result.balance?.asIs;
  const num = (v: unknown) => (typeof v === 'number' ? v : null);
  return { predictedIbu: num(figures?.ibu), predictedColourSrm: num(figures?.colourSrm) };
}

/** Where a brew day left its targets, from its readings and decisions alone (no query): the log, the review and the mentor's queue agree. */
export function brewDayDeviations(targets: RecipeTargets, readings: readonly JudgedReading[], decisions: readonly BrewDecision[]): BrewDeviation[] {
  return findDeviations({
    targets,
    readings: readings.map((r) => ({ id: r.id, kind: r.kind, corrected: r.corrected, volumeL: r.volumeL, instrument: r.instrument, takenAt: r.takenAt })),
    decisions: decisions.map((d) => ({ id: d.id, choiceKind: d.choice.kind, predictedSg: predictedSg(d), ...predictedBalance(d), decidedAt: d.decidedAt })),
  });
}

function stagesOf(targets: RecipeTargets, stageRows: readonly (typeof brewStagesTable.$inferSelect)[]): BrewStageState[] {
  return stagesFor(targets).map((stage) => {
    const s = stageRows.find((r) => r.stage === stage);
    return { stage, startedAt: iso(s?.startedAt ?? null), completedAt: iso(s?.completedAt ?? null), skippedAt: iso(s?.skippedAt ?? null) };
  });
}

/** What findDeviations reads of a reading. */
export type JudgedReading = Pick<BrewReading, 'id' | 'kind' | 'corrected' | 'volumeL' | 'instrument' | 'takenAt'>;

/** The kinds findDeviations judges one by one (shared/brew-deviations.ts); the others only name their instrument. */
const judgedKinds = ['mash_temp', 'mash_ph', 'og', 'pitch_temp'] as const;

/** drizzle's raw rows give TIMESTAMP columns as 'YYYY-MM-DD HH:MM:SS.fff' in UTC (the pool's timezone). */
const fromDbTimestamp = (value: string | Date) => (value instanceof Date ? value : new Date(`${value.replace(' ', 'T')}Z`));

const judgedColumns = {
  id: brewReadings.id,
  brewId: brewReadings.brewId,
  kind: brewReadings.kind,
  corrected: brewReadings.correctedValue,
  volumeL: brewReadings.volumeL,
  instrument: brewReadings.instrumentSnapshot,
  takenAt: brewReadings.takenAt,
  note: brewReadings.instrumentNote,
};

/** Judged readings of brew days with no call-out note: every judged kind, and readings stored before notes were kept. */
const judgedRowsUnnoted = (db: DbOrTx) =>
  db
    .select(judgedColumns)
    .from(brewReadings)
    .where(and(inList(brewReadings.brewId, 'brewIds'), or(inArray(brewReadings.kind, judgedKinds), isNull(brewReadings.instrumentNote))))
    .orderBy(asc(brewReadings.brewId), asc(brewReadings.takenAt), asc(brewReadings.id));

/** As judgedRowsUnnoted, and the readings at each call-out's first time (`firsts`: a list of (brew, note, time) rows). */
const judgedRowsWithFirsts = (db: DbOrTx) =>
  db
    .select(judgedColumns)
    .from(brewReadings)
    .where(
      and(
        inList(brewReadings.brewId, 'brewIds'),
        or(
          inArray(brewReadings.kind, judgedKinds),
          isNull(brewReadings.instrumentNote),
          sql`(${brewReadings.brewId}, ${brewReadings.instrumentNote}, ${brewReadings.takenAt}) in (${sql.placeholder('firsts')})`,
        ),
      ),
    )
    .orderBy(asc(brewReadings.brewId), asc(brewReadings.takenAt), asc(brewReadings.id));

/**
 * The readings that decide the brew day's deviations, OG and fermenter volume, and how many
 * readings there are, sending back a handful of rows however long the log: every reading of a
 * judged kind, and the first reading of each instrument call-out (readings keep theirs in
 * `instrument_note`; one index-only pass groups them and counts). findDeviations raises an
 * instrument deviation only at its first reading, so it gives over these rows what it gives over
 * them all. Readings stored before the note was kept come whole, judged as before.
 */
export async function judgedReadings(db: DbOrTx, brewId: number): Promise<{ readings: JudgedReading[]; count: number }> {
  return (await judgedReadingsOf(db, [brewId])).get(brewId) ?? { readings: [], count: 0 };
}

/**
 * judgedReadings for several brew days at once (a page of the review queue), in the same two
 * statements: the groups of every brew day in one pass, then their rows.
 */
export async function judgedReadingsOf(db: DbOrTx, brewIds: readonly number[]): Promise<Map<number, { readings: JudgedReading[]; count: number }>> {
  const judged = new Map<number, { readings: JudgedReading[]; count: number }>();
  if (brewIds.length === 0) return judged;
  const groups = await prepared(db, readingGroups).execute({ brewIds });
  if (groups.length === 0) return judged;
  // Each call-out's first reading, as (brew, note, time) rows: one list placeholder keeps the
  // statement's text the same whatever the number of groups, so it is prepared once.
  const firsts = groups.filter((g) => g.note !== null).map((g) => [g.brewId, g.note, fromDbTimestamp(g.firstAt)]);
  const rows = firsts.length > 0 ? await prepared(db, judgedRowsWithFirsts).execute({ brewIds, firsts }) : await prepared(db, judgedRowsUnnoted).execute({ brewIds });
  for (const g of groups) {
    const entry = judged.get(g.brewId) ?? { readings: [], count: 0 };
    entry.count += Number(g.n);
    judged.set(g.brewId, entry);
  }
  // Two readings may share the first time of a call-out: the lower id is the first.
  const seen = new Set<string>();
  for (const { brewId, note, ...row } of rows) {
    const key = note ? `${brewId}:${note}` : null;
    const first = key ? !seen.has(key) : true;
    if (key) seen.add(key);
    if (first || judgedKinds.includes(row.kind as (typeof judgedKinds)[number])) judged.get(brewId)!.readings.push({ ...row, takenAt: row.takenAt.toISOString() });
  }
  return judged;
}

/** OG and the volume into the fermenter: the latest OG reading, and the latest one with a volume. */
function ogFigures(readings: readonly JudgedReading[]) {
  const ogs = readings.filter((r) => r.kind === 'og');
  return { og: ogs.at(-1)?.corrected ?? null, fermenterVolumeL: ogs.findLast((r) => r.volumeL !== null)?.volumeL ?? null };
}

async function photosOf(db: DbOrTx, brewId: number, readingIds: number[]) {
  const byReading = new Map<number, ReadingPhoto[]>();
  if (readingIds.length === 0) return byReading;
  const rows = await prepared(db, photosOfReadings).execute({ brewId, readingIds });
  for (const p of rows) {
    const list = byReading.get(p.readingId) ?? [];
    list.push({ ...p, createdAt: p.createdAt.toISOString(), url: photoUrl(brewId, p.readingId, p.id) });
    byReading.set(p.readingId, list);
  }
  return byReading;
}

/**
 * The readings before `cursor` (the latest when absent), oldest first, with their photos: read
 * backwards along the (brew, time) index, so a page costs the same however long the log.
 */
export async function readingPage(db: DbOrTx, brewId: number, query: { cursor?: string; pageSize: number }): Promise<BrewReadingPage> {
  const before = query.cursor ? decodeTimeCursor('readings', query.cursor) : null;
  const rows = before
    ? await db
        .select()
        .from(brewReadings)
        .where(and(eq(brewReadings.brewId, brewId), beforeTimeKey(brewReadings.takenAt, brewReadings.id, before)))
        .orderBy(desc(brewReadings.takenAt), desc(brewReadings.id))
        .limit(query.pageSize + 1)
    : await prepared(db, latestReadings).execute({ id: brewId, limit: query.pageSize + 1 });
  const page = rows.slice(0, query.pageSize).reverse();
  const photos = await photosOf(db, brewId, page.map((r) => r.id));
  const first = page[0];
  return {
    items: page.map((r) => toReading(r, photos.get(r.id))),
    nextCursor: rows.length > query.pageSize && first ? encodeTimeCursor('readings', { at: first.takenAt, id: first.id }) : null,
    pageSize: query.pageSize,
  };
}

/** GET /api/brews/:id/readings: older readings of a brew day the actor may read. */
export async function listReadings(db: DbOrTx, actor: Actor, id: number, query: { cursor?: string; pageSize: number }): Promise<BrewReadingPage> {
  await loadBrewForActor(db, actor, id, 'read');
  return readingPage(db, id, query);
}

/**
 * What a write changed on the brew day (OG, stages, deviations), without photos, notes or
 * the readings themselves: the answer to a new reading, so the client need not reload the day.
 */
export async function brewDayChange(db: DbOrTx, brewId: number): Promise<BrewDayChange> {
  const [[row], stageRows, judged, decisionRows] = await Promise.all([
    prepared(db, brewRowById).execute({ id: brewId }),
    prepared(db, stagesOfBrew).execute({ id: brewId }),
    judgedReadings(db, brewId),
    prepared(db, decisionsOfBrew).execute({ id: brewId }),
  ]);
  // Deleted (by its owner elsewhere) between the write and this answer.
  if (!row) throw new NotFound('This brew day was deleted.');
  return {
    ...ogFigures(judged.readings),
    readingCount: judged.count,
    pitchedAt: iso(row.pitchedAt),
    currentStage: row.currentStage,
    updatedAt: row.updatedAt.toISOString(),
    stages: stagesOf(row.targetsSnapshot, stageRows),
    deviations: brewDayDeviations(row.targetsSnapshot as RecipeTargets, judged.readings, decisionRows.map(toDecision)),
  };
}

/**
 * The brew day as its page opens: the latest READINGS_WINDOW readings, with the cursor for older
 * ones; `allReadings` sends every reading (a mentor's review anchors comments to any of them).
 */
export async function getBrew(db: DbOrTx, actor: Actor, id: number, options: { allReadings?: boolean } = {}): Promise<BrewDetail> {
  const stored = await loadBrewForActor(db, actor, id, 'read');
  return assembleBrew(db, actor, stored, options.allReadings ?? false);
}

async function allReadingsOf(db: DbOrTx, id: number): Promise<BrewReadingPage> {
  const rows = await db.select().from(brewReadings).where(eq(brewReadings.brewId, id)).orderBy(asc(brewReadings.takenAt), asc(brewReadings.id));
  const photos = await photosOf(db, id, rows.map((r) => r.id));
  return { items: rows.map((r) => toReading(r, photos.get(r.id))), nextCursor: null, pageSize: rows.length };
}

async function assembleBrew(db: DbOrTx, actor: Actor, stored: StoredBrew, allReadings: boolean): Promise<BrewDetail> {
  const id = stored.row.id;
  const [stageRows, latest, judged, decisionRows, noteRows] = await Promise.all([
    prepared(db, stagesOfBrew).execute({ id }),
    allReadings ? allReadingsOf(db, id) : readingPage(db, id, { pageSize: READINGS_WINDOW }),
    judgedReadings(db, id),
    prepared(db, decisionsOfBrew).execute({ id }),
    prepared(db, notesOfBrew).execute({ id }),
  ]);
  const decisions = decisionRows.map(toDecision);
  const targets = stored.row.targetsSnapshot;
  const equipment = stored.row.equipmentSnapshot;
  const stages = stagesOf(targets, stageRows);
  const { og, fermenterVolumeL } = ogFigures(judged.readings);
  const resource = { ownerId: stored.row.ownerId, sharedWithClubIds: stored.sharedWithClubIds };
  return {
    ...toSummary(actor, stored, og),
    targets,
    equipment,
    boilOffLPerHour: stored.row.boilOffLPerHour ?? equipment.boilOffLPerHour,
    notes: stored.row.notes,
    stages,
    readings: latest.items,
    readingCount: judged.count,
    olderReadings: latest.nextCursor,
    fermenterVolumeL,
    decisions,
    log: noteRows.map(toNote),
    deviations: brewDayDeviations(targets, judged.readings, decisions),
    permissions: {
      edit: can(actor, 'update', resource),
      share: can(actor, 'share', resource),
      delete: can(actor, 'delete', resource),
      comment: can(actor, 'comment', resource),
    },
  };
}

/** A brew-day list cursor: the last brew day's date and id (server/lib/cursor.ts). */
function decodeBrewCursor(scope: 'mine' | 'shared', cursor: string) {
  return decodeCursor(cursor, (parts) => {
    const [tag, brewedOn, id] = parts;
    const valid = parts.length === 3 && tag === scope && typeof brewedOn === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(brewedOn) && isCursorId(id);
    return valid ? { brewedOn, id } : null;
  });
}

/**
 * My brew days, or those shared with my clubs by others; newest first, a page at a time. Paged by
 * key (brew date and id) along the owner index, "more" known from one extra row.
 */
export async function listBrews(db: DbOrTx, actor: Actor, query: { scope: 'mine' | 'shared'; cursor?: string; pageSize: number }): Promise<BrewList> {
  const { scope, pageSize } = query;
  const after = query.cursor ? decodeBrewCursor(scope, query.cursor) : null;
  const empty: BrewList = { items: [], nextCursor: null, pageSize };
  const where: SQL[] = [];
  if (scope === 'mine') where.push(eq(brews.ownerId, actor.id));
  else {
    const clubIds = actor.memberships.map((m) => m.clubId);
    if (clubIds.length === 0) return empty;
    // A subquery, not a join, so a brew day shared with two of my clubs is listed once.
    where.push(sql`${brews.id} in (select ${brewClubShares.brewId} from ${brewClubShares} where ${inArray(brewClubShares.clubId, clubIds)})`, ne(brews.ownerId, actor.id));
  }
  if (after) where.push(or(lt(brews.brewedOn, after.brewedOn), and(eq(brews.brewedOn, after.brewedOn), lt(brews.id, after.id)))!);
  const rows = await db
    .select({ row: brews, ownerName: users.displayName })
    .from(brews)
    .innerJoin(users, eq(users.id, brews.ownerId))
    .where(and(...where))
    .orderBy(desc(brews.brewedOn), desc(brews.id))
    .limit(pageSize + 1);
  const page = rows.slice(0, pageSize);
  if (page.length === 0) return empty;
  const ids = page.map((r) => r.row.id);
  const [shares, ogs] = await Promise.all([
    db.select().from(brewClubShares).where(inArray(brewClubShares.brewId, ids)),
    db
      .select({ brewId: brewReadings.brewId, corrected: brewReadings.correctedValue })
      .from(brewReadings)
      .where(and(inArray(brewReadings.brewId, ids), eq(brewReadings.kind, 'og')))
      .orderBy(asc(brewReadings.takenAt), asc(brewReadings.id)),
  ]);
  const latestOg = new Map<number, number>();
  for (const o of ogs) latestOg.set(o.brewId, o.corrected);
  const last = page[page.length - 1].row;
  return {
    items: page.map(({ row, ownerName }) =>
      toSummary(actor, { row, ownerName, sharedWithClubIds: shares.filter((s) => s.brewId === row.id).map((s) => s.clubId) }, latestOg.get(row.id) ?? null),
    ),
    nextCursor: rows.length > pageSize ? encodeCursor([scope, last.brewedOn, last.id]) : null,
    pageSize,
  };
}

/** The client sends the brewer's own day; without one, the UTC day (decision 0016). */
const todayIso = () => utcDay();

/** Starts a brew day from a recipe the brewer may read: snapshots its targets and the equipment profile. */
export async function startBrew(db: DbOrTx, actor: Actor, input: StartBrewInput, now = new Date()): Promise<number> {
  await loadRecipeForActor(db, actor, input.recipeId, 'read');
  const targets = await getRecipeTargets(db, input.recipeId);
  const equipment = await getEquipmentProfile(db, actor.id);
  return db.transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(brews)
      .values({
        ownerId: actor.id,
        recipeId: input.recipeId,
        name: input.name ?? targets.name,
        brewedOn: input.brewedOn ?? todayIso(),
        targetsSnapshot: targets,
        equipmentSnapshot: equipment,
        currentStage: 'mash',
        notes: '',
        createdAt: now,
        updatedAt: now,
      })
      .$returningId();
    await tx.insert(brewStagesTable).values(stagesFor(targets).map((stage) => ({ brewId: id, stage, startedAt: stage === 'mash' ? now : null })));
    return id;
  });
}

export async function updateBrew(db: DbOrTx, actor: Actor, id: number, input: UpdateBrewInput): Promise<void> {
  await loadBrewForActor(db, actor, id, 'update');
  const set: Partial<typeof brews.$inferInsert> = { updatedAt: new Date() };
  if (input.name !== undefined) set.name = input.name;
  if (input.brewedOn !== undefined) set.brewedOn = input.brewedOn;
  if (input.status !== undefined) set.status = input.status;
  if (input.notes !== undefined) set.notes = input.notes;
  if (input.boilOffLPerHour !== undefined) set.boilOffLPerHour = input.boilOffLPerHour;
  await db.update(brews).set(set).where(eq(brews.id, id));
}

export async function deleteBrew(db: DbOrTx, actor: Actor, id: number): Promise<void> {
  await loadBrewForActor(db, actor, id, 'delete');
  await db.delete(brews).where(eq(brews.id, id));
}

/** Marks a stage started (it is returned to when it was done or skipped), completed or skipped; times are kept. */
export async function setStage(db: DbOrTx, actor: Actor, id: number, stage: BrewStage, action: BrewStageAction, now = new Date()): Promise<void> {
  const stored = await loadBrewForActor(db, actor, id, 'update');
  const stages = stagesFor(stored.row.targetsSnapshot);
  if (!stages.includes(stage)) {
    const message = 'This brew day has no souring stage: its recipe sets no souring target pH.';
    throw new BadRequest(message, { stage: message });
  }
  await db.transaction(async (tx) => {
    await lockBrewRow(tx, id);
    const rows = await tx.select().from(brewStagesTable).where(eq(brewStagesTable.brewId, id)).for('update');
    const current = rows.find((r) => r.stage === stage);
    const next: Partial<typeof brewStagesTable.$inferInsert> =
      action === 'start'
        ? { startedAt: current?.startedAt ?? now, completedAt: null, skippedAt: null }
        : action === 'complete'
          ? { startedAt: current?.startedAt ?? now, completedAt: now, skippedAt: null }
          : { skippedAt: now, completedAt: null };
    if (current) await tx.update(brewStagesTable).set(next).where(and(eq(brewStagesTable.brewId, id), eq(brewStagesTable.stage, stage)));
    else await tx.insert(brewStagesTable).values({ brewId: id, stage, ...next });

    let currentStage: BrewStage = stage;
    if (action !== 'start') {
      // On to the next stage not yet done; stay on the last one.
      const done = (s: BrewStage) => {
        if (s === stage) return true;
        const r = rows.find((x) => x.stage === s);
        return Boolean(r?.completedAt || r?.skippedAt);
      };
      const after = stages.slice(stages.indexOf(stage) + 1).find((s) => !done(s));
      currentStage = after ?? stages.find((s) => !done(s)) ?? stage;
    }
    const set: Partial<typeof brews.$inferInsert> = { currentStage, updatedAt: now };
    // The last stage done on brew day: the beer is fermenting now.
    if (stage === 'og' && action === 'complete' && stored.row.status === 'brewing') set.status = 'fermenting';
    await tx.update(brews).set(set).where(eq(brews.id, id));
  });
}

const stageOfBrew = (db: DbOrTx) =>
  db
    .select()
    .from(brewStagesTable)
    .where(and(eq(brewStagesTable.brewId, sql.placeholder('brewId')), eq(brewStagesTable.stage, sql.placeholder('stage'))));
const touchBrew = (db: DbOrTx) => db.update(brews).set({ updatedAt: sql`${sql.placeholder('at')}` }).where(eq(brews.id, sql.placeholder('brewId')));

/** A reading or decision in a stage starts that stage, if it was not started yet. The caller holds the brew row lock (lockBrewRow). */
export async function touchStage(tx: DbOrTx, brewId: number, stage: BrewStage, at: Date) {
  const [row] = await prepared(tx, stageOfBrew).execute({ brewId, stage });
  if (!row) await tx.insert(brewStagesTable).values({ brewId, stage, startedAt: at });
  else if (!row.startedAt) await tx.update(brewStagesTable).set({ startedAt: at }).where(and(eq(brewStagesTable.brewId, brewId), eq(brewStagesTable.stage, stage)));
  await prepared(tx, touchBrew).execute({ brewId, at });
}

/**
 * Replaces the set of clubs the brew day is shared with (empty = private). Each club must be one
 * the owner belongs to.
 */
export async function setBrewSharing(db: DbOrTx, actor: Actor, id: number, clubIds: number[]): Promise<BrewSharing> {
  await loadBrewForActor(db, actor, id, 'share');
  const unique = checkShareTargets(actor, clubIds);
  await db.transaction(async (tx) => {
    await lockShareTargets(tx, actor.id, unique);
    const existing = await tx.select({ clubId: brewClubShares.clubId }).from(brewClubShares).where(eq(brewClubShares.brewId, id));
    const { gone, added } = diffShares(existing.map((e) => e.clubId), unique);
    if (gone.length > 0) await tx.delete(brewClubShares).where(and(eq(brewClubShares.brewId, id), inArray(brewClubShares.clubId, gone)));
    if (added.length > 0) await tx.insert(brewClubShares).values(added.map((clubId) => ({ brewId: id, clubId })));
  });
  return { brewId: id, clubIds: unique };
}

export async function addNote(db: DbOrTx, actor: Actor, id: number, input: { body: string; stage: BrewStage | null }, now = new Date()): Promise<BrewNote> {
  await loadBrewForActor(db, actor, id, 'update');
  const [{ id: noteId }] = await db
    .insert(brewNotes)
    .values({ brewId: id, kind: 'note', stage: input.stage, body: input.body, authorId: actor.id, createdAt: now })
    .$returningId();
  const [row] = await db.select().from(brewNotes).where(eq(brewNotes.id, noteId));
  return toNote(row);
}

export async function deleteNote(db: DbOrTx, actor: Actor, id: number, noteId: number): Promise<void> {
  await loadBrewForActor(db, actor, id, 'update');
  const [row] = await db.select().from(brewNotes).where(and(eq(brewNotes.id, noteId), eq(brewNotes.brewId, id)));
  if (!row) throw new NotFound('That note was not found.');
  if (row.kind !== 'note') throw new BadRequest('Entries Wortwise wrote itself stay in the log.');
  await db.delete(brewNotes).where(eq(brewNotes.id, noteId));
}
