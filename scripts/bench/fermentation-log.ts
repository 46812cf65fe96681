/**
 * `npx tsx scripts/bench/fermentation-log.ts`: what opening a fermentation log costs with 10
 * readings and with 2,000 (a logger every 15 minutes for three weeks, a hydrometer reading a day):
 * median milliseconds of sequential GETs, statements per request and bytes per answer, in-process
 * through supertest on its own database. Prints figures, never a pass/fail test.
 */
import request from 'supertest';
import { DAY_MS } from '@shared/dates';
import { defaultSnapshot } from '@shared/instruments';
import { createApp } from '../../server/app';
import { createDb } from '../../server/db/client';
import { fermentationReadings } from '../../server/db/schema';
import { migrateDatabase } from '../../server/db/migrate';
import { seedDemo } from '../../server/db/seed';
import '../../server/demo-seeds';
import { loadEnv } from '../../server/env';
import { dedupeKey } from '../../server/fermentation/readings';
import { createMailer } from '../../server/mail/mailer';
import { databaseUrl, ensureDatabase, ensureMariadb } from '../lib/mariadb';

const SAMPLES = 25;
const STEP_MS = 15 * 60_000;

const mariadb = await ensureMariadb();
const url = databaseUrl(`wortwise_bench_fermlog_${process.pid}`, mariadb.port);
await ensureDatabase(url, { fresh: true });
await migrateDatabase(url);
let statements = 0;
const { db, pool } = createDb(url, { logger: { logQuery: () => void statements++ } });
try {
  await seedDemo(db);
  const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: url, AUTH_RATE_LIMIT_MAX: '100000', CALC_RATE_LIMIT_MAX: '100000' });
  const agent = request.agent(createApp({ env, db, pool, mailer: createMailer(env) }));
  await agent.post('/api/auth/login').send({ email: 'priya@hollow-oak.example', password: 'wortwise-demo' }).expect(200);
  const recipeId = (await agent.get('/api/recipes').expect(200)).body.items[0].id as number;

  /** A brew day pitched 30 days ago with `n` readings: temperatures every 15 minutes, a gravity reading every 96th. */
  async function brewWith(n: number) {
    const brewId = (await agent.post('/api/brews').send({ recipeId }).expect(201)).body.id as number;
    const pitchedAt = new Date(Math.floor((Date.now() - 30 * DAY_MS) / 1000) * 1000);
    await agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true }).expect(201);
    const rows = Array.from({ length: n }, (_, i) => {
      const takenAt = new Date(pitchedAt.getTime() + (i + 1) * STEP_MS);
      const gravity = i % 96 === 95;
      const value = gravity ? 1.05 - Math.min(0.038, i / 96 / 300) : 18 + (i % 7) / 2;
      const method = gravity ? ('hydrometer' as const) : ('thermometer' as const);
      return {
        brewId,
        kind: gravity ? ('gravity' as const) : ('temperature' as const),
        method,
        instrumentSnapshot: defaultSnapshot(method),
        raw: gravity ? { method: 'hydrometer' as const, sg: value, sampleTempC: 20 } : { method: 'thermometer' as const, tempC: value },
        correctedValue: value,
        correction: null,
        warnings: [],
        takenAt,
        source: 'csv' as const,
        dedupeKey: dedupeKey(brewId, takenAt, method, value),
      };
    });
    for (let i = 0; i < rows.length; i += 500) await db.insert(fermentationReadings).values(rows.slice(i, i + 500));
    return brewId;
  }

  async function measure(brewId: number) {
    const path = `/api/brews/${brewId}/fermentation`;
    for (let i = 0; i < 3; i++) await agent.get(path).expect(200);
    statements = 0;
    const bytes = Buffer.byteLength((await agent.get(path).expect(200)).text);
    const perRequest = statements;
    const times: number[] = [];
    for (let i = 0; i < SAMPLES; i++) {
      const t = performance.now();
      await agent.get(path).expect(200);
      times.push(performance.now() - t);
    }
    times.sort((a, b) => a - b);
    return { median: times[Math.floor(times.length / 2)], statements: perRequest, bytes };
  }

  const small = await measure(await brewWith(10));
  const large = await measure(await brewWith(2000));
  const row = (label: string, m: typeof small) =>
    console.log(`${label.padEnd(34)} ${m.median.toFixed(1).padStart(7)} ms median  ${String(m.statements).padStart(3)} statements  ${m.bytes.toLocaleString('en').padStart(11)} bytes`);
  console.log(`GET /api/brews/:id/fermentation, ${SAMPLES} sequential requests each`);
  row('10 readings', small);
  row('2,000 readings', large);
  console.log(`growth ${(large.median / small.median).toFixed(2)}× (target ≤ 2×)`);
} finally {
  await pool.query(`DROP DATABASE \`${new URL(url).pathname.slice(1)}\``);
  await pool.end();
  await mariadb.stop();
}
