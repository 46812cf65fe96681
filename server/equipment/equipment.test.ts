import request from 'supertest';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { makeUser } from '../db/factories';
import { equipmentProfiles } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { getEquipmentProfile } from './service';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function brewer() {
  const user = await makeUser(h.ctx.db);
  return { user, agent: await h.signIn(user.email) };
}

const kettle = { name: 'Hollow 30 L kettle', boilOffLPerHour: 3.5, trubLossL: 1.5, deadSpaceL: 0.5, coolingShrinkage: 0.04 };

describe('equipment profile', () => {
  it('needs a signed-in brewer', async () => {
    await request(h.app).get('/api/equipment/default').expect(401);
  });

  it('without a saved kettle gives common-practice values and says so', async () => {
    const { agent, user } = await brewer();
    const res = await agent.get('/api/equipment/default').expect(200);
    // Cooling shrinkage about 4 % (common practice, no source).
    expect(res.body).toMatchObject({ id: null, source: 'common-practice', coolingShrinkage: 0.04, boilOffLPerHour: 4 });
    expect(res.body.note).toMatch(/common-practice values/);
    expect(await getEquipmentProfile(h.ctx.db, user.id)).toEqual(res.body);
  });

  it('works out the boil-off rate from a measurement: 28.0 L to 24.5 L in 60 min is 3.5 L/h; 30 L to 26.4 L in 45 min is 4.8 L/h', async () => {
    const { agent } = await brewer();
    const created = await agent
      .post('/api/equipment')
      .send({ ...kettle, boilOffMeasurement: { startL: 28, endL: 24.5, minutes: 60 } })
      .expect(201);
    expect(created.body).toMatchObject({ source: 'saved', isDefault: true, note: null, boilOffMeasurement: { startL: 28, endL: 24.5, minutes: 60 } });
    expect(created.body.boilOffLPerHour).toBeCloseTo(3.5, 10);
    // (30 − 26.4) L × 60 / 45 min = 3.6 × 4/3 = 4.8 L/h, worked by hand.
    const again = await agent
      .patch(`/api/equipment/${created.body.id}`)
      .send({ boilOffMeasurement: { startL: 30, endL: 26.4, minutes: 45 } })
      .expect(200);
    expect(again.body.boilOffLPerHour).toBeCloseTo(4.8, 10);
    const typed = await agent.patch(`/api/equipment/${created.body.id}`).send({ boilOffLPerHour: 4 }).expect(200);
    expect(typed.body).toMatchObject({ boilOffLPerHour: 4, boilOffMeasurement: null });
  });

  it('refuses impossible measurements and values, with a message per field, and saves nothing', async () => {
    const { agent, user } = await brewer();
    const up = await agent.post('/api/equipment').send({ ...kettle, boilOffMeasurement: { startL: 20, endL: 22, minutes: 60 } }).expect(400);
    expect(up.body.fields['boilOffMeasurement.endL']).toMatch(/a boil only loses volume/);
    const fast = await agent.post('/api/equipment').send({ ...kettle, boilOffMeasurement: { startL: 30, endL: 5, minutes: 20 } }).expect(400);
    expect(fast.body.fields['boilOffMeasurement.minutes']).toMatch(/beyond a home kettle/);
    const shrink = await agent.post('/api/equipment').send({ ...kettle, coolingShrinkage: 4 }).expect(400);
    expect(shrink.body.fields.coolingShrinkage).toMatch(/between 0 and 10 %/);
    expect(await h.ctx.db.select().from(equipmentProfiles).where(eq(equipmentProfiles.ownerId, user.id))).toEqual([]);
  });

  it('keeps exactly one default when several kettles exist', async () => {
    const { agent, user } = await brewer();
    const first = await agent.post('/api/equipment').send(kettle).expect(201);
    const second = await agent.post('/api/equipment').send({ ...kettle, name: 'Small stovetop pot', boilOffLPerHour: 2 }).expect(201);
    expect(second.body.isDefault).toBe(false);
    await agent.patch(`/api/equipment/${second.body.id}`).send({ isDefault: true }).expect(200);
    expect((await getEquipmentProfile(h.ctx.db, user.id)).id).toBe(second.body.id);
    const list = await agent.get('/api/equipment').expect(200);
    expect(list.body.filter((p: { isDefault: boolean }) => p.isDefault)).toHaveLength(1);
    await agent.delete(`/api/equipment/${second.body.id}`).expect(204);
    expect(await getEquipmentProfile(h.ctx.db, user.id)).toMatchObject({ id: first.body.id, isDefault: true });
  });

  it("another brewer's kettle is not found (404) and stays as it was", async () => {
    const owner = await brewer();
    const other = await brewer();
    const mine = await owner.agent.post('/api/equipment').send(kettle).expect(201);
    await other.agent.get(`/api/equipment/${mine.body.id}`).expect(404);
    await other.agent.patch(`/api/equipment/${mine.body.id}`).send({ boilOffLPerHour: 9 }).expect(404);
    await other.agent.delete(`/api/equipment/${mine.body.id}`).expect(404);
    expect((await other.agent.get('/api/equipment/default').expect(200)).body.source).toBe('common-practice');
    expect((await owner.agent.get(`/api/equipment/${mine.body.id}`).expect(200)).body.boilOffLPerHour).toBe(3.5);
  });
});
