/**
 * Bitterness and colour targets on recipes, their estimates, the colour preference, and the
 * history of saved versions.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { RecipeInput } from '@shared/schemas/recipes';
import { makeUser } from '../db/factories';
import { createHarness, type TestHarness } from '../../tests/support/api';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/** The pale ale of recipes.test.ts with a colour for its malt and bitterness/colour targets. */
function paleAle(overrides: Partial<RecipeInput> = {}): RecipeInput {
  return {
    name: 'Bitter Pale',
    style: 'Pale ale',
    notes: '',
    batchVolumeL: 23,
    preBoilVolumeL: 28,
    postBoilVolumeL: 24,
    boilMinutes: 60,
    boilOffLPerHour: 4,
    efficiency: 0.75,
    targetOg: 1.045,
    targetFg: 1.01,
    targetIbu: 27,
    targetColourSrm: 4.5,
    fermentationTempMinC: 18,
    fermentationTempMaxC: 20,
    fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 4.6, potentialPointsLPerKg: 300, colourLovibond: 3 }],
    hops: [
      { name: 'Bittering hop', amountG: 25, minutes: 60, alphaAcidPercent: 8 },
      { name: 'Aroma hop', amountG: 30, minutes: 5, alphaAcidPercent: 5.5 },
    ],
    ...overrides,
  };
}

async function brewer(input: Parameters<typeof makeUser>[1] = {}) {
  const user = await makeUser(h.ctx.db, input);
  return { user, agent: await h.signIn(user.email) };
}

describe('bitterness and colour on a recipe', () => {
  it('stores the targets and answers with Tinseth and Morey estimates and BU:GU (worked by hand)', async () => {
    const { agent } = await brewer();
    const res = await agent.post('/api/recipes').send(paleAle());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ targetIbu: 27, targetColourSrm: 4.5, souringTargetPh: null });
    expect(res.body.fermentables[0].colourLovibond).toBe(3);
    // OG estimate 4.6 kg × 300 × 0.75 / 23 L = 45 points. Boil gravity (Tinseth: the boil's average):
    // pre-boil 1 + 0.045 × 24/28 = 1.038571; average with 1.045 = 1.041786.
    // bigness 1.65 × 0.000125^0.041786 = 1.65 × 0.686921 = 1.133419
    // 60 min: × (1 − e^−2.4)/4.15 = × 0.219104 → U 0.248337; 0.08 × 25 000 / 23 = 86.957 mg/L → 21.595 IBU
    // 5 min: × (1 − e^−0.2)/4.15 = × 0.043679 → U 0.049507; 0.055 × 30 000 / 23 = 71.739 mg/L → 3.552 IBU
    // total 25.15 IBU (Tinseth 1997, published formula)
    expect(res.body.estimatedIbu).toBeCloseTo(25.15, 1);
    // Morey: 4.6 kg = 10.1413 lb × 3 °L = 30.424; 23 L = 6.07596 gal; MCU 5.00724;
    // 5.00724^0.6859 = 3.01894; × 1.4922 = 4.505 SRM
    expect(res.body.estimatedColourSrm).toBeCloseTo(4.505, 2);
    // BU:GU from the targets: 27 / 45 = 0.6
    expect(res.body.buToGu).toBeCloseTo(0.6, 10);
  });

  it('a recipe with no hops has no bitterness estimate; unknown malt colour gives no colour estimate', async () => {
    const { agent } = await brewer();
    const res = await agent.post('/api/recipes').send(
      paleAle({ hops: [], targetIbu: null, targetColourSrm: null, fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 4.6, potentialPointsLPerKg: 300 }] }),
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ estimatedIbu: null, estimatedColourSrm: null, targetIbu: null, targetColourSrm: null, buToGu: null });
  });

  it('bad bitterness and colour input: a 400 naming each field, nothing saved', async () => {
    const { agent } = await brewer();
    const before = (await agent.get('/api/recipes?scope=mine')).body.total;
    const res = await agent.post('/api/recipes').send(
      paleAle({
        targetIbu: -5,
        targetColourSrm: 150,
        souringTargetPh: 5.5,
        fermentables: [{ name: 'Black malt', kind: 'grain', amountKg: 0.2, potentialPointsLPerKg: 200, colourLovibond: 900 }],
        hops: [{ name: 'Hop', amountG: 10, minutes: 60, alphaAcidPercent: 26 }],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({
      targetIbu: 'Target bitterness cannot be negative.',
      targetColourSrm: 'Target colour must be between 1 and 100 SRM (2 EBC and 197 EBC).',
      souringTargetPh: 'Souring target pH must be between 2.8 and 4.6; kettle sours usually aim for about 3.2 to 3.6 before the boil.',
      'fermentables.0.colourLovibond': 'Malt colour must be between 0 and 700 °L (0 and 1379 EBC); black malt is about 500 °L.',
      'hops.0.alphaAcidPercent': 'Alpha acid must be above 0 and at most 25 %; hops are sold at about 2 to 20 %.',
    });
    const negative = await agent.post('/api/recipes').send(paleAle({ hops: [{ name: 'Hop', amountG: 10, minutes: -1, alphaAcidPercent: 5 }] }));
    expect(negative.body.fields).toEqual({ 'hops.0.minutes': 'Minutes cannot be negative.' });
    expect((await agent.get('/api/recipes?scope=mine')).body.total).toBe(before);
  });

  it('keeps the colour scale a brewer prefers', async () => {
    const { agent } = await brewer();
    expect((await agent.get('/api/auth/me')).body.colourScale).toBe('srm');
    const res = await agent.patch('/api/auth/me').send({ colourScale: 'ebc' });
    expect(res.status).toBe(200);
    expect(res.body.colourScale).toBe('ebc');
    const bad = await agent.patch('/api/auth/me').send({ colourScale: 'lovibond' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ colourScale: 'Choose SRM or EBC.' });
  });

  it('exports version 2 files with the new fields and still imports a version 1 file', async () => {
    const { agent } = await brewer();
    const { body: created } = await agent.post('/api/recipes').send(paleAle({ souringTargetPh: 3.4 }));
    const exported = await agent.get(`/api/recipes/${created.id}/export?format=json`);
    const file = JSON.parse(exported.text);
    expect(file.version).toBe(2);
    expect(file.recipe).toMatchObject({ targetIbu: 27, targetColourSrm: 4.5, souringTargetPh: 3.4 });
    expect(file.recipe.fermentables[0].colourLovibond).toBe(3);
    const back = await agent.post('/api/recipes/import').attach('file', Buffer.from(exported.text), 'x.json');
    expect(back.status).toBe(201);
    expect(back.body.ignored).toEqual([]);
    expect(back.body.recipe).toMatchObject({ targetIbu: 27, targetColourSrm: 4.5, souringTargetPh: 3.4 });

    const { targetIbu: _i, targetColourSrm: _c, ...old } = paleAle({ fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 4.6, potentialPointsLPerKg: 300 }] });
    const v1 = await agent.post('/api/recipes/import').attach('file', Buffer.from(JSON.stringify({ format: 'wortwise-recipe', version: 1, recipe: old })), 'old.json');
    expect(v1.status).toBe(201);
    expect(v1.body.ignored).toEqual([]);
    expect(v1.body.recipe).toMatchObject({ targetIbu: null, targetColourSrm: null, souringTargetPh: null, estimatedColourSrm: null });

    const csv = await agent.get(`/api/recipes/${created.id}/export?format=csv`);
    const lines = csv.text.replace(/^\ufeff/, '').split('\r\n');
    expect(lines).toContain('recipe,,target_ibu,27,IBU');
    expect(lines).toContain('recipe,,target_colour,4.5,SRM');
    expect(lines).toContain('fermentable,1,colour,3,°L');
  });
});

describe('recipe history', () => {
  it('keeps every saved version, shows each, and says what changed', async () => {
    const { agent } = await brewer({ displayName: 'Wren Halloway' });
    const { body: created } = await agent.post('/api/recipes').send(paleAle());
    await agent.put(`/api/recipes/${created.id}`).send({ ...paleAle({ targetIbu: 32 }), version: 1 }).expect(200);
    await agent.put(`/api/recipes/${created.id}`).send({ ...paleAle({ targetIbu: 32, hops: [paleAle().hops![0]] }), version: 2 }).expect(200);

    const list = await agent.get(`/api/recipes/${created.id}/versions`);
    expect(list.status).toBe(200);
    expect(list.body.map((v: { version: number }) => v.version)).toEqual([3, 2, 1]);
    expect(list.body[0].savedByName).toBe('Wren Halloway');

    const v1 = await agent.get(`/api/recipes/${created.id}/versions/1`);
    expect(v1.body).toMatchObject({ recipeId: created.id, version: 1, data: { targetIbu: 27 } });
    expect(v1.body.data.hops).toHaveLength(2);
    const v3 = await agent.get(`/api/recipes/${created.id}/versions/3`);
    expect(v3.body.data).toMatchObject({ targetIbu: 32 });
    expect(v3.body.data.hops).toHaveLength(1);

    await agent.get(`/api/recipes/${created.id}/versions/9`).expect(404);
    const bad = await agent.get(`/api/recipes/${created.id}/versions/zero`);
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ version: 'The version must be a number.' });
  });

  it('a 409 on a stale save adds no version', async () => {
    const { agent } = await brewer();
    const { body: created } = await agent.post('/api/recipes').send(paleAle());
    await agent.put(`/api/recipes/${created.id}`).send({ ...paleAle({ name: 'A' }), version: 1 }).expect(200);
    await agent.put(`/api/recipes/${created.id}`).send({ ...paleAle({ name: 'B' }), version: 1 }).expect(409);
    expect((await agent.get(`/api/recipes/${created.id}/versions`)).body).toHaveLength(2);
    expect((await agent.get(`/api/recipes/${created.id}/versions/2`)).body.data.name).toBe('A');
  });

  it('another brewer cannot read the history of a private recipe (404)', async () => {
    const { agent } = await brewer();
    const { body: created } = await agent.post('/api/recipes').send(paleAle());
    const other = await brewer();
    await other.agent.get(`/api/recipes/${created.id}/versions`).expect(404);
    await other.agent.get(`/api/recipes/${created.id}/versions/1`).expect(404);
  });
});
