import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser } from './db/factories';
import { createHarness, type TestHarness } from '../tests/support/api';

// A built client in miniature: what Vite and its precompress plugin (vite.config.ts) leave in dist/.
const dist = mkdtempSync(path.join(tmpdir(), 'wortwise-dist-'));
const js = `export const answer = ${JSON.stringify('x'.repeat(4000))};\n`;
mkdirSync(path.join(dist, 'assets'));
writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Wortwise</title><div id="root"></div>');
writeFileSync(path.join(dist, 'late-boil-check.html'), '<!doctype html><title>Late-boil check · Wortwise</title><div id="root"></div>');
writeFileSync(path.join(dist, 'assets', 'app-abc123.js'), js);
writeFileSync(path.join(dist, 'assets', 'app-abc123.js.br'), brotliCompressSync(js));
writeFileSync(path.join(dist, 'assets', 'app-abc123.js.gz'), gzipSync(js));
writeFileSync(path.join(dist, 'assets', 'app-abc123.js.map'), '{"version":3}');
afterAll(() => rmSync(dist, { recursive: true, force: true }));

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness({ CLIENT_DIST: dist });
});

const raw = (r: request.Test) => r.buffer(true).parse((res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
});

describe('serving the built client', () => {
  it('sends hashed assets precompressed, brotli first, cached for a year as immutable', async () => {
    const br = await raw(request(h.app).get('/assets/app-abc123.js').set('Accept-Encoding', 'gzip, deflate, br'));
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    // The stored .br file itself, not one compressed per request.
    expect(Number(br.headers['content-length'])).toBe(brotliCompressSync(js).length);

    const gz = await raw(request(h.app).get('/assets/app-abc123.js').set('Accept-Encoding', 'gzip'));
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.headers['cache-control']).toBe('public, max-age=31536000, immutable');

    const plain = await raw(request(h.app).get('/assets/app-abc123.js').set('Accept-Encoding', 'identity'));
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect((plain.body as Buffer).toString('utf8')).toBe(js);
  });

  it('keeps source maps private and answers a missing asset with 404, not the app page', async () => {
    await request(h.app).get('/assets/app-abc123.js.map').expect(404);
    await request(h.app).get('/assets/app-gone999.js').expect(404);
  });

  it('falls back to index.html, never cached without asking, for the client’s routes', async () => {
    const page = await request(h.app).get('/recipes').expect(200);
    expect(page.headers['cache-control']).toBe('no-cache');
    expect(page.text).toContain('<div id="root">');
    // Pages get helmet's default policy (helmet's README: "default-src 'self'" first).
    expect(page.headers['content-security-policy']).toMatch(/^default-src 'self'/);
    expect(page.headers['x-content-type-options']).toBe('nosniff');
  });

  it('gives a visitor without a session the public check’s own page, and a signed-in brewer the app', async () => {
    const visitor = await request(h.app).get('/late-boil-check').expect(200);
    expect(visitor.text).toContain('<title>Late-boil check · Wortwise</title>');
    expect(visitor.headers['cache-control']).toBe('no-cache');
    expect(visitor.headers['content-security-policy']).toMatch(/^default-src 'self'/);
    // Other cookies do not make a visitor a brewer.
    const other = await request(h.app).get('/late-boil-check').set('Cookie', 'theme=dark; wortwise_sessionx=1').expect(200);
    expect(other.text).toContain('<title>Late-boil check · Wortwise</title>');

    // The same address answers two pages: caches must key them by the cookie and not revalidate one
    // with the other's date.
    expect(visitor.headers['vary']).toMatch(/Cookie/);
    expect(visitor.headers['last-modified']).toBeUndefined();

    const user = await makeUser(h.ctx.db);
    const agent = await h.signIn(user.email);
    const app = await agent.get('/late-boil-check').set('If-Modified-Since', new Date(Date.now() + 60_000).toUTCString()).expect(200);
    expect(app.text).toContain('<title>Wortwise</title>');
    expect(app.headers['vary']).toMatch(/Cookie/);
    // Any other path is the app's, with or without a session.
    expect((await request(h.app).get('/late-boil-check/more').expect(200)).text).toContain('<title>Wortwise</title>');
  });

  it('compresses larger API answers for clients that accept it', async () => {
    const user = await makeUser(h.ctx.db);
    const agent = await h.signIn(user.email);
    const res = await agent.get('/api/nope-' + 'x'.repeat(10)).set('Accept-Encoding', 'br');
    expect(res.status).toBe(404);
    // Small answers go as they are; a long list (well over 1 kB) is compressed.
    expect(res.headers['content-encoding']).toBeUndefined();
    const big = await agent.get('/api/recipes?pageSize=100').set('Accept-Encoding', 'br');
    expect(big.status).toBe(200);
    if (JSON.stringify(big.body).length > 1024) expect(big.headers['content-encoding']).toBe('br');
  });
});
