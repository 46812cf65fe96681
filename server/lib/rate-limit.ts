/**
 * Every rate limit of the API, built once from configuration. The counts live in memory (one
 * process, the `npm start` default) or, when `REDIS_URL` is set, in Redis through
 * `rate-limit-redis`, so every instance behind a load balancer counts against the same limit
 * (docs/deploy.md). If Redis goes away the requests pass uncounted rather than fail: a few
 * minutes without a limit is better than a site that answers 500.
 */
import type { RequestHandler } from 'express';
import { rateLimit, type Logger, type Options } from 'express-rate-limit';
import { Redis } from 'ioredis';
import { RedisStore, type RedisReply } from 'rate-limit-redis';
import type { Env } from '../env';

const minute = 60 * 1000;
const tooManyAttempts = 'Too many attempts. Please wait a few minutes and try again.';

/** Each limit: its window, its size from configuration, whom it counts and what it says. */
const limitSpecs = {
  /** Sign-up and sign-in share one count per address. */
  auth: { windowMs: 15 * minute, limit: (env: Env) => env.AUTH_RATE_LIMIT_MAX, message: tooManyAttempts },
  /** Accepting an invitation can create an account, so it is limited like sign-up. */
  invitationAccept: { windowMs: 15 * minute, limit: (env: Env) => env.AUTH_RATE_LIMIT_MAX, message: tooManyAttempts },
  /** Asking for, checking and using a reset link; the per-account cap on mails is in MariaDB. */
  passwordReset: { windowMs: 15 * minute, limit: (env: Env) => env.AUTH_RATE_LIMIT_MAX, message: tooManyAttempts },
  /** Keeps one account from turning invitations into a way to mail strangers in bulk. */
  clubInvite: {
    windowMs: 60 * minute,
    limit: (env: Env) => env.AUTH_RATE_LIMIT_MAX * 5,
    perUser: true,
    message: 'That is a lot of invitations in one hour. Please wait a while and try again.',
  },
  /** The public calculators: no account needed, nothing stored. */
  calc: {
    windowMs: minute,
    limit: (env: Env) => env.CALC_RATE_LIMIT_MAX,
    message: 'Too many calculations in a minute. Please wait a moment and try again.',
  },
} satisfies Record<string, { windowMs: number; limit: (env: Env) => number; perUser?: boolean; message: string }>;

export type RateLimitName = keyof typeof limitSpecs;
export type RateLimits = Record<RateLimitName, RequestHandler>;

/** A store error (Redis down) is worth one line, not a stack trace per request. */
const quietLogger: Logger = {
  warn: (error: unknown) => console.warn(`[rate-limit] ${String(error)}`),
  error: (error: unknown, message?: string) => console.warn(`[rate-limit] ${message ?? 'store error'}: ${error instanceof Error ? error.message : String(error)}`),
};

/** Connects to Redis and waits until it answers: a configured but unreachable Redis fails start-up. */
export async function connectRedis(url: string): Promise<Redis> {
  const client = new Redis(url, {
    lazyConnect: true,
    // While Redis is away, commands fail at once (the request passes uncounted) instead of queueing.
    enableOfflineQueue: false,
    maxRetriesPerRequest: 1,
    commandTimeout: 1000,
    connectTimeout: 2000,
    retryStrategy: (attempt) => Math.min(attempt * 200, 2000),
  });
  let down = false;
  client.on('error', (error: Error) => {
    if (down) return;
    down = true;
    console.warn(`[rate-limit] Redis unreachable (${error.message}); requests pass uncounted until it is back`);
  });
  client.on('ready', () => {
    if (down) console.warn('[rate-limit] Redis is back');
    down = false;
  });
  await client.connect();
  return client;
}

/** Builds every limit once; given a Redis client, their counts are shared through it. */
export function createRateLimits(env: Env, redis?: Redis | null): RateLimits {
  const build = (name: RateLimitName): RequestHandler => {
    const spec: (typeof limitSpecs)[RateLimitName] = limitSpecs[name];
    const options: Partial<Options> = {
      windowMs: spec.windowMs,
      limit: spec.limit(env),
      // `RateLimit` and `RateLimit-Policy` as the IETF draft 7 words them; draft 8 adds a partition key
      // that costs a SHA-256 of the client's key on every request (issue 14: per-request cost).
      standardHeaders: 'draft-7',
      legacyHeaders: false,
      message: { error: 'rate_limited', message: spec.message },
      passOnStoreError: true,
      logger: quietLogger,
    };
    if ('perUser' in spec && spec.perUser) options.keyGenerator = (req) => `user:${req.user?.id ?? 0}`;
    if (redis) {
      options.store = new RedisStore({
        prefix: `wortwise:rl:${name}:`,
        sendCommand: (command: string, ...args: string[]) => redis.call(command, ...args) as Promise<RedisReply>,
      });
    }
    return rateLimit(options);
  };
  return Object.fromEntries((Object.keys(limitSpecs) as RateLimitName[]).map((name) => [name, build(name)])) as RateLimits;
}
