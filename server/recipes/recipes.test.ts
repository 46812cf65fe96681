import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { KG_PER_LB, LITRES_PER_US_GALLON } from '@shared/brewmath';
import { recipeTargetsSchema, type RecipeInput } from '@shared/schemas/recipes';
import { eq } from 'drizzle-orm';
import { addMember, makeClub, makeUser } from '../db/factories';
import { recipeFermentables, recipes } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { getRecipeTargets, loadRecipeForActor } from './service';
import { loadSessionUser } from '../auth/session';
import { makeScene } from '../brews/test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/**
 * A pale ale of 23 L. Boil: 28 L down to 24 L in 60 minutes is 4 L/h. OG estimate: 4.6 kg of a
 * 300 points·L/kg malt at 75 % gives 1035 points·L, /23 L = 45 points, plus nothing else.
 */
function paleAle(overrides: Partial<RecipeInput> = {}): RecipeInput {
  return {
    name: 'Test Pale',
    style: 'Pale ale',
    notes: 'Mash thin, ferment cool.',
    batchVolumeL: 23,
    preBoilVolumeL: 28,
    postBoilVolumeL: 24,
    boilMinutes: 60,
    boilOffLPerHour: 4,
    efficiency: 0.75,
    targetOg: 1.045,
    targetFg: 1.01,
    mashPhTarget: 5.3,
    fermentationTempMinC: 18,
    fermentationTempMaxC: 20,
    yeast: { name: 'Clean ale yeast', amount: '1 sachet, 11 g' },
    fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 4.6, potentialPointsLPerKg: 300 }],
    hops: [
      { name: 'Bittering hop', amountG: 25, minutes: 60, alphaAcidPercent: 8 },
      { name: 'Aroma hop', amountG: 30, minutes: 5, alphaAcidPercent: 5.5 },
    ],
    mashSteps: [
      { tempC: 66, minutes: 60 },
      { tempC: 76, minutes: 10 },
    ],
    ...overrides,
  };
}

async function brewerWithAgent(input: Parameters<typeof makeUser>[1] = {}) {
  const user = await makeUser(h.ctx.db, input);
  return { user, agent: await h.signIn(user.email) };
}

async function countRecipes(ownerId: number) {
  return (await h.ctx.db.select({ id: recipes.id }).from(recipes).where(eq(recipes.ownerId, ownerId))).length;
}

describe('POST /api/recipes and GET /api/recipes/:id', () => {
  it('creates a private recipe at version 1 and reads it back as saved', async () => {
    const { user, agent } = await brewerWithAgent({ displayName: 'Nell Ashgrove' });
    const res = await agent.post('/api/recipes').send(paleAle());
    expect(res.status).toBe(201);
    expect(res.headers.location).toBe(`/api/recipes/${res.body.id}`);
    expect(res.body).toMatchObject({ ...paleAle(), ownerId: user.id, ownerName: 'Nell Ashgrove', version: 1, sharedWithClubIds: [], clonedFromId: null });
    expect(res.body.permissions).toEqual({ edit: true, share: true, delete: true, clone: true });

    const read = await agent.get(`/api/recipes/${res.body.id}`);
    expect(read.status).toBe(200);
    expect(read.body).toEqual(res.body);
  });

  it('gives ABV by (OG − FG) × 131.25 and apparent attenuation by (OG − FG)/(OG − 1)', async () => {
    // Worked example: 1.050 → 1.010 is 5.25 % ABV and 80 % apparent attenuation (the homebrew
    // rule of thumb, recalled from memory; attenuation by its definition).
    const { agent } = await brewerWithAgent();
    const res = await agent.post('/api/recipes').send(paleAle({ targetOg: 1.05, targetFg: 1.01 }));
    expect(res.body.abvPercent).toBeCloseTo(5.25, 6);
    expect(res.body.apparentAttenuation).toBeCloseTo(0.8, 6);
  });

  it('estimates OG from grain × potential × efficiency over the batch volume', async () => {
    // Worked example in US units: 10 lb of pale malt at 37 points per pound per gallon, 75 %
    // efficiency, 5 gallons: 10 × 37 × 0.75 / 5 = 55.5 points, OG 1.0555 (the usual
    // points-per-pound-per-gallon method of homebrewing handbooks; recalled from memory).
    const { agent } = await brewerWithAgent();
    const ppgToSi = LITRES_PER_US_GALLON / KG_PER_LB; // points·gal/lb → points·L/kg
    const res = await agent.post('/api/recipes').send(
      paleAle({
        batchVolumeL: 5 * LITRES_PER_US_GALLON,
        fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 10 * KG_PER_LB, potentialPointsLPerKg: 37 * ppgToSi }],
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body.estimatedOg).toBeCloseTo(1.0555, 6);
  });

  it('does not scale extracts and sugar by the mash efficiency', async () => {
    // 1 kg of dry malt extract at 367 points·L/kg in 20 L: 18.35 points, whatever the efficiency
    // (extract dissolves whole; shared/brewmath's default potential for DME).
    const { agent } = await brewerWithAgent();
    const res = await agent.post('/api/recipes').send(
      paleAle({ batchVolumeL: 20, efficiency: 0.5, fermentables: [{ name: 'Light DME', kind: 'dry-extract', amountKg: 1, potentialPointsLPerKg: 367 }] }),
    );
    expect(res.body.estimatedOg).toBeCloseTo(1.01835, 6);
  });

  it('answers 401 to a visitor', async () => {
    await request(h.app).get('/api/recipes').expect(401);
    await request(h.app).post('/api/recipes').send(paleAle()).expect(401);
  });
});

describe('bad input: a 400 with a message per field, and nothing saved', () => {
  it('refuses negative amounts, FG above OG, post-boil above pre-boil', async () => {
    const { user, agent } = await brewerWithAgent();
    const before = await countRecipes(user.id);
    const res = await agent.post('/api/recipes').send(
      paleAle({
        targetOg: 1.04,
        targetFg: 1.05,
        preBoilVolumeL: 24,
        postBoilVolumeL: 26,
        fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: -4, potentialPointsLPerKg: 300 }],
        hops: [{ name: 'Hop', amountG: -10, minutes: 60, alphaAcidPercent: 5 }],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({
      'fermentables.0.amountKg': 'Amount cannot be negative.',
      'hops.0.amountG': 'Amount cannot be negative.',
      targetFg: 'Target FG must be below the target OG: fermentation only lowers gravity.',
      postBoilVolumeL: 'Post-boil volume cannot be above the pre-boil volume: a boil only loses water.',
    });
    expect(await countRecipes(user.id)).toBe(before);
  });

  it('refuses a boil-off rate that contradicts the volumes and boil length', async () => {
    // 28 L boiled 60 minutes at 2 L/h leaves 26 L, not 24 L; the volumes imply 4 L/h.
    const { agent } = await brewerWithAgent();
    const res = await agent.post('/api/recipes').send(paleAle({ boilOffLPerHour: 2 }));
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({
      boilOffLPerHour:
        'This boil-off rate does not match the volumes: over 60 minutes it would leave 26.0 L (6.87 gal), not the post-boil 24.0 L (6.34 gal). The volumes imply about 4.0 L (1.06 gal) per hour.',
    });
    // Within the tolerance (0.5 L or 2 % of pre-boil, common practice, no source) it is accepted.
    await agent.post('/api/recipes').send(paleAle({ boilOffLPerHour: 3.6 })).expect(201);
  });

  it('names missing and non-numeric fields', async () => {
    const { agent } = await brewerWithAgent();
    const res = await agent.post('/api/recipes').send({ ...paleAle(), name: '  ', batchVolumeL: 'lots', targetOg: undefined, fermentables: [] });
    expect(res.status).toBe(400);
    expect(res.body.fields).toMatchObject({
      name: 'Enter a name for the recipe.',
      batchVolumeL: 'Batch volume must be a number.',
      targetOg: 'Enter the target OG.',
      fermentables: 'Add at least one fermentable.',
    });
  });
});

describe('permissions', () => {
  it("hides another brewer's private recipe (404, like a recipe that does not exist)", async () => {
    const owner = await brewerWithAgent();
    const { id } = (await owner.agent.post('/api/recipes').send(paleAle())).body;
    const stranger = await brewerWithAgent();
    const hidden = await stranger.agent.get(`/api/recipes/${id}`);
    const missing = await stranger.agent.get('/api/recipes/999999');
    expect(hidden.status).toBe(404);
    expect(hidden.body).toEqual(missing.body);
    await stranger.agent.put(`/api/recipes/${id}`).send({ ...paleAle(), version: 1 }).expect(404);
    await stranger.agent.delete(`/api/recipes/${id}`).expect(404);
    await stranger.agent.post(`/api/recipes/${id}/clone`).expect(404);
    await stranger.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [] }).expect(404);
    await stranger.agent.get(`/api/recipes/${id}/export`).expect(404);
    const list = await stranger.agent.get('/api/recipes');
    expect(list.body.items.map((r: { id: number }) => r.id)).not.toContain(id);
  });

  it('a club-shared recipe: members view, clone and export; only the owner edits, deletes or shares', async () => {
    const club = await makeClub(h.ctx.db);
    const otherClub = await makeClub(h.ctx.db);
    const owner = await brewerWithAgent();
    const member = await brewerWithAgent({ displayName: 'Club Member' });
    const outsider = await brewerWithAgent();
    await addMember(h.ctx.db, club.id, owner.user.id);
    await addMember(h.ctx.db, otherClub.id, owner.user.id);
    await addMember(h.ctx.db, club.id, member.user.id, 'mentor');
    const { id } = (await owner.agent.post('/api/recipes').send(paleAle({ name: 'Shared Pale' }))).body;

    await member.agent.get(`/api/recipes/${id}`).expect(404);
    const shared = await owner.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [club.id, otherClub.id, club.id] });
    expect(shared.status).toBe(200);
    expect(shared.body).toEqual({ recipeId: id, clubIds: [club.id, otherClub.id].sort((a, b) => a - b) });

    const seen = await member.agent.get(`/api/recipes/${id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.permissions).toEqual({ edit: false, share: false, delete: false, clone: true });
    // The member learns only about the club they are in.
    expect(seen.body.sharedWithClubIds).toEqual([club.id]);
    const list = await member.agent.get('/api/recipes?scope=shared');
    expect(list.body.items.map((r: { id: number }) => r.id)).toContain(id);

    await member.agent.put(`/api/recipes/${id}`).send({ ...paleAle(), version: 1 }).expect(403);
    await member.agent.delete(`/api/recipes/${id}`).expect(403);
    await member.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [] }).expect(403);
    await member.agent.get(`/api/recipes/${id}/export?format=csv`).expect(200);

    const copy = await member.agent.post(`/api/recipes/${id}/clone`);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Shared Pale (copy)', ownerId: member.user.id, clonedFromId: id, version: 1, sharedWithClubIds: [] });
    expect(copy.body.fermentables).toEqual(paleAle().fermentables!.map((f) => ({ ...f, colourLovibond: null })));
    expect(copy.body.permissions.edit).toBe(true);

    await outsider.agent.get(`/api/recipes/${id}`).expect(404);

    // Back to private: the member loses sight of it (their clone stays theirs).
    await owner.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [] }).expect(200);
    await member.agent.get(`/api/recipes/${id}`).expect(404);
    await member.agent.get(`/api/recipes/${copy.body.id}`).expect(200);
  });

  it('refuses to share with a club the owner does not belong to', async () => {
    const owner = await brewerWithAgent();
    const strangersClub = await makeClub(h.ctx.db);
    const { id } = (await owner.agent.post('/api/recipes').send(paleAle())).body;
    const res = await owner.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [strangersClub.id] });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ 'clubIds.0': 'You can only share with a club you belong to.' });
    const bad = await owner.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: 'all' });
    expect(bad.status).toBe(400);
  });

  it('loadRecipeForActor applies the same rules for other features', async () => {
    const club = await makeClub(h.ctx.db);
    const owner = await brewerWithAgent();
    const member = await makeUser(h.ctx.db);
    await addMember(h.ctx.db, club.id, owner.user.id);
    await addMember(h.ctx.db, club.id, member.id);
    const { id } = (await owner.agent.post('/api/recipes').send(paleAle())).body;
    const memberActor = (await loadSessionUser(h.ctx.db, member.id))!;
    await expect(loadRecipeForActor(h.ctx.db, memberActor, id, 'read')).rejects.toMatchObject({ status: 404 });
    await owner.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [club.id] }).expect(200);
    await expect(loadRecipeForActor(h.ctx.db, memberActor, id, 'read')).resolves.toMatchObject({ row: { id } });
    await expect(loadRecipeForActor(h.ctx.db, memberActor, id, 'update')).rejects.toMatchObject({ status: 403 });
  });
});

describe('PUT /api/recipes/:id and versions', () => {
  it('saves over the current version, bumps it and replaces the ingredient lists', async () => {
    const { agent } = await brewerWithAgent();
    const created = (await agent.post('/api/recipes').send(paleAle())).body;
    const res = await agent.put(`/api/recipes/${created.id}`).send({ ...paleAle({ name: 'Renamed', hops: [], mashSteps: [{ tempC: 67, minutes: 45 }] }), version: 1 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Renamed', version: 2, hops: [], mashSteps: [{ tempC: 67, minutes: 45 }] });
    expect(new Date(res.body.updatedAt).getTime()).toBeGreaterThanOrEqual(new Date(created.updatedAt).getTime());
  });

  it('refuses a save from an older version with 409, and changes nothing', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle())).body;
    await agent.put(`/api/recipes/${id}`).send({ ...paleAle({ name: 'Saved in the other tab' }), version: 1 }).expect(200);
    const stale = await agent.put(`/api/recipes/${id}`).send({ ...paleAle({ name: 'Typed in this tab' }), version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/you were editing version 1, and version 2 was saved at .* UTC\. Your changes were not saved and nothing was overwritten\./);
    const now = await agent.get(`/api/recipes/${id}`);
    expect(now.body).toMatchObject({ name: 'Saved in the other tab', version: 2 });
  });

  it('lets exactly one of two simultaneous saves from the same version through', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle())).body;
    const [a, b] = await Promise.all([
      agent.put(`/api/recipes/${id}`).send({ ...paleAle({ name: 'A' }), version: 1 }),
      agent.put(`/api/recipes/${id}`).send({ ...paleAle({ name: 'B' }), version: 1 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? 'A' : 'B';
    expect((await agent.get(`/api/recipes/${id}`)).body).toMatchObject({ name: winner, version: 2 });
  });

  it('validates a save like a create, and needs the version', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle())).body;
    const res = await agent.put(`/api/recipes/${id}`).send(paleAle({ targetFg: 1.06 }));
    expect(res.status).toBe(400);
    expect(res.body.fields).toMatchObject({ version: 'The recipe version is missing; reload the recipe.', targetFg: expect.stringMatching(/below the target OG/) });
  });
});

describe('DELETE /api/recipes/:id', () => {
  it('deletes the recipe and its ingredient rows', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle())).body;
    await agent.delete(`/api/recipes/${id}`).expect(204);
    await agent.get(`/api/recipes/${id}`).expect(404);
    expect(await h.ctx.db.select().from(recipeFermentables).where(eq(recipeFermentables.recipeId, id))).toEqual([]);
  });
});

describe('GET /api/recipes: search, sort and paging on the server', () => {
  it('searches name and style, sorts and pages', async () => {
    const { agent } = await brewerWithAgent();
    const specs = [
      { name: 'Amber Fox', style: 'Amber ale', targetOg: 1.052, targetFg: 1.012 },
      { name: 'Barley Storm', style: 'Barley wine', targetOg: 1.1, targetFg: 1.025 },
      { name: 'Copper Kettle', style: 'Bitter', targetOg: 1.04, targetFg: 1.01 },
      { name: 'Dark Hollow 100%', style: 'Stout', targetOg: 1.06, targetFg: 1.016 },
    ];
    for (const s of specs) await agent.post('/api/recipes').send(paleAle(s)).expect(201);

    const byName = await agent.get('/api/recipes?sort=name&pageSize=2');
    expect(byName.body).toMatchObject({ pageSize: 2, nextCursor: expect.any(String) });
    expect(byName.body).not.toHaveProperty('total');
    expect(byName.body.items.map((r: { name: string }) => r.name)).toEqual(['Amber Fox', 'Barley Storm']);
    const page2 = await agent.get('/api/recipes').query({ sort: 'name', pageSize: 2, cursor: byName.body.nextCursor });
    expect(page2.body.items.map((r: { name: string }) => r.name)).toEqual(['Copper Kettle', 'Dark Hollow 100%']);
    // Exactly four: the last page says there is no more.
    expect(page2.body.nextCursor).toBeNull();

    const strongest = await agent.get('/api/recipes?sort=abv&dir=desc&pageSize=1');
    expect(strongest.body.items[0]).toMatchObject({ name: 'Barley Storm', isOwner: true });
    // (1.100 − 1.025) × 131.25 = 9.84 % (the simple rule).
    expect(strongest.body.items[0].abvPercent).toBeCloseTo(9.84375, 6);
    const lightest = await agent.get('/api/recipes?sort=og&pageSize=1');
    expect(lightest.body.items[0].name).toBe('Copper Kettle');

    const search = await agent.get('/api/recipes?q=barley');
    expect(search.body.items.map((r: { name: string }) => r.name)).toEqual(['Barley Storm']);
    const byStyle = await agent.get('/api/recipes?q=STOUT');
    expect(byStyle.body.items.map((r: { name: string }) => r.name)).toEqual(['Dark Hollow 100%']);
    // % is a character here, not a wildcard.
    const literal = await agent.get('/api/recipes?q=0%25');
    expect(literal.body.items.map((r: { name: string }) => r.name)).toEqual(['Dark Hollow 100%']);

    const bad = await agent.get('/api/recipes?sort=colour&pageSize=1000');
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ sort: 'Sort by name, style, og, abv or updated.', pageSize: 'Ask for at most 100 recipes a page.' });
  });
});

describe('GET /api/recipes: paged by key across mine and shared', () => {
  it('walks every sort in both directions without repeating or skipping a recipe, own and shared mixed, equal values ordered by id', async () => {
    const s = await makeScene(h);
    const mine = [1.04, 1.05, 1.05, 1.05, 1.062];
    const theirs = [1.045, 1.05, 1.07];
    for (const [i, og] of mine.entries()) await s.owner.agent.post('/api/recipes').send(paleAle({ name: `Mine ${i}`, style: i % 2 ? 'Bitter' : 'Stout', targetOg: og })).expect(201);
    for (const [i, og] of theirs.entries()) {
      const { id } = (await s.member.agent.post('/api/recipes').send(paleAle({ name: `Theirs ${i}`, style: 'Mild', targetOg: og })).expect(201)).body;
      await s.member.agent.put(`/api/recipes/${id}/sharing`).send({ clubIds: [s.club.id] }).expect(200);
    }
    // Someone else's unshared recipe never shows.
    await s.other.agent.post('/api/recipes').send(paleAle({ name: 'Elsewhere', targetOg: 1.05 })).expect(201);

    for (const sort of ['name', 'style', 'og', 'abv', 'updated'] as const) {
      for (const dir of ['asc', 'desc'] as const) {
        const all = (await s.owner.agent.get('/api/recipes').query({ sort, dir, pageSize: 100 }).expect(200)).body;
        expect(all.nextCursor).toBeNull();
        // The scene's own recipe, five more of mine and three shared by a club member.
        expect(all.items).toHaveLength(1 + mine.length + theirs.length);
        const walked: number[] = [];
        let cursor: string | undefined;
        for (let guard = 0; guard < 20; guard++) {
          const res = await s.owner.agent.get('/api/recipes').query({ sort, dir, pageSize: 3, ...(cursor ? { cursor } : {}) }).expect(200);
          walked.push(...res.body.items.map((r: { id: number }) => r.id));
          cursor = res.body.nextCursor ?? undefined;
          if (!cursor) break;
        }
        expect(walked, `${sort} ${dir}`).toEqual(all.items.map((r: { id: number }) => r.id));
      }
    }
    const shared = (await s.owner.agent.get('/api/recipes?scope=shared&sort=og').expect(200)).body.items;
    expect(shared.map((r: { name: string }) => r.name)).toEqual(['Theirs 0', 'Theirs 1', 'Theirs 2']);
    const byOg = (await s.owner.agent.get('/api/recipes?sort=og&pageSize=100').expect(200)).body.items.map((r: { targetOg: number }) => r.targetOg);
    expect(byOg).toEqual([...byOg].sort((a, b) => a - b));

    const bad = await s.owner.agent.get('/api/recipes').query({ sort: 'name', cursor: 'not-a-cursor' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ cursor: 'This list has changed since; start again from the top.' });
  });
});

describe('getRecipeTargets: the snapshot a brew day keeps', () => {
  it('returns the targets of the current version; a snapshot taken earlier does not change', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle())).body;
    const before = await getRecipeTargets(h.ctx.db, id);
    expect(recipeTargetsSchema.parse(before)).toEqual(before);
    expect(before).toEqual({
      recipeId: id,
      recipeVersion: 1,
      name: 'Test Pale',
      style: 'Pale ale',
      batchVolumeL: 23,
      preBoilVolumeL: 28,
      postBoilVolumeL: 24,
      boilMinutes: 60,
      boilOffLPerHour: 4,
      efficiency: 0.75,
      targetOg: 1.045,
      targetFg: 1.01,
      targetIbu: null,
      targetColourSrm: null,
      souringTargetPh: null,
      hops: [
        { amountG: 25, minutes: 60, alphaAcidPercent: 8 },
        { amountG: 30, minutes: 5, alphaAcidPercent: 5.5 },
      ],
      grist: [{ amountKg: 4.6, colourLovibond: null }],
      mashPhTarget: 5.3,
      mashSteps: [
        { tempC: 66, minutes: 60 },
        { tempC: 76, minutes: 10 },
      ],
      fermentationTempMinC: 18,
      fermentationTempMaxC: 20,
    });
    const kept = structuredClone(before);
    await agent.put(`/api/recipes/${id}`).send({ ...paleAle({ targetOg: 1.05, mashSteps: [] }), version: 1 }).expect(200);
    expect(before).toEqual(kept);
    expect(await getRecipeTargets(h.ctx.db, id)).toMatchObject({ recipeVersion: 2, targetOg: 1.05, mashSteps: [] });
    await expect(getRecipeTargets(h.ctx.db, 999999)).rejects.toMatchObject({ status: 404 });
  });
});

describe('export and import', () => {
  it('exports our JSON, which imports back to the same recipe', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle({ name: 'Round Trip Ölbier' }))).body;
    const file = await agent.get(`/api/recipes/${id}/export?format=json`);
    expect(file.status).toBe(200);
    expect(file.headers['content-disposition']).toMatch(/^attachment; filename="?round-trip-olbier\.wortwise\.json"?$/);
    const json = JSON.parse(file.text);
    expect(json).toMatchObject({ format: 'wortwise-recipe', version: 2, recipe: { ...paleAle({ name: 'Round Trip Ölbier' }) } });

    const imported = await agent.post('/api/recipes/import').attach('file', Buffer.from(file.text), 'recipe.json');
    expect(imported.status).toBe(201);
    expect(imported.body.ignored).toEqual([]);
    expect(imported.body.recipe).toMatchObject({ ...json.recipe, version: 1 });
    expect(imported.body.recipe.id).not.toBe(id);
  });

  it('exports CSV, one value per row, in SI, with text that cannot run as a formula', async () => {
    const { agent } = await brewerWithAgent();
    const { id } = (await agent.post('/api/recipes').send(paleAle({ name: '=HYPERLINK("x")', notes: 'Line one\nline, two' }))).body;
    const res = await agent.get(`/api/recipes/${id}/export?format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    const lines = res.text.replace(/^\ufeff/, '').split('\r\n');
    expect(lines[0]).toBe('section,position,field,value,unit');
    expect(lines).toContain(`recipe,,name,"'=HYPERLINK(""x"")",`);
    expect(lines).toContain('recipe,,batch_volume,23,L');
    expect(lines).toContain('recipe,,brewhouse_efficiency,75,%');
    expect(lines).toContain('recipe,,target_og,1.045,SG');
    expect(lines).toContain('fermentable,1,amount,4.6,kg');
    expect(lines).toContain('hop,2,alpha_acid,5.5,%');
    expect(lines).toContain('mash_step,2,temperature,76,°C');
    expect(res.text).toContain('recipe,,notes,"Line one\nline, two",');
  });

  it('imports nothing from an invalid file and reports every problem', async () => {
    const { user, agent } = await brewerWithAgent();
    const before = await countRecipes(user.id);
    const file = {
      format: 'wortwise-recipe',
      version: 1,
      recipe: { ...paleAle(), targetFg: 1.2, fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: -1, potentialPointsLPerKg: 300 }] },
    };
    const res = await agent.post('/api/recipes/import').attach('file', Buffer.from(JSON.stringify(file)), 'bad.json');
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('Nothing was imported: the file has 2 problems.');
    expect(res.body.fields).toEqual({
      'recipe.fermentables.0.amountKg': 'Amount cannot be negative.',
      'recipe.targetFg': 'Target FG must be below the target OG: fermentation only lowers gravity.',
    });

    const notJson = await agent.post('/api/recipes/import').attach('file', Buffer.from('name,og\nx,1.05'), 'x.csv');
    expect(notJson.status).toBe(400);
    expect(notJson.body.message).toMatch(/^Nothing was imported: the file is not valid JSON/);

    const foreign = await agent.post('/api/recipes/import').attach('file', Buffer.from(JSON.stringify({ format: 'something-else', version: 1, recipe: {} })), 'x.json');
    expect(foreign.status).toBe(400);
    expect(foreign.body.fields.format).toBe('This is not a Wortwise recipe file: "format" must be "wortwise-recipe".');

    const none = await agent.post('/api/recipes/import');
    expect(none.status).toBe(400);
    expect(none.body.fields).toEqual({ file: 'Choose a Wortwise recipe file (.json) to import.' });

    expect(await countRecipes(user.id)).toBe(before);
  });

  it('imports a valid file and lists the fields it ignored', async () => {
    const { agent } = await brewerWithAgent();
    const file = { format: 'wortwise-recipe', version: 1, colour: 'gold', recipe: { ...paleAle(), bitterness: 30, hops: [{ ...paleAle().hops![0], form: 'pellet' }] } };
    const res = await agent.post('/api/recipes/import').attach('file', Buffer.from(JSON.stringify(file)), 'ok.json');
    expect(res.status).toBe(201);
    expect(res.body.ignored).toEqual([
      { path: 'colour', message: 'Not part of a Wortwise recipe: ignored.' },
      { path: 'recipe.bitterness', message: 'Not part of a Wortwise recipe: ignored.' },
      { path: 'recipe.hops.0.form', message: 'Not part of a Wortwise recipe: ignored.' },
    ]);
    expect(res.body.recipe).not.toHaveProperty('bitterness');
  });

  it('refuses a file larger than 256 kB', async () => {
    const { agent } = await brewerWithAgent();
    const res = await agent.post('/api/recipes/import').attach('file', Buffer.alloc(300 * 1024, 32), 'big.json');
    expect(res.status).toBe(413);
  });
});
