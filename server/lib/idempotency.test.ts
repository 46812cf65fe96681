import { count, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { brewNotes, brewReadings, readingPhotos, recipes } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeScene, startBrewDay, testRecipe } from '../brews/test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const readingCount = async (brewId: number) => Number((await h.ctx.db.select({ n: count() }).from(brewReadings).where(eq(brewReadings.brewId, brewId)))[0].n);

describe('Idempotency-Key on creates', () => {
  it('answers a retried reading with the first answer and stores it once', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const send = () => scene.owner.agent.post(`/api/brews/${brewId}/readings`).set('Idempotency-Key', 'reading-retry-1').send({ kind: 'mash_temp', tempC: 66 });
    const first = await send();
    expect(first.status).toBe(201);
    const again = await send();
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(await readingCount(brewId)).toBe(1);
  });

  it('stores one reading when the same key arrives eight times at once', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const responses = await Promise.all(
      Array.from({ length: 8 }, () => scene.owner.agent.post(`/api/brews/${brewId}/readings`).set('Idempotency-Key', 'burst').send({ kind: 'og', sg: 1.05, sampleTempC: 20 })),
    );
    expect(responses.map((r) => r.status)).toEqual(Array(8).fill(201));
    expect(new Set(responses.map((r) => r.body.id)).size).toBe(1);
    expect(await readingCount(brewId)).toBe(1);
  });

  it('keeps keys per user, refuses a key reused on another route, and stores a new thing for a new key', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const note = (key: string) => scene.owner.agent.post(`/api/brews/${brewId}/notes`).set('Idempotency-Key', key).send({ body: 'Lid on.' });
    expect((await note('n-1')).status).toBe(201);
    expect((await note('n-1')).status).toBe(201);
    expect((await note('n-2')).status).toBe(201);
    const notes = await h.ctx.db.select({ id: brewNotes.id }).from(brewNotes).where(eq(brewNotes.brewId, brewId));
    expect(notes).toHaveLength(2);
    // Another brewer's recipe with the same key is their own request.
    const mine = await scene.other.agent.post('/api/recipes').set('Idempotency-Key', 'n-1').send(testRecipe);
    expect(mine.status).toBe(201);
    const reused = await scene.owner.agent.post('/api/recipes').set('Idempotency-Key', 'n-1').send(testRecipe);
    expect(reused.status).toBe(422);
    expect(reused.body.error).toBe('idempotency_key_reused');
    const owned = await h.ctx.db.select({ n: count() }).from(recipes).where(eq(recipes.ownerId, scene.owner.user.id));
    expect(Number(owned[0].n)).toBe(1);
  });

  it('answers a retried photo upload with the first photo', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const reading = await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20 }).expect(201);
    // The PNG signature (W3C PNG specification, section 5.2) is what the server checks.
    const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(32, 2)]);
    const upload = () => scene.owner.agent.post(`/api/brews/${brewId}/readings/${reading.body.id}/photos`).set('Idempotency-Key', 'photo-1').attach('photo', png, 'jar.png');
    const first = await upload();
    const again = await upload();
    expect(first.status).toBe(201);
    expect(again.body).toEqual(first.body);
    const photos = await h.ctx.db.select({ id: readingPhotos.id }).from(readingPhotos).where(eq(readingPhotos.readingId, reading.body.id));
    expect(photos).toHaveLength(1);
  });

  it('replays a refusal too, and refuses a malformed key with 400', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const bad = () => scene.owner.agent.post(`/api/brews/${brewId}/readings`).set('Idempotency-Key', 'bad-1').send({ kind: 'mash_temp', tempC: 'hot' });
    const first = await bad();
    expect(first.status).toBe(400);
    expect((await bad()).body).toEqual(first.body);
    const malformed = await scene.owner.agent.post(`/api/brews/${brewId}/readings`).set('Idempotency-Key', 'has space').send({ kind: 'mash_temp', tempC: 66 });
    expect(malformed.status).toBe(400);
    expect(await readingCount(brewId)).toBe(0);
  });
});
