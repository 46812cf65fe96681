import { count, eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { brewReadings } from '../db/schema';
import { MAX_READINGS_PER_LOG } from '../lib/reading-limit';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeScene, startBrewDay } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const mashReading = { kind: 'mash_temp', method: 'thermometer', tempC: 66 };

async function readingsOf(brewId: number) {
  const [{ n }] = await h.ctx.db.select({ n: count() }).from(brewReadings).where(eq(brewReadings.brewId, brewId));
  return n;
}

/** Fills the log up to `total` readings by copying its first one (MariaDB's sequence engine). */
async function fillTo(brewId: number, total: number) {
  const [first] = await h.ctx.db.select().from(brewReadings).where(eq(brewReadings.brewId, brewId)).limit(1);
  await h.ctx.db.execute(
    sql`insert into ${brewReadings} (brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at, note)
        select brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at + interval s.seq second, note
        from ${brewReadings} r join ${sql.raw(`seq_1_to_${total - 1}`)} s where r.id = ${first.id}`,
  );
}

describe('at most 5,000 readings on one brew day', () => {
  it('stores the 5,000th, refuses the next with words for brewers, and holds under concurrent saves', async () => {
    const s = await makeScene(h);
    const brewId = await startBrewDay(s);
    await s.owner.agent.post(`/api/brews/${brewId}/readings`).send(mashReading).expect(201);
    await fillTo(brewId, MAX_READINGS_PER_LOG - 3);
    expect(await readingsOf(brewId)).toBe(MAX_READINGS_PER_LOG - 3);

    // Five saves at once with room for three: exactly three are stored, two refused.
    const answers = await Promise.all(Array.from({ length: 5 }, () => s.owner.agent.post(`/api/brews/${brewId}/readings`).send(mashReading)));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 201, 201, 409, 409]);
    expect(await readingsOf(brewId)).toBe(MAX_READINGS_PER_LOG);
    const refused = answers.find((a) => a.status === 409)!;
    expect(refused.body.message).toBe(
      'This reading was not saved: the brew-day log of a brew day holds at most 5,000 readings. Delete readings you no longer need, or start a new brew day.',
    );

    // Deleting one makes room again.
    const one = answers.find((a) => a.status === 201)!.body.id as number;
    await s.owner.agent.delete(`/api/brews/${brewId}/readings/${one}`).expect(200);
    await s.owner.agent.post(`/api/brews/${brewId}/readings`).send(mashReading).expect(201);
  });
});
