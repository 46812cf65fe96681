/**
 * Entries kept on a brewer's device while offline reach the server later: each create takes the
 * time it was made on the device (readings already did), and refuses a time in the future.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeScene, startBrewDay } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

// The late-boil input of decisions.test.ts (hydrometer 1.046 at its 20 °C calibration temperature).
const checkInput = {
  reading: { kind: 'hydrometer', sg: 1.046, sampleTempC: 20, calibrationTempC: 20 },
  volumeL: 24,
  minutesLeft: 10,
  boilOffLPerHour: 3,
  targetSg: 1.05,
  targetVolumeL: 21,
  targetFg: 1.011,
  extractsOnHand: ['dme'],
  coolingShrinkage: 0.04,
};

const minutesAgo = (m: number) => new Date(Date.now() - m * 60_000);
/** MariaDB keeps whole seconds or finer: compare to the second. */
const toSecond = (iso: string) => Math.floor(Date.parse(iso) / 1000);

describe('times made on the device', () => {
  it('stores a decision, a note and a stage change with the time the brewer made them, not when they arrived', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const decidedAt = minutesAgo(42).toISOString();
    const writtenAt = minutesAgo(41).toISOString();
    const at = minutesAgo(40).toISOString();

    const decision = await scene.owner.agent.post(`/api/brews/${id}/decisions`).send({ input: checkInput, choice: { kind: 'as-is' }, decidedAt });
    expect(decision.status).toBe(201);
    const note = await scene.owner.agent.post(`/api/brews/${id}/notes`).send({ body: 'Wind picked up, lid half on.', stage: 'boil', writtenAt });
    expect(note.status).toBe(201);
    const stage = await scene.owner.agent.post(`/api/brews/${id}/stages/mash`).send({ action: 'complete', at });
    expect(stage.status).toBe(200);

    const brew = (await scene.owner.agent.get(`/api/brews/${id}`)).body;
    expect(toSecond(brew.decisions[0].decidedAt)).toBe(toSecond(decidedAt));
    expect(toSecond(brew.log.find((n: { body: string }) => n.body.startsWith('Wind')).createdAt)).toBe(toSecond(writtenAt));
    expect(toSecond(brew.stages.find((s: { stage: string }) => s.stage === 'mash').completedAt)).toBe(toSecond(at));
  });

  it('uses the server clock when no time is sent', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const before = Math.floor(Date.now() / 1000);
    const res = await scene.owner.agent.post(`/api/brews/${id}/decisions`).send({ input: checkInput, choice: { kind: 'as-is' } });
    expect(res.status).toBe(201);
    expect(toSecond(res.body.decidedAt)).toBeGreaterThanOrEqual(before);
  });

  it('refuses a time in the future with a 400 naming the field, and stores nothing', async () => {
    const scene = await makeScene(h);
    const id = await startBrewDay(scene);
    const future = new Date(Date.now() + 60 * 60_000).toISOString();
    const decision = await scene.owner.agent.post(`/api/brews/${id}/decisions`).send({ input: checkInput, choice: { kind: 'as-is' }, decidedAt: future });
    expect(decision.status).toBe(400);
    expect(decision.body.fields).toEqual({ decidedAt: 'The time of the decision cannot be in the future.' });
    const note = await scene.owner.agent.post(`/api/brews/${id}/notes`).send({ body: 'x', writtenAt: 'yesterday' });
    expect(note.status).toBe(400);
    expect(note.body.fields).toEqual({ writtenAt: 'Give the time as an ISO date and time.' });
    const stage = await scene.owner.agent.post(`/api/brews/${id}/stages/boil`).send({ action: 'skip', at: future });
    expect(stage.status).toBe(400);
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`)).body;
    expect(brew.decisions).toHaveLength(0);
    expect(brew.log).toHaveLength(0);
    expect(brew.stages.find((s: { stage: string }) => s.stage === 'boil').skippedAt).toBeNull();
  });
});
