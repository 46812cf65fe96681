import { asc, eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { READINGS_WINDOW } from '@shared/schemas/brews';
import { loadSessionUser } from '../auth/session';
import { createDb } from '../db/client';
import { brewReadings } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { backfillInstrumentNotes } from './instrument-notes';
import { getBrew } from './service';
import { makeInstrument, makeScene, startBrewDay, testRecipe, type Scene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const mashReading = { kind: 'mash_temp', tempC: 66, takenAt: '2025-09-20T08:00:00.000Z' };

/**
 * Copies the brew day's first reading `copies` times, `step` copies a second apart (MariaDB's
 * sequence engine), so several readings share one time and only the id orders them.
 */
async function fill(brewId: number, copies: number, step = 3) {
  const [first] = await h.ctx.db.select().from(brewReadings).where(eq(brewReadings.brewId, brewId)).orderBy(asc(brewReadings.id)).limit(1);
  await h.ctx.db.execute(
    sql`insert into ${brewReadings} (brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at, note, instrument_note)
        select brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at + interval ((s.seq div ${step}) + 1) second, note, instrument_note
        from ${brewReadings} r join ${sql.raw(`seq_1_to_${copies}`)} s where r.id = ${first.id}`,
  );
}

/** Every reading id in log order, read straight from the table. */
async function idsInOrder(brewId: number) {
  const rows = await h.ctx.db.select({ id: brewReadings.id }).from(brewReadings).where(eq(brewReadings.brewId, brewId)).orderBy(asc(brewReadings.takenAt), asc(brewReadings.id));
  return rows.map((r) => r.id);
}

async function longBrewDay(scene: Scene, total: number) {
  const id = await startBrewDay(scene);
  await scene.owner.agent.post(`/api/brews/${id}/readings`).send(mashReading).expect(201);
  await fill(id, total - 1);
  return id;
}

const ids = (list: { id: number }[]) => list.map((r) => r.id);

describe('GET /api/brews/:id with a long log', () => {
  it('sends the latest readings in time order, the count and a cursor for the older ones', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 130);
    const all = await idsInOrder(id);
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    expect(READINGS_WINDOW).toBe(50);
    expect(ids(brew.readings)).toEqual(all.slice(-50));
    expect(brew.readingCount).toBe(130);
    expect(typeof brew.olderReadings).toBe('string');
  });

  it('has no cursor when every reading is sent', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 50);
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    expect(ids(brew.readings)).toEqual(await idsInOrder(id));
    expect(brew.olderReadings).toBeNull();
    expect(brew.readingCount).toBe(50);
  });

  it('still judges the readings it does not send: the first reading’s uncalibrated thermometer and an OG far below target', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 120);
    const [firstId] = await idsInOrder(id);
    // Hand check: 1.030 is 20 points short of the recipe's 1.050, beyond the 2 points allowed (common practice, no source).
    const og = (await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'og', sg: 1.03, sampleTempC: 20, takenAt: '2025-09-20T12:00:00.000Z' }).expect(201)).body;
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    expect(ids(brew.readings)).not.toContain(firstId);
    expect(brew.deviations.map((d: { code: string; readingId: number | null }) => [d.code, d.readingId])).toEqual([
      ['instrument-uncalibrated', firstId],
      ['og-low', og.id],
      ['instrument-uncalibrated', og.id],
    ]);
    expect(og.brewDay.deviations).toEqual(brew.deviations);
    expect(brew.og).toBe(og.corrected);
    expect(brew.readingCount).toBe(121);
    expect(og.brewDay.readingCount).toBe(121);
  });

  it('judges readings stored before they kept their instrument note the same way', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 80);
    const [firstId] = await idsInOrder(id);
    await h.ctx.db.update(brewReadings).set({ instrumentNote: null }).where(eq(brewReadings.brewId, id));
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    expect(brew.deviations.map((d: { code: string; readingId: number | null }) => [d.code, d.readingId])).toEqual([['instrument-uncalibrated', firstId]]);
    expect(brew.readingCount).toBe(80);

    // The backfill gives them the note a new reading gets, and the day reads the same.
    const [stored] = await h.ctx.db.select().from(brewReadings).where(eq(brewReadings.id, (await idsInOrder(await longBrewDay(scene, 1)))[0]));
    expect(await backfillInstrumentNotes(h.ctx.db, { batch: 7 })).toBeGreaterThanOrEqual(80);
    const notes = await h.ctx.db.selectDistinct({ note: brewReadings.instrumentNote }).from(brewReadings).where(eq(brewReadings.brewId, id));
    expect(notes).toEqual([{ note: stored.instrumentNote }]);
    expect((await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body.deviations).toEqual(brew.deviations);
  });

  it('flags a pH meter past its reminder at the first reading after the reminder day, to the millisecond, however many came before', async () => {
    const scene = await makeScene(h);
    const recipe = await scene.owner.agent.post('/api/recipes').send({ ...testRecipe, name: 'Scene Sour', souringTargetPh: 3.4 }).expect(201);
    const id = (await scene.owner.agent.post('/api/brews').send({ recipeId: recipe.body.id }).expect(201)).body.id as number;
    // Calibrated 1 January with a 30-day reminder: due at 2025-01-31T00:00:00Z (calibration day at 00:00 UTC plus 30 days).
    const meter = await makeInstrument(scene, { kind: 'ph_meter', name: 'Pen meter', calibratedOn: '2025-01-01', reminderDays: 30 });
    const send = async (takenAt: string) =>
      (await scene.owner.agent.post(`/api/brews/${id}/readings`).send({ kind: 'souring_ph', instrumentId: meter, ph: 3.6, takenAt }).expect(201)).body.id as number;
    await send('2025-01-20T10:00:00.000Z');
    await fill(id, 60, 1);
    await send('2025-01-31T00:00:00.000Z');
    const firstPast = await send('2025-01-31T00:00:00.500Z');
    await send('2025-02-03T09:00:00.000Z');
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    expect(brew.deviations).toEqual([
      {
        code: 'instrument-overdue',
        stage: 'souring',
        readingId: firstPast,
        decisionId: null,
        expected: null,
        actual: null,
        quantity: null,
        instrumentName: 'Pen meter',
        message: 'Pen meter was last calibrated 30 days before this reading, past its 30-day reminder.',
      },
    ]);
  });

  it('costs the same statements with 10 readings as with 400', async () => {
    const scene = await makeScene(h);
    const small = await longBrewDay(scene, 10);
    const large = await longBrewDay(scene, 400);
    let statements = 0;
    const counted = createDb(h.ctx.env.DATABASE_URL, { poolSize: 2, logger: { logQuery: () => void statements++ } });
    try {
      const actor = (await loadSessionUser(h.ctx.db, scene.owner.user.id))!;
      const count = async (brewId: number) => {
        statements = 0;
        const brew = await getBrew(counted.db, actor, brewId);
        return { statements, sent: brew.readings.length };
      };
      const a = await count(small);
      const b = await count(large);
      expect([a.sent, b.sent]).toEqual([10, 50]);
      expect(b.statements).toBe(a.statements);
    } finally {
      await counted.pool.end();
    }
  });
});

describe('GET /api/brews/:id/readings', () => {
  it('pages back through every reading, oldest first within a page, none lost or repeated, ties in time ordered by id', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 130);
    const all = await idsInOrder(id);
    const brew = (await scene.owner.agent.get(`/api/brews/${id}`).expect(200)).body;
    let seen: number[] = ids(brew.readings);
    let cursor: string | null = brew.olderReadings;
    const sizes: number[] = [];
    while (cursor) {
      const page = (await scene.owner.agent.get(`/api/brews/${id}/readings`).query({ cursor, pageSize: 37 }).expect(200)).body;
      expect(page.pageSize).toBe(37);
      sizes.push(page.items.length);
      seen = [...ids(page.items), ...seen];
      cursor = page.nextCursor;
    }
    // 130 - 50 sent with the day = 80 = 37 + 37 + 6.
    expect(sizes).toEqual([37, 37, 6]);
    expect(seen).toEqual(all);
  });

  it('answers the latest page without a cursor, with photos and the full reading', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 5);
    const page = (await scene.owner.agent.get(`/api/brews/${id}/readings?pageSize=2`).expect(200)).body;
    expect(ids(page.items)).toEqual((await idsInOrder(id)).slice(-2));
    expect(page.items[0]).toMatchObject({ kind: 'mash_temp', raw: { tempC: 66 }, photos: [] });
    expect(typeof page.nextCursor).toBe('string');
  });

  it('refuses a bad page size or cursor with a 400 naming the field', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 3);
    for (const pageSize of ['0', '201', 'many', '2.5']) {
      const res = await scene.owner.agent.get(`/api/brews/${id}/readings`).query({ pageSize }).expect(400);
      expect(Object.keys(res.body.fields)).toEqual(['pageSize']);
    }
    const listCursor = (await scene.owner.agent.get('/api/brews?pageSize=1').expect(200)).body.nextCursor;
    for (const cursor of ['not-a-cursor', Buffer.from('["readings","yesterday",3]').toString('base64url'), Buffer.from('["readings","2025-01-01T00:00:00.000Z",-1]').toString('base64url'), listCursor ?? 'x']) {
      const res = await scene.owner.agent.get(`/api/brews/${id}/readings`).query({ cursor }).expect(400);
      expect(res.body.fields).toEqual({ cursor: 'This list has changed since; start again from the top.' });
    }
  });

  it('is for those who may read the brew day: 404 for others, 200 for a club member once shared', async () => {
    const scene = await makeScene(h);
    const id = await longBrewDay(scene, 3);
    await scene.other.agent.get(`/api/brews/${id}/readings`).expect(404);
    await scene.member.agent.get(`/api/brews/${id}/readings`).expect(404);
    await scene.owner.agent.put(`/api/brews/${id}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
    expect((await scene.member.agent.get(`/api/brews/${id}/readings`).expect(200)).body.items).toHaveLength(3);
  });
});

describe('GET /api/brews pages by key', () => {
  it('lists newest first, a page at a time, none lost or repeated, and refuses a bad cursor', async () => {
    const scene = await makeScene(h);
    const started: number[] = [];
    for (const brewedOn of ['2025-03-01', '2025-05-01', '2025-05-01', '2025-05-01', '2025-04-01']) {
      started.push((await scene.owner.agent.post('/api/brews').send({ recipeId: scene.recipeId, brewedOn }).expect(201)).body.id);
    }
    // Newest brew date first; the same date, the later one started first.
    const expected = [started[3], started[2], started[1], started[4], started[0]];
    const seen: number[] = [];
    let cursor: string | undefined;
    do {
      const page = (await scene.owner.agent.get('/api/brews').query({ pageSize: 2, ...(cursor && { cursor }) }).expect(200)).body;
      expect(page.items.length).toBeLessThanOrEqual(2);
      seen.push(...ids(page.items));
      cursor = page.nextCursor ?? undefined;
    } while (cursor);
    expect(seen).toEqual(expected);

    const first = (await scene.owner.agent.get('/api/brews?pageSize=2').expect(200)).body;
    // A cursor of my list does not page the shared list.
    const res = await scene.owner.agent.get('/api/brews').query({ scope: 'shared', cursor: first.nextCursor }).expect(400);
    expect(res.body.fields).toEqual({ cursor: 'This list has changed since; start again from the top.' });
    const big = await scene.owner.agent.get('/api/brews?pageSize=101').expect(400);
    expect(Object.keys(big.body.fields)).toEqual(['pageSize']);
  });
});
