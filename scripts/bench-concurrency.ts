/**
 * `npm run bench:concurrency`: many brewers' writes at once against a real server and MariaDB,
 * printing requests, errors and acknowledged-but-missing counts (a write answered 201 that is
 * not in the database afterwards). Starts its own server on a free port against its own
 * database on the shared MariaDB, and removes both when done.
 *
 *   BENCH_REQUESTS=600 BENCH_CONCURRENCY=30 npm run bench:concurrency
 */
import { randomUUID } from 'node:crypto';
import { inArray } from 'drizzle-orm';
import { recipeInputSchema } from '../shared/schemas/recipes';
import { loadSessionUser } from '../server/auth/session';
import { testRecipe } from '../server/brews/test-scene';
import { createDb } from '../server/db/client';
import { makeUser } from '../server/db/factories';
import { migrateDatabase } from '../server/db/migrate';
import { brewNotes, brewReadings } from '../server/db/schema';
import { loadEnv } from '../server/env';
import { startServer } from '../server/index';
import { createRecipe } from '../server/recipes/service';
import { databaseUrl, ensureDatabase, ensureMariadb } from './lib/mariadb';

const total = Number(process.env.BENCH_REQUESTS ?? 400);
const concurrency = Number(process.env.BENCH_CONCURRENCY ?? 25);
const retryShare = 0.15; // this share of creates is sent a second time with the same Idempotency-Key

const mariadb = await ensureMariadb();
const name = `wortwise_bench_${process.pid}`;
const url = databaseUrl(name, mariadb.port);
await ensureDatabase(url, { fresh: true });
await migrateDatabase(url);
const server = await startServer(loadEnv({ NODE_ENV: 'test', PORT: '0', DATABASE_URL: url, AUTH_RATE_LIMIT_MAX: '100000', CALC_RATE_LIMIT_MAX: '100000' }));
const base = `http://127.0.0.1:${server.port}`;
const { db, pool } = createDb(url);

try {
  // Three brewers, two brew days each: most writes land on the same few rows, as on a club brew day.
  const brewers = await Promise.all([0, 1, 2].map(() => makeUser(db)));
  const scenes: { cookie: string; brewId: number }[] = [];
  for (const brewer of brewers) {
    const actor = (await loadSessionUser(db, brewer.id))!;
    const recipeId = await createRecipe(db, actor, recipeInputSchema.parse(testRecipe));
    const login = await fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: brewer.email, password: brewer.password }) });
    const cookie = (login.headers.get('set-cookie') ?? '').split(';')[0];
    for (let i = 0; i < 2; i++) {
      const res = await fetch(`${base}/api/brews`, { method: 'POST', headers: { 'Content-Type': 'application/json', Cookie: cookie }, body: JSON.stringify({ recipeId }) });
      scenes.push({ cookie, brewId: ((await res.json()) as { id: number }).id });
    }
  }

  const statuses = new Map<number | string, number>();
  const acknowledged = { readings: new Set<number>(), notes: new Set<number>() };
  let requests = 0;
  let errors = 0;
  let replayMismatch = 0;

  async function send(path: string, cookie: string, body: unknown, key: string) {
    requests++;
    try {
      const res = await fetch(`${base}${path}`, { method: 'POST', headers: { 'Content-Type': 'application/json', Cookie: cookie, 'Idempotency-Key': key }, body: JSON.stringify(body) });
      statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
      if (res.status >= 500) errors++;
      return { status: res.status, body: (await res.json().catch(() => null)) as { id?: number } | null };
    } catch (error) {
      errors++;
      statuses.set((error as Error).name, (statuses.get((error as Error).name) ?? 0) + 1);
      return null;
    }
  }

  async function one(i: number) {
    const scene = scenes[i % scenes.length];
    const key = randomUUID();
    const isNote = i % 5 === 4;
    const path = isNote ? `/api/brews/${scene.brewId}/notes` : `/api/brews/${scene.brewId}/readings`;
    const body = isNote ? { body: `Note ${i}`, stage: null } : i % 2 ? { kind: 'mash_temp', tempC: 60 + (i % 10) } : { kind: 'og', sg: 1.04 + (i % 20) / 1000, sampleTempC: 20 };
    const first = await send(path, scene.cookie, body, key);
    if (first?.status === 201 && first.body?.id) (isNote ? acknowledged.notes : acknowledged.readings).add(first.body.id);
    if (Math.random() < retryShare) {
      const again = await send(path, scene.cookie, body, key);
      if (first?.status === 201 && again && again.body?.id !== first.body?.id) replayMismatch++;
    }
  }

  const started = performance.now();
  let next = 0;
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (next < total) await one(next++);
    }),
  );
  const seconds = (performance.now() - started) / 1000;

  const brewIds = scenes.map((s) => s.brewId);
  const storedReadings = new Set((await db.select({ id: brewReadings.id }).from(brewReadings).where(inArray(brewReadings.brewId, brewIds))).map((r) => r.id));
  const storedNotes = new Set((await db.select({ id: brewNotes.id }).from(brewNotes).where(inArray(brewNotes.brewId, brewIds))).map((r) => r.id));
  const missing = [...acknowledged.readings].filter((id) => !storedReadings.has(id)).length + [...acknowledged.notes].filter((id) => !storedNotes.has(id)).length;
  const duplicates = storedReadings.size - acknowledged.readings.size + (storedNotes.size - acknowledged.notes.size);

  console.log(`concurrency bench: ${total} creates (${Math.round(retryShare * 100)} % retried with the same Idempotency-Key), ${concurrency} at a time, on ${scenes.length} brew days`);
  console.log(`  requests sent:                 ${requests} in ${seconds.toFixed(1)} s (${(requests / seconds).toFixed(0)}/s)`);
  console.log(`  answers:                       ${[...statuses].map(([s, n]) => `${s}×${n}`).join(', ')}`);
  console.log(`  errors (5xx or no answer):     ${errors}`);
  console.log(`  acknowledged:                  ${acknowledged.readings.size + acknowledged.notes.size}`);
  console.log(`  acknowledged but missing:      ${missing}`);
  console.log(`  stored but never acknowledged: ${duplicates}`);
  console.log(`  retries answered differently:  ${replayMismatch}`);
  process.exitCode = errors > 0 || missing > 0 || duplicates !== 0 || replayMismatch > 0 ? 1 : 0;
} finally {
  await pool.end();
  await server.stop();
  const mysql = await import('mysql2/promise');
  const conn = await mysql.createConnection(databaseUrl('', mariadb.port));
  await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await conn.end();
  await mariadb.stop();
}
