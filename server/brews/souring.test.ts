import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { brewReadings } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeInstrument, makeScene, startBrewDay, testRecipe, type Scene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/** A kettle sour: the scene's pale ale with a souring target of pH 3.4 (common practice 3.2 to 3.6, no source). */
async function startSourBrewDay(scene: Scene): Promise<number> {
  const recipe = await scene.owner.agent.post('/api/recipes').send({ ...testRecipe, name: 'Scene Sour', souringTargetPh: 3.4 }).expect(201);
  const res = await scene.owner.agent.post('/api/brews').send({ recipeId: recipe.body.id }).expect(201);
  return res.body.id;
}

async function readingCount(brewId: number) {
  return (await h.ctx.db.select({ id: brewReadings.id }).from(brewReadings).where(eq(brewReadings.brewId, brewId))).length;
}

describe('the souring stage', () => {
  it('appears between mash and boil only when the recipe sets a souring target', async () => {
    const scene = await makeScene(h);
    const plain = await scene.owner.agent.get(`/api/brews/${await startBrewDay(scene)}`).expect(200);
    expect(plain.body.stages.map((s: { stage: string }) => s.stage)).toEqual(['mash', 'boil', 'chill', 'og']);
    const sour = await scene.owner.agent.get(`/api/brews/${await startSourBrewDay(scene)}`).expect(200);
    expect(sour.body.targets.souringTargetPh).toBe(3.4);
    expect(sour.body.stages.map((s: { stage: string }) => s.stage)).toEqual(['mash', 'souring', 'boil', 'chill', 'og']);
  });

  it('stores a souring pH taken with the calibrated pH meter under the souring stage, and starts that stage', async () => {
    const scene = await makeScene(h);
    const id = await startSourBrewDay(scene);
    const meter = await makeInstrument(scene, { kind: 'ph_meter', name: 'Pen meter', calibratedOn: '2025-09-19', reminderDays: 30 });
    const takenAt = '2025-09-20T20:00:00.000Z';
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'souring_ph', instrumentId: meter, ph: 3.52, takenAt }).expect(201);
    expect(res.body).toMatchObject({
      kind: 'souring_ph',
      stage: 'souring',
      quantity: 'ph',
      raw: { ph: 3.52 },
      corrected: 3.52,
      instrument: { instrumentId: meter, kind: 'ph_meter', calibratedOn: '2025-09-19' },
      correction: { kind: 'ph-calibration', calibratedOn: '2025-09-19', daysSinceCalibration: 1 },
    });
    const [row] = await h.ctx.db.select().from(brewReadings).where(eq(brewReadings.id, res.body.id));
    expect(row.stage).toBe('souring');
    const souring = res.body.brewDay.stages.find((s: { stage: string }) => s.stage === 'souring');
    expect(souring.startedAt).toBe(takenAt);
  });

  it('completing the mash moves on to souring; completing souring moves on to the boil', async () => {
    const scene = await makeScene(h);
    const id = await startSourBrewDay(scene);
    const mashDone = await scene.owner.agent.post(`/api/brews/${id}/stages/mash`).send({ action: 'complete' }).expect(200);
    expect(mashDone.body.currentStage).toBe('souring');
    const souringDone = await scene.owner.agent.post(`/api/brews/${id}/stages/souring`).send({ action: 'complete' }).expect(200);
    expect(souringDone.body.currentStage).toBe('boil');
  });

  it('refuses a pH outside 2.5 to 7 with a message under the field, and saves nothing', async () => {
    const scene = await makeScene(h);
    const id = await startSourBrewDay(scene);
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'souring_ph', ph: 1.9 });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ ph: 'Souring wort reads between pH 2.5 and 7; anything else is a misreading or a meter fault. Check the meter.' });
    expect(await readingCount(id)).toBe(0);
  });

  it('refuses a souring reading or stage on a brew day whose recipe does not sour', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'souring_ph', ph: 3.5 });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ kind: 'This brew day has no souring stage: its recipe sets no souring target pH.' });
    expect(await readingCount(id)).toBe(0);
    const stage = await scene.owner.agent.post(`/api/brews/${id}/stages/souring`).send({ action: 'start' });
    expect(stage.status).toBe(400);
    expect(stage.body.fields).toHaveProperty('stage');
  });
});
