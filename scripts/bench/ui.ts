/**
 * `npm run bench:ui`: what the browser pays for Wortwise's client against the framework floor, in
 * the same invocation (issue 14's targets).
 *
 * - Its own database on the shared MariaDB (demo data seeded, dropped at the end), a private client
 *   build and its own Wortwise process on a free loopback port.
 * - The floor: scripts/bench/floor-app (React + React Router + TanStack Query, one route, one query)
 *   built with the same Vite and served gzipped (level 9, as Wortwise's precompressed files) by a
 *   tiny node:http server in this process.
 * - Debian's Chromium through playwright-core. JavaScript transferred = the sum of the encoded
 *   (on-the-wire) body sizes of script responses on a cold load, headers left out (Wortwise's security
 *   headers would otherwise count against it), requested with Accept-Encoding gzip;
 *   service workers are blocked, so the worker's precache of every chunk is not counted.
 * - Keystroke latency on the late-boil check at 4× CPU throttling: from keydown to the first frame
 *   after the answer's text changed (MutationObserver on #late-boil-answer, then
 *   requestAnimationFrame, whose frame is painted next). Same measurement on the floor's input.
 * Bounded loops, loopback only. Figures are printed, never asserted.
 */
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readFileSync, rmSync, statSync } from 'node:fs';
import http from 'node:http';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import react from '@vitejs/plugin-react';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { build } from 'vite';
import { createDb } from '../../server/db/client';
import { migrateDatabase } from '../../server/db/migrate';
import { demoPassword, demoPeople, seedDemo } from '../../server/db/seed';
import '../../server/demo-seeds';
import { DEMO_BREW_NAME } from '../../server/brews/demo-seed';
import { chromiumArgs, chromiumPath, ensureChromium } from '../lib/chromium';
import { freePort, waitFor } from './processes';
import { databaseUrl, dataRoot, ensureDatabase, ensureMariadb, projectRoot } from '../lib/mariadb';

const KEYSTROKES = Number(process.env.BENCH_KEYSTROKES ?? 40);
const LOAD_ROUNDS = Number(process.env.BENCH_ROUNDS ?? 2);
const CPU_THROTTLE = 4;
const traceCategories = [
  'devtools.timeline',
  'disabled-by-default-devtools.timeline',
  'disabled-by-default-devtools.timeline.frame',
  'v8.execute',
  'disabled-by-default-v8.cpu_profiler',
  'blink.user_timing',
  'toplevel',
];
const jwtSecret = 'bench-only-secret-of-at-least-thirty-two-characters';


const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
};

// ---------------------------------------------------------------------------------------------
// The floor: built with the same Vite, served gzipped by a tiny static server

const types: Record<string, string> = { '.html': 'text/html; charset=utf-8', '.js': 'text/javascript', '.css': 'text/css', '.json': 'application/json', '.svg': 'image/svg+xml' };

function serveStatic(dir: string): Promise<http.Server> {
  const cache = new Map<string, { body: Buffer; gz: Buffer; type: string }>();
  const server = http.createServer((req, res) => {
    const urlPath = decodeURIComponent(new URL(req.url ?? '/', 'http://x').pathname);
    if (urlPath === '/floor.json') {
      res.writeHead(200, { 'Content-Type': 'application/json' }).end('{"ok":true}');
      return;
    }
    let file = path.join(dir, path.normalize(urlPath));
    if (!file.startsWith(dir) || !existsSync(file) || statSync(file).isDirectory()) file = path.join(dir, 'index.html');
    let entry = cache.get(file);
    if (!entry) {
      const body = readFileSync(file);
      entry = { body, gz: gzipSync(body, { level: 9 }), type: types[path.extname(file)] ?? 'application/octet-stream' };
      cache.set(file, entry);
    }
    const gzip = /\bgzip\b/.test(String(req.headers['accept-encoding'] ?? ''));
    res.writeHead(200, { 'Content-Type': entry.type, ...(gzip ? { 'Content-Encoding': 'gzip' } : {}), Vary: 'Accept-Encoding' });
    res.end(gzip ? entry.gz : entry.body);
  });
  return new Promise((resolve) => server.listen(0, '127.0.0.1', () => resolve(server)));
}

// ---------------------------------------------------------------------------------------------
// Measurements in the browser

async function newContext(browser: Browser, baseURL: string): Promise<BrowserContext> {
  return browser.newContext({
    baseURL,
    viewport: { width: 375, height: 740 },
    serviceWorkers: 'block',
    // Chromium would ask for brotli too; the figure compared is the gzipped one.
    extraHTTPHeaders: { 'Accept-Encoding': 'gzip' },
  });
}

interface Transfer {
  bytes: number;
  scripts: number;
  encodings: Set<string>;
  /** Of `bytes`, the framework chunks' (React, TanStack Query and React Router: vite.config.ts's `framework` and `router` groups). */
  frameworkBytes: number;
  /** Of `bytes`, the form libraries' (zod and Formik with its helpers: vite.config.ts's `zod` and `formik` groups). */
  formBytes: number;
}

/** Loads urlPath cold in the page and sums the encoded body size of every script response until the network is idle. */
async function scriptTransfer(page: Page, urlPath: string, ready: (page: Page) => Promise<unknown>): Promise<Transfer> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  const scripts = new Map<string, string>();
  const sizes = new Map<string, number>();
  // Bytes on the wire when the headers arrived: taken off the total so only the (encoded) body counts.
  const headerBytes = new Map<string, number>();
  const urls = new Map<string, string>();
  cdp.on('Network.responseReceived', (e) => {
    urls.set(e.requestId, e.response.url);
    const encoding = Object.entries(e.response.headers).find(([k]) => k.toLowerCase() === 'content-encoding')?.[1] ?? 'identity';
    if (e.type === 'Script') scripts.set(e.requestId, String(encoding));
    headerBytes.set(e.requestId, e.response.encodedDataLength);
  });
  cdp.on('Network.loadingFinished', (e) => sizes.set(e.requestId, e.encodedDataLength));
  await page.goto(urlPath, { waitUntil: 'networkidle' });
  await ready(page);
  await page.waitForLoadState('networkidle');
  await cdp.detach();
  let bytes = 0;
  let frameworkBytes = 0;
  let formBytes = 0;
  const listed: [string, number][] = [];
  for (const id of scripts.keys()) {
    const body = Math.max(0, (sizes.get(id) ?? 0) - (headerBytes.get(id) ?? 0));
    const pathname = new URL(urls.get(id) ?? '', 'http://x').pathname;
    bytes += body;
    if (/^\/assets\/(framework|router)-[\w-]+\.js$/.test(pathname)) frameworkBytes += body;
    if (/^\/assets\/(zod|formik)-[\w-]+\.js$/.test(pathname)) formBytes += body;
    listed.push([pathname, body]);
  }
  // BENCH_LIST_SCRIPTS=1 prints each script of the load with its bytes on the wire, largest first.
  if (process.env.BENCH_LIST_SCRIPTS) console.log(`\n${urlPath}:\n${listed.sort((a, b) => b[1] - a[1]).map(([u, n]) => `  ${(n / 1000).toFixed(1).padStart(6)} kB  ${u}`).join('\n')}`);
  return { bytes, scripts: scripts.size, encodings: new Set(scripts.values()), frameworkBytes, formBytes };
}

/**
 * Types `count` digits into the field one at a time (after resetting it to a one-digit value,
 * unmeasured) and returns, for each, the ms from keydown to the first frame after #late-boil-answer's
 * content changed.
 */
async function keystrokeLatency(page: Page, field: string, count: number): Promise<number[]> {
  await page.evaluate(() => {
    const w = window as unknown as { __bench: { keydownAt: number; pending: Promise<number> | null; arm: () => void } };
    const answer = document.getElementById('late-boil-answer')!;
    let resolve: ((ms: number) => void) | null = null;
    w.__bench = {
      keydownAt: 0,
      pending: null,
      arm() {
        w.__bench.pending = new Promise<number>((r) => {
          resolve = r;
        });
      },
    };
    document.addEventListener('keydown', (e) => (w.__bench.keydownAt = e.timeStamp), true);
    new MutationObserver(() => {
      const done = resolve;
      if (!done) return;
      resolve = null;
      requestAnimationFrame(() => done(performance.now() - w.__bench.keydownAt));
    }).observe(answer, { subtree: true, childList: true, characterData: true, attributes: true });
  });
  const input = page.locator(field);
  const times: number[] = [];
  for (let i = 0; i < count; i++) {
    await input.fill(String(1 + (i % 2)));
    await page.waitForTimeout(150);
    await page.evaluate(() => (window as unknown as { __bench: { arm: () => void } }).__bench.arm());
    await page.keyboard.press(String(i % 10));
    const ms = await page.evaluate(() =>
      Promise.race([(window as unknown as { __bench: { pending: Promise<number> } }).__bench.pending, new Promise<number>((r) => setTimeout(() => r(Number.NaN), 3000))]),
    );
    if (Number.isFinite(ms)) times.push(ms);
  }
  return times;
}

// ---------------------------------------------------------------------------------------------

async function main() {
  const started = Date.now();
  ensureChromium();
  const running = await ensureMariadb();
  const dbName = `wortwise_bench_ui_${process.pid}`;
  const url = databaseUrl(dbName, running.port);
  const wwDist = path.join(dataRoot, `bench-ui-dist-${process.pid}`);
  const floorDist = path.join(dataRoot, `bench-floor-dist-${process.pid}`);
  const children: ChildProcess[] = [];
  let floorServer: http.Server | null = null;
  let browser: Browser | null = null;
  try {
    await ensureDatabase(url, { fresh: true });
    await migrateDatabase(url);
    const { db, pool } = createDb(url);
    await seedDemo(db);
    await pool.end();

    console.log('building the Wortwise client and the floor app…');
    // A traced run (BENCH_TRACE) builds unminified, so the profile names our functions.
    const traceBuild = process.env.BENCH_TRACE ? ['--minify', 'false'] : [];
    execFileSync('npx', ['vite', 'build', '--logLevel', 'error', '--outDir', wwDist, '--emptyOutDir', ...traceBuild], { cwd: projectRoot, stdio: 'inherit' });
    await build({
      root: path.join(import.meta.dirname, 'floor-app'),
      configFile: false,
      logLevel: 'error',
      plugins: [react()],
      build: { outDir: floorDist, emptyOutDir: true },
    });

    const wwPort = await freePort();
    const ww = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      cwd: projectRoot,
      env: {
        ...process.env,
        // 'test' keeps the session cookie usable over plain http on loopback and the reminder worker off.
        NODE_ENV: 'test',
        JWT_SECRET: jwtSecret,
        DATABASE_URL: url,
        HOST: '127.0.0.1',
        PORT: String(wwPort),
        AUTH_RATE_LIMIT_MAX: '10000',
        CALC_RATE_LIMIT_MAX: '10000',
        SMTP_HOST: '127.0.0.1',
        SMTP_PORT: String(await freePort()),
        CLIENT_DIST: wwDist,
      },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    children.push(ww);
    const wwBase = `http://127.0.0.1:${wwPort}`;
    await waitFor(`${wwBase}/api/health`, ww);
    floorServer = await serveStatic(floorDist);
    const floorBase = `http://127.0.0.1:${(floorServer.address() as net.AddressInfo).port}`;

    browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: chromiumArgs });

    // --- JavaScript transferred, cold, interleaved with the floor.
    const heading = (p: Page) => p.locator('h1').first().waitFor({ timeout: 30_000 });
    const transfers: Record<string, Transfer[]> = { floor: [], first: [], check: [], brew: [] };
    const encodings = new Set<string>();
    const measure = async (name: string, base: string, urlPath: string | ((c: BrowserContext) => Promise<string>)) => {
      const context = await newContext(browser!, base);
      try {
        const target = typeof urlPath === 'string' ? urlPath : await urlPath(context);
        const page = await context.newPage();
        const t = await scriptTransfer(page, target, heading);
        for (const e of t.encodings) encodings.add(e);
        transfers[name].push(t);
      } finally {
        await context.close();
      }
    };
    const brewDayPath = async (context: BrowserContext) => {
      const login = await context.request.post('/api/auth/login', { data: { email: demoPeople.brewer.email, password: demoPassword } });
      if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
      const listed = (await (await context.request.get('/api/brews')).json()) as { id: number; name: string }[] | { items: { id: number; name: string }[] };
      const brews = Array.isArray(listed) ? listed : listed.items;
      const brew = brews.find((b) => b.name === DEMO_BREW_NAME) ?? brews[0];
      if (!brew) throw new Error('the demo brew day is missing');
      return `/brews/${brew.id}`;
    };
    for (let round = 0; round < LOAD_ROUNDS; round++) {
      await measure('floor', floorBase, '/');
      await measure('first', wwBase, '/');
      await measure('check', wwBase, '/late-boil-check');
      await measure('brew', wwBase, brewDayPath);
    }

    // --- Keystroke latency at 4× CPU throttling.
    const throttled = async (base: string, urlPath: string, prepare: (p: Page) => Promise<string>) => {
      const context = await newContext(browser!, base);
      try {
        const page = await context.newPage();
        await page.goto(urlPath, { waitUntil: 'networkidle' });
        await heading(page);
        const field = await prepare(page);
        const cdp = await context.newCDPSession(page);
        await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_THROTTLE });
        // Two unmeasured keystrokes first, so neither side is timed cold.
        await keystrokeLatency(page, field, 2);
        // BENCH_TRACE=file.json saves a Chromium performance trace (with a CPU profile) of the
        // check's measured keystrokes, for DevTools or scripts/bench/trace-summary.ts. Tracing
        // slows the page: the figures of such a run are for finding where the time goes, not for comparing.
        const trace = process.env.BENCH_TRACE && urlPath !== '/' ? path.resolve(process.env.BENCH_TRACE) : null;
        if (trace) await browser!.startTracing(page, { path: trace, categories: traceCategories });
        try {
          return await keystrokeLatency(page, field, KEYSTROKES);
        } finally {
          if (trace) {
            await browser!.stopTracing();
            console.log(`trace of the late-boil keystrokes saved to ${trace}`);
          }
        }
      } finally {
        await context.close();
      }
    };
    const floorKeys = await throttled(floorBase, '/', async () => '#floor-input');
    const checkKeys = await throttled(wwBase, '/late-boil-check', async (page) => {
      // By keyboard, as the floor's input is filled: a click would leave Playwright's pointer over
      // the page, and Chromium then hit-tests under it for hover at the start of each frame after
      // the layout changed (style, layout and pre-paint before requestAnimationFrame), which the
      // floor's page never pays and a phone, with no pointer hovering, does not either.
      for (const name of ['Litres, kg', 'Refractometer']) {
        const radio = page.getByRole('radio', { name, exact: true });
        await radio.focus();
        await page.keyboard.press('Space');
        if (!(await radio.isChecked())) throw new Error(`the ${name} choice did not take`);
      }
      await page.getByLabel('Wort in the kettle (hot)').fill('26');
      await page.getByLabel('Boil-off rate').fill('4');
      await page.getByLabel('Target OG').fill('1.050');
      await page.getByLabel('Into the fermenter').fill('23');
      const id = await page.getByLabel('Brix').getAttribute('id');
      if (!id) throw new Error('the Brix field has no id');
      return `[id="${id}"]`;
    });

    // --- Report.
    const avgBytes = (name: string) => transfers[name].reduce((n, t) => n + t.bytes, 0) / transfers[name].length / 1000;
    const floorKb = avgBytes('floor');
    const rows: string[][] = [['figure', 'Wortwise', 'baseline', 'ratio', 'target', 'result']];
    const verdict = (ok: boolean, x: number) => (Number.isFinite(x) ? (ok ? 'pass' : 'FAIL') : 'n/a');
    for (const [name, what, limit] of [
      ['first', 'JS gzipped kB, first page / signed out', 1.2],
      ['check', 'JS gzipped kB, /late-boil-check', 1.2],
      ['brew', 'JS gzipped kB, brew day (signed in)', 1.5],
    ] as const) {
      const kb = avgBytes(name);
      const ratio = kb / floorKb;
      rows.push([`${what} (${transfers[name][0].scripts} scripts)`, kb.toFixed(1), floorKb.toFixed(1), ratio.toFixed(2), `≤ ${limit}`, verdict(ratio <= limit, ratio)]);
    }
    // A reference row: Wortwise's framework chunks alone (on the first page: React, TanStack Query
    // and the router) against the whole floor app, so a reader can see how much of each page's
    // budget is left for Wortwise's own code.
    const frameworkKb = transfers.first.reduce((n, t) => n + t.frameworkBytes, 0) / transfers.first.length / 1000;
    rows.push(['JS gzipped kB, of which the framework chunks (reference)', frameworkKb.toFixed(1), floorKb.toFixed(1), (frameworkKb / floorKb).toFixed(2), '', 'info']);
    // And on a brew day, the framework plus the form libraries our stack fixes (zod, Formik): what
    // the page spends before any of Wortwise's own code, against the same floor.
    const brewFixedKb = transfers.brew.reduce((n, t) => n + t.frameworkBytes + t.formBytes, 0) / transfers.brew.length / 1000;
    rows.push(['JS gzipped kB, brew day: framework, zod and Formik (reference)', brewFixedKb.toFixed(1), floorKb.toFixed(1), (brewFixedKb / floorKb).toFixed(2), '', 'info']);
    const keyRow = (what: string, q: number, limit: number) => {
      const ms = quantile(checkKeys, q);
      const base = quantile(floorKeys, q);
      rows.push([what, ms.toFixed(1), base.toFixed(1), (ms / base).toFixed(2), `< ${limit} ms`, verdict(ms < limit, ms)]);
    };
    keyRow(`late-boil keystroke median ms (${CPU_THROTTLE}× CPU, n=${checkKeys.length})`, 0.5, 16);
    keyRow(`late-boil keystroke p95 ms (${CPU_THROTTLE}× CPU, n=${checkKeys.length})`, 0.95, 33);
    const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)));
    console.log(`\nWortwise UI benchmark, Debian Chromium ${browser.version()}, ${LOAD_ROUNDS} cold loads each (interleaved with the floor), ${KEYSTROKES} keystrokes`);
    for (const [i, r] of rows.entries()) {
      console.log(r.map((c, j) => (j === 0 ? c.padEnd(widths[j]) : c.padStart(widths[j]))).join('  '));
      if (i === 0) console.log(widths.map((w) => '-'.repeat(w)).join('  '));
    }
    console.log(
      `\nbaseline = the React + React Router + TanStack Query floor (scripts/bench/floor-app; ${floorKeys.length} keystrokes into its mirrored input); script encodings seen: ${[...encodings].join(', ')}; load average ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(' ')} on ${os.cpus().length} cores; ${((Date.now() - started) / 1000).toFixed(0)} s`,
    );
  } finally {
    await browser?.close();
    floorServer?.close();
    for (const c of children) if (c.exitCode === null) c.kill('SIGTERM');
    await Promise.all(children.map((c) => (c.exitCode === null ? new Promise((r) => c.once('exit', r)) : null)));
    const { pool } = createDb(url);
    await pool.query(`drop database if exists \`${dbName}\``);
    await pool.end();
    rmSync(wwDist, { recursive: true, force: true });
    rmSync(floorDist, { recursive: true, force: true });
    await running.stop();
  }
}

await main();
process.exit(0);
