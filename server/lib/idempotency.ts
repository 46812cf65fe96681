/**
 * `Idempotency-Key` on creates (every POST of a signed-in user): the first request with a key
 * runs and its answer (status and JSON body) is kept in MariaDB for a day; the same key from the
 * same user gets that answer again and nothing new is stored. A second request arriving while
 * the first still runs waits for it. Answers of 5xx and 429 are not kept, so a retry after an
 * outage runs again. See docs/decisions/0012-writes-under-concurrency-and-outages.md.
 */
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { and, eq, lt } from 'drizzle-orm';
import type { Db } from '../db/client';
import { idempotencyKeys } from '../db/schema';
import { isDuplicateKey } from './db-errors';
import { BadRequest, HttpError } from './errors';

export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
const WAIT_FOR_FIRST_MS = 10_000;
const KEY_PATTERN = /^[\x21-\x7e]{1,200}$/;

class KeyReused extends HttpError {
  constructor() {
    super(422, 'idempotency_key_reused', 'This Idempotency-Key was already used for a different request. Use a new key for each new thing you save.');
  }
}

class StillRunning extends HttpError {
  constructor() {
    super(409, 'idempotency_in_progress', 'The first request with this Idempotency-Key is still being saved. Try again in a moment.');
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** The row of one brewer's key (keys are per user). */
const keyOf = (userId: number, key: string) => and(eq(idempotencyKeys.userId, userId), eq(idempotencyKeys.key, key));

async function findKey(db: Db, userId: number, key: string) {
  const [row] = await db.select().from(idempotencyKeys).where(keyOf(userId, key));
  return row ?? null;
}

export function idempotency(db: Db): RequestHandler {
  // Most requests carry no key: they pass straight on, without an async step.
  return (req: Request, res: Response, next: NextFunction) => {
    const key = req.get('Idempotency-Key');
    if (req.method !== 'POST' || key === undefined || !req.user) return next();
    return claimKey(db, key, req.user.id, req, res, next);
  };
}

/** Claims `key` for this request (or answers with what the first request with it got). */
async function claimKey(db: Db, key: string, userId: number, req: Request, res: Response, next: NextFunction) {
  if (!KEY_PATTERN.test(key)) throw new BadRequest('The Idempotency-Key header must be 1 to 200 visible ASCII characters.');
  const request = `${req.method} ${req.originalUrl.split('?')[0]}`.slice(0, 300);
  const now = new Date();

  for (const deadline = Date.now() + WAIT_FOR_FIRST_MS; ; ) {
    const row = await findKey(db, userId, key);
    if (row && row.expiresAt.getTime() <= now.getTime()) {
      await db.delete(idempotencyKeys).where(eq(idempotencyKeys.id, row.id));
      continue;
    }
    if (row) {
      if (row.request !== request) throw new KeyReused();
      if (row.status !== null) {
        res.set('Idempotent-Replayed', 'true');
        if (row.status === 204 || row.body === null) res.status(row.status).end();
        else res.status(row.status).json(row.body);
        return;
      }
      if (Date.now() > deadline) throw new StillRunning();
      await sleep(100);
      continue;
    }
    try {
      await db.insert(idempotencyKeys).values({ userId, key, request, expiresAt: new Date(now.getTime() + IDEMPOTENCY_TTL_MS) });
      break;
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      // Another request with the key claimed it a moment ago: wait for its answer.
    }
  }
  // Now and then, drop expired keys (any instance may do it).
  if (Math.random() < 0.01) void db.delete(idempotencyKeys).where(lt(idempotencyKeys.expiresAt, now)).catch(() => {});

  let settled = false;
  const thisKey = keyOf(userId, key);
  const forget = () => db.delete(idempotencyKeys).where(thisKey);
  const keep = (status: number) => status < 500 && status !== 429;
  // The answer is stored before it is sent, so a retry never finds the key without it.
  const send = res.json.bind(res);
  res.json = (body: unknown) => {
    if (settled) return send(body);
    settled = true;
    const status = res.statusCode;
    const store = keep(status)
      ? db.update(idempotencyKeys).set({ status, body: body ?? null }).where(thisKey)
      : forget();
    store.then(
      () => send(body),
      () => send(body),
    );
    return res;
  };
  res.on('finish', () => {
    if (settled) return;
    settled = true;
    // Answered without JSON (204 and the like): keep the status, or free the key for a retry.
    const status = res.statusCode;
    void (keep(status) ? db.update(idempotencyKeys).set({ status, body: null }).where(thisKey) : forget()).catch(() => {});
  });
  res.on('close', () => {
    if (!settled) {
      settled = true;
      void forget().catch(() => {});
    }
  });
  next();
}
