import { eq } from 'drizzle-orm';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { passwordResetRequestedMessage } from '@shared/schemas/password-reset';
import { makeUser } from '../db/factories';
import { passwordResetTokens, users } from '../db/schema';
import { hashLinkToken } from '../lib/tokens';
import { linkToken } from '../clubs/test-scene';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const unique = (what: string) => `${what}-${Math.random().toString(36).slice(2, 10)}@example.org`;

async function askForLink(email: string) {
  const res = await request(h.app).post('/api/auth/password-reset').send({ email });
  expect(res.status).toBe(202);
  const mail = await waitForMail(h.smtp, email);
  return { mail, token: linkToken(mail.text, 'reset-password') };
}

async function tokenRow(token: string) {
  const [row] = await h.ctx.db.select().from(passwordResetTokens).where(eq(passwordResetTokens.tokenHash, hashLinkToken(token)));
  return row;
}

describe('POST /api/auth/password-reset', () => {
  it('answers the same whether or not the address has an account, and mails only a real one', async () => {
    const user = await makeUser(h.ctx.db, { email: unique('known'), displayName: 'Kit Ashdown' });
    const known = await request(h.app).post('/api/auth/password-reset').send({ email: user.email.toUpperCase() });
    const nobody = unique('nobody');
    const unknown = await request(h.app).post('/api/auth/password-reset').send({ email: nobody });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    expect(known.body.message).toBe(passwordResetRequestedMessage);

    const mail = await waitForMail(h.smtp, user.email);
    expect(mail.subject).toBe('Choose a new Wortwise password');
    expect(mail.text).toContain('Hello Kit Ashdown,');
    expect(mail.text).toContain(`${h.ctx.env.APP_URL}/reset-password/`);
    expect(mail.text).toContain('for 60 minutes');
    const row = await tokenRow(linkToken(mail.text, 'reset-password'));
    // One hour, allowing a few seconds for the request (whole-second timestamps).
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeGreaterThanOrEqual(3600_000 - 2_000);
    expect(row.expiresAt.getTime() - row.createdAt.getTime()).toBeLessThanOrEqual(3600_000 + 2_000);
    await new Promise((r) => setTimeout(r, 300));
    expect(h.smtp.messages.some((m) => m.to.includes(nobody))).toBe(false);
  });

  it('sends at most three links an hour to one account, answering the same each time', async () => {
    const user = await makeUser(h.ctx.db, { email: unique('eager') });
    for (let i = 0; i < 5; i++) await request(h.app).post('/api/auth/password-reset').send({ email: user.email }).expect(202);
    await new Promise((r) => setTimeout(r, 500));
    expect(h.smtp.messages.filter((m) => m.to.includes(user.email))).toHaveLength(3);
    expect(await h.ctx.db.select().from(passwordResetTokens).where(eq(passwordResetTokens.userId, user.id))).toHaveLength(3);
  });

  it('answers 400 for a malformed address', async () => {
    const res = await request(h.app).post('/api/auth/password-reset').send({ email: 'nope' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ email: 'Enter a valid e-mail address.' });
  });

  it('is rate-limited per client', async () => {
    const limited = await createHarness({ AUTH_RATE_LIMIT_MAX: '2' });
    const statuses = [];
    for (let i = 0; i < 3; i++) statuses.push((await request(limited.app).post('/api/auth/password-reset').send({ email: unique('x') })).status);
    expect(statuses).toEqual([202, 202, 429]);
  });
});

describe('POST /api/auth/password-reset/:token', () => {
  it('sets the new password, signs out every other session, signs this one in, and works once', async () => {
    const user = await makeUser(h.ctx.db, { email: unique('forgetful') });
    const elsewhere = await h.signIn(user.email);
    const { token } = await askForLink(user.email);
    expect((await request(h.app).get(`/api/auth/password-reset/${token}`)).status).toBe(200);

    const here = request.agent(h.app);
    const res = await here.post(`/api/auth/password-reset/${token}`).send({ password: 'a-brand-new-password' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: user.id, email: user.email });
    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    const [row] = await h.ctx.db.select({ tv: users.tokenVersion }).from(users).where(eq(users.id, user.id));
    expect(row.tv).toBe(1);
    await request(h.app).post('/api/auth/login').send({ email: user.email, password: user.password }).expect(401);
    await request(h.app).post('/api/auth/login').send({ email: user.email, password: 'a-brand-new-password' }).expect(200);
    expect((await tokenRow(token)).usedAt).not.toBeNull();

    const again = await request(h.app).post(`/api/auth/password-reset/${token}`).send({ password: 'yet-another-password' });
    expect(again.status).toBe(410);
    expect(again.body.message).toBe('This reset link has already been used. Ask for a new one if you still need to change your password.');
    await request(h.app).post('/api/auth/login').send({ email: user.email, password: 'a-brand-new-password' }).expect(200);
  });

  it('uses up the account’s other outstanding links too', async () => {
    const user = await makeUser(h.ctx.db, { email: unique('twice') });
    const first = await askForLink(user.email);
    await request(h.app).post('/api/auth/password-reset').send({ email: user.email }).expect(202);
    await new Promise((r) => setTimeout(r, 300));
    const second = linkToken((await waitForMail(h.smtp, user.email)).text, 'reset-password');
    expect(second).not.toBe(first.token);
    await request(h.app).post(`/api/auth/password-reset/${second}`).send({ password: 'a-brand-new-password' }).expect(200);
    expect((await request(h.app).post(`/api/auth/password-reset/${first.token}`).send({ password: 'sneaky-other-password' })).status).toBe(410);
  });

  it('refuses an expired link with 410 and leaves the password alone', async () => {
    const user = await makeUser(h.ctx.db, { email: unique('slow') });
    const { token } = await askForLink(user.email);
    // Expiry set in the past directly in the database.
    await h.ctx.db.update(passwordResetTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(passwordResetTokens.tokenHash, hashLinkToken(token)));
    const check = await request(h.app).get(`/api/auth/password-reset/${token}`);
    expect(check.status).toBe(410);
    const res = await request(h.app).post(`/api/auth/password-reset/${token}`).send({ password: 'a-brand-new-password' });
    expect(res.status).toBe(410);
    expect(res.body.message).toBe('This reset link has expired: links work for 60 minutes. Ask for a new one.');
    await request(h.app).post('/api/auth/login').send({ email: user.email, password: user.password }).expect(200);
    expect((await tokenRow(token)).usedAt).toBeNull();
  });

  it('answers 404 for an unknown link and 400 for a short password, changing nothing', async () => {
    const unknown = await request(h.app).post('/api/auth/password-reset/never-issued').send({ password: 'a-brand-new-password' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.message).toBe('This reset link is not valid. Check that the whole link was copied from the e-mail.');

    const user = await makeUser(h.ctx.db, { email: unique('short') });
    const { token } = await askForLink(user.email);
    const short = await request(h.app).post(`/api/auth/password-reset/${token}`).send({ password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.fields).toEqual({ password: 'Use at least 10 characters.' });
    expect((await tokenRow(token)).usedAt).toBeNull();
  });
});
