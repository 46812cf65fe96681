import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Redis } from 'ioredis';
import { startRedis, type RunningRedis } from '../../scripts/lib/redis';
import { createApp } from '../app';
import type { AppContext } from '../context';
import { createDb } from '../db/client';
import { loadEnv } from '../env';
import { createMailer } from '../mail/mailer';
import { connectRedis } from './rate-limit';

/**
 * Two API instances in front of one real redis-server (Debian's, installed when missing, on a
 * free port): the calculator limit of 3 a minute holds for both together, not 3 each.
 */
let redis: RunningRedis;
const clients: Redis[] = [];
const pools: AppContext['pool'][] = [];

async function instance(withRedis: boolean) {
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: inject('databaseUrl'),
    CALC_RATE_LIMIT_MAX: '3',
    ...(withRedis ? { REDIS_URL: redis.url } : {}),
  });
  const client = withRedis ? await connectRedis(redis.url) : null;
  if (client) clients.push(client);
  const { db, pool } = createDb(env.DATABASE_URL);
  pools.push(pool);
  return createApp({ env, db, pool, mailer: createMailer(env), redis: client });
}

/** Any body: a refused calculation (400) counts against the limit like an answered one. */
const calc = (app: Awaited<ReturnType<typeof instance>>) => request(app).post('/api/calc/boil-correction').send({}).then((r) => r.status);

beforeAll(async () => {
  redis = await startRedis();
});
afterAll(async () => {
  for (const c of clients) c.disconnect();
  for (const p of pools) await p.end();
  await redis.stop();
});

describe('rate limits shared through Redis', () => {
  it('counts requests to two instances against one limit', async () => {
    const [a, b] = [await instance(true), await instance(true)];
    expect(await calc(a)).toBe(400);
    expect(await calc(b)).toBe(400);
    expect(await calc(a)).toBe(400);
    // The fourth request in the minute, whichever instance it reaches, is refused.
    expect(await calc(b)).toBe(429);
    const refused = await request(a).post('/api/calc/boil-correction').send({});
    expect(refused.status).toBe(429);
    expect(refused.body.error).toBe('rate_limited');
  });

  it('counts per instance without Redis (the single-machine default)', async () => {
    const [a, b] = [await instance(false), await instance(false)];
    for (let i = 0; i < 3; i++) expect(await calc(a)).toBe(400);
    expect(await calc(a)).toBe(429);
    // The other process has its own count: proof that the first test's 429 came through Redis.
    expect(await calc(b)).toBe(400);
  });

  it('lets requests pass, never a 500, while Redis is down', async () => {
    const app = await instance(true);
    await redis.stop();
    expect(await calc(app)).toBe(400);
    expect(await calc(app)).toBe(400);
  });
});
