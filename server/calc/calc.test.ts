import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createHarness, type TestHarness } from '../../tests/support/api';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/**
 * Worked example, gravity points × litres mass balance, hand calculation.
 * 26 L hot at 1.044 with 10 minutes left at 4 L/h; recipe 1.050 and 23 L; 4 % cooling shrinkage.
 * - End of boil: 26 − 4 × 10/60 = 25.333 L hot, × 0.96 = 24.32 L cold.
 * - Extract: 44 × 26 × 0.96 = 1098.24 points·L; with no action 1098.24 / 24.32 = 45.16 points.
 * - Dry malt extract (367 points·L/kg, 0.62 L/kg, shared/brewmath/extract.ts):
 *   (50 × 24.32 − 1098.24) / (367 − 50 × 0.62) = 117.76 / 336 = 0.35048 kg, into 24.32 + 0.35048 × 0.62 = 24.537 L.
 * - Boiling on to 1.050 would leave 1098.24 / 50 = 21.96 L, under the recipe's 23 L: not offered.
 */
const workedExample = { volumeL: 26, sg: 1.044, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05, targetVolumeL: 23, coolingShrinkage: 0.04 };

describe('POST /api/calc/boil-correction', () => {
  it('answers the worked example without an account', async () => {
    const res = await request(h.app).post('/api/calc/boil-correction').send(workedExample);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('low');
    expect(res.body.projected.endVolumeL).toBeCloseTo(25.3333, 4);
    expect(res.body.projected.fermenterVolumeL).toBeCloseTo(24.32, 6);
    expect((res.body.projected.endSg - 1) * 1000).toBeCloseTo(1098.24 / 24.32, 6);
    const dme = res.body.options.find((o: { kind: string; extract?: string }) => o.kind === 'extract' && o.extract === 'dme');
    expect(dme.kg).toBeCloseTo(117.76 / 336, 6);
    expect(dme.fermenterVolumeL).toBeCloseTo(24.32 + (117.76 / 336) * 0.62, 6);
    expect(dme.endSg).toBeCloseTo(1.05, 9);
    const boil = res.body.options.find((o: { kind: string }) => o.kind === 'boil-longer');
    expect(boil).toMatchObject({ feasible: false, code: 'below-recipe-volume' });
  });

  it('offers water when the wort is strong: 1.060 down to 1.050 (hand calculation)', async () => {
    // Nothing left to boil: 20 L at 1.060, cold 19.2 L × 60 points = 1152 points·L; 1152 / 50 = 23.04 L, so add 3.84 L.
    const res = await request(h.app)
      .post('/api/calc/boil-correction')
      .send({ volumeL: 20, sg: 1.06, minutesLeft: 0, boilOffLPerHour: 4, targetSg: 1.05 });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('high');
    const water = res.body.options.find((o: { kind: string }) => o.kind === 'water');
    expect(water.litres).toBeCloseTo(3.84, 9);
  });

  it.each([
    ['a gravity no wort reads (about 66 °Brix)', { sg: 1.3 }, 'sg', 'Current gravity 1.300 is outside 0.980 to 1.200, the range wort can read. Check the reading.'],
    ['an empty kettle', { volumeL: 0 }, 'volumeL', 'Kettle volume must be more than 0.'],
    ['minutes left below zero', { minutesLeft: -1 }, 'minutesLeft', 'Minutes left cannot be below 0.'],
    ['a missing target', { targetSg: undefined }, 'targetSg', 'Enter the target OG.'],
    ['text for a number', { volumeL: 'twenty' }, 'volumeL', 'Kettle volume must be a number.'],
  ])('refuses %s with a 400 naming the field', async (_what, change, field, message) => {
    const res = await request(h.app).post('/api/calc/boil-correction').send({ ...workedExample, ...change });
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('bad_request');
    expect(res.body.fields).toEqual({ [field]: message });
  });

  it('refuses a boil-off that would empty the kettle, under the boil-off rate', async () => {
    // 3 L boiling off at 4 L/h for 60 minutes would lose 4 L: more than is there.
    const res = await request(h.app).post('/api/calc/boil-correction').send({ ...workedExample, volumeL: 3, minutesLeft: 60 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields)).toEqual(['boilOffLPerHour']);
    expect(res.body.fields.boilOffLPerHour).toMatch(/would boil away 4 L, more than the 3 L in the kettle/);
  });

  it('refuses an FG above the OG, under the FG', async () => {
    const res = await request(h.app).post('/api/calc/boil-correction').send({ ...workedExample, targetFg: 1.06 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields)).toEqual(['targetFg']);
  });

  it('answers malformed JSON with a 400', async () => {
    const res = await request(h.app).post('/api/calc/boil-correction').set('Content-Type', 'application/json').send('{"volumeL": 26,');
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('bad_json');
  });

  it('is rate-limited per minute', async () => {
    const limited = await createHarness({ CALC_RATE_LIMIT_MAX: '2' });
    const statuses = [];
    for (let i = 0; i < 3; i++) {
      statuses.push((await request(limited.app).post('/api/calc/boil-correction').send(workedExample)).status);
    }
    expect(statuses).toEqual([200, 200, 429]);
    const refused = await request(limited.app).post('/api/calc/boil-correction').send(workedExample);
    expect(refused.body.error).toBe('rate_limited');
  });
});
