import { beforeAll, describe, expect, it } from 'vitest';
import { count, eq } from 'drizzle-orm';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeInstrument } from '../brews/test-scene';
import { brewNotes, fermentationReadings } from '../db/schema';
import { makeFermentationScene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function readingCount(brewId: number) {
  const [row] = await h.ctx.db.select({ n: count() }).from(fermentationReadings).where(eq(fermentationReadings.brewId, brewId));
  return row.n;
}

describe('the fermentation log', () => {
  it('corrects a hydrometer reading for sample temperature with the instrument it was taken with', async () => {
    const s = await makeFermentationScene(h);
    const hydrometer = await makeInstrument(s, { kind: 'hydrometer', name: 'Trial-jar hydrometer', calibrationTempC: 20 });
    const res = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/readings`)
      .send({ method: 'hydrometer', instrumentId: hydrometer, sg: 1.01, sampleTempC: 30, takenAt: s.day(12) });
    expect(res.status).toBe(201);
    // Water density (CRC Handbook table, as in Tanaka et al. 2001): 998.2071 kg/m³ at 20 °C,
    // 995.6502 kg/m³ at 30 °C, so 1.010 read at 30 °C is 1.010 × 998.2071 / 995.6502 at 20 °C.
    expect(res.body.reading.corrected).toBeCloseTo((1.01 * 998.2071) / 995.6502, 5);
    expect(res.body.reading.instrument).toMatchObject({ instrumentId: hydrometer, name: 'Trial-jar hydrometer', calibrationTempC: 20 });
    expect(res.body.reading.day).toBeCloseTo(12, 6);
    expect(res.body.verdict.state).toBe('too-early');
  });

  it('labels a refractometer reading as an alcohol-corrected estimate and keeps the original Brix it used', async () => {
    const s = await makeFermentationScene(h);
    const res = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/readings`)
      .send({ method: 'refractometer', brix: 6.2, originalBrix: 12.8, takenAt: s.day(12) });
    expect(res.status).toBe(201);
    expect(res.body.reading.estimate).toBe(true);
    expect(res.body.reading.raw).toMatchObject({ brix: 6.2, originalBrix: 12.8 });
    expect(res.body.reading.correction).toMatchObject({ kind: 'wcf-alcohol', originalBrix: 12.8, formula: 'terrill-2011-cubic' });
    expect(res.body.reading.warnings.join(' ')).toMatch(/estimate/);
  });

  // Common practice, no source: two hydrometer readings two days apart after day 12 that agree.
  it('changes its verdict from no reading to still moving to stable as readings come in', async () => {
    const s = await makeFermentationScene(h);
    const add = (day: number, sg: number) =>
      s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'hydrometer', sg, sampleTempC: 20, takenAt: s.day(day) });
    expect((await add(3, 1.02)).body.verdict.state).toBe('no-reading');
    expect((await add(12, 1.016)).body.verdict.state).toBe('too-early');
    const moving = await add(14, 1.012);
    expect(moving.body.verdict.state).toBe('moving');
    expect(moving.body.verdict.reason).toMatch(/still going/);
    const stable = await add(16, 1.012);
    expect(stable.body.verdict).toMatchObject({ state: 'stable', needsHydrometer: false });
    // Apparent attenuation against the brew day's OG 1.050: (1.050 − 1.012) / 0.050 = 76 %.
    expect(stable.body.progress.current.apparentAttenuation).toBeCloseTo(0.76, 6);
    expect(stable.body.progress.current.abvSimple).toBeCloseTo((1.05 - 1.012) * 131.25, 6);
  });

  // Common practice, no source: a stable verdict needs two agreeing hydrometer readings after day 12.
  it('answers a new reading with that reading and what it changed, not the whole log', async () => {
    const s = await makeFermentationScene(h);
    const add = (body: Record<string, unknown>) => s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body).expect(201);
    await add({ method: 'hydrometer', sg: 1.012, sampleTempC: 20, takenAt: s.day(14) });
    await add({ method: 'thermometer', tempC: 19, takenAt: s.day(15) });
    const res = await add({ method: 'hydrometer', sg: 1.012, sampleTempC: 20, takenAt: s.day(17), note: 'third' });
    expect(res.body).not.toHaveProperty('readings');
    expect(res.body).not.toHaveProperty('log');
    expect(JSON.stringify(res.body)).not.toMatch(/"readings"/);
    expect(res.body.reading).toMatchObject({ brewId: s.brewId, kind: 'gravity', corrected: 1.012, note: 'third' });
    expect(res.body.verdict.state).toBe('stable');
    expect(res.body.progress.current.sg).toBe(1.012);
    expect(res.body.temperature.latest.tempC).toBe(19);
    // The full log still holds all three, in time order.
    const log = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(log.body.readings.map((r: { id: number }) => r.id).at(-1)).toBe(res.body.reading.id);
    expect(log.body.readings).toHaveLength(3);
    expect(log.body.verdict.state).toBe(res.body.verdict.state);
  });

  it('counts every reading outside the recipe range but lists only the latest twenty', async () => {
    const s = await makeFermentationScene(h);
    const { brew } = (await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200)).body;
    expect(brew.fermentationTempMaxC).not.toBeNull();
    let res;
    for (let i = 0; i < 22; i++) {
      res = await s.owner.agent
        .post(`/api/brews/${s.brewId}/fermentation/readings`)
        .send({ method: 'thermometer', tempC: brew.fermentationTempMaxC + 3, takenAt: new Date(s.pitchedAt.getTime() + (i + 1) * 3_600_000).toISOString() })
        .expect(201);
    }
    expect(res!.body.temperature.excursionCount).toBe(22);
    expect(res!.body.temperature.excursions).toHaveLength(20);
    expect(res!.body.temperature.excursions.at(-1).readingId).toBe(res!.body.reading.id);
    const log = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(log.body.temperature.excursionCount).toBe(22);
    expect(log.body.temperature.excursions).toHaveLength(20);
  });

  it('never calls refractometer estimates alone stable', async () => {
    const s = await makeFermentationScene(h);
    for (const day of [12, 14, 16]) {
      await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'refractometer', brix: 6, originalBrix: 12.4, takenAt: s.day(day) }).expect(201);
    }
    const log = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(log.body.verdict).toMatchObject({ state: 'no-reading', needsHydrometer: true });
    expect(log.body.verdict.reason).toMatch(/hydrometer/);
  });

  it("summarises fermenter temperature and flags readings outside the recipe's 18–20 °C", async () => {
    const s = await makeFermentationScene(h, { pitchedDaysAgo: 3 });
    const now = Date.now();
    for (const [hoursAgo, tempC] of [
      [60, 18.5],
      [30, 21.5],
      [10, 19],
      [2, 17.5],
    ]) {
      await s.owner.agent
        .post(`/api/brews/${s.brewId}/fermentation/readings`)
        .send({ method: 'thermometer', tempC, takenAt: new Date(now - hoursAgo * 3_600_000).toISOString() })
        .expect(201);
    }
    const { body } = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(body.temperature.target).toEqual({ minC: 18, maxC: 20 });
    expect(body.temperature.last24h).toMatchObject({ minC: 17.5, maxC: 19, count: 2 });
    expect(body.temperature.overall).toMatchObject({ minC: 17.5, maxC: 21.5, count: 4 });
    expect(body.temperature.excursions.map((e: { direction: string; byC: number }) => [e.direction, Number(e.byC.toFixed(2))])).toEqual([
      ['warm', 1.5],
      ['cold', 0.5],
    ]);
  });

  it.each([
    ['before pitching', (s: { day: (n: number) => string }) => ({ method: 'hydrometer', sg: 1.02, sampleTempC: 20, takenAt: s.day(-1) }), 'takenAt', /before the yeast was pitched/],
    ['in the future', () => ({ method: 'hydrometer', sg: 1.02, sampleTempC: 20, takenAt: new Date(Date.now() + 3 * 86_400_000).toISOString() }), 'takenAt', /future/],
    ['a gravity of 1.5', () => ({ method: 'hydrometer', sg: 1.5, sampleTempC: 20 }), 'sg', /0.980 and 1.200/],
    ['a hot sample', () => ({ method: 'hydrometer', sg: 1.02, sampleTempC: 80 }), 'sampleTempC', /between 0 and 60 °C/],
    ['a Brix above the original', () => ({ method: 'refractometer', brix: 14, originalBrix: 12 }), 'brix', /only lowers it/],
    // Terrill's cubic at 20 and 17 wort-corrected °Bx gives 1.1057, above the 1.0829 wort (worked by hand).
    ['too small a Brix drop for the alcohol correction', () => ({ method: 'refractometer', brix: 17.68, originalBrix: 20.8 }), 'brix', /too early in fermentation.*1\.036–1\.106/],
    ['a fermenter at 90 °C', () => ({ method: 'thermometer', tempC: 90 }), 'tempC', /Check the thermometer/],
  ])('refuses a reading %s with a message under the field, and saves nothing', async (_what, body, field, message) => {
    const s = await makeFermentationScene(h);
    const res = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body(s));
    expect(res.status).toBe(400);
    expect(res.body.fields[field]).toMatch(message);
    expect(await readingCount(s.brewId)).toBe(0);
  });

  it('stores a retried reading once', async () => {
    const s = await makeFermentationScene(h);
    const body = { method: 'hydrometer', sg: 1.014, sampleTempC: 20, takenAt: s.day(13) };
    const first = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body);
    const again = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body);
    expect([first.status, again.status]).toEqual([201, 200]);
    expect(again.body).toMatchObject({ duplicate: true, reading: { id: first.body.reading.id } });
    expect(await readingCount(s.brewId)).toBe(1);
  });

  it('asks for the pitch time before taking readings', async () => {
    const s = await makeFermentationScene(h);
    const other = await s.owner.agent.post('/api/brews').send({ recipeId: s.recipeId }).expect(201);
    const res = await s.owner.agent.post(`/api/brews/${other.body.id}/fermentation/readings`).send({ method: 'thermometer', tempC: 19 });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/no pitch time/);
  });
});

describe('who may see and write the log', () => {
  it('lets club members of a shared brew read it; only the owner writes; everyone else gets 404', async () => {
    const s = await makeFermentationScene(h, { shared: true });
    await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 19, takenAt: s.day(1) }).expect(201);
    for (const reader of [s.member, s.mentor]) {
      const log = await reader.agent.get(`/api/brews/${s.brewId}/fermentation`);
      expect(log.status).toBe(200);
      expect(log.body.brew.isOwner).toBe(false);
      expect(log.body.remindersEnabled).toBeNull();
      await reader.agent.get(`/api/brews/${s.brewId}/fermentation.csv`).expect(200);
      const write = await reader.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 19 });
      expect(write.status).toBe(403);
      const pack = await reader.agent
        .post(`/api/brews/${s.brewId}/fermentation/packaging`)
        .send({ container: 'keg', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'none', override: true, overrideReason: 'not mine to decide' });
      expect(pack.status).toBe(403);
    }
    await s.other.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(404);
    await s.other.agent.get(`/api/brews/${s.brewId}/fermentation.csv`).expect(404);
    await s.other.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 19 }).expect(404);
    expect(await readingCount(s.brewId)).toBe(1);
  });

  it('refuses an instrument of another brewer', async () => {
    const s = await makeFermentationScene(h);
    const foreign = await s.other.agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Not yours' }).expect(201);
    const res = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/readings`)
      .send({ method: 'hydrometer', instrumentId: foreign.body.id, sg: 1.012, sampleTempC: 20 });
    expect(res.status).toBe(400);
    expect(res.body.fields.instrumentId).toMatch(/not found/);
  });
});

// One API check per verdict state. The rule is common practice, no source: from day 12, the last
// two hydrometer readings at least two days apart must be the same at the hydrometer's scale step,
// with no steady fall over three readings, and not well above the recipe's FG (1.011 in this scene).
describe('the final-gravity verdict, state by state', () => {
  const hydrometerAt = (s: Awaited<ReturnType<typeof makeFermentationScene>>, day: number, sg: number, instrumentId?: number) =>
    s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'hydrometer', instrumentId, sg, sampleTempC: 20, takenAt: s.day(day) });

  it('too-early: day 5, before any check is worth taking', async () => {
    const s = await makeFermentationScene(h, { pitchedDaysAgo: 5 });
    const log = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(log.body.verdict.state).toBe('too-early');
    expect(log.body.verdict.reason).toMatch(/around day 12/);
  });

  it('no-reading: past day 12 with no hydrometer reading says so', async () => {
    const s = await makeFermentationScene(h, { pitchedDaysAgo: 20 });
    const log = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(log.body.verdict.state).toBe('no-reading');
    expect(log.body.verdict.reason).toMatch(/^No hydrometer reading since day 12 yet/);
  });

  it('moving: 1.012 then 1.011 three days apart is not the same figure', async () => {
    const s = await makeFermentationScene(h);
    await hydrometerAt(s, 14, 1.012).expect(201);
    const res = await hydrometerAt(s, 17, 1.011).expect(201);
    expect(res.body.verdict.state).toBe('moving');
    expect(res.body.verdict.reason).toMatch(/^1\.012 on day 14 and 1\.011 on day 17, 3 days apart: the gravity fell by 0\.001/);
  });

  it('moving: a steady fall of 0.45 points a day on a 0.002 hydrometer (1.0128, 1.0119, 1.0110 on days 12, 14, 16)', async () => {
    const s = await makeFermentationScene(h);
    const coarse = await makeInstrument(s, { kind: 'hydrometer', name: 'Coarse hydrometer', calibrationTempC: 20, resolutionSg: 0.002 });
    for (const [day, sg] of [
      [12, 1.0128],
      [14, 1.0119],
    ]) {
      await hydrometerAt(s, day, sg, coarse).expect(201);
    }
    const res = await hydrometerAt(s, 16, 1.011, coarse).expect(201);
    expect(res.body.reading.instrument).toMatchObject({ resolutionSg: 0.002 });
    expect(res.body.verdict.state).toBe('moving');
    expect(res.body.verdict.reason).toMatch(/fell steadily/);
  });

  it('stuck: steady at 1.030 when the recipe expects 1.011, and packaging needs the override', async () => {
    const s = await makeFermentationScene(h);
    await hydrometerAt(s, 14, 1.03).expect(201);
    const res = await hydrometerAt(s, 17, 1.03).expect(201);
    expect(res.body.verdict.state).toBe('stuck');
    expect(res.body.verdict.reason).toMatch(/steady, but 0\.019 above the 1\.011 this recipe should finish at/);
    const refused = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/packaging`)
      .send({ container: 'bottles', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'sucrose' });
    expect(refused.status).toBe(409);
    expect(refused.body.fields.override).toMatch(/^Stuck, not finished/);
  });

  it('stable: 1.012 on day 14 and 1.012 on day 17, and the message says what was compared', async () => {
    const s = await makeFermentationScene(h);
    await hydrometerAt(s, 14, 1.012).expect(201);
    const res = await hydrometerAt(s, 17, 1.012).expect(201);
    expect(res.body.verdict.state).toBe('stable');
    expect(res.body.verdict.reason).toBe('1.012 on day 14 and 1.012 on day 17, 3 days apart: the same reading. Final gravity is stable.');
  });
});

describe('packaging', () => {
  const keg = { container: 'keg', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'none' };

  it('refuses to package before the verdict is stable unless the brewer overrides, and records the override for the mentor', async () => {
    const s = await makeFermentationScene(h, { shared: true });
    await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'hydrometer', sg: 1.014, sampleTempC: 20, takenAt: s.day(12) }).expect(201);
    const refused = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/packaging`).send(keg);
    expect(refused.status).toBe(409);
    expect(refused.body.fields.override).toMatch(/Not stable yet/);
    const noReason = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/packaging`).send({ ...keg, override: true });
    expect(noReason.status).toBe(400);
    expect(noReason.body.fields.overrideReason).toMatch(/why/);

    const ok = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/packaging`)
      .send({ ...keg, override: true, overrideReason: 'Moving house tomorrow; kegged cold and kept under watch.' });
    expect(ok.status).toBe(201);
    expect(ok.body.packaging).toMatchObject({ override: true, verdictState: 'too-early', overrideReason: 'Moving house tomorrow; kegged cold and kept under watch.' });
    expect(ok.body.brew.status).toBe('packaged');

    const seenByMentor = await s.mentor.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(seenByMentor.body.packaging).toMatchObject({ override: true, overrideReason: expect.stringMatching(/Moving house/) });
    const notes = await h.ctx.db.select().from(brewNotes).where(eq(brewNotes.brewId, s.brewId));
    expect(notes.map((n) => n.body).join('\n')).toMatch(/before the final gravity was proven stable/);

    const twice = await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/packaging`).send({ ...keg, override: true, overrideReason: 'again, again' });
    expect(twice.status).toBe(409);
  });

  it('works out priming sugar with primingSugarG once the gravity is stable', async () => {
    const s = await makeFermentationScene(h);
    for (const day of [12, 15]) {
      await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'hydrometer', sg: 1.011, sampleTempC: 20, takenAt: s.day(day) }).expect(201);
    }
    const res = await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/packaging`)
      .send({ container: 'bottles', volumeL: 20, warmestTempC: 20, targetCo2Volumes: 2.5, sugar: 'sucrose' });
    expect(res.status).toBe(201);
    // Residual CO2 at 20 °C (68 °F) from the quadratic in shared/brewmath/priming.ts (recalled from
    // memory): 3.0378 − 0.050062·68 + 0.00026555·68² = 0.8615 volumes. Sucrose: 342.30 g gives
    // 4 × 44.01 g CO2 (stoichiometry); CO2 is 1.977 g/L (CRC Handbook, recalled from memory) and
    // yeast yields about 96 % of theory, so 1.977 × 342.30 / 176.04 / 0.96 = 4.004 g/L per volume:
    // (2.5 − 0.8615) × 4.004 × 20 L = 131.2 g (worked by hand).
    expect(res.body.packaging.residualCo2Volumes).toBeCloseTo(0.8615, 3);
    expect(res.body.packaging.primingSugarG).toBeCloseTo(131.2, 0);
    expect(res.body.packaging).toMatchObject({ override: false, verdictState: 'stable' });
    await s.owner.agent.delete(`/api/brews/${s.brewId}/fermentation/packaging`).expect(200);
    const back = await s.owner.agent.get(`/api/brews/${s.brewId}/fermentation`).expect(200);
    expect(back.body.packaging).toBeNull();
    expect(back.body.brew.status).toBe('fermenting');
  });
});
