import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { makeUser } from '../db/factories';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { SESSION_COOKIE } from './session';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function signInCookie(email: string, password: string) {
  const res = await request(h.app).post('/api/auth/login').send({ email, password }).expect(200);
  const cookie = String(res.headers['set-cookie']).split(';')[0];
  expect(cookie.startsWith(`${SESSION_COOKIE}=`)).toBe(true);
  return cookie;
}

const me = (cookie: string) => request(h.app).get('/api/auth/me').set('Cookie', cookie);

describe('signing out', () => {
  it('revokes the session: a copy of the cookie taken before signing out no longer works', async () => {
    const user = await makeUser(h.ctx.db);
    const cookie = await signInCookie(user.email, user.password);
    expect((await me(cookie)).status).toBe(200);
    await request(h.app).post('/api/auth/logout').set('Cookie', cookie).expect(204);
    expect((await me(cookie)).status).toBe(401);
  });

  it('signs out only this device, and "sign out everywhere" every device', async () => {
    const user = await makeUser(h.ctx.db);
    const phone = await signInCookie(user.email, user.password);
    const laptop = await signInCookie(user.email, user.password);
    const tablet = await signInCookie(user.email, user.password);
    await request(h.app).post('/api/auth/logout').set('Cookie', phone).expect(204);
    expect((await me(phone)).status).toBe(401);
    expect((await me(laptop)).status).toBe(200);
    await request(h.app).post('/api/auth/logout-everywhere').set('Cookie', laptop).expect(204);
    expect((await me(laptop)).status).toBe(401);
    expect((await me(tablet)).status).toBe(401);
    // Signing in again works.
    expect((await me(await signInCookie(user.email, user.password))).status).toBe(200);
  });

  it('answers 401, not 500, for a validly signed token with a missing or non-numeric subject', async () => {
    const user = await makeUser(h.ctx.db);
    const sign = (payload: object, options: jwt.SignOptions = {}) =>
      `${SESSION_COOKIE}=${jwt.sign(payload, h.ctx.env.JWT_SECRET, { algorithm: 'HS256', expiresIn: '1h', ...options })}`;
    for (const cookie of [
      sign({ tv: 0 }),
      sign({ tv: 0 }, { subject: 'admin' }),
      sign({ tv: 0 }, { subject: '1e3' }),
      sign({ tv: 0 }, { subject: '99999999999999999999' }),
      sign({ tv: 'x' }, { subject: String(user.id) }),
      sign({ tv: 0, sid: { $ne: null } }, { subject: String(user.id) }),
    ]) {
      const res = await me(cookie);
      expect(res.status).toBe(401);
    }
    // The same secret with a proper subject is a session (the test secret is the configured one).
    expect((await me(sign({ tv: 0 }, { subject: String(user.id) }))).status).toBe(200);
  });
});

describe('checking the token (remembered once it passed)', () => {
  afterEach(() => {
    vi.useRealTimers();
  });

  const sign = (payload: object, secret: string, options: jwt.SignOptions = {}) =>
    `${SESSION_COOKIE}=${jwt.sign(payload, secret, { algorithm: 'HS256', expiresIn: '1h', ...options })}`;

  it('still refuses a token once it expires, though it passed before', async () => {
    const user = await makeUser(h.ctx.db);
    const cookie = sign({ tv: 0 }, h.ctx.env.JWT_SECRET, { subject: String(user.id) });
    expect((await me(cookie)).status).toBe(200);
    expect((await me(cookie)).status).toBe(200);
    // Only the clock moves: an hour and a second later the same token is no session.
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 3_601_000 });
    const res = await me(cookie);
    expect(res.status).toBe(401);
    expect(String(res.headers['set-cookie'])).toContain(`${SESSION_COOKIE}=;`);
  });

  it('refuses a token altered after one like it passed, or signed with another secret', async () => {
    const user = await makeUser(h.ctx.db);
    const cookie = sign({ tv: 0 }, h.ctx.env.JWT_SECRET, { subject: String(user.id) });
    expect((await me(cookie)).status).toBe(200);
    const [head, body, signature] = cookie.split('.');
    const otherUser = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(body, 'base64url').toString()), sub: String(user.id + 1) })).toString('base64url');
    expect((await me([head, otherUser, signature].join('.'))).status).toBe(401);
    expect((await me(sign({ tv: 0 }, 'another-secret-of-at-least-thirty-two-chars', { subject: String(user.id) }))).status).toBe(401);
    expect((await me(cookie)).status).toBe(200);
  });
});
