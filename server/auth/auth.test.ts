import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { makeUser } from '../db/factories';
import { createHarness, type TestHarness } from '../../tests/support/api';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const unique = () => `signup-${Math.random().toString(36).slice(2, 10)}@example.org`;

describe('POST /api/auth/signup', () => {
  it('creates an account, sets an httpOnly SameSite cookie and returns the user', async () => {
    const email = unique();
    const res = await request(h.app).post('/api/auth/signup').send({ email, password: 'a-long-password', displayName: 'Mara Quill' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, displayName: 'Mara Quill', unitSystem: 'metric', gravityUnit: 'sg', siteRole: 'user', clubs: [] });
    expect(res.body).not.toHaveProperty('passwordHash');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/wortwise_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('refuses a duplicate e-mail with 409, whatever its case', async () => {
    const email = unique();
    await request(h.app).post('/api/auth/signup').send({ email, password: 'a-long-password', displayName: 'A' }).expect(201);
    const res = await request(h.app).post('/api/auth/signup').send({ email: email.toUpperCase(), password: 'a-long-password', displayName: 'B' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/already exists/);
  });

  it('answers 400 with a message per field', async () => {
    const res = await request(h.app).post('/api/auth/signup').send({ email: 'not-an-email', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({
      email: 'Enter a valid e-mail address.',
      password: 'Use at least 10 characters.',
      displayName: 'Tell us what to call you.',
    });
  });
});

describe('POST /api/auth/login', () => {
  it('signs in, and /me returns the user with the cookie', async () => {
    const user = await makeUser(h.ctx.db, { displayName: 'Odile Marsh' });
    const agent = await h.signIn(user.email);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ id: user.id, displayName: 'Odile Marsh' });
  });

  it('gives the same 401 for a wrong password and an unknown e-mail', async () => {
    const user = await makeUser(h.ctx.db);
    const wrong = await request(h.app).post('/api/auth/login').send({ email: user.email, password: 'not the password' });
    const unknown = await request(h.app).post('/api/auth/login').send({ email: unique(), password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('is rate-limited', async () => {
    const limited = await createHarness({ AUTH_RATE_LIMIT_MAX: '3' });
    const statuses = [];
    for (let i = 0; i < 4; i++) {
      statuses.push((await request(limited.app).post('/api/auth/login').send({ email: unique(), password: 'x' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
  });
});

describe('sign out and /me', () => {
  it('clears the cookie; /me is then 401', async () => {
    const user = await makeUser(h.ctx.db);
    const agent = await h.signIn(user.email);
    await agent.post('/api/auth/logout').expect(204);
    await agent.get('/api/auth/me').expect(401);
  });

  it('rejects a forged token', async () => {
    const res = await request(h.app).get('/api/auth/me').set('Cookie', 'wortwise_session=eyJhbGciOiJIUzI1NiJ9.eyJzdWIiOiIxIn0.bad');
    expect(res.status).toBe(401);
  });

  it('saves unit preferences', async () => {
    const user = await makeUser(h.ctx.db);
    const agent = await h.signIn(user.email);
    const res = await agent.patch('/api/auth/me').send({ unitSystem: 'us', gravityUnit: 'plato' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ unitSystem: 'us', gravityUnit: 'plato' });
    const bad = await agent.patch('/api/auth/me').send({ unitSystem: 'imperial' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.unitSystem).toBe('Choose metric or US units.');
    expect(res.body.gallonUnit).toBe('us');
    const imperial = await agent.patch('/api/auth/me').send({ gallonUnit: 'imperial' });
    expect(imperial.status).toBe(200);
    expect(imperial.body).toMatchObject({ unitSystem: 'us', gallonUnit: 'imperial' });
    const badGallon = await agent.patch('/api/auth/me').send({ gallonUnit: 'quart' });
    expect(badGallon.status).toBe(400);
    expect(badGallon.body.fields.gallonUnit).toBe('Choose US gallons (3.785 L) or imperial gallons (4.546 L).');
    expect((await agent.get('/api/auth/me')).body.gallonUnit).toBe('imperial');
  });
});
