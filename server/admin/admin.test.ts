import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { makeUser } from '../db/factories';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const tag = () => Math.random().toString(36).slice(2, 10);

describe('GET /api/admin/mail', () => {
  it('lists the caught messages, newest first, to a site admin', async () => {
    const admin = await makeUser(h.ctx.db, { siteRole: 'admin' });
    const to = `caught-${tag()}@example.org`;
    await h.ctx.mailer.send({ to, subject: 'First of two', text: 'one' });
    await h.ctx.mailer.send({ to, subject: 'Second of two', text: 'two' });
    await waitForMail(h.smtp, to);
    const agent = await h.signIn(admin.email);
    const res = await agent.get('/api/admin/mail');
    expect(res.status).toBe(200);
    const mine = res.body.filter((m: { to: string[] }) => m.to.includes(to));
    expect(mine.map((m: { subject: string }) => m.subject)).toEqual(['Second of two', 'First of two']);
    expect(mine[0]).toMatchObject({ text: 'two\n', receivedAt: expect.any(String) });
  });

  it('is a 404 for everyone who is not a site admin', async () => {
    const brewer = await makeUser(h.ctx.db);
    const agent = await h.signIn(brewer.email);
    const res = await agent.get('/api/admin/mail');
    expect(res.status).toBe(404);
    expect(res.body.message).toBe('Not found.');
    expect((await request(h.app).get('/api/admin/mail')).status).toBe(404);
  });

  it('is a 404 where no local mail catcher is configured (production)', async () => {
    const app = createApp({ ...h.ctx, env: { ...h.ctx.env, FAKE_SMTP_API_URL: undefined } });
    const admin = await makeUser(h.ctx.db, { siteRole: 'admin' });
    const agent = request.agent(app);
    await agent.post('/api/auth/login').send({ email: admin.email, password: admin.password }).expect(200);
    expect((await agent.get('/api/admin/mail')).status).toBe(404);
  });
});

describe('GET /api/admin/users', () => {
  it('pages through accounts, newest first, with a search', async () => {
    const admin = await makeUser(h.ctx.db, { siteRole: 'admin' });
    const t = tag();
    for (let i = 1; i <= 3; i++) await makeUser(h.ctx.db, { email: `paged-${t}-${i}@example.org`, displayName: `Paged ${i}` });
    const agent = await h.signIn(admin.email);
    const first = await agent.get(`/api/admin/users?q=paged-${t}&pageSize=2`);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    const second = await agent.get(`/api/admin/users?q=paged-${t}&pageSize=2&page=2`);
    const all = [...first.body.items, ...second.body.items];
    expect(all.map((u: { email: string }) => u.email).sort()).toEqual([1, 2, 3].map((i) => `paged-${t}-${i}@example.org`));
    expect(all[0]).toEqual({ id: expect.any(Number), email: expect.any(String), displayName: expect.any(String), siteRole: 'user', clubCount: 0, createdAt: expect.any(String) });
    expect(all[0]).not.toHaveProperty('passwordHash');
    // A LIKE wildcard typed by the admin is matched literally.
    expect((await agent.get('/api/admin/users?q=%25')).body.total).toBe(0);
    expect((await agent.get('/api/admin/users?pageSize=500')).status).toBe(400);
  });

  it('is a 404 for everyone who is not a site admin', async () => {
    const brewer = await makeUser(h.ctx.db);
    expect((await (await h.signIn(brewer.email)).get('/api/admin/users')).status).toBe(404);
    expect((await request(h.app).get('/api/admin/users')).status).toBe(404);
  });
});
