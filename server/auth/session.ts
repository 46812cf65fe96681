import type { CookieOptions, NextFunction, Request, RequestHandler, Response } from 'express';
import jwt from 'jsonwebtoken';
import { LRUCache } from 'lru-cache';
import { createSecretKey, randomBytes, type KeyObject } from 'node:crypto';
import { asc, eq, lt, sql, type SQL } from 'drizzle-orm';
import type { Db, DbOrTx } from '../db/client';
import { prepared } from '../db/prepared';
import { clubMemberships, clubs, revokedSessions, users, type User } from '../db/schema';
import type { Env } from '../env';
import { Unauthorized } from '../lib/errors';
import type { Actor } from './permissions';

export const SESSION_COOKIE = 'wortwise_session';
const SESSION_DAYS = 14;

export interface SessionUser extends Actor {
  email: string;
  displayName: string;
  unitSystem: User['unitSystem'];
  gravityUnit: User['gravityUnit'];
  colourScale: User['colourScale'];
  gallonUnit: User['gallonUnit'];
  clubs: { id: number; name: string; role: Actor['memberships'][number]['role'] }[];
}

declare module 'express-serve-static-core' {
  interface Request {
    /** The signed-in user, loaded fresh from the database on each request; null when anonymous. */
    user: SessionUser | null;
  }
}

interface TokenPayload {
  sub?: unknown;
  tv?: unknown;
  /** This device's session id: signing out here revokes only it. */
  sid?: unknown;
  exp?: number;
}

declare module 'express-serve-static-core' {
  interface Request {
    /** The signed-in session (id and expiry), for signing out this device. */
    session?: { id: string | null; expiresAt: Date };
  }
}

function cookieOptions(env: Env): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: env.NODE_ENV === 'production',
    path: '/',
    maxAge: SESSION_DAYS * 24 * 60 * 60 * 1000,
  };
}

// One KeyObject per secret, made once: jsonwebtoken given a string tries it as a PEM key first on every call.
const keys = new Map<string, KeyObject>();
function sessionKey(env: Env): KeyObject {
  let key = keys.get(env.JWT_SECRET);
  if (!key) {
    key = createSecretKey(Buffer.from(env.JWT_SECRET, 'utf8'));
    keys.set(env.JWT_SECRET, key);
  }
  return key;
}

export function issueSession(res: Response, env: Env, user: Pick<User, 'id' | 'tokenVersion'>) {
  const token = jwt.sign({ tv: user.tokenVersion, sid: randomBytes(16).toString('base64url') }, sessionKey(env), {
    subject: String(user.id),
    expiresIn: `${SESSION_DAYS}d`,
    algorithm: 'HS256',
  });
  res.cookie(SESSION_COOKIE, token, cookieOptions(env));
}

export function clearSession(res: Response, env: Env) {
  const { maxAge: _maxAge, ...options } = cookieOptions(env);
  res.clearCookie(SESSION_COOKIE, options);
}

/**
 * The user, their clubs and (given a session id) whether that session was signed out, in one
 * query, without the password hash. It runs on every signed-in request, so its SQL is built once
 * (server/db/prepared.ts) rather than per request.
 */
function buildSessionQuery(db: DbOrTx, revoked: SQL<number>) {
  return db
    .select({
      id: users.id,
      email: users.email,
      displayName: users.displayName,
      unitSystem: users.unitSystem,
      gravityUnit: users.gravityUnit,
      colourScale: users.colourScale,
      gallonUnit: users.gallonUnit,
      siteRole: users.siteRole,
      tokenVersion: users.tokenVersion,
      clubId: clubs.id,
      clubName: clubs.name,
      role: clubMemberships.role,
      revoked,
    })
    .from(users)
    .leftJoin(clubMemberships, eq(clubMemberships.userId, users.id))
    .leftJoin(clubs, eq(clubs.id, clubMemberships.clubId))
    .where(eq(users.id, sql.placeholder('userId')))
    .orderBy(asc(clubs.name));
}
const sessionWithId = (db: DbOrTx) =>
  buildSessionQuery(db, sql<number>`exists(select 1 from ${revokedSessions} where ${revokedSessions.sessionId} = ${sql.placeholder('sessionId')})`);
const sessionWithoutId = (db: DbOrTx) => buildSessionQuery(db, sql<number>`0`);

async function loadSessionRows(db: Db, userId: number, sessionId: string | null) {
  return sessionId === null ? prepared(db, sessionWithoutId).execute({ userId }) : prepared(db, sessionWithId).execute({ userId, sessionId });
}

function toSessionUser(rows: Awaited<ReturnType<typeof loadSessionRows>>): SessionUser | null {
  const [user] = rows;
  if (!user) return null;
  const memberRows = rows.filter((r) => r.clubId !== null && r.role !== null);
  const clubList = memberRows.map((r) => ({ id: r.clubId!, name: r.clubName!, role: r.role! }));
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    unitSystem: user.unitSystem,
    gravityUnit: user.gravityUnit,
    colourScale: user.colourScale,
    gallonUnit: user.gallonUnit,
    siteRole: user.siteRole,
    clubs: clubList,
    memberships: clubList.map((c) => ({ clubId: c.id, role: c.role })),
  };
}

export async function loadSessionUser(db: Db, userId: number): Promise<SessionUser | null> {
  return toSessionUser(await loadSessionRows(db, userId, null));
}

const SESSION_ID = /^[A-Za-z0-9_-]{22}$/;

/** Far more signed-in devices than one instance serves at once; an evicted token is only checked again. */
const VERIFIED_TOKENS = 10_000;

/**
 * Checks a session token's signature and expiry, remembering the tokens that passed until they
 * expire: the same token text always gives the same answer with the same key, and checking it
 * (decoding, HMAC, claims) cost more than the rest of a signed-in request's own work (issue 14).
 * Only a token that passed is kept, and its expiry is checked again on every use; the database
 * check after it (token version, signed-out session) still runs on every request, so signing out
 * takes effect at once. Null for a token that fails.
 */
function tokenVerifier(env: Env): (token: string) => TokenPayload | null {
  const key = sessionKey(env);
  const passed = new LRUCache<string, TokenPayload>({ max: VERIFIED_TOKENS });
  return (token) => {
    const known = passed.get(token);
    if (known) return typeof known.exp === 'number' && known.exp * 1000 > Date.now() ? known : null;
    let payload: TokenPayload;
    try {
      payload = jwt.verify(token, key, { algorithms: ['HS256'] }) as TokenPayload;
    } catch {
      return null;
    }
    if (typeof payload.exp === 'number') passed.set(token, payload, { ttl: Math.max(1, payload.exp * 1000 - Date.now()) });
    return payload;
  };
}

/**
 * Reads the signed cookie and loads the user. The token carries the id, a version (bumped to
 * sign out everywhere) and a session id (listed when this device signs out), so any instance can
 * serve any request. A token that does not say who it is for is no session at all (401 where
 * one is needed), never a 500.
 */
export function loadUser(db: Db, env: Env): RequestHandler {
  const verify = tokenVerifier(env);
  return async (req: Request, res: Response, next: NextFunction) => {
    req.user = null;
    const token = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string') return next();
    const payload = verify(token);
    if (!payload) {
      clearSession(res, env);
      return next();
    }
    const userId = typeof payload.sub === 'string' && /^[1-9]\d{0,9}$/.test(payload.sub) ? Number(payload.sub) : NaN;
    const sessionId = typeof payload.sid === 'string' && SESSION_ID.test(payload.sid) ? payload.sid : null;
    if (!Number.isSafeInteger(userId) || userId > 2_147_483_647 || typeof payload.tv !== 'number' || (payload.sid !== undefined && sessionId === null)) {
      clearSession(res, env);
      return next();
    }
    const rows = await loadSessionRows(db, userId, sessionId);
    if (rows.length === 0 || rows[0].tokenVersion !== payload.tv || Number(rows[0].revoked) === 1) {
      clearSession(res, env);
      return next();
    }
    req.user = toSessionUser(rows);
    req.session = { id: sessionId, expiresAt: new Date((payload.exp ?? Date.now() / 1000 + SESSION_DAYS * 86_400) * 1000) };
    next();
  };
}

/** Signs out this device: its session id is listed as revoked until the token would have expired. */
export async function revokeSession(db: Db, req: Request) {
  if (!req.user || !req.session) return;
  if (req.session.id) {
    await db.insert(revokedSessions).values({ sessionId: req.session.id, expiresAt: req.session.expiresAt }).onDuplicateKeyUpdate({ set: { expiresAt: req.session.expiresAt } });
  } else {
    // A token from before session ids: only a version bump can revoke it.
    await revokeAllSessions(db, req.user.id);
  }
  // Now and then, forget revocations of tokens that have expired anyway.
  if (Math.random() < 0.02) await db.delete(revokedSessions).where(lt(revokedSessions.expiresAt, new Date()));
}

/** Signs out every device: tokens carry the version they were issued with. */
export async function revokeAllSessions(db: Db, userId: number) {
  await db.update(users).set({ tokenVersion: sql`${users.tokenVersion} + 1` }).where(eq(users.id, userId));
}

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new Unauthorized();
  next();
};

/** For handlers behind requireUser. */
export function currentUser(req: Request): SessionUser {
  if (!req.user) throw new Unauthorized();
  return req.user;
}

export function toMe(user: SessionUser) {
  const { memberships: _memberships, ...me } = user;
  return me;
}
