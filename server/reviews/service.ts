/**
 * A club mentor's review of a shared brew day: the queue of brew days no mentor of the club has
 * commented on yet, the review (brew day, fermentation, deviations, comments) and the comments
 * themselves. Every read goes through loadBrewForActor and every rule through
 * server/auth/permissions.ts. A comment is written in a transaction that re-reads the brew day's
 * shares with a lock, so a comment sent a second after the brewer stopped sharing is refused.
 */
import { and, asc, desc, eq, inArray, max, ne, sql } from 'drizzle-orm';
import { readingKindLabels } from '@shared/schemas/brews';
import type { RecipeTargets } from '@shared/schemas/recipes';
import type { Page } from '@shared/schemas/common';
import type { BrewComment, BrewReview, CommentBody, CommentCreated, CommentTarget, ReviewDeviation, ReviewedItem, ReviewQueueItem } from '@shared/schemas/comments';
import { can, canDeleteComment, canSeeComment, type Actor, type OwnedResource } from '../auth/permissions';
import { brewDayDeviations, getBrew, judgedReadingsOf, loadBrewForActor, toDecision, type StoredBrew } from '../brews/service';
import type { AppContext } from '../context';
import type { Db, DbOrTx } from '../db/client';
import { inList, prepared } from '../db/prepared';
import { brewClubShares, brewDecisions, brewReadings, brews, clubMemberships, clubs, comments, fermentationReadings, packagingRecords, users, type CommentRow } from '../db/schema';
import { assembleLog, deviationRowsOf, fermentationDeviations, toPackaging } from '../fermentation/service';
import { decodeCursor, encodeCursor, isCursorId } from '../lib/cursor';
import { Forbidden, NotFound } from '../lib/errors';
import { sendAfterCommit } from '../mail/mailer';
import { mentorCommentNotice } from '../mail/templates';

/** The one answer for a brew day the commenter cannot see (any more): the same whether it was unshared, never shared or never existed. */
export const NO_LONGER_SHARED = 'This brew day is no longer shared with your club.';
const MENTORS_ONLY = 'Only the club’s mentors comment on a shared brew day; members read along.';
/** A page of the mentor's queue (or reviewed list) holds this many brew days unless asked otherwise. */
export const REVIEW_PAGE_SIZE = 20;

const resourceOf = (stored: StoredBrew): OwnedResource => ({ ownerId: stored.row.ownerId, sharedWithClubIds: stored.sharedWithClubIds });

/** Loads the brew day for commenting, with words a mentor understands when it is refused. */
async function loadForComment(db: DbOrTx, actor: Actor, brewId: number): Promise<StoredBrew> {
  try {
    return await loadBrewForActor(db, actor, brewId, 'comment');
  } catch (error) {
    if (error instanceof NotFound) throw new NotFound(NO_LONGER_SHARED);
    if (error instanceof Forbidden) throw new Forbidden(MENTORS_ONLY);
    throw error;
  }
}

// ---------------------------------------------------------------------------------------------
// Comments as a reader sees them

interface TargetIndex {
  reading: Map<number, { label: string; at: string }>;
  decision: Map<number, { label: string; at: string }>;
  fermentation_reading: Map<number, { label: string; at: string }>;
}

async function targetIndex(db: DbOrTx, brewId: number): Promise<TargetIndex> {
  const [readings, decisions, fermentation] = await Promise.all([
    db.select({ id: brewReadings.id, kind: brewReadings.kind, at: brewReadings.takenAt }).from(brewReadings).where(eq(brewReadings.brewId, brewId)),
    db.select({ id: brewDecisions.id, at: brewDecisions.decidedAt }).from(brewDecisions).where(eq(brewDecisions.brewId, brewId)),
    db
      .select({ id: fermentationReadings.id, kind: fermentationReadings.kind, at: fermentationReadings.takenAt })
      .from(fermentationReadings)
      .where(eq(fermentationReadings.brewId, brewId)),
  ]);
  return {
    reading: new Map(readings.map((r) => [r.id, { label: `${readingKindLabels[r.kind]} reading`, at: r.at.toISOString() }])),
    decision: new Map(decisions.map((d) => [d.id, { label: 'Late-boil decision', at: d.at.toISOString() }])),
    fermentation_reading: new Map(fermentation.map((f) => [f.id, { label: `Fermentation ${f.kind} reading`, at: f.at.toISOString() }])),
  };
}

const fallbackLabel = { reading: 'A brew-day reading', decision: 'A late-boil decision', fermentation_reading: 'A fermentation reading' } as const;

function targetOf(row: CommentRow, index: TargetIndex): CommentTarget {
  if (row.targetKind === 'brew' || row.targetId === null) return { kind: 'brew', id: null, label: 'The brew day', at: null, missing: false };
  const found = index[row.targetKind].get(row.targetId);
  if (!found) return { kind: row.targetKind, id: row.targetId, label: `${fallbackLabel[row.targetKind]}, since deleted`, at: null, missing: true };
  return { kind: row.targetKind, id: row.targetId, label: found.label, at: found.at, missing: false };
}

/** The comments on a brew day the actor may see, oldest first. */
export async function commentsFor(db: DbOrTx, actor: Actor, stored: StoredBrew, only?: { id: number }): Promise<BrewComment[]> {
  const brewId = stored.row.id;
  const rows = await db
    .select({ row: comments, authorName: users.displayName })
    .from(comments)
    .leftJoin(users, eq(users.id, comments.authorId))
    .where(only ? and(eq(comments.brewId, brewId), eq(comments.id, only.id)) : eq(comments.brewId, brewId))
    .orderBy(asc(comments.createdAt), asc(comments.id));
  if (rows.length === 0) return [];
  const authorIds = [...new Set(rows.map((r) => r.row.authorId).filter((id): id is number => id !== null))];
  const shared = stored.sharedWithClubIds;
  const memberships =
    authorIds.length > 0 && shared.length > 0
      ? await db
          .select({ userId: clubMemberships.userId, clubId: clubMemberships.clubId })
          .from(clubMemberships)
          .where(and(inArray(clubMemberships.userId, authorIds), inArray(clubMemberships.clubId, shared)))
      : [];
  const resource = resourceOf(stored);
  const visible = rows.filter(({ row }) =>
    canSeeComment(actor, resource, { authorId: row.authorId, authorClubIds: memberships.filter((m) => m.userId === row.authorId).map((m) => m.clubId) }),
  );
  if (visible.length === 0) return [];
  const index = await targetIndex(db, brewId);
  return visible.map(({ row, authorName }) => ({
    id: row.id,
    brewId: row.brewId,
    author: {
      id: row.authorId,
      name: authorName ?? 'A former member',
      role: row.authorId === stored.row.ownerId ? 'brewer' : 'mentor',
    },
    target: targetOf(row, index),
    body: row.body,
    createdAt: row.createdAt.toISOString(),
    editedAt: row.editedAt ? row.editedAt.toISOString() : null,
    canDelete: canDeleteComment(actor, row),
  }));
}

export async function listComments(db: DbOrTx, actor: Actor, brewId: number): Promise<BrewComment[]> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  return commentsFor(db, actor, stored);
}

// ---------------------------------------------------------------------------------------------
// Writing and deleting

async function requireTargetOfBrew(tx: DbOrTx, brewId: number, target: CommentBody['target']): Promise<void> {
  if (!target || target.kind === 'brew') return;
  const table = { reading: brewReadings, decision: brewDecisions, fermentation_reading: fermentationReadings }[target.kind];
  const [row] = await tx
    .select({ id: table.id })
    .from(table)
    .where(and(eq(table.id, target.id), eq(table.brewId, brewId)));
  if (!row) {
    const what = { reading: 'That reading', decision: 'That decision', fermentation_reading: 'That fermentation reading' }[target.kind];
    throw new NotFound(`${what} is not part of this brew day (it may have been deleted).`);
  }
}

/**
 * Writes a comment. The brew day's shares are read again inside the transaction with a locking
 * read, so a comment and the brewer's "stop sharing" are serialised: if the unsharing went first,
 * the comment is refused (404, nothing saved); if the comment went first, it was made while shared.
 * Returns the new comment's id; the demo seed calls this too, without the e-mail.
 */
export async function insertComment(db: DbOrTx, actor: Actor, brewId: number, input: CommentBody, now = new Date()): Promise<number> {
  return db.transaction(async (tx) => {
    const [brew] = await tx.select({ ownerId: brews.ownerId }).from(brews).where(eq(brews.id, brewId));
    if (!brew) throw new NotFound(NO_LONGER_SHARED);
    const shares = await tx.select({ clubId: brewClubShares.clubId }).from(brewClubShares).where(eq(brewClubShares.brewId, brewId)).for('update');
    const memberships = await tx.select({ clubId: clubMemberships.clubId, role: clubMemberships.role }).from(clubMemberships).where(eq(clubMemberships.userId, actor.id));
    const fresh: Actor = { id: actor.id, siteRole: actor.siteRole, memberships };
    const resource = { ownerId: brew.ownerId, sharedWithClubIds: shares.map((s) => s.clubId) };
    if (!can(fresh, 'read', resource)) throw new NotFound(NO_LONGER_SHARED);
    if (!can(fresh, 'comment', resource)) throw new Forbidden(MENTORS_ONLY);
    await requireTargetOfBrew(tx, brewId, input.target);
    const target = input.target && input.target.kind !== 'brew' ? input.target : null;
    const [{ id }] = await tx
      .insert(comments)
      .values({ brewId, authorId: actor.id, targetKind: target?.kind ?? 'brew', targetId: target?.id ?? null, body: input.body, createdAt: now })
      .$returningId();
    return id;
  });
}

/** Adds a comment (see insertComment) and, when someone else wrote it, mails the brewer after the commit. */
export async function addComment(ctx: AppContext, actor: Actor, brewId: number, input: CommentBody, now = new Date()): Promise<CommentCreated> {
  const { db } = ctx;
  await loadForComment(db, actor, brewId);
  const commentId = await insertComment(db, actor, brewId, input, now);

  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  const [comment] = await commentsFor(db, actor, stored, { id: commentId });
  if (stored.row.ownerId === actor.id) return { comment, noticeSent: null };
  const [owner] = await db.select({ email: users.email, name: users.displayName }).from(users).where(eq(users.id, stored.row.ownerId));
  const [author] = await db.select({ name: users.displayName }).from(users).where(eq(users.id, actor.id));
  const mail = mentorCommentNotice({
    brewerName: owner.name,
    mentorName: author?.name ?? 'A mentor',
    brewName: stored.row.name,
    commentExcerpt: input.body,
    url: `${ctx.env.APP_URL}/brews/${brewId}/log#comments`,
  });
  const noticeSent = await sendAfterCommit(ctx.mailer, { to: owner.email, ...mail });
  return { comment, noticeSent };
}

export async function deleteComment(db: Db, actor: Actor, brewId: number, commentId: number): Promise<void> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  const [comment] = await commentsFor(db, actor, stored, { id: commentId });
  if (!comment) throw new NotFound('That comment was not found.');
  if (!comment.canDelete) throw new Forbidden('Only its author can delete a comment.');
  await db.delete(comments).where(and(eq(comments.id, commentId), eq(comments.brewId, brewId)));
}

// ---------------------------------------------------------------------------------------------
// The review and the queue

/** The brew day (as its log shows it), its fermentation and every deviation of both. */
async function reviewParts(db: DbOrTx, actor: Actor, stored: StoredBrew) {
  const now = new Date();
  const [brew, log, rows] = await Promise.all([
    getBrew(db, actor, stored.row.id, { allReadings: true }),
    assembleLog(db, actor, stored, now, { allReadings: true }),
    deviationRowsOf(db, [stored.row.id]),
  ]);
  // Judged as the queue judges them (every excursion, not only those the log lists), so the two agree.
  const later = fermentationDeviations(actor, stored, rows.get(stored.row.id) ?? [], log.packaging, brew.deviations, now);
  const deviations: ReviewDeviation[] = [...brew.deviations, ...later];
  return { brew, log, deviations };
}

export async function getReview(db: DbOrTx, actor: Actor, brewId: number): Promise<BrewReview> {
  const stored = await loadBrewForActor(db, actor, brewId, 'read');
  const [{ brew, log, deviations }, list] = await Promise.all([reviewParts(db, actor, stored), commentsFor(db, actor, stored)]);
  return {
    brew,
    fermentation: { readings: log.readings, verdict: log.verdict, temperature: log.temperature, packaging: log.packaging },
    deviations,
    comments: list,
    permissions: { comment: brew.permissions.comment },
  };
}

interface ClubShare {
  sharedAt: Date;
  brewedOn: string;
  /** Latest comment of a mentor of these clubs (reviewed list only). */
  reviewedAt: Date | null;
  clubs: { id: number; name: string }[];
}

/**
 * The brew days shared by others with clubs where the actor is a mentor, split by whether a mentor
 * of that club has commented (a comment counts for a club when its author is a mentor of that club
 * now, not the brewer). Two statements whatever the number of shares.
 */
const sharesWithMentorClubs = (db: DbOrTx) =>
  db
    .select({ brewId: brewClubShares.brewId, clubId: brewClubShares.clubId, clubName: clubs.name, sharedAt: brewClubShares.sharedAt, brewedOn: brews.brewedOn })
    .from(brewClubShares)
    .innerJoin(brews, eq(brews.id, brewClubShares.brewId))
    .innerJoin(clubs, eq(clubs.id, brewClubShares.clubId))
    .where(and(inList(brewClubShares.clubId, 'clubIds'), ne(brews.ownerId, sql.placeholder('actorId'))))
    .orderBy(desc(brewClubShares.sharedAt), desc(brews.brewedOn), desc(brews.id));
const mentorComments = (db: DbOrTx) =>
  db
    .select({ brewId: comments.brewId, clubId: clubMemberships.clubId, lastAt: max(comments.createdAt) })
    .from(comments)
    .innerJoin(brews, eq(brews.id, comments.brewId))
    .innerJoin(clubMemberships, and(eq(clubMemberships.userId, comments.authorId), eq(clubMemberships.role, 'mentor')))
    .where(and(inList(comments.brewId, 'brewIds'), inList(clubMemberships.clubId, 'clubIds'), ne(comments.authorId, brews.ownerId)))
    .groupBy(comments.brewId, clubMemberships.clubId);

async function mentorShares(db: DbOrTx, actor: Actor) {
  const waiting = new Map<number, ClubShare>();
  const reviewed = new Map<number, ClubShare>();
  const mentorClubIds = actor.memberships.filter((m) => m.role === 'mentor').map((m) => m.clubId);
  if (mentorClubIds.length === 0) return { waiting, reviewed };
  const shares = await prepared(db, sharesWithMentorClubs).execute({ clubIds: mentorClubIds, actorId: actor.id });
  if (shares.length === 0) return { waiting, reviewed };
  const commented = await prepared(db, mentorComments).execute({ brewIds: [...new Set(shares.map((s) => s.brewId))], clubIds: mentorClubIds });
  const done = new Map(commented.map((r) => [`${r.brewId}:${r.clubId}`, r.lastAt]));
  for (const s of shares) {
    const key = `${s.brewId}:${s.clubId}`;
    const lastAt = done.get(key);
    const into = done.has(key) ? reviewed : waiting;
    const entry = into.get(s.brewId) ?? { sharedAt: s.sharedAt, brewedOn: s.brewedOn, reviewedAt: null, clubs: [] };
    if (s.sharedAt > entry.sharedAt) entry.sharedAt = s.sharedAt;
    if (lastAt && (!entry.reviewedAt || lastAt > entry.reviewedAt)) entry.reviewedAt = lastAt;
    entry.clubs.push({ id: s.clubId, name: s.clubName });
    into.set(s.brewId, entry);
  }
  return { waiting, reviewed };
}

/**
 * The summary of each brew day with its deviation count (brew day and fermentation, as on the
 * review page), for any number of brew days in seven statements: each table is read once with an
 * `IN (…)` list rather than once per brew day, and of the brew-day readings only those that decide
 * the deviations and the OG (judgedReadingsOf: two statements), of the fermentation readings only
 * the narrow rows their deviations read (deviationRowsOf), however long each log is.
 */
// The queue's reads of a page of brew days, built once per database handle (server/db/prepared.ts).
const brewsByIds = (db: DbOrTx) => db.select({ row: brews, ownerName: users.displayName }).from(brews).innerJoin(users, eq(users.id, brews.ownerId)).where(inList(brews.id, 'ids'));
const sharesOfBrews = (db: DbOrTx) =>
  db.select({ brewId: brewClubShares.brewId, clubId: brewClubShares.clubId }).from(brewClubShares).where(inList(brewClubShares.brewId, 'ids')).orderBy(asc(brewClubShares.clubId));
const decisionsOfBrews = (db: DbOrTx) => db.select().from(brewDecisions).where(inList(brewDecisions.brewId, 'ids')).orderBy(asc(brewDecisions.decidedAt), asc(brewDecisions.id));
const packagingOfBrews = (db: DbOrTx) => db.select().from(packagingRecords).where(inList(packagingRecords.brewId, 'ids'));

async function queueItems(db: DbOrTx, actor: Actor, entries: Map<number, ClubShare>, now = new Date()): Promise<ReviewQueueItem[]> {
  const ids = [...entries.keys()];
  if (ids.length === 0) return [];
  const [brewRows, shareRows, judged, decisionRows, fermentation, packagingRows] = await Promise.all([
    prepared(db, brewsByIds).execute({ ids }),
    prepared(db, sharesOfBrews).execute({ ids }),
    judgedReadingsOf(db, ids),
    prepared(db, decisionsOfBrews).execute({ ids }),
    deviationRowsOf(db, ids),
    prepared(db, packagingOfBrews).execute({ ids }),
  ]);
  const byBrew = <T extends { brewId: number }>(rows: readonly T[]) => {
    const map = new Map<number, T[]>();
    for (const r of rows) {
      const list = map.get(r.brewId);
      if (list) list.push(r);
      else map.set(r.brewId, [r]);
    }
    return map;
  };
  const shares = byBrew(shareRows);
  const decisions = byBrew(decisionRows);
  const packaging = new Map(packagingRows.map((p) => [p.brewId, p]));
  const items: ReviewQueueItem[] = [];
  for (const { row, ownerName } of brewRows) {
    const stored: StoredBrew = { row, ownerName, sharedWithClubIds: (shares.get(row.id) ?? []).map((s) => s.clubId) };
    // Unshared or deleted between the queries: not waiting any more.
    if (!can(actor, 'read', resourceOf(stored))) continue;
    const brewReadingList = judged.get(row.id)?.readings ?? [];
    const brewDay = brewDayDeviations(row.targetsSnapshot as RecipeTargets, brewReadingList, (decisions.get(row.id) ?? []).map(toDecision));
    const packagingRow = packaging.get(row.id);
    const later = fermentationDeviations(actor, stored, fermentation.get(row.id) ?? [], packagingRow ? toPackaging(packagingRow) : null, brewDay, now);
    const og = brewReadingList.findLast((r) => r.kind === 'og')?.corrected ?? null;
    items.push(toQueueItem(stored, og, entries.get(row.id)!, brewDay.length + later.length));
  }
  return items;
}

/** A list's order as a key per brew day: ISO instants and dates compared as text, newest first, then the id. */
type OrderKey = [...string[], number];

const afterInOrder = (key: OrderKey, cursor: OrderKey) => {
  for (let i = 0; i < key.length; i++) {
    if (key[i] === cursor[i]) continue;
    return typeof key[i] === 'number' ? (key[i] as number) < (cursor[i] as number) : (key[i] as string) < (cursor[i] as string);
  }
  return false;
};

/**
 * One page of the brew days in `entries`, in the order `keyOf` gives (newest first): the share
 * rows are only ids and dates, so the ordering and the cursor are worked out on them, and the
 * brew days themselves (with their readings) are read for one page only, so a queue of 100 costs
 * what a queue of 20 does. The cursor is the last brew day's key (server/lib/cursor.ts).
 */
async function reviewPage<T extends ReviewQueueItem>(
  db: DbOrTx,
  actor: Actor,
  list: 'queue' | 'reviewed',
  entries: Map<number, ClubShare>,
  keyOf: (brewId: number, entry: ClubShare) => OrderKey,
  query: { cursor?: string; pageSize: number },
  toItem: (item: ReviewQueueItem, entry: ClubShare) => T,
): Promise<Page<T>> {
  const ordered = [...entries].map(([brewId, entry]) => ({ brewId, entry, key: keyOf(brewId, entry) }));
  ordered.sort((a, b) => (afterInOrder(a.key, b.key) ? 1 : afterInOrder(b.key, a.key) ? -1 : 0));
  const keyLength = list === 'queue' ? 3 : 4;
  const after = query.cursor
    ? decodeCursor(query.cursor, (parts) =>
        parts.length === keyLength + 1 && parts[0] === list && isCursorId(parts.at(-1)) && parts.slice(1, -1).every((p) => typeof p === 'string') ? (parts.slice(1) as OrderKey) : null,
      )
    : null;
  const rest = after ? ordered.filter((o) => afterInOrder(o.key, after)) : ordered;
  const page = rest.slice(0, query.pageSize);
  const chosen = new Map(page.map((o) => [o.brewId, o.entry]));
  const items = (await queueItems(db, actor, chosen)).map((item) => toItem(item, chosen.get(item.brewId)!));
  const rank = new Map(page.map((o, i) => [o.brewId, i]));
  items.sort((a, b) => rank.get(a.brewId)! - rank.get(b.brewId)!);
  const last = page.at(-1);
  return { items, nextCursor: rest.length > page.length && last ? encodeCursor([list, ...last.key]) : null };
}

/**
 * The brew days shared with clubs where the actor is a mentor that no mentor of that club has
 * commented on yet, newest share first, a page at a time. Anyone who mentors no club gets an empty
 * list (not a 403): the Reviews page is in everyone's navigation and says what it lists. A constant
 * number of statements whatever the queue's length (server/reviews/queue.test.ts counts them).
 */
export async function listQueue(db: DbOrTx, actor: Actor, query: { cursor?: string; pageSize: number } = { pageSize: REVIEW_PAGE_SIZE }): Promise<Page<ReviewQueueItem>> {
  const { waiting } = await mentorShares(db, actor);
  return reviewPage(db, actor, 'queue', waiting, (brewId, e) => [e.sharedAt.toISOString(), e.brewedOn, brewId], query, (item) => item);
}

/**
 * The brew days a mentor of the actor's clubs has already commented on, latest comment first, so
 * a brew day that left the queue can be found again. Same statement count as the queue.
 */
export async function listReviewed(db: DbOrTx, actor: Actor, query: { cursor?: string; pageSize: number } = { pageSize: REVIEW_PAGE_SIZE }): Promise<Page<ReviewedItem>> {
  const { reviewed } = await mentorShares(db, actor);
  return reviewPage(
    db,
    actor,
    'reviewed',
    reviewed,
    (brewId, e) => [e.reviewedAt!.toISOString(), e.sharedAt.toISOString(), e.brewedOn, brewId],
    query,
    (item, e) => ({ ...item, reviewedAt: e.reviewedAt!.toISOString() }),
  );
}

function toQueueItem(stored: StoredBrew, og: number | null, entry: ClubShare, deviationCount: number): ReviewQueueItem {
  const { row } = stored;
  const targets = row.targetsSnapshot as RecipeTargets;
  return {
    brewId: row.id,
    brewName: row.name,
    brewerName: stored.ownerName,
    recipeName: targets.name,
    brewedOn: row.brewedOn,
    status: row.status,
    sharedAt: entry.sharedAt.toISOString(),
    clubs: [...entry.clubs].sort((a, b) => a.name.localeCompare(b.name)),
    og,
    targetOg: targets.targetOg,
    deviationCount,
  };
}
