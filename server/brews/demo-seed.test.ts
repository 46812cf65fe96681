import { beforeAll, describe, expect, it } from 'vitest';
import { brixToSg, EXTRACT_POTENTIALS_POINTS_L_PER_KG, EXTRACT_VOLUME_L_PER_KG } from '@shared/brewmath';
import { demoPassword, demoPeople, seedDemo } from '../db/seed';
import '../demo-seeds';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { DEMO_BREW_NAME } from './demo-seed';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
  // Another test file of this run may have seeded already; either way the demo data is there.
  await seedDemo(h.ctx.db);
});

describe('the demo brew day', () => {
  it('is Priya’s finished brew day, shared with the club, with readings, a decision, OG and pitch', async () => {
    const priya = await h.signIn(demoPeople.brewer.email, demoPassword);
    const list = await priya.get('/api/brews').expect(200);
    const summary = list.body.items.find((b: { name: string }) => b.name === DEMO_BREW_NAME);
    expect(summary).toMatchObject({ status: 'fermenting', recipeName: 'Hollow Oak Harvest Pale', targetOg: 1.05 });
    const brew = (await priya.get(`/api/brews/${summary.id}`).expect(200)).body;
    expect(brew.readings.map((r: { kind: string }) => r.kind)).toEqual(['mash_temp', 'mash_ph', 'mash_temp', 'pre_boil_gravity', 'late_boil_gravity', 'og', 'pitch_temp']);
    expect(brew.readings.every((r: { instrumentId: number | null }) => r.instrumentId !== null)).toBe(true);
    expect(brew.pitchedAt).toBe(brew.readings[6].takenAt);
    expect(brew.og).toBeCloseTo(brew.readings[5].corrected, 12);
    expect(brew.stages.every((s: { completedAt: string | null }) => s.completedAt !== null)).toBe(true);
    expect(brew.deviations).toEqual([]);
    expect(brew.sharedWithClubIds).toHaveLength(1);

    // Worked example, gravity points × litres mass balance, hand calculation, from the stored input:
    // 25.8 L hot, 10 min left at 4 L/h → 25.1333 L hot, × 0.96 = 24.128 L cold; extract 25.8 × 0.96 × current points.
    const [decision] = brew.decisions;
    expect(decision.choice).toEqual({ kind: 'extract', extract: 'dme' });
    const current = (brixToSg(12, decision.input.reading.wcf) - 1) * 1000;
    const coldEnd = (25.8 - (4 * 10) / 60) * 0.96;
    const kg = (50 * coldEnd - current * 25.8 * 0.96) / (EXTRACT_POTENTIALS_POINTS_L_PER_KG.dme - 50 * EXTRACT_VOLUME_L_PER_KG.dme);
    expect(decision.chosen.kg).toBeCloseTo(kg, 9);
    expect(decision.chosen.kg).toBeGreaterThan(0.1);
    expect(decision.chosen.kg).toBeLessThan(0.25);
  });

  it('can be read by the club’s mentor, who may not change it', async () => {
    const priya = await h.signIn(demoPeople.brewer.email, demoPassword);
    const { id } = (await priya.get('/api/brews').expect(200)).body.items.find((b: { name: string }) => b.name === DEMO_BREW_NAME);
    const ivo = await h.signIn(demoPeople.mentor.email, demoPassword);
    const shared = await ivo.get('/api/brews?scope=shared').expect(200);
    expect(shared.body.items.map((b: { id: number }) => b.id)).toContain(id);
    await ivo.get(`/api/brews/${id}`).expect(200);
    await ivo.patch(`/api/brews/${id}`).send({ notes: 'x' }).expect(403);
  });
});
