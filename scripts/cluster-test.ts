/**
 * `npm run test:cluster`: the scale test, on loopback. Starts the cluster (scripts/lib/cluster.ts),
 * runs a steady, bounded write load through the load balancer (brew-day readings by the demo
 * brewer), then kills one database node, one API instance and Redis in turn, each with SIGKILL,
 * and waits for each to come back. Prints requests, answers by status, retries and the writes that
 * were acknowledged but are missing afterwards. Exits 1 on any 500 or any lost write.
 * Not part of `npm test`: it starts a dozen processes and takes a few minutes.
 */
import { randomUUID } from 'node:crypto';
import { createDb } from '../server/db/client';
import { migrateDatabase } from '../server/db/migrate';
import { seedDemo } from '../server/db/seed';
import '../server/demo-seeds';
import { startFakeSmtp } from '../server/mail/fake-smtp';
import { clusterSize, nodeSynced, portAnswers, ports, startCluster, stopEverything, waitFor, type Supervised } from './lib/cluster';
import { ensureLocalS3 } from './lib/s3';

const workers = Number(process.env.LOAD_WORKERS ?? 4);
/** Pause between one worker's requests: about workers × 1000 / pauseMs requests a second. */
const pauseMs = Number(process.env.LOAD_PAUSE_MS ?? 100);
const settleMs = 8_000;

const s3 = await ensureLocalS3();
const smtp = await startFakeSmtp({ smtpPort: ports.smtp, apiPort: ports.smtpApi });
let cleaned = false;
async function cleanUp() {
  if (cleaned) return;
  cleaned = true;
  await stopEverything();
  await smtp.close();
  await s3.stop();
}
process.once('SIGINT', () => void cleanUp().then(() => process.exit(130)));

const cluster = await startCluster({
  async afterDatabase(url) {
    await migrateDatabase(url);
    const { db, pool } = createDb(url);
    await seedDemo(db);
    await pool.end();
  },
});
const base = cluster.webUrl;

const stats = { requests: 0, byStatus: new Map<string, number>(), retried: 0, gaveUp: 0 };
const count = (key: string) => stats.byStatus.set(key, (stats.byStatus.get(key) ?? 0) + 1);
const acknowledged: { brewId: number; readingId: number }[] = [];

async function call(method: string, path: string, cookie: string, body?: unknown, idempotencyKey?: string): Promise<Response | null> {
  stats.requests += 1;
  try {
    const res = await fetch(`${base}${path}`, {
      method,
      headers: { 'content-type': 'application/json', cookie, ...(idempotencyKey && { 'idempotency-key': idempotencyKey }) },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: AbortSignal.timeout(10_000),
    });
    count(String(res.status));
    return res;
  } catch (error) {
    count(`network: ${(error as Error).name}`);
    return null;
  }
}

/**
 * A write as a careful client sends it: a 502/503 or a dropped connection is tried again, up to 5
 * times, with the same Idempotency-Key, so a retry whose first answer was lost stores nothing new.
 */
async function write(path: string, cookie: string, body: unknown): Promise<Response | null> {
  const key = randomUUID();
  for (let attempt = 0; attempt < 6; attempt++) {
    if (attempt > 0) {
      stats.retried += 1;
      await new Promise((r) => setTimeout(r, 300 * attempt));
    }
    const res = await call('POST', path, cookie, body, key);
    if (res && res.status !== 502 && res.status !== 503 && res.status !== 504) return res;
  }
  stats.gaveUp += 1;
  return null;
}

async function signIn(): Promise<string> {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'priya@hollow-oak.example', password: 'wortwise-demo' }),
  });
  if (!res.ok) throw new Error(`demo sign-in failed: ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

const cookie = await signIn();
const recipes = (await (await fetch(`${base}/api/recipes`, { headers: { cookie } })).json()) as { id: number }[] | { items: { id: number }[] };
const recipeId = (Array.isArray(recipes) ? recipes : recipes.items)[0].id;
const brewIds: number[] = [];
for (let i = 0; i < workers; i++) {
  const res = await write('/api/brews', cookie, { recipeId });
  if (res?.status !== 201) throw new Error(`could not start a brew day: ${res?.status}`);
  brewIds.push(((await res.json()) as { id: number }).id);
}

let running = true;
const failures: string[] = [];
async function worker(brewId: number) {
  let n = 0;
  while (running) {
    n += 1;
    // An OG reading by hydrometer at its calibration temperature: a plain, valid write.
    const res = await write(`/api/brews/${brewId}/readings`, cookie, { kind: 'og', sg: 1.04 + (n % 20) / 1000, sampleTempC: 20 });
    if (res?.status === 201) acknowledged.push({ brewId, readingId: ((await res.json()) as { id: number }).id });
    else if (res && res.status >= 500) failures.push(`${res.status} ${await res.text()}`);
    else if (res) failures.push(`${res.status} ${(await res.text()).slice(0, 200)}`);
    await new Promise((r) => setTimeout(r, pauseMs));
  }
}

const timeline: string[] = [];
const t0 = Date.now();
const mark = (what: string) => {
  const line = `${((Date.now() - t0) / 1000).toFixed(1).padStart(6)} s  ${what}  (requests so far ${stats.requests}, acknowledged ${acknowledged.length})`;
  timeline.push(line);
  console.log(`[test:cluster] ${line}`);
};

async function faultAndRecover(target: Supervised, recovered: () => Promise<boolean>) {
  const restartsBefore = target.restarts;
  mark(`kill -9 ${target.name} (pid ${target.pid})`);
  target.kill('SIGKILL');
  await waitFor(`${target.name} to come back`, async () => target.restarts > restartsBefore && (await recovered()), 240_000);
  mark(`${target.name} is back`);
  await new Promise((r) => setTimeout(r, settleMs));
}

const load = brewIds.map((id) => worker(id));
let exitCode = 0;
try {
  mark('load running');
  await new Promise((r) => setTimeout(r, settleMs));
  // node1 is the one HAProxy sends writes to; losing it moves them to the next node.
  await faultAndRecover(cluster.nodes[0], async () => (await nodeSynced(0)) && (await clusterSize(0)) === 3);
  await faultAndRecover(cluster.apps[0], async () => (await fetch(`http://127.0.0.1:${ports.apps[0]}/api/health`)).ok);
  await faultAndRecover(cluster.redis, () => portAnswers(ports.redis));
  running = false;
  await Promise.all(load);
  mark('load stopped');

  // Every acknowledged reading must be there, read back through the balancer and from each node.
  const present = new Set<number>();
  for (const brewId of brewIds) {
    const res = await fetch(`${base}/api/brews/${brewId}`, { headers: { cookie } });
    const brew = (await res.json()) as { readings: { id: number }[] };
    for (const r of brew.readings) present.add(r.id);
  }
  const missing = acknowledged.filter((a) => !present.has(a.readingId));
  const perNode: string[] = [];
  for (let i = 0; i < 3; i++) {
    const mysql = await import('mysql2/promise');
    const conn = await mysql.createConnection({ uri: `mysql://root@127.0.0.1:${ports.nodes[i]}/wortwise` });
    const [rows] = await conn.query('SELECT COUNT(*) AS n FROM brew_readings WHERE brew_id IN (?)', [brewIds]);
    await conn.end();
    perNode.push(`node${i + 1}: ${(rows as { n: number }[])[0].n}`);
  }
  const errors500 = [...stats.byStatus].filter(([status]) => status.startsWith('5') && !['502', '503', '504'].includes(status)).reduce((n, [, c]) => n + c, 0);
  console.log(`
Scale test: ${workers} writers through HAProxy at ${base}
${timeline.map((l) => `  ${l}`).join('\n')}
  requests sent                  ${stats.requests}
  answers by status              ${[...stats.byStatus].sort().map(([s, c]) => `${s}: ${c}`).join(', ')}
  retried after 502/503/network  ${stats.retried}
  writes given up after retries  ${stats.gaveUp}
  writes acknowledged (201)      ${acknowledged.length}
  acknowledged but missing       ${missing.length}
  500 answers                    ${errors500}
  readings on each node          ${perNode.join(', ')} (more than acknowledged = a retried write that had already been stored)
  restarts                       ${[...cluster.nodes, ...cluster.apps, cluster.redis].map((s) => `${s.name} ${s.restarts}`).join(', ')}
  other refusals                 ${failures.length ? [...new Set(failures)].slice(0, 5).join(' | ') : 'none'}`);
  if (missing.length > 0 || errors500 > 0) exitCode = 1;
} catch (error) {
  console.error(error);
  exitCode = 1;
} finally {
  running = false;
  await Promise.allSettled(load);
  await cleanUp();
}
process.exit(exitCode);
