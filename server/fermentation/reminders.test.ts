import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';
import type { AppContext } from '../context';
import { createDb } from '../db/client';
import { fermentationReminders } from '../db/schema';
import { createMailer } from '../mail/mailer';
import { runDueReminders } from './reminders';
import { DAY_MS, makeFermentationScene } from './test-scene';

let h: TestHarness;
/** A second API instance: its own connection pool and mailer, the same database and mail server. */
let second: AppContext;
beforeAll(async () => {
  h = await createHarness();
  const { db, pool } = createDb(h.ctx.env.DATABASE_URL);
  second = { ...h.ctx, db, pool, mailer: createMailer(h.ctx.env) };
});
afterAll(async () => {
  await second.pool.end();
});

const mailsTo = (email: string) => h.smtp.messages.filter((m) => m.to.includes(email.toLowerCase()));
const settle = () => new Promise((r) => setTimeout(r, 400));

describe('fermentation reminders by e-mail', () => {
  it('sends the first final-gravity check once, even with two instances running at the same moment', async () => {
    // Pitched 12 days and 2 hours ago: the day-12 check came due two hours ago.
    const scenes = await Promise.all([0, 1, 2].map(() => makeFermentationScene(h, { pitchedDaysAgo: 12 + 2 / 24 })));
    const now = new Date();
    const runs = await Promise.all([
      runDueReminders(h.ctx, now, { workerId: 'instance-a' }),
      runDueReminders(second, now, { workerId: 'instance-b' }),
      runDueReminders(h.ctx, now, { workerId: 'instance-a' }),
      runDueReminders(second, now, { workerId: 'instance-b' }),
    ]);
    for (const s of scenes) await waitForMail(h.smtp, s.owner.user.email);
    await settle();
    for (const s of scenes) {
      const mails = mailsTo(s.owner.user.email);
      expect(mails).toHaveLength(1);
      expect(mails[0].subject).toBe('Day 12: time to check the gravity of Scene Pale');
      expect(mails[0].text).toContain(`${h.ctx.env.APP_URL}/brews/${s.brewId}/fermentation`);
      expect(mails[0].text).toMatch(/can burst/);
      const [row] = await h.ctx.db
        .select()
        .from(fermentationReminders)
        .where(and(eq(fermentationReminders.brewId, s.brewId), eq(fermentationReminders.kind, 'first-fg-check')));
      expect(row).toMatchObject({ outcome: 'sent', dueAt: new Date(s.pitchedAt.getTime() + 12 * DAY_MS) });
      expect(row.sentAt).not.toBeNull();
    }
    expect(runs.reduce((n, r) => n + r.sent, 0)).toBeGreaterThanOrEqual(3);
    // Running again finds nothing more to send for these brews.
    await runDueReminders(h.ctx, new Date());
    await settle();
    for (const s of scenes) expect(mailsTo(s.owner.user.email)).toHaveLength(1);
  });

  it('reminds two days after a reading that was still moving, and not when the brewer already read again', async () => {
    const s = await makeFermentationScene(h, { pitchedDaysAgo: 14.5 });
    const add = (day: number, sg: number) =>
      s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'hydrometer', sg, sampleTempC: 20, takenAt: s.day(day) }).expect(201);
    await add(12, 1.018);
    const moving = await add(14, 1.013);
    expect(moving.body.verdict.state).toBe('moving');
    const recheck = moving.body.reminders.find((r: { kind: string }) => r.kind === 'recheck');
    expect(recheck.dueAt).toBe(s.day(16));

    // Nothing is due yet: the day-12 check is skipped because the brewer is already checking.
    await runDueReminders(h.ctx, new Date());
    await settle();
    expect(mailsTo(s.owner.user.email)).toHaveLength(0);

    const due = new Date(Date.parse(s.day(16)) + 60_000);
    await Promise.all([runDueReminders(h.ctx, due), runDueReminders(second, due)]);
    const mail = await waitForMail(h.smtp, s.owner.user.email);
    expect(mail.subject).toBe('Read the gravity of Scene Pale again');
    expect(mail.text).toMatch(/still moving/);
    await settle();
    expect(mailsTo(s.owner.user.email)).toHaveLength(1);
  });

  it('sends nothing when the brewer has switched reminders off', async () => {
    const s = await makeFermentationScene(h, { pitchedDaysAgo: 12.1 });
    const off = await s.owner.agent.put('/api/fermentation/settings').send({ remindersEnabled: false });
    expect(off.status).toBe(200);
    expect((await s.owner.agent.get('/api/fermentation/settings')).body).toEqual({ remindersEnabled: false });
    await runDueReminders(h.ctx, new Date());
    await settle();
    expect(mailsTo(s.owner.user.email)).toHaveLength(0);
    const [row] = await h.ctx.db.select().from(fermentationReminders).where(eq(fermentationReminders.brewId, s.brewId));
    expect(row).toMatchObject({ outcome: 'skipped', outcomeNote: 'reminders switched off' });
    const bad = await s.owner.agent.put('/api/fermentation/settings').send({ remindersEnabled: 'maybe' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.remindersEnabled).toBe('Reminders are on or off.');
  });
});
