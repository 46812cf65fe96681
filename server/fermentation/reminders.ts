/**
 * Fermentation reminders by e-mail: the day the first final-gravity check is due, and two days
 * after a reading that was still moving. They are rows in fermentation_reminders, not timers in
 * memory, so with several API instances each is sent once: a worker claims due rows with a single
 * UPDATE … LIMIT (row locks make two claims of one row impossible), sends, and stamps sent_at
 * where it still holds the claim. docs/decisions/0009-fermentation-verdict-reminders-and-csv.md explains why.
 */
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import { and, asc, eq, gte, inArray, isNotNull, isNull, lt, lte, ne, or, sql } from 'drizzle-orm';
import { FG_FIRST_CHECK_DAY, FG_MIN_SPAN_DAYS } from '@shared/brewmath';
import type { FermentationVerdict } from '@shared/schemas/fermentation';
import type { StoredBrew } from '../brews/service';
import type { AppContext } from '../context';
import type { DbOrTx } from '../db/client';
import { brews, fermentationReadings, fermentationReminders, fermentationSettings, packagingRecords, users } from '../db/schema';
import { reminderMail } from './mail';
import { DAY_MS } from '@shared/dates';

/** How long a claim holds before another instance may take the row over (a crashed sender). */
const CLAIM_MS = 5 * 60_000;
/** A reminder this late is no longer useful: it is skipped, not sent. */
const STALE_MS = 3 * DAY_MS;
/** Brews pitched longer ago than this get no first-check reminder (e.g. when reminders first ship). */
const SCHEDULE_WINDOW_MS = 45 * DAY_MS;
const MAX_ATTEMPTS = 5;

export function firstCheckDue(pitchedAt: Date) {
  return new Date(pitchedAt.getTime() + FG_FIRST_CHECK_DAY * DAY_MS);
}

async function insertReminder(db: DbOrTx, values: { brewId: number; kind: 'first-fg-check' | 'recheck'; dueAt: Date; readingId?: number | null }) {
  // The unique (brew, kind, due) index makes this idempotent, also when two instances race.
  await db
    .insert(fermentationReminders)
    .values({ ...values, readingId: values.readingId ?? null })
    .onDuplicateKeyUpdate({ set: { brewId: sql`${fermentationReminders.brewId}` } });
}

/** After readings were added: the first check (if not yet scheduled) and, when still moving, a re-check. */
export async function scheduleAfterReadings(db: DbOrTx, stored: StoredBrew, verdict: FermentationVerdict | null, now: Date) {
  const pitchedAt = stored.row.pitchedAt;
  if (!pitchedAt || stored.row.status === 'packaged') return;
  await insertReminder(db, { brewId: stored.row.id, kind: 'first-fg-check', dueAt: firstCheckDue(pitchedAt) });
  if (verdict?.state !== 'moving') return;
  const [latest] = await db
    .select({ id: fermentationReadings.id, takenAt: fermentationReadings.takenAt })
    .from(fermentationReadings)
    .where(and(eq(fermentationReadings.brewId, stored.row.id), eq(fermentationReadings.kind, 'gravity')))
    .orderBy(sql`${fermentationReadings.takenAt} desc`, sql`${fermentationReadings.id} desc`)
    .limit(1);
  if (!latest) return;
  const dueAt = new Date(latest.takenAt.getTime() + FG_MIN_SPAN_DAYS * DAY_MS);
  if (dueAt.getTime() < now.getTime() - STALE_MS) return;
  await insertReminder(db, { brewId: stored.row.id, kind: 'recheck', dueAt, readingId: latest.id });
}

/** Brews pitched recently that have no first-check reminder yet: the brew-day page set the pitch time. */
export async function scheduleFirstChecks(db: DbOrTx, now: Date) {
  const candidates = await db
    .select({ id: brews.id, pitchedAt: brews.pitchedAt })
    .from(brews)
    .leftJoin(fermentationReminders, and(eq(fermentationReminders.brewId, brews.id), eq(fermentationReminders.kind, 'first-fg-check')))
    .where(and(isNotNull(brews.pitchedAt), gte(brews.pitchedAt, new Date(now.getTime() - SCHEDULE_WINDOW_MS)), ne(brews.status, 'packaged'), isNull(fermentationReminders.id)))
    .limit(500);
  for (const c of candidates) await insertReminder(db, { brewId: c.id, kind: 'first-fg-check', dueAt: firstCheckDue(c.pitchedAt!) });
}

export interface ReminderRun {
  claimed: number;
  sent: number;
  skipped: number;
  failed: number;
}

/**
 * Sends every reminder due at `now`. Safe to run on several instances at once: each row is
 * claimed by exactly one run, and only the claimant stamps it sent.
 */
export async function runDueReminders(ctx: AppContext, now = new Date(), { limit = 50, workerId = `${hostname()}-${process.pid}` } = {}): Promise<ReminderRun> {
  const { db } = ctx;
  try {
    await scheduleFirstChecks(db, now);
  } catch (error) {
    // Two instances scheduling the same rows can deadlock in InnoDB; the next run schedules them.
    const code = (error as { code?: string; cause?: { code?: string } }).cause?.code ?? (error as { code?: string }).code;
    if (code !== 'ER_LOCK_DEADLOCK' && code !== 'ER_LOCK_WAIT_TIMEOUT') throw error;
  }
  const token = `${workerId}-${randomUUID().slice(0, 8)}`.slice(0, 64);
  await db
    .update(fermentationReminders)
    .set({ claimedBy: token, claimedUntil: new Date(now.getTime() + CLAIM_MS), attempts: sql`${fermentationReminders.attempts} + 1` })
    .where(
      and(
        isNull(fermentationReminders.sentAt),
        lte(fermentationReminders.dueAt, now),
        or(isNull(fermentationReminders.claimedUntil), lt(fermentationReminders.claimedUntil, now)),
      ),
    )
    .orderBy(asc(fermentationReminders.dueAt))
    .limit(limit);
  const claimed = await db
    .select()
    .from(fermentationReminders)
    .where(and(eq(fermentationReminders.claimedBy, token), isNull(fermentationReminders.sentAt)));
  const run: ReminderRun = { claimed: claimed.length, sent: 0, skipped: 0, failed: 0 };
  if (claimed.length === 0) return run;

  const brewIds = [...new Set(claimed.map((r) => r.brewId))];
  const brewRows = await db
    .select({
      id: brews.id,
      name: brews.name,
      status: brews.status,
      pitchedAt: brews.pitchedAt,
      ownerId: brews.ownerId,
      email: users.email,
      displayName: users.displayName,
      remindersEnabled: fermentationSettings.remindersEnabled,
      packagingId: packagingRecords.id,
    })
    .from(brews)
    .innerJoin(users, eq(users.id, brews.ownerId))
    .leftJoin(fermentationSettings, eq(fermentationSettings.userId, brews.ownerId))
    .leftJoin(packagingRecords, eq(packagingRecords.brewId, brews.id))
    .where(inArray(brews.id, brewIds));
  const byId = new Map(brewRows.map((b) => [b.id, b]));

  const finish = (id: number, outcome: 'sent' | 'skipped' | 'failed', note: string | null) =>
    db
      .update(fermentationReminders)
      .set({ sentAt: now, outcome, outcomeNote: note, claimedUntil: null })
      .where(and(eq(fermentationReminders.id, id), eq(fermentationReminders.claimedBy, token), isNull(fermentationReminders.sentAt)));

  for (const reminder of claimed) {
    const brew = byId.get(reminder.brewId);
    const skipReason = await whySkip(db, reminder, brew, now);
    if (skipReason) {
      await finish(reminder.id, 'skipped', skipReason);
      run.skipped++;
      continue;
    }
    const mail = reminderMail({
      kind: reminder.kind,
      brewerName: brew!.displayName,
      brewName: brew!.name,
      pitchedAt: brew!.pitchedAt!,
      dueAt: reminder.dueAt,
      url: `${ctx.env.APP_URL.replace(/\/$/, '')}/brews/${brew!.id}/fermentation`,
    });
    try {
      await ctx.mailer.send({ to: brew!.email, ...mail });
      await finish(reminder.id, 'sent', null);
      run.sent++;
    } catch (error) {
      console.warn(`Fermentation reminder ${reminder.id} could not be sent:`, (error as Error).message);
      if (reminder.attempts >= MAX_ATTEMPTS) {
        await finish(reminder.id, 'failed', (error as Error).message.slice(0, 200));
        run.failed++;
      } else {
        // Leave the claim to expire, so the next run (on any instance) tries again.
        run.failed++;
      }
    }
  }
  return run;
}

type BrewInfo = { status: string; pitchedAt: Date | null; remindersEnabled: boolean | null; packagingId: number | null };

async function whySkip(db: DbOrTx, reminder: typeof fermentationReminders.$inferSelect, brew: BrewInfo | undefined, now: Date): Promise<string | null> {
  if (!brew) return 'brew deleted';
  if (brew.status === 'packaged' || brew.packagingId !== null) return 'already packaged';
  if (brew.remindersEnabled === false) return 'reminders switched off';
  if (now.getTime() - reminder.dueAt.getTime() > STALE_MS) return 'too late to be useful';
  if (!brew.pitchedAt) return 'no pitch time';
  if (reminder.kind === 'first-fg-check') {
    if (firstCheckDue(brew.pitchedAt).getTime() !== reminder.dueAt.getTime()) return 'pitch time changed';
    // A gravity reading on or after the first check day: the brewer is already checking.
    if (await gravitySince(db, reminder.brewId, reminder.dueAt)) return 'already checked';
    return null;
  }
  const [trigger] = reminder.readingId
    ? await db.select({ takenAt: fermentationReadings.takenAt }).from(fermentationReadings).where(eq(fermentationReadings.id, reminder.readingId))
    : [];
  if (!trigger) return 'reading deleted';
  if (await gravitySince(db, reminder.brewId, new Date(trigger.takenAt.getTime() + 1))) return 'already read again';
  return null;
}

async function gravitySince(db: DbOrTx, brewId: number, since: Date) {
  const [row] = await db
    .select({ id: fermentationReadings.id })
    .from(fermentationReadings)
    .where(and(eq(fermentationReadings.brewId, brewId), eq(fermentationReadings.kind, 'gravity'), gte(fermentationReadings.takenAt, since)))
    .limit(1);
  return Boolean(row);
}

/** Runs the reminders every minute until stopped; one run at a time per instance. */
export function startReminderWorker(ctx: AppContext, intervalMs = 60_000): () => void {
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      await runDueReminders(ctx);
    } catch (error) {
      console.warn('Fermentation reminders: this run failed and will be retried.', (error as Error).message);
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), intervalMs);
  timer.unref();
  const first = setTimeout(() => void tick(), 5_000);
  first.unref();
  return () => {
    clearInterval(timer);
    clearTimeout(first);
  };
}
