import { createHash, randomBytes } from 'node:crypto';
import type { Readable } from 'node:stream';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { GetObjectCommand, HeadObjectCommand } from '@aws-sdk/client-s3';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { readingPhotos } from '../db/schema';
import { movePhotosToStore, movedPhotoKey, sweepUnreferencedPhotos } from './move-photos';
import { createPhotoStore, s3ClientFromEnv, type PhotoStore } from './photo-store';
import { makeScene, startBrewDay } from './test-scene';

/** The photo store against the local fake S3 (s3rver, a real S3 HTTP API) started by the harness. */
let h: TestHarness;
let store: PhotoStore;
beforeAll(async () => {
  h = await createHarness();
  store = createPhotoStore(h.ctx.env);
});

async function readAll(stream: Readable): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const part of stream) parts.push(part as Buffer);
  return Buffer.concat(parts);
}

/** An image-like payload: the PNG signature (W3C PNG, 2nd edition) and random bytes after it. */
const pngLike = (size = 2048) => Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), randomBytes(size)]);
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

async function readingWith(h: TestHarness) {
  const scene = await makeScene(h);
  const brewId = await startBrewDay(scene);
  const reading = await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20 }).expect(201);
  return { scene, brewId, readingId: reading.body.id as number };
}

const getBytes = (agent: Awaited<ReturnType<typeof makeScene>>['owner']['agent'], url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => cb(null, Buffer.concat(parts)));
    });

describe('S3 photo store', () => {
  it('puts, gets and removes bytes unchanged, under keys that are never reused', async () => {
    const bytes = pngLike();
    const [key, other] = [store.newKey(7), store.newKey(7)];
    expect(key).not.toBe(other);
    await store.put(key, bytes, 'image/png');
    expect(sha(await readAll(await store.get(key)))).toBe(sha(bytes));
    // The object really is in the bucket, with its type: asked through a separate S3 client.
    const head = await s3ClientFromEnv(h.ctx.env).send(new HeadObjectCommand({ Bucket: h.ctx.env.S3_BUCKET, Key: key }));
    expect(head.ContentType).toBe('image/png');
    expect(head.ContentLength).toBe(bytes.length);
    await store.remove(key);
    await expect(store.get(key)).rejects.toMatchObject({ status: 503, code: 'storage_unavailable' });
    await store.remove(key); // removing twice is not an error
  });

  it('answers 503, never 500, when the store cannot be reached', async () => {
    // Port 9 (discard) on loopback: nothing listens there.
    const unreachable = createPhotoStore({ ...h.ctx.env, S3_ENDPOINT: 'http://127.0.0.1:9' });
    await expect(unreachable.put('k', pngLike(10), 'image/png')).rejects.toMatchObject({ status: 503 });
  });

  it('stores an upload in the bucket, not in MariaDB, and deletes it with the photo', async () => {
    const { scene, brewId, readingId } = await readingWith(h);
    const bytes = pngLike();
    const res = await scene.owner.agent.post(`/api/brews/${brewId}/readings/${readingId}/photos`).attach('photo', bytes, 'jar.png').expect(201);
    const [row] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, res.body.id));
    expect(row.data).toBeNull();
    expect(row.storageKey).toMatch(new RegExp(`^reading-photos/brew-${brewId}/`));
    const object = await s3ClientFromEnv(h.ctx.env).send(new GetObjectCommand({ Bucket: h.ctx.env.S3_BUCKET, Key: row.storageKey! }));
    expect(sha(Buffer.from(await object.Body!.transformToByteArray()))).toBe(res.body.sha256);
    const got = await getBytes(scene.owner.agent, res.body.url);
    expect(got.status).toBe(200);
    expect(got.headers['content-length']).toBe(String(bytes.length));
    expect(sha(got.body as Buffer)).toBe(sha(bytes));
    await scene.owner.agent.delete(res.body.url).expect(204);
    await expect(store.get(row.storageKey!)).rejects.toMatchObject({ status: 503 });
  });
});

describe('moving photos out of MariaDB', () => {
  it('serves a photo kept in the database, moves it to the bucket, and a second run changes nothing', async () => {
    const { scene, brewId, readingId } = await readingWith(h);
    const bytes = pngLike(4096);
    const damagedBytes = pngLike(100);
    const [{ id }] = await h.ctx.db.insert(readingPhotos).values({ readingId, brewId, mime: 'image/png', sizeBytes: bytes.length, sha256: sha(bytes), data: bytes }).$returningId();
    const [{ id: damagedId }] = await h.ctx.db
      .insert(readingPhotos)
      .values({ readingId, brewId, mime: 'image/png', sizeBytes: damagedBytes.length, sha256: sha(Buffer.from('something else')), data: damagedBytes })
      .$returningId();
    const url = `/api/brews/${brewId}/readings/${readingId}/photos/${id}`;
    expect(sha((await getBytes(scene.owner.agent, url)).body as Buffer)).toBe(sha(bytes));

    const first = await movePhotosToStore(h.ctx.db, store, { batchSize: 1 });
    expect(first.moved).toBeGreaterThanOrEqual(1);
    expect(first.damaged).toContain(damagedId);
    const [row] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, id));
    expect(row).toMatchObject({ storageKey: movedPhotoKey(brewId, id), data: null });
    expect(sha(await readAll(await store.get(row.storageKey!)))).toBe(sha(bytes));
    const served = await getBytes(scene.owner.agent, url);
    expect(served.status).toBe(200);
    expect(sha(served.body as Buffer)).toBe(sha(bytes));
    // The damaged row is left as it was, for a person to look at.
    const [damaged] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, damagedId));
    expect(damaged.storageKey).toBeNull();
    expect(damaged.data).not.toBeNull();

    const second = await movePhotosToStore(h.ctx.db, store);
    expect(second.moved).toBe(0);
    const [again] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, id));
    expect(again.storageKey).toBe(row.storageKey);
  });

  it('finishes a run that stopped between the upload and the update', async () => {
    const { brewId, readingId } = await readingWith(h);
    const bytes = pngLike(512);
    const [{ id }] = await h.ctx.db.insert(readingPhotos).values({ readingId, brewId, mime: 'image/png', sizeBytes: bytes.length, sha256: sha(bytes), data: bytes }).$returningId();
    // The earlier run got as far as the upload.
    await store.put(movedPhotoKey(brewId, id), bytes, 'image/png');
    await movePhotosToStore(h.ctx.db, store);
    const [row] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, id));
    expect(row).toMatchObject({ storageKey: movedPhotoKey(brewId, id), data: null });
    expect(sha(await readAll(await store.get(row.storageKey!)))).toBe(sha(bytes));
  });
});

describe('sweeping objects no photo points to', () => {
  it('removes an old unreferenced object and keeps photos and fresh uploads', async () => {
    const { scene, brewId, readingId } = await readingWith(h);
    const kept = await scene.owner.agent.post(`/api/brews/${brewId}/readings/${readingId}/photos`).attach('photo', pngLike(), 'jar.png').expect(201);
    const [row] = await h.ctx.db.select().from(readingPhotos).where(eq(readingPhotos.id, kept.body.id));
    const orphan = store.newKey(brewId);
    await store.put(orphan, pngLike(64), 'image/png');

    // An hour has not passed: an upload may still be on its way to its row.
    const early = await sweepUnreferencedPhotos(h.ctx.db, store);
    expect(early.removed).not.toContain(orphan);

    const later = await sweepUnreferencedPhotos(h.ctx.db, store, { now: new Date(Date.now() + 2 * 60 * 60 * 1000) });
    expect(later.removed).toContain(orphan);
    expect(later.removed).not.toContain(row.storageKey);
    await expect(store.get(orphan)).rejects.toMatchObject({ status: 503 });
    expect(sha(await readAll(await store.get(row.storageKey!)))).toBe(kept.body.sha256);
  });
});

describe('photo store out of reach', () => {
  let broken: TestHarness;
  beforeAll(async () => {
    // The same database, a photo store on a port where nothing listens.
    broken = await createHarness({ S3_ENDPOINT: 'http://127.0.0.1:9' });
  });

  it('answers a photo view and an upload with 503 and stores no row', async () => {
    const { brewId, readingId, scene } = await readingWith(broken);
    const [{ id }] = await broken.ctx.db
      .insert(readingPhotos)
      .values({ readingId, brewId, mime: 'image/png', sizeBytes: 10, sha256: sha(Buffer.from('x')), storageKey: store.newKey(brewId) })
      .$returningId();
    const view = await scene.owner.agent.get(`/api/brews/${brewId}/readings/${readingId}/photos/${id}`);
    expect(view.status).toBe(503);
    expect(view.body.error).toBe('storage_unavailable');
    expect(view.headers['cache-control'] ?? '').not.toMatch(/max-age=3600/);
    const upload = await scene.owner.agent.post(`/api/brews/${brewId}/readings/${readingId}/photos`).attach('photo', pngLike(), 'jar.png');
    expect(upload.status).toBe(503);
    const rows = await broken.ctx.db.select({ id: readingPhotos.id }).from(readingPhotos).where(eq(readingPhotos.readingId, readingId));
    expect(rows).toHaveLength(1);
  });
});
