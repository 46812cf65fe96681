import request from 'supertest';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { correctReading } from '@shared/instruments';
import { latestTodayIso } from '@shared/schemas/instruments';
import { makeUser } from '../db/factories';
import { instrumentCalibrations, instruments } from '../db/schema';
import { getEquipmentProfile } from '../equipment/service';
import { loadSessionUser } from '../auth/session';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { loadInstrumentSnapshot } from './service';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function brewer() {
  const user = await makeUser(h.ctx.db);
  const agent = await h.signIn(user.email);
  return { user, agent, actor: (await loadSessionUser(h.ctx.db, user.id))! };
}

async function historyCount(instrumentId: number) {
  return (await h.ctx.db.select().from(instrumentCalibrations).where(eq(instrumentCalibrations.instrumentId, instrumentId))).length;
}

describe('instrument profiles', () => {
  it('needs a signed-in brewer', async () => {
    await request(h.app).get('/api/instruments').expect(401);
    await request(h.app).post('/api/instruments').send({ kind: 'hydrometer', name: 'x' }).expect(401);
  });

  it('creates several of each kind with common-practice defaults, and logs each creation', async () => {
    const { agent } = await brewer();
    const hyd = await agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Glass hydrometer' }).expect(201);
    expect(hyd.body).toMatchObject({ kind: 'hydrometer', calibrationTempC: 20, archived: false });
    const hyd60 = await agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Old US hydrometer', calibrationTempC: 15.56 }).expect(201);
    expect(hyd60.body.snapshot).toMatchObject({ kind: 'hydrometer', calibrationTempC: 15.56, instrumentId: hyd60.body.id });
    const refr = await agent.post('/api/instruments').send({ kind: 'refractometer', name: 'Handheld refractometer' }).expect(201);
    expect(refr.body).toMatchObject({ wcf: 1.04, wcfSource: 'default' });
    const ph = await agent.post('/api/instruments').send({ kind: 'ph_meter', name: 'Pen meter' }).expect(201);
    expect(ph.body).toMatchObject({ resolutionPh: 0.01, reminderDays: 30, calibratedOn: null });
    const list = await agent.get('/api/instruments').expect(200);
    expect(list.body.map((i: { name: string }) => i.name)).toEqual(['Glass hydrometer', 'Old US hydrometer', 'Handheld refractometer', 'Pen meter']);
    const log = await agent.get(`/api/instruments/${hyd60.body.id}/calibrations`).expect(200);
    expect(log.body).toHaveLength(1);
    expect(log.body[0]).toMatchObject({ method: 'created', before: null, after: { calibrationTempC: 15.56, calibrationId: log.body[0].id } });
  });

  it('renames and archives; archived instruments leave the default list', async () => {
    const { agent } = await brewer();
    const t = await agent.post('/api/instruments').send({ kind: 'thermometer', name: 'Dial' }).expect(201);
    const renamed = await agent.patch(`/api/instruments/${t.body.id}`).send({ name: 'Dial on the kettle', archived: true }).expect(200);
    expect(renamed.body).toMatchObject({ name: 'Dial on the kettle', archived: true });
    expect((await agent.get('/api/instruments').expect(200)).body).toEqual([]);
    expect((await agent.get('/api/instruments?archived=include').expect(200)).body).toHaveLength(1);
  });

  it('refuses bad input with a message per field and saves nothing', async () => {
    const { agent, user } = await brewer();
    const wcf = await agent.post('/api/instruments').send({ kind: 'refractometer', name: 'R', wcf: 1.25 }).expect(400);
    expect(wcf.body.fields.wcf).toMatch(/between 0.9 and 1.2/);
    const offset = await agent.post('/api/instruments').send({ kind: 'thermometer', name: 'T', offsetC: 10.5 }).expect(400);
    expect(offset.body.fields.offsetC).toMatch(/over 10 °C/);
    const future = await agent.post('/api/instruments').send({ kind: 'ph_meter', name: 'P', calibratedOn: '2999-01-01' }).expect(400);
    expect(future.body.fields.calibratedOn).toBe('The calibration date cannot be in the future.');
    const kind = await agent.post('/api/instruments').send({ kind: 'barometer', name: 'B' }).expect(400);
    expect(kind.body.fields.kind).toMatch(/Choose a hydrometer/);
    const rows = await h.ctx.db.select().from(instruments).where(eq(instruments.ownerId, user.id));
    expect(rows).toEqual([]);
  });
});

describe("a hydrometer's scale step", () => {
  it('defaults to 0.001, can be set, and a reading keeps the step it was taken with', async () => {
    const { agent } = await brewer();
    const hyd = await agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Glass hydrometer' }).expect(201);
    expect(hyd.body).toMatchObject({ resolutionSg: 0.001 });
    expect(hyd.body.snapshot).toMatchObject({ resolutionSg: 0.001 });
    const set = await agent.post(`/api/instruments/${hyd.body.id}/calibrations`).send({ method: 'set', resolutionSg: 0.002 });
    expect(set.status).toBe(201);
    const after = await agent.get(`/api/instruments/${hyd.body.id}`).expect(200);
    expect(after.body).toMatchObject({ resolutionSg: 0.002 });
  });

  it('refuses a step outside 0.0001–0.005 with a message under the field, and saves nothing', async () => {
    const { agent, user } = await brewer();
    const res = await agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Odd hydrometer', resolutionSg: 0.05 });
    expect(res.status).toBe(400);
    expect(res.body.fields.resolutionSg).toMatch(/between 0\.0001 and 0\.005/);
    expect(await h.ctx.db.select().from(instruments).where(eq(instruments.ownerId, user.id))).toHaveLength(0);
  });
});

describe("another brewer's instruments", () => {
  it('are not found (404) for reading, editing, calibrating or the log; nothing changes', async () => {
    const owner = await brewer();
    const other = await brewer();
    const refr = await owner.agent.post('/api/instruments').send({ kind: 'refractometer', name: 'Mine' }).expect(201);
    const id = refr.body.id;
    const get = await other.agent.get(`/api/instruments/${id}`).expect(404);
    const missing = await other.agent.get('/api/instruments/99999999').expect(404);
    // The same answer whether it exists or not: nothing leaks.
    expect(get.body).toEqual(missing.body);
    await other.agent.patch(`/api/instruments/${id}`).send({ name: 'Stolen' }).expect(404);
    await other.agent.get(`/api/instruments/${id}/calibrations`).expect(404);
    await other.agent.post(`/api/instruments/${id}/calibrations`).send({ method: 'set', wcf: 1.1 }).expect(404);
    expect((await other.agent.get('/api/instruments').expect(200)).body).toEqual([]);
    const after = await owner.agent.get(`/api/instruments/${id}`).expect(200);
    expect(after.body).toMatchObject({ name: 'Mine', wcf: 1.04 });
    expect(await historyCount(id)).toBe(1);
  });

  it("cannot name another brewer's hydrometer in a calibration", async () => {
    const owner = await brewer();
    const other = await brewer();
    const theirs = await other.agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Theirs', calibrationTempC: 15.56 }).expect(201);
    const refr = await owner.agent.post('/api/instruments').send({ kind: 'refractometer', name: 'Mine' }).expect(201);
    const res = await owner.agent
      .post(`/api/instruments/${refr.body.id}/calibrations`)
      .send({ method: 'wcf-pairs', hydrometerId: theirs.body.id, pairs: [{ brix: 12.6, sg: 1.04838 }] })
      .expect(400);
    expect(res.body.fields.hydrometerId).toBe('That hydrometer was not found among your instruments.');
    expect(await historyCount(refr.body.id)).toBe(1);
  });

  it('loadInstrumentSnapshot: 404 for another brewer, 400 for the wrong kind or an archived one', async () => {
    const owner = await brewer();
    const other = await brewer();
    const t = await owner.agent.post('/api/instruments').send({ kind: 'thermometer', name: 'Probe', offsetC: 0.4 }).expect(201);
    await expect(loadInstrumentSnapshot(h.ctx.db, other.actor, t.body.id)).rejects.toMatchObject({ status: 404 });
    await expect(loadInstrumentSnapshot(h.ctx.db, owner.actor, t.body.id, { kind: 'hydrometer' })).rejects.toMatchObject({
      status: 400,
      fields: { instrumentId: 'Probe is a thermometer, not a hydrometer.' },
    });
    const snap = await loadInstrumentSnapshot(h.ctx.db, owner.actor, t.body.id, { kind: 'thermometer' });
    expect(snap).toEqual({ kind: 'thermometer', instrumentId: t.body.id, name: 'Probe', offsetC: 0.4, checkedOn: expect.any(String), calibrationId: expect.any(Number) });
    await owner.agent.patch(`/api/instruments/${t.body.id}`).send({ archived: true }).expect(200);
    await expect(loadInstrumentSnapshot(h.ctx.db, owner.actor, t.body.id)).rejects.toMatchObject({ status: 400 });
  });
});

describe('calibrating a refractometer from paired readings', () => {
  it('saves the mean factor with its inputs; an earlier snapshot keeps the factor it was taken with', async () => {
    const { agent, actor } = await brewer();
    const hyd = await agent.post('/api/instruments').send({ kind: 'hydrometer', name: 'Hydrometer', calibrationTempC: 20 }).expect(201);
    const refr = await agent.post('/api/instruments').send({ kind: 'refractometer', name: 'Refractometer' }).expect(201);
    const id = refr.body.id;
    // A reading taken before calibrating keeps the default factor.
    const before = await loadInstrumentSnapshot(h.ctx.db, actor, id);
    const oldReading = correctReading(before as Extract<typeof before, { kind: 'refractometer' }>, { brix: 12.6 });

    // ASBC extract table, recalled from memory: 10 °P = 1.04003, 12 °P = 1.04838, 20 °P = 1.08297.
    // Factors 10.4/10 = 1.040, 12.6/12 = 1.050, 20.9/20 = 1.045; mean 1.045.
    const res = await agent
      .post(`/api/instruments/${id}/calibrations`)
      .send({
        method: 'wcf-pairs',
        hydrometerId: hyd.body.id,
        pairs: [
          { brix: 10.4, sg: 1.04003, sampleTempC: 20 },
          { brix: 12.6, sg: 1.04838, sampleTempC: 20 },
          { brix: 20.9, sg: 1.08297 },
        ],
      })
      .expect(201);
    expect(Math.abs(res.body.instrument.wcf - 1.045)).toBeLessThan(0.002);
    expect(res.body.instrument.wcfSource).toBe('measured');
    expect(res.body.calibration).toMatchObject({
      method: 'wcf-pairs',
      inputs: { hydrometerId: hyd.body.id, hydrometerCalibrationTempC: 20 },
      before: { wcf: 1.04, wcfSource: 'default' },
      after: { wcfSource: 'measured', calibrationId: res.body.calibration.id },
    });
    expect(res.body.calibration.result.pairs).toHaveLength(3);
    expect(Math.abs(res.body.calibration.result.spread - 0.01)).toBeLessThan(0.002);

    // The earlier reading is untouched: it still says 1.04 and the SG worked with it.
    expect(oldReading.correction).toEqual({ kind: 'wcf', wcf: 1.04 });
    const now = await loadInstrumentSnapshot(h.ctx.db, actor, id);
    expect(now).toMatchObject({ wcf: res.body.instrument.wcf, calibrationId: res.body.calibration.id });
    const newReading = correctReading(now as Extract<typeof now, { kind: 'refractometer' }>, { brix: 12.6 });
    expect(newReading.corrected).toBeLessThan(oldReading.corrected);

    const log = await agent.get(`/api/instruments/${id}/calibrations`).expect(200);
    expect(log.body.map((e: { method: string }) => e.method)).toEqual(['wcf-pairs', 'created']);
  });

  it('refuses pairs that cannot be the same wort, naming the pair, and saves nothing', async () => {
    const { agent } = await brewer();
    const refr = await agent.post('/api/instruments').send({ kind: 'refractometer', name: 'R' }).expect(201);
    const res = await agent
      .post(`/api/instruments/${refr.body.id}/calibrations`)
      .send({ method: 'wcf-pairs', pairs: [{ brix: 10.4, sg: 1.04003 }, { brix: 16, sg: 1.04838 }] })
      .expect(400);
    expect(res.body.fields['pairs.1.sg']).toMatch(/^Pair 2 gives a factor of 1\.33/);
    const got = await agent.get(`/api/instruments/${refr.body.id}`).expect(200);
    expect(got.body.wcf).toBe(1.04);
    expect(await historyCount(refr.body.id)).toBe(1);
  });

  it('refuses a typed-in factor outside 0.9–1.2 and a method that does not fit the instrument', async () => {
    const { agent } = await brewer();
    const refr = await agent.post('/api/instruments').send({ kind: 'refractometer', name: 'R' }).expect(201);
    const bad = await agent.post(`/api/instruments/${refr.body.id}/calibrations`).send({ method: 'set', wcf: 0.85 }).expect(400);
    expect(bad.body.fields.wcf).toMatch(/between 0.9 and 1.2/);
    const wrong = await agent.post(`/api/instruments/${refr.body.id}/calibrations`).send({ method: 'ph-two-point', calibratedOn: '2025-01-01', bufferLowPh: 4.01, bufferHighPh: 7 }).expect(400);
    expect(wrong.body.fields.method).toMatch(/Refractometers are calibrated by/);
    const foreign = await agent.post(`/api/instruments/${refr.body.id}/calibrations`).send({ method: 'set', offsetC: 1 }).expect(400);
    expect(foreign.body.fields.offsetC).toBe('Refractometers have no such setting.');
    const ok = await agent.post(`/api/instruments/${refr.body.id}/calibrations`).send({ method: 'set', wcf: 1.03, note: 'From the maker' }).expect(201);
    expect(ok.body.instrument).toMatchObject({ wcf: 1.03, wcfSource: 'entered' });
    expect(await historyCount(refr.body.id)).toBe(2);
  });
});

describe('checking a thermometer', () => {
  it('saves the offset from ice and boiling water, flags over 1 °C, and remembers the elevation on the kettle profile', async () => {
    const { agent, user } = await brewer();
    const t = await agent.post('/api/instruments').send({ kind: 'thermometer', name: 'Kettle dial' }).expect(201);
    expect((await getEquipmentProfile(h.ctx.db, user.id)).source).toBe('common-practice');
    // Sea level: water boils at 99.974 °C (ITS-90 / IAPWS). 1.5 in ice and 101.5 at the boil: a
    // two-point line through (1.5 → 0) and (101.5 → 99.974), i.e. offset 1.5 and slope 99.974 / 100.
    const res = await agent
      .post(`/api/instruments/${t.body.id}/calibrations`)
      .send({ method: 'thermometer-check', iceReadingC: 1.5, boilingReadingC: 101.5, elevationM: 0 })
      .expect(201);
    expect(res.body.instrument.offsetC).toBeCloseTo(1.5, 9);
    expect(Math.abs(res.body.instrument.snapshot.scale - 0.99974)).toBeLessThan(0.00002);
    expect(res.body.calibration.result.flagged).toBe(true);
    expect(res.body.calibration.result.warnings.join(' ')).toMatch(/more than 1 °C off/);
    const kettle = await getEquipmentProfile(h.ctx.db, user.id);
    expect(kettle).toMatchObject({ source: 'saved', elevationM: 0, boilOffLPerHour: 4 });
  });

  it('refuses an offset over 10 °C, from a check or typed in, and saves nothing', async () => {
    const { agent } = await brewer();
    const t = await agent.post('/api/instruments').send({ kind: 'thermometer', name: 'Strip' }).expect(201);
    const check = await agent.post(`/api/instruments/${t.body.id}/calibrations`).send({ method: 'thermometer-check', boilingReadingC: 108, elevationM: 1600 }).expect(400);
    expect(check.body.fields.boilingReadingC).toMatch(/more than 10 °C from the expected/);
    const typed = await agent.post(`/api/instruments/${t.body.id}/calibrations`).send({ method: 'set', offsetC: -12 }).expect(400);
    expect(typed.body.fields.offsetC).toMatch(/over 10 °C/);
    expect((await agent.get(`/api/instruments/${t.body.id}`).expect(200)).body.offsetC).toBe(0);
    expect(await historyCount(t.body.id)).toBe(1);
  });
});

describe('a pH meter', () => {
  it('records a two-point calibration; a future date is refused', async () => {
    const { agent } = await brewer();
    const p = await agent.post('/api/instruments').send({ kind: 'ph_meter', name: 'Bench meter', reminderDays: 14 }).expect(201);
    const future = new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);
    const bad = await agent.post(`/api/instruments/${p.body.id}/calibrations`).send({ method: 'ph-two-point', calibratedOn: future, bufferLowPh: 4.01, bufferHighPh: 7 }).expect(400);
    expect(bad.body.fields.calibratedOn).toBe('The calibration date cannot be in the future.');
    const today = new Date().toISOString().slice(0, 10);
    expect(today <= latestTodayIso()).toBe(true);
    const ok = await agent.post(`/api/instruments/${p.body.id}/calibrations`).send({ method: 'ph-two-point', calibratedOn: today, bufferLowPh: 4.01, bufferHighPh: 7 }).expect(201);
    expect(ok.body.instrument).toMatchObject({ calibratedOn: today, bufferLowPh: 4.01, bufferHighPh: 7, reminderDays: 14 });
    expect(ok.body.instrument.snapshot).toMatchObject({ kind: 'ph_meter', calibratedOn: today });
  });
});

describe('demo data', () => {
  it("gives Priya a calibrated set and a kettle, and Jonah a 60 °F hydrometer and a refractometer", async () => {
    await import('../demo-seeds');
    const { seedDemo, demoPeople, demoPassword } = await import('../db/seed');
    await seedDemo(h.ctx.db);
    const priya = await h.signIn(demoPeople.brewer.email, demoPassword);
    const mine = (await priya.get('/api/instruments').expect(200)).body as { kind: string; wcf: number; wcfSource: string; offsetC: number; calibratedOn: string }[];
    expect(mine.map((i) => i.kind).sort()).toEqual(['hydrometer', 'ph_meter', 'refractometer', 'thermometer']);
    const refr = mine.find((i) => i.kind === 'refractometer')!;
    expect(refr.wcfSource).toBe('measured');
    expect(refr.wcf.toFixed(3)).toBe('1.040');
    expect(mine.find((i) => i.kind === 'thermometer')!.offsetC).toBeCloseTo(0.4, 10);
    expect(mine.find((i) => i.kind === 'ph_meter')!.calibratedOn).toBe(new Date(Date.now() - 10 * 86_400_000).toISOString().slice(0, 10));
    expect((await priya.get('/api/equipment/default').expect(200)).body).toMatchObject({ source: 'saved', boilOffLPerHour: 4, trubLossL: 1.5, deadSpaceL: 0.5, coolingShrinkage: 0.04 });
    const jonah = await h.signIn(demoPeople.secondBrewer.email, demoPassword);
    const his = (await jonah.get('/api/instruments').expect(200)).body as { kind: string; calibrationTempC: number }[];
    expect(his.map((i) => i.kind)).toEqual(['hydrometer', 'refractometer']);
    expect(his[0].calibrationTempC).toBe(15.56);
  });
});
