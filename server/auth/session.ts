import type { CookieOptions, NextFunction, Request, RequestHandler, Response } from 'express';
import jwt from 'jsonwebtoken';
import { eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { clubMemberships, clubs, users, type User } from '../db/schema';
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
  sub: string;
  tv: number;
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

export function issueSession(res: Response, env: Env, user: Pick<User, 'id' | 'tokenVersion'>) {
  const token = jwt.sign({ tv: user.tokenVersion } satisfies Omit<TokenPayload, 'sub'>, env.JWT_SECRET, {
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

export async function loadSessionUser(db: Db, userId: number): Promise<SessionUser | null> {
  const [user] = await db.select().from(users).where(eq(users.id, userId));
  if (!user) return null;
  const rows = await db
    .select({ id: clubs.id, name: clubs.name, role: clubMemberships.role })
    .from(clubMemberships)
    .innerJoin(clubs, eq(clubs.id, clubMemberships.clubId))
    .where(eq(clubMemberships.userId, userId))
    .orderBy(clubs.name);
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    unitSystem: user.unitSystem,
    gravityUnit: user.gravityUnit,
    gallonUnit: user.gallonUnit,
    siteRole: user.siteRole,
    clubs: rows,
    memberships: rows.map((r) => ({ clubId: r.id, role: r.role })),
  };
}

/**
 * Reads the signed cookie and loads the user. The token carries only the id and a version, so
 * the API keeps no session state: any instance can serve any request.
 */
export function loadUser(db: Db, env: Env): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    req.user = null;
    const token = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string') return next();
    let payload: TokenPayload;
    try {
      payload = jwt.verify(token, env.JWT_SECRET, { algorithms: ['HS256'] }) as TokenPayload;
    } catch {
      clearSession(res, env);
      return next();
    }
    const [row] = await db.select({ tv: users.tokenVersion }).from(users).where(eq(users.id, Number(payload.sub)));
    if (!row || row.tv !== payload.tv) {
      clearSession(res, env);
      return next();
    }
    req.user = await loadSessionUser(db, Number(payload.sub));
    next();
  };
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
