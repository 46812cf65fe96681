import request from 'supertest';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { brewReadings, brews, recipes } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { brewDayChange } from './service';
import { makeInstrument, makeScene, startBrewDay, testRecipe, type Scene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function readingCount(brewId: number) {
  return (await h.ctx.db.select({ id: brewReadings.id }).from(brewReadings).where(eq(brewReadings.brewId, brewId))).length;
}

async function shareWithClub(scene: Scene, brewId: number) {
  await scene.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
}

describe('starting a brew day', () => {
  it('snapshots the recipe’s targets and the equipment profile, and starts the mash', async () => {
    const scene = await makeScene(h);
    const res = await scene.owner.agent.post('/api/brews').send({ recipeId: scene.recipeId, brewedOn: '2025-09-20' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Scene Pale',
      status: 'brewing',
      brewedOn: '2025-09-20',
      recipeId: scene.recipeId,
      currentStage: 'mash',
      isOwner: true,
      og: null,
      pitchedAt: null,
      targets: { recipeId: scene.recipeId, targetOg: 1.05, targetFg: 1.011, batchVolumeL: 23, mashSteps: testRecipe.mashSteps },
      // No saved kettle yet: the common-practice profile, said so.
      equipment: { source: 'common-practice' },
      permissions: { edit: true, share: true, delete: true },
      readings: [],
      decisions: [],
      deviations: [],
    });
    expect(res.body.boilOffLPerHour).toBe(res.body.equipment.boilOffLPerHour);
    expect(res.body.stages.map((s: { stage: string }) => s.stage)).toEqual(['mash', 'boil', 'chill', 'og']);
    expect(res.body.stages[0].startedAt).not.toBeNull();
    expect(res.body.stages[1].startedAt).toBeNull();
  });

  it('keeps its snapshot when the recipe is deleted', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    await h.ctx.db.delete(recipes).where(eq(recipes.id, scene.recipeId));
    const res = await scene.owner.agent.get(`/api/brews/${id}`).expect(200);
    expect(res.body.recipeId).toBeNull();
    expect(res.body.targets).toMatchObject({ name: 'Scene Pale', targetOg: 1.05 });
  });

  it('starts from a recipe shared with my club, but not from another brewer’s private one', async () => {
    const scene = await makeScene(h);
    await scene.owner.agent.put(`/api/recipes/${scene.recipeId}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
    const fromShared = await scene.member.agent.post('/api/brews').send({ recipeId: scene.recipeId });
    expect(fromShared.status).toBe(201);
    expect(fromShared.body.ownerId).not.toBe(scene.owner.user.id);
    const fromPrivate = await scene.other.agent.post('/api/brews').send({ recipeId: scene.recipeId });
    expect(fromPrivate.status).toBe(404);
  });

  it('asks for a recipe, and needs a signed-in brewer', async () => {
    const scene = await makeScene(h);
    const res = await scene.owner.agent.post('/api/brews').send({});
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ recipeId: 'Choose a recipe.' });
    await request(h.app).post('/api/brews').send({ recipeId: scene.recipeId }).expect(401);
    await request(h.app).get('/api/brews').expect(401);
  });
});

describe('who may see and change a brew day', () => {
  it('owner reads and writes; another brewer gets 404; club members read a shared day but may not write (403); anonymous 401', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const reading = { kind: 'mash_temp', tempC: 66 };

    // Private: only the owner sees it.
    await scene.owner.agent.get(`/api/brews/${id}`).expect(200);
    for (const outsider of [scene.other, scene.member, scene.mentor]) {
      await outsider.agent.get(`/api/brews/${id}`).expect(404);
      await outsider.agent.post(`/api/brews/${id}/readings`).send(reading).expect(404);
    }
    await request(h.app).get(`/api/brews/${id}`).expect(401);

    await shareWithClub(scene, id);
    const asMember = await scene.member.agent.get(`/api/brews/${id}`).expect(200);
    expect(asMember.body).toMatchObject({ isOwner: false, permissions: { edit: false, share: false, delete: false, comment: false } });
    const asMentor = await scene.mentor.agent.get(`/api/brews/${id}`).expect(200);
    expect(asMentor.body.permissions).toMatchObject({ edit: false, comment: true });
    await scene.other.agent.get(`/api/brews/${id}`).expect(404);

    for (const reader of [scene.member, scene.mentor]) {
      await reader.agent.post(`/api/brews/${id}/readings`).send(reading).expect(403);
      await reader.agent.patch(`/api/brews/${id}`).send({ name: 'Mine now' }).expect(403);
      await reader.agent.post(`/api/brews/${id}/stages/boil`).send({ action: 'start' }).expect(403);
      await reader.agent.post(`/api/brews/${id}/notes`).send({ body: 'Hello' }).expect(403);
      await reader.agent.put(`/api/brews/${id}/sharing`).send({ clubIds: [] }).expect(403);
      await reader.agent.delete(`/api/brews/${id}`).expect(403);
    }
    expect(await readingCount(id)).toBe(0);
    const [row] = await h.ctx.db.select().from(brews).where(eq(brews.id, id));
    expect(row.name).toBe('Scene Pale');
  });

  it('lists my brew days, and those shared with my clubs separately', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const mine = await scene.owner.agent.get('/api/brews').expect(200);
    expect(mine.body.items.map((b: { id: number }) => b.id)).toEqual([id]);
    expect(mine.body.nextCursor).toBeNull();
    const none = { items: [], nextCursor: null, pageSize: 20 };
    expect((await scene.member.agent.get('/api/brews?scope=shared').expect(200)).body).toEqual(none);
    await shareWithClub(scene, id);
    const shared = await scene.member.agent.get('/api/brews?scope=shared').expect(200);
    expect(shared.body.items).toMatchObject([{ id, isOwner: false, recipeName: 'Scene Pale', targetOg: 1.05 }]);
    expect((await scene.other.agent.get('/api/brews?scope=shared').expect(200)).body).toEqual(none);
  });

  it('shares only with clubs the owner belongs to', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const res = await scene.owner.agent.put(`/api/brews/${id}/sharing`).send({ clubIds: [scene.club.id, 999_999] });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ 'clubIds.1': 'You can only share with a club you belong to.' });
    await scene.member.agent.get(`/api/brews/${id}`).expect(404);
    const ok = await scene.owner.agent.put(`/api/brews/${id}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
    expect(ok.body).toEqual({ brewId: id, clubIds: [scene.club.id] });
  });

  it('lets only the owner delete it', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    await scene.other.agent.delete(`/api/brews/${id}`).expect(404);
    await scene.owner.agent.delete(`/api/brews/${id}`).expect(204);
    await scene.owner.agent.get(`/api/brews/${id}`).expect(404);
  });
});

describe('stages', () => {
  it('can be skipped and returned to, with the times kept; finishing the OG stage moves the beer to fermenting', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const { agent } = scene.owner;
    let res = await agent.post(`/api/brews/${id}/stages/mash`).send({ action: 'complete' }).expect(200);
    expect(res.body.currentStage).toBe('boil');
    res = await agent.post(`/api/brews/${id}/stages/boil`).send({ action: 'skip' }).expect(200);
    expect(res.body.currentStage).toBe('chill');
    expect(res.body.stages[1].skippedAt).not.toBeNull();
    res = await agent.post(`/api/brews/${id}/stages/boil`).send({ action: 'start' }).expect(200);
    expect(res.body.currentStage).toBe('boil');
    expect(res.body.stages[1]).toMatchObject({ skippedAt: null, completedAt: null });
    expect(res.body.stages[1].startedAt).not.toBeNull();
    await agent.post(`/api/brews/${id}/stages/boil`).send({ action: 'complete' }).expect(200);
    await agent.post(`/api/brews/${id}/stages/chill`).send({ action: 'complete' }).expect(200);
    res = await agent.post(`/api/brews/${id}/stages/og`).send({ action: 'complete' }).expect(200);
    expect(res.body.status).toBe('fermenting');
    const bad = await agent.post(`/api/brews/${id}/stages/sparge`).send({ action: 'start' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.stage).toBe('Unknown stage: use mash, souring, boil, chill or og.');
  });

  it('takes today’s boil-off rate when the brewer changes it', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const res = await scene.owner.agent.patch(`/api/brews/${id}`).send({ boilOffLPerHour: 3.2, notes: 'Windy day, lid half on.' }).expect(200);
    expect(res.body).toMatchObject({ boilOffLPerHour: 3.2, notes: 'Windy day, lid half on.' });
    const bad = await scene.owner.agent.patch(`/api/brews/${id}`).send({ boilOffLPerHour: -1 });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ boilOffLPerHour: 'The boil-off rate cannot be negative.' });
  });
});

describe('readings', () => {
  it('keeps raw and corrected values with the thermometer’s offset (ice-bath check: melting ice is 0 °C)', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const thermometer = await makeInstrument(scene, { kind: 'thermometer', name: 'Probe' });
    // The probe read 0.5 °C in a stirred ice bath, so it reads 0.5 °C high.
    await scene.owner.agent.post(`/api/instruments/${thermometer}/calibrations`).send({ method: 'thermometer-check', iceReadingC: 0.5 }).expect(201);
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_temp', instrumentId: thermometer, tempC: 66.5, note: 'Stirred, middle of the tun' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'mash_temp', stage: 'mash', quantity: 'temperature', instrumentId: thermometer, raw: { tempC: 66.5 }, note: 'Stirred, middle of the tun' });
    expect(res.body.corrected).toBeCloseTo(66.0, 9);
    expect(res.body.instrument).toMatchObject({ kind: 'thermometer', offsetC: 0.5, name: 'Probe' });
  });

  it('corrects an OG sample for temperature (water densities at 20 and 30 °C, CRC Handbook table, recalled from memory)', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const hydrometer = await makeInstrument(scene, { kind: 'hydrometer', name: 'Trial-jar hydrometer', calibrationTempC: 20 });
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'og', instrumentId: hydrometer, sg: 1.046, sampleTempC: 30, volumeL: 21.5 });
    expect(res.status).toBe(201);
    // ρ(20 °C) = 998.2071 kg/m³, ρ(30 °C) = 995.6502 kg/m³: 1.046 × 998.2071 / 995.6502 = 1.04869.
    expect(res.body.corrected).toBeCloseTo((1.046 * 998.2071) / 995.6502, 4);
    expect(res.body.raw).toEqual({ sg: 1.046, sampleTempC: 30, volumeL: 21.5 });
    expect(res.body.volumeL).toBe(21.5);
    const brew = await scene.owner.agent.get(`/api/brews/${id}`).expect(200);
    expect(brew.body.og).toBeCloseTo(1.04869, 4);
    // 21.5 L is 6.5 % short of 23 L: more than the 5 % allowed (common practice, no source).
    expect(brew.body.deviations.map((d: { code: string }) => d.code)).toEqual(['volume-low']);
    // The answer carries what the reading changed, exactly as the whole day now reads, so the
    // client updates its copy without reloading the day.
    const { og, fermenterVolumeL, readingCount, pitchedAt, currentStage, updatedAt, stages, deviations } = brew.body;
    expect(res.body.brewDay).toEqual({ og, fermenterVolumeL, readingCount, pitchedAt, currentStage, updatedAt, stages, deviations });
    expect(fermenterVolumeL).toBe(21.5);
    expect(readingCount).toBe(1);
  });

  it('words a stored hydrometer warning in the brewer’s own units', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const hydrometer = await makeInstrument(scene, { kind: 'hydrometer', name: 'Trial-jar hydrometer', calibrationTempC: 20 });
    await scene.owner.agent.patch('/api/auth/me').send({ unitSystem: 'us' }).expect(200);
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'og', instrumentId: hydrometer, sg: 1.046, sampleTempC: 35, volumeL: 21.5 });
    expect(res.status).toBe(201);
    // 20 °C = 68 °F and a 10 °C difference is 18 °F (NIST SP 811, appendix B.8).
    expect(res.body.warnings).toEqual([expect.stringMatching(/more than 18 °F from the hydrometer's 68 °F calibration/)]);
    expect(res.body.warnings.join(' ')).not.toMatch(/°C/);
  });

  it('records the pitch time once, for the fermentation log to count from', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const takenAt = '2025-09-20T14:05:00.000Z';
    await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'pitch_temp', tempC: 19, takenAt }).expect(201);
    await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'pitch_temp', tempC: 18.5 }).expect(201);
    const brew = await scene.owner.agent.get(`/api/brews/${id}`).expect(200);
    expect(brew.body.pitchedAt).toBe(takenAt);
    expect(brew.body.stages[2].startedAt).toBe(takenAt);
  });

  it.each([
    ['Brix 60', { kind: 'late_boil_gravity', method: 'refractometer', brix: 60, volumeL: 25, minutesLeft: 10 }, 'brix', 'A brewing refractometer reads 0 to 40 °Bx. Check the reading.'],
    ['a volume of 0', { kind: 'late_boil_gravity', method: 'refractometer', brix: 12, volumeL: 0, minutesLeft: 10 }, 'volumeL', 'The volume must be more than 0.'],
    ['minutes left below zero', { kind: 'late_boil_gravity', method: 'refractometer', brix: 12, volumeL: 25, minutesLeft: -5 }, 'minutesLeft', 'Minutes left cannot be below 0. Enter 0 if the boil has ended.'],
    ['a mash pH of 12', { kind: 'mash_ph', ph: 12 }, 'ph', 'A mash reads between pH 3 and 9; anything else is a misreading or a meter fault. Check the meter.'],
    ['a hydrometer in hot wort', { kind: 'og', sg: 1.05, sampleTempC: 85 }, 'sampleTempC', 'Read the sample between 0 and 60 °C (32 °F and 140 °F): a hydrometer cannot be read in hot wort. Cool the sample first.'],
    ['a hydrometer reading without its temperature', { kind: 'pre_boil_gravity', method: 'hydrometer', sg: 1.04 }, 'sampleTempC', 'Enter the sample temperature.'],
  ])('refuses %s with a message under the field and saves nothing', async (_what, body, field, message) => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ [field]: message });
    expect(await readingCount(id)).toBe(0);
  });

  it('refuses an instrument of the wrong kind, or another brewer’s', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const hydrometer = await makeInstrument(scene, { kind: 'hydrometer', name: 'Glass hydrometer' });
    const wrong = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_temp', instrumentId: hydrometer, tempC: 66 });
    expect(wrong.status).toBe(400);
    expect(wrong.body.fields.instrumentId).toMatch(/Glass hydrometer is a hydrometer/);
    const theirs = await scene.other.agent.post('/api/instruments').send({ kind: 'thermometer', name: 'Not yours' }).expect(201);
    const stolen = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_temp', instrumentId: theirs.body.id, tempC: 66 });
    expect(stolen.status).toBe(400);
    expect(stolen.body.fields).toEqual({ instrumentId: 'That instrument was not found; pick one of your own.' });
    expect(await readingCount(id)).toBe(0);
  });

  it('keeps the instrument snapshot after a recalibration, and recomputes only on purpose, logging old and new values', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const { agent } = scene.owner;
    const thermometer = await makeInstrument(scene, { kind: 'thermometer', name: 'Probe', offsetC: 0.5 });
    const taken = await agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_temp', instrumentId: thermometer, tempC: 67 }).expect(201);
    expect(taken.body.corrected).toBeCloseTo(66.5, 9);

    // The probe is re-checked: it now reads 1.5 °C high.
    await agent.post(`/api/instruments/${thermometer}/calibrations`).send({ method: 'set', offsetC: 1.5 }).expect(201);
    let brew = await agent.get(`/api/brews/${id}`).expect(200);
    expect(brew.body.readings[0].corrected).toBeCloseTo(66.5, 9);
    expect(brew.body.readings[0].instrument.offsetC).toBe(0.5);
    expect(brew.body.readings[0].recomputedAt).toBeNull();

    // Club members cannot recompute someone else's reading.
    await shareWithClub(scene, id);
    await scene.member.agent.post(`/api/brews/${id}/readings/${taken.body.id}/recompute`).expect(403);

    const recomputed = await agent.post(`/api/brews/${id}/readings/${taken.body.id}/recompute`).expect(200);
    expect(recomputed.body.corrected).toBeCloseTo(65.5, 9);
    expect(recomputed.body.instrument.offsetC).toBe(1.5);
    expect(recomputed.body.raw).toEqual({ tempC: 67 });
    expect(recomputed.body.recomputedFrom.corrected).toBeCloseTo(66.5, 9);
    expect(recomputed.body.recomputedFrom.instrument.offsetC).toBe(0.5);

    brew = await agent.get(`/api/brews/${id}`).expect(200);
    expect(brew.body.log).toHaveLength(1);
    expect(brew.body.log[0]).toMatchObject({
      kind: 'recompute',
      stage: 'mash',
      body: 'Mash temperature recomputed with the current calibration of Probe: 66.5 °C became 65.5 °C.',
      details: { readingId: taken.body.id, old: { corrected: 66.5 }, new: { corrected: 65.5 } },
    });
  });

  it('cannot recompute a reading taken without an instrument of the brewer’s own', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const taken = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_ph', ph: 5.4 }).expect(201);
    expect(taken.body.instrument).toMatchObject({ instrumentId: null, kind: 'ph_meter' });
    const res = await scene.owner.agent.post(`/api/brews/${id}/readings/${taken.body.id}/recompute`);
    expect(res.status).toBe(400);
    expect(res.body.fields.instrumentId).toMatch(/common-practice defaults/);
  });

  it('calls out deviations from the snapshot targets', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const { agent } = scene.owner;
    await agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_ph', ph: 5.8 }).expect(201);
    await agent.post(`/api/brews/${id}/readings`).send({ kind: 'pitch_temp', tempC: 25 }).expect(201);
    const brew = await agent.get(`/api/brews/${id}`).expect(200);
    expect(brew.body.deviations.map((d: { code: string }) => d.code)).toEqual(['mash-ph-high', 'instrument-uncalibrated', 'pitch-too-warm', 'instrument-uncalibrated']);
  });

  it('deletes a reading, owner only', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const taken = await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'mash_temp', tempC: 66 }).expect(201);
    await shareWithClub(scene, id);
    await scene.member.agent.delete(`/api/brews/${id}/readings/${taken.body.id}`).expect(403);
    const before = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    const deleted = await scene.owner.agent.delete(`/api/brews/${id}/readings/${taken.body.id}`).expect(200);
    // What the deletion changed, not the day: the page drops the reading from what it holds.
    expect(deleted.body).toMatchObject({ readingId: taken.body.id, brewDay: { readingCount: before.readingCount - 1 } });
    expect(deleted.body.brewDay).not.toHaveProperty('readings');
    await scene.owner.agent.delete(`/api/brews/${id}/readings/${taken.body.id}`).expect(404);
  });
});

describe('notes', () => {
  it('adds and deletes the brewer’s notes', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const note = await scene.owner.agent.post(`/api/brews/${id}/notes`).send({ body: 'Mash tun lid left off for 5 minutes.', stage: 'mash' }).expect(201);
    expect(note.body).toMatchObject({ kind: 'note', stage: 'mash', body: 'Mash tun lid left off for 5 minutes.' });
    const empty = await scene.owner.agent.post(`/api/brews/${id}/notes`).send({ body: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.fields).toEqual({ body: 'Write the note.' });
    await scene.owner.agent.delete(`/api/brews/${id}/notes/${note.body.id}`).expect(204);
    expect((await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body.log).toEqual([]);
  });
});

describe('a write whose brew day is deleted before the answer is read', () => {
  it('answers 404 with words, not a crash', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    await h.ctx.db.delete(brews).where(eq(brews.id, id));
    await expect(brewDayChange(h.ctx.db, id)).rejects.toMatchObject({ status: 404, message: 'This brew day was deleted.' });
  });
});
