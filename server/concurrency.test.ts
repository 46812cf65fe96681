/**
 * Real concurrency against MariaDB: many writes to one brew day at the same moment. Every
 * acknowledged write must be stored, nothing concurrent may answer 500, and "at most N" rules
 * must hold when the requests race.
 */
import { and, count, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { brewClubShares, brewReadings, equipmentProfiles, readingPhotos, recipeClubShares } from './db/schema';
import { addMember, makeClub } from './db/factories';
import { createHarness, type TestHarness } from '../tests/support/api';
import { makeScene, startBrewDay } from './brews/test-scene';
import { PHOTOS_PER_READING } from './brews/photos';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/** The 8-byte PNG signature (W3C PNG specification, section 5.2) and a little more: what the server sniffs. */
const pngBytes = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);

const statuses = (responses: { status: number }[]) => responses.map((r) => r.status).sort();

describe('many writes to one brew day at once', () => {
  it('stores all 40 readings posted in parallel (several kinds, each starting its stage), every one answered 201', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const bodies = Array.from({ length: 40 }, (_, i) =>
      i % 4 === 0
        ? { kind: 'mash_temp', tempC: 60 + (i % 8) }
        : i % 4 === 1
          ? { kind: 'og', sg: 1.04 + i / 10_000, sampleTempC: 20 }
          : i % 4 === 2
            ? { kind: 'pre_boil_gravity', method: 'hydrometer', sg: 1.04, sampleTempC: 20 }
            : { kind: 'mash_ph', ph: 5.2 },
    );
    const responses = await Promise.all(bodies.map((body) => scene.owner.agent.post(`/api/brews/${brewId}/readings`).send(body)));
    expect(statuses(responses)).toEqual(bodies.map(() => 201));
    const ids = new Set(responses.map((r) => r.body.id as number));
    expect(ids.size).toBe(40);
    const [{ n }] = await h.ctx.db.select({ n: count() }).from(brewReadings).where(eq(brewReadings.brewId, brewId));
    expect(Number(n)).toBe(40);
  });

  it('takes readings, stage changes and notes at the same moment: every request answered, none 500', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const agent = scene.owner.agent;
    const requests = [
      ...Array.from({ length: 12 }, () => agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'mash_temp', tempC: 66 })),
      ...(['mash', 'boil', 'chill'] as const).map((stage) => agent.post(`/api/brews/${brewId}/stages/${stage}`).send({ action: 'complete' })),
      ...Array.from({ length: 6 }, (_, i) => agent.post(`/api/brews/${brewId}/notes`).send({ body: `Note ${i}`, stage: null })),
    ];
    const responses = await Promise.all(requests);
    for (const r of responses) expect([200, 201]).toContain(r.status);
  });

  it('keeps at most six photos on a reading when twelve are uploaded at once', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    const reading = await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20 }).expect(201);
    const base = `/api/brews/${brewId}/readings/${reading.body.id}/photos`;
    const responses = await Promise.all(Array.from({ length: 12 }, (_, i) => scene.owner.agent.post(base).attach('photo', pngBytes, `jar-${i}.png`)));
    expect(statuses(responses)).toEqual([...Array(PHOTOS_PER_READING).fill(201), ...Array(12 - PHOTOS_PER_READING).fill(400)]);
    const [{ n }] = await h.ctx.db.select({ n: count() }).from(readingPhotos).where(eq(readingPhotos.readingId, reading.body.id));
    expect(Number(n)).toBe(PHOTOS_PER_READING);
  });

  it('saves five first kettle profiles posted at once, exactly one of them the default', async () => {
    const scene = await makeScene(h);
    const kettle = (i: number) => ({ name: `Kettle ${i}`, boilOffLPerHour: 4, trubLossL: 1, deadSpaceL: 0.5, coolingShrinkage: 0.04 });
    const responses = await Promise.all(Array.from({ length: 5 }, (_, i) => scene.owner.agent.post('/api/equipment').send(kettle(i))));
    expect(statuses(responses)).toEqual([201, 201, 201, 201, 201]);
    const rows = await h.ctx.db.select().from(equipmentProfiles).where(eq(equipmentProfiles.ownerId, scene.owner.user.id));
    expect(rows).toHaveLength(5);
    expect(rows.filter((r) => r.isDefault)).toHaveLength(1);
  });
});

describe('sharing while leaving the club', () => {
  it('never leaves a brew day or recipe visible to a club its owner has left (15 rounds)', async () => {
    const scene = await makeScene(h);
    const brewId = await startBrewDay(scene);
    for (let round = 0; round < 15; round++) {
      const club = await makeClub(h.ctx.db, { name: `Race club ${round}` });
      await addMember(h.ctx.db, club.id, scene.owner.user.id, 'member');
      await addMember(h.ctx.db, club.id, scene.mentor.user.id, 'organiser');
      const [shareBrew, shareRecipe, leave] = await Promise.all([
        scene.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [club.id] }),
        scene.owner.agent.put(`/api/recipes/${scene.recipeId}/sharing`).send({ clubIds: [club.id] }),
        scene.owner.agent.post(`/api/clubs/${club.id}/leave`).send({}),
      ]);
      expect(leave.status).toBe(204);
      // Shared before leaving (200, then removed by the leave) or refused after it (400): never 500.
      expect([200, 400]).toContain(shareBrew.status);
      expect([200, 400]).toContain(shareRecipe.status);
      const brewShares = await h.ctx.db.select().from(brewClubShares).where(and(eq(brewClubShares.brewId, brewId), eq(brewClubShares.clubId, club.id)));
      const recipeShares = await h.ctx.db
        .select()
        .from(recipeClubShares)
        .where(and(eq(recipeClubShares.recipeId, scene.recipeId), eq(recipeClubShares.clubId, club.id)));
      expect(brewShares, `round ${round}`).toEqual([]);
      expect(recipeShares, `round ${round}`).toEqual([]);
    }
  });
});
