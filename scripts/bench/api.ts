/**
 * `npm run bench:api`: Wortwise's API against bare baselines in the same invocation, and how the
 * recipe list, a brew day and the review queue cost as data grows (issue 14's targets).
 *
 * - Its own database on the shared MariaDB (dropped at the end), its own Wortwise process and a
 *   bare node:http + mysql2 process (scripts/bench/bare-server.ts) on free loopback ports.
 * - The baseline runs the very statements Wortwise ran for the same request on the same rows
 *   (recorded here by wrapping the mysql2 pool), one after the other; the public calculation's
 *   baseline calls the same shared function. A third process, the smallest Express app serving
 *   that calculation (scripts/bench/express-floor.ts), is measured beside them as a reference row:
 *   what the framework alone costs against the same baseline.
 * - autocannon, 50 connections, runs interleaved (Wortwise, baseline, baseline, Wortwise…); CPU per
 *   request is read from /proc for each server process.
 * - Growth: median of sequential requests with small and large data (100,000 recipes of other
 *   brewers, 2,000 readings on one brew day, 100 brew days in a mentor's queue).
 * Bounded loops, loopback only. Figures are printed, never asserted.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import type { Pool } from 'mysql2/promise';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/context';
import { createDb } from '../../server/db/client';
import { addMember, makeClub, makeUser } from '../../server/db/factories';
import { migrateDatabase } from '../../server/db/migrate';
import { loadEnv } from '../../server/env';
import { createMailer } from '../../server/mail/mailer';
import { freePort, waitFor } from './processes';
import { databaseUrl, ensureDatabase, ensureMariadb, projectRoot } from '../lib/mariadb';

const DURATION_S = Number(process.env.BENCH_SECONDS ?? 4);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 2);
const CONNECTIONS = 50;
const GROWTH_SAMPLES = 25;
const CLK_TCK = 100; // Linux USER_HZ
const root = process.env.BENCH_APP_ROOT || projectRoot;
const jwtSecret = 'bench-only-secret-of-at-least-thirty-two-characters';

// ---------------------------------------------------------------------------------------------
// Recording the statements Wortwise runs

interface Statement {
  sql: string;
  params: unknown[];
}
let recording: Statement[] | null = null;

/**
 * A statement's values as the baseline will send them after a trip through JSON: a Date (which
 * mysql2 writes in the pool's UTC) becomes the same literal text, in lists too.
 */
const replayable = (value: unknown): unknown =>
  value instanceof Date ? value.toISOString().replace('T', ' ').replace('Z', '') : Array.isArray(value) ? value.map(replayable) : value;

/** Wraps the pool so every statement (outside or inside a transaction) is seen; works on any version of server/db/client.ts. */
function recordOn(pool: Pool) {
  const wrap = (target: { query: (...a: never[]) => unknown; execute: (...a: never[]) => unknown }) => {
    for (const method of ['query', 'execute'] as const) {
      const original = target[method].bind(target) as (...a: unknown[]) => unknown;
      (target as Record<string, unknown>)[method] = (...args: unknown[]) => {
        const first = args[0] as string | { sql: string };
        const sql = typeof first === 'string' ? first : first.sql;
        if (recording && !/^(begin|commit|rollback|start transaction|set )/i.test(sql.trim())) recording.push({ sql, params: ((args[1] as unknown[]) ?? []).map(replayable) });
        return original(...args);
      };
    }
  };
  wrap(pool as never);
  const getConnection = pool.getConnection.bind(pool);
  pool.getConnection = (async () => {
    const conn = await getConnection();
    if (!(conn as unknown as { __bench?: boolean }).__bench) {
      wrap(conn as never);
      (conn as unknown as { __bench?: boolean }).__bench = true;
    }
    return conn;
  }) as Pool['getConnection'];
}

// ---------------------------------------------------------------------------------------------
// Small helpers


function cpuTicks(pid: number): number {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return Number(fields[11]) + Number(fields[12]); // utime + stime
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};

interface Client {
  base: string;
  cookie?: string;
}

async function call(c: Client, method: string, url: string, body?: unknown) {
  const res = await fetch(`${c.base}${url}`, {
    method,
    headers: { ...(body !== undefined ? { 'Content-Type': 'application/json' } : {}), ...(c.cookie ? { Cookie: c.cookie } : {}) },
    body: body !== undefined ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  if (res.status >= 400) throw new Error(`${method} ${url}: ${res.status} ${text.slice(0, 300)}`);
  return { res, json: text ? (JSON.parse(text) as Record<string, unknown> & { id?: number }) : null };
}

async function signIn(base: string, email: string, password: string): Promise<Client> {
  const { res } = await call({ base }, 'POST', '/api/auth/login', { email, password });
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  return { base, cookie };
}

// Invented recipe for the bench (not a real brewery's): a plain pale ale.
const benchRecipe = {
  name: 'Bench Pale',
  style: 'Pale ale',
  notes: 'For the benchmark only.',
  batchVolumeL: 21,
  preBoilVolumeL: 27,
  postBoilVolumeL: 23,
  boilMinutes: 60,
  boilOffLPerHour: 4,
  efficiency: 0.72,
  targetOg: 1.05,
  targetFg: 1.011,
  mashPhTarget: 5.3,
  fermentationTempMinC: 18,
  fermentationTempMaxC: 20,
  yeast: { name: 'Clean ale yeast', amount: '1 sachet' },
  fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 4.5, potentialPointsLPerKg: 300 }],
  hops: [{ name: 'Bittering hop', amountG: 25, minutes: 60, alphaAcidPercent: 8 }],
  mashSteps: [{ tempC: 66, minutes: 60 }],
};
const lateBoilReading = { kind: 'late_boil_gravity', method: 'hydrometer', sg: 1.046, sampleTempC: 20, volumeL: 24, minutesLeft: 10 };
const calcBody = { volumeL: 24, sg: 1.046, minutesLeft: 10, boilOffLPerHour: 3, targetSg: 1.05, targetVolumeL: 21 };

/** Copies one row of a table `times` times in one statement (MariaDB's sequence engine), changing some columns. */
async function cloneRows(pool: Pool, db: string, table: string, id: number, times: number, overrides: Record<string, string>) {
  const [cols] = (await pool.query(`select column_name as c from information_schema.columns where table_schema = ? and table_name = ? and column_name <> 'id' order by ordinal_position`, [db, table])) as unknown as [{ c: string }[]];
  const names = cols.map((c) => c.c);
  const select = names.map((n) => overrides[n] ?? `t.\`${n}\``).join(', ');
  await pool.query(`insert into \`${table}\` (${names.map((n) => `\`${n}\``).join(', ')}) select ${select} from \`${table}\` t join seq_1_to_${times} s where t.id = ?`, [id]);
}

// ---------------------------------------------------------------------------------------------

interface RunResult {
  rps: number;
  p99: number;
  cpuMsPerReq: number;
  errors: number;
}

async function load(target: { url: string; method: string; body?: string; cookie?: string }, pid: number): Promise<RunResult> {
  const before = cpuTicks(pid);
  const result = await autocannon({
    url: target.url,
    method: target.method as 'GET',
    body: target.body,
    headers: { ...(target.body ? { 'content-type': 'application/json' } : {}), ...(target.cookie ? { cookie: target.cookie } : {}) },
    connections: CONNECTIONS,
    duration: DURATION_S,
  });
  const cpuMs = ((cpuTicks(pid) - before) / CLK_TCK) * 1000;
  const requests = result.requests.total || 1;
  return { rps: result.requests.average, p99: result.latency.p99, cpuMsPerReq: cpuMs / requests, errors: result.non2xx + result.errors };
}

/** Lets the requests autocannon left in flight finish before the bench deletes rows or stops the servers. */
const settle = () => new Promise((r) => setTimeout(r, 1500));

async function main() {
  const started = Date.now();
  const running = await ensureMariadb();
  const dbName = `wortwise_bench_${process.pid}`;
  const url = databaseUrl(dbName, running.port);
  await ensureDatabase(url, { fresh: true });
  await migrateDatabase(url);
  const tmp = mkdtempSync(path.join(os.tmpdir(), 'wortwise-bench-'));
  const children: ChildProcess[] = [];
  const { db, pool } = createDb(url);
  recordOn(pool);
  try {
    // --- Seed through the real app (in this process), then grow with bulk statements.
    const env = loadEnv({
      NODE_ENV: 'test',
      DATABASE_URL: url,
      JWT_SECRET: jwtSecret,
      AUTH_RATE_LIMIT_MAX: '1000000',
      CALC_RATE_LIMIT_MAX: '1000000000',
      SMTP_PORT: String(await freePort()),
      CLIENT_DIST: path.join(tmp, 'no-client'),
    });
    const ctx: AppContext = { env, db, pool, mailer: createMailer(env) };
    const local = createApp(ctx).listen(0, '127.0.0.1');
    await new Promise((r) => local.once('listening', r));
    const localBase = `http://127.0.0.1:${(local.address() as net.AddressInfo).port}`;

    const brewerUser = await makeUser(db, { displayName: 'Bench Brewer' });
    const smallMentorUser = await makeUser(db, { displayName: 'Bench Mentor Small' });
    const largeMentorUser = await makeUser(db, { displayName: 'Bench Mentor Large' });
    const othersUser = await makeUser(db, { displayName: 'Bench Others' });
    const smallClub = await makeClub(db, { name: 'Bench club small' });
    const largeClub = await makeClub(db, { name: 'Bench club large' });
    await addMember(db, smallClub.id, brewerUser.id, 'member');
    await addMember(db, largeClub.id, brewerUser.id, 'member');
    await addMember(db, smallClub.id, smallMentorUser.id, 'mentor');
    await addMember(db, largeClub.id, largeMentorUser.id, 'mentor');
    const brewer = await signIn(localBase, brewerUser.email, brewerUser.password);
    const smallMentor = await signIn(localBase, smallMentorUser.email, smallMentorUser.password);
    const largeMentor = await signIn(localBase, largeMentorUser.email, largeMentorUser.password);
    const others = await signIn(localBase, othersUser.email, othersUser.password);

    const recipeId = (await call(brewer, 'POST', '/api/recipes', benchRecipe)).json!.id!;
    for (let i = 0; i < 30; i++) await call(brewer, 'POST', '/api/recipes', { ...benchRecipe, name: `Bench Pale ${i}`, targetOg: 1.04 + i / 1000 });
    const otherRecipe = (await call(others, 'POST', '/api/recipes', { ...benchRecipe, name: 'Elsewhere' })).json!.id!;

    const brewDay = async (share?: number) => {
      const id = (await call(brewer, 'POST', '/api/brews', { recipeId })).json!.id!;
      await call(brewer, 'POST', `/api/brews/${id}/readings`, lateBoilReading);
      if (share) await call(brewer, 'PUT', `/api/brews/${id}/sharing`, { clubIds: [share] });
      return id;
    };
    const smallBrew = await brewDay();
    for (let i = 0; i < 9; i++) await call(brewer, 'POST', `/api/brews/${smallBrew}/readings`, lateBoilReading);
    const largeBrew = await brewDay();
    const [[first]] = (await pool.query('select id from brew_readings where brew_id = ? order by id limit 1', [largeBrew])) as unknown as [{ id: number }[]];
    await cloneRows(pool, dbName, 'brew_readings', first.id, 1999, { taken_at: 't.taken_at + interval s.seq second' });
    const writeBrew = await brewDay();
    for (let i = 0; i < 2; i++) await brewDay(smallClub.id);
    for (let i = 0; i < 100; i++) await brewDay(largeClub.id);

    // --- Record what Wortwise runs for each request (after a first call warms any cache).
    const endpoints = {
      health: { client: { base: '' } as Client, method: 'GET', url: '/api/health', kind: 'floor' as const },
      calc: { client: { base: '' } as Client, method: 'POST', url: '/api/calc/boil-correction', body: calcBody, bare: { method: 'POST', url: '/calc' }, kind: 'floor' as const },
      recipes: { client: brewer, method: 'GET', url: '/api/recipes?pageSize=20', kind: 'read' as const },
      brew: { client: brewer, method: 'GET', url: `/api/brews/${smallBrew}`, kind: 'read' as const },
      queue: { client: smallMentor, method: 'GET', url: '/api/reviews/queue', kind: 'read' as const },
      write: { client: brewer, method: 'POST', url: `/api/brews/${writeBrew}/readings`, body: lateBoilReading, kind: 'write' as const },
    };
    const statements: Record<string, Statement[]> = {};
    const statementCounts: Record<string, number> = {};
    for (const [name, e] of Object.entries(endpoints)) {
      const client = { ...e.client, base: localBase };
      await call(client, e.method, e.url, 'body' in e ? e.body : undefined);
      recording = [];
      await call(client, e.method, e.url, 'body' in e ? e.body : undefined);
      statements[name] = recording;
      statementCounts[name] = recording.length;
      recording = null;
    }
    // The health check pings the pool rather than running a statement through it.
    if (statements.health.length === 0) statements.health = [{ sql: 'select 1', params: [] }];
    // BENCH_SHOW_SQL=1 prints what each request ran, for finding statements to save.
    if (process.env.BENCH_SHOW_SQL) for (const [name, list] of Object.entries(statements)) console.log(`\n${name}:\n${list.map((st) => `  ${st.sql.slice(0, 220)}`).join('\n')}`);
    const statementsFile = path.join(tmp, 'statements.json');
    writeFileSync(statementsFile, JSON.stringify(statements));
    // Growth, small side, measured on the in-process app would mix CPU with this script: use the child below.

    // --- Start Wortwise and the bare baseline as their own processes.
    const [wwPort, barePort] = [await freePort(), await freePort()];
    const childEnv = { ...process.env, NODE_ENV: 'production', JWT_SECRET: jwtSecret, DATABASE_URL: url, HOST: '127.0.0.1', AUTH_RATE_LIMIT_MAX: '1000000', CALC_RATE_LIMIT_MAX: '1000000000', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await freePort()), CLIENT_DIST: path.join(tmp, 'no-client') };
    // BENCH_CPU_PROF=<dir> writes a V8 CPU profile of the Wortwise process there, for finding where its time goes.
    const profile = process.env.BENCH_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${path.resolve(process.env.BENCH_CPU_PROF)}`] : [];
    // BENCH_NODE_FLAGS="--flag …" adds Node options to the Wortwise process only, for trying a runtime setting against the same baseline.
    const nodeFlags = process.env.BENCH_NODE_FLAGS?.split(' ').filter(Boolean) ?? [];
    const ww = spawn(process.execPath, [...profile, ...nodeFlags, '--import', 'tsx', 'server/index.ts'], { cwd: root, env: { ...childEnv, PORT: String(wwPort) }, stdio: ['ignore', 'ignore', 'inherit'] });
    const bare = spawn(process.execPath, ['--import', 'tsx', path.join(import.meta.dirname, 'bare-server.ts')], {
      cwd: projectRoot,
      env: { ...childEnv, PORT: String(barePort), BENCH_STATEMENTS: statementsFile },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    children.push(ww, bare);
    const wwBase = `http://127.0.0.1:${wwPort}`;
    const bareBase = `http://127.0.0.1:${barePort}`;
    await waitFor(`${wwBase}/api/health`, ww);
    await waitFor(`${bareBase}/replay/health`, bare);
    // The public calculation is also run on the smallest Express app that serves it: a reference
    // row showing what the framework alone costs against the same bare baseline.
    const floorPort = await freePort();
    const expressFloor = spawn(process.execPath, ['--import', 'tsx', path.join(import.meta.dirname, 'express-floor.ts')], {
      cwd: projectRoot,
      env: { ...childEnv, PORT: String(floorPort) },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    children.push(expressFloor);
    const floorBase = `http://127.0.0.1:${floorPort}`;
    await waitFor(`${floorBase}/ready`, expressFloor);
    local.close();

    // --- Growth: small data first (before the 100,000 recipes arrive).
    const timed = async (client: Client, urlPath: string) => {
      const times: number[] = [];
      // Unmeasured first calls, so neither side is timed cold.
      for (let i = 0; i < 3; i++) await call({ ...client, base: wwBase }, 'GET', urlPath);
      for (let i = 0; i < GROWTH_SAMPLES; i++) {
        const t = performance.now();
        await call({ ...client, base: wwBase }, 'GET', urlPath);
        times.push(performance.now() - t);
      }
      return median(times);
    };
    const growth = {
      recipes: { small: await timed(brewer, '/api/recipes?pageSize=20'), large: 0, what: 'recipe list, +100,000 other recipes' },
      brew: { small: await timed(brewer, `/api/brews/${smallBrew}`), large: await timed(brewer, `/api/brews/${largeBrew}`), what: 'brew day, 10 → 2,000 readings' },
      queue: { small: await timed(smallMentor, '/api/reviews/queue'), large: await timed(largeMentor, '/api/reviews/queue'), what: 'review queue, 2 → 100 brew days' },
    };
    const t0 = Date.now();
    await cloneRows(pool, dbName, 'recipes', otherRecipe, 100_000, { name: "concat('Elsewhere ', s.seq)", target_og: '1.03 + (s.seq mod 70) / 1000' });
    await pool.query('analyze table recipes');
    console.log(`(100,000 recipes of another brewer added in ${((Date.now() - t0) / 1000).toFixed(1)} s)`);
    growth.recipes.large = await timed(brewer, '/api/recipes?pageSize=20');

    // --- Throughput, interleaved.
    const results: Record<string, { ww: RunResult[]; bare: RunResult[]; express: RunResult[] }> = {};
    // BENCH_ONLY=write,queue limits the throughput runs (the growth checks always run).
    const only = process.env.BENCH_ONLY?.split(',');
    const measured = Object.entries(endpoints).filter(([name]) => !only || only.includes(name));
    for (const [name, e] of measured) {
      results[name] = { ww: [], bare: [], express: [] };
      const bareTarget = 'bare' in e ? e.bare : { method: e.method, url: `/replay/${name}` };
      const body = 'body' in e ? JSON.stringify(e.body) : undefined;
      for (let round = 0; round < ROUNDS; round++) {
        const runWw = async () => results[name].ww.push(await load({ url: `${wwBase}${e.url}`, method: e.method, body, cookie: e.client.cookie }, ww.pid!));
        const runBare = async () => results[name].bare.push(await load({ url: `${bareBase}${bareTarget.url}`, method: bareTarget.method, body }, bare.pid!));
        const runExpress = async () => {
          if (name === 'calc') results[name].express.push(await load({ url: `${floorBase}/calc`, method: 'POST', body }, expressFloor.pid!));
        };
        const order = [runWw, runBare, runExpress];
        for (const run of round % 2 === 0 ? order : order.reverse()) await run();
        if (name === 'write') await settle();
        if (name === 'write') await pool.query('delete from brew_readings where brew_id = ? and id > (select m from (select min(id) m from brew_readings where brew_id = ?) x)', [writeBrew, writeBrew]);
      }
    }

    // --- Report.
    const avg = (rs: RunResult[], k: keyof RunResult) => rs.reduce((n, r) => n + r[k], 0) / rs.length;
    const target = { floor: 0.35, read: 0.6, write: 0.5 } as const;
    const rows: string[][] = [['figure', 'Wortwise', 'baseline', 'ratio', 'target', 'result']];
    for (const [name, e] of measured) {
      const r = results[name];
      const rps = avg(r.ww, 'rps');
      const baseRps = avg(r.bare, 'rps');
      const ratio = baseRps > 0 ? rps / baseRps : Number.NaN;
      // A baseline that finished no request in the window leaves no ratio to judge.
      const verdict = (ok: boolean, r: number) => (Number.isFinite(r) ? (ok ? 'pass' : 'FAIL') : 'n/a');
      rows.push([`${name} req/s (${statementCounts[name]} statements)`, rps.toFixed(0), baseRps.toFixed(0), ratio.toFixed(2), `≥ ${target[e.kind]}`, verdict(ratio >= target[e.kind], ratio)]);
      const p99 = avg(r.ww, 'p99');
      const baseP99 = avg(r.bare, 'p99');
      const p99Ratio = baseP99 > 0 ? p99 / baseP99 : Number.NaN;
      if (e.kind !== 'floor') rows.push([`${name} p99 ms`, p99.toFixed(1), baseP99.toFixed(1), p99Ratio.toFixed(2), '≤ 4', verdict(p99Ratio <= 4, p99Ratio)]);
      const cpu = avg(r.ww, 'cpuMsPerReq');
      const baseCpu = avg(r.bare, 'cpuMsPerReq');
      rows.push([`${name} CPU ms/request`, cpu.toFixed(3), baseCpu.toFixed(3), (cpu / baseCpu).toFixed(2), '', '']);
      if (r.express.length > 0) {
        const floorRatio = avg(r.express, 'rps') / baseRps;
        rows.push([`${name} req/s, smallest Express app (reference)`, avg(r.express, 'rps').toFixed(0), baseRps.toFixed(0), floorRatio.toFixed(2), '', 'info']);
        rows.push([`${name} CPU ms/request, smallest Express app`, avg(r.express, 'cpuMsPerReq').toFixed(3), baseCpu.toFixed(3), (avg(r.express, 'cpuMsPerReq') / baseCpu).toFixed(2), '', '']);
      }
      const errors = avg(r.ww, 'errors') + avg(r.bare, 'errors') + (r.express.length ? avg(r.express, 'errors') : 0);
      if (errors > 0) rows.push([`${name} errors (non-2xx)`, avg(r.ww, 'errors').toFixed(0), avg(r.bare, 'errors').toFixed(0), '', '0', 'FAIL']);
    }
    for (const g of Object.values(growth)) {
      const ratio = g.large / g.small;
      rows.push([`growth: ${g.what} (median ms)`, g.large.toFixed(1), g.small.toFixed(1), ratio.toFixed(2), '≤ 2', ratio <= 2 ? 'pass' : 'FAIL']);
    }
    const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
    console.log(`\nWortwise API benchmark (${root}), ${ROUNDS} interleaved rounds of ${DURATION_S} s at ${CONNECTIONS} connections`);
    for (const [i, r] of rows.entries()) {
      console.log(r.map((c, j) => (j === 0 ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  '));
      if (i === 0) console.log(widths.map((w) => '-'.repeat(w)).join('  '));
    }
    console.log(`\nbaseline for growth rows = the same request with small data; load average ${os.loadavg().map((l) => l.toFixed(2)).join(' ')} on ${os.cpus().length} cores; ${((Date.now() - started) / 1000).toFixed(0)} s`);
  } finally {
    await settle();
    for (const c of children) if (c.exitCode === null) c.kill('SIGTERM');
    await Promise.all(children.map((c) => (c.exitCode === null ? new Promise((r) => c.once('exit', r)) : null)));
    await pool.query(`drop database if exists \`${dbName}\``);
    await pool.end();
    rmSync(tmp, { recursive: true, force: true });
    await running.stop();
  }
}

await main();
process.exit(0);
