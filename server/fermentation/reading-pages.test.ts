import { asc, eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { READINGS_WINDOW } from '@shared/schemas/brews';
import { loadSessionUser } from '../auth/session';
import { createDb } from '../db/client';
import { fermentationReadings } from '../db/schema';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { getLog } from './service';
import { makeFermentationScene, type FermentationScene } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

/**
 * A temperature logger: the scene's first reading copied `copies` times, one every 15 minutes
 * after it (MariaDB's sequence engine), each with its own dedupe key.
 */
async function fill(brewId: number, copies: number) {
  const [first] = await h.ctx.db.select().from(fermentationReadings).where(eq(fermentationReadings.brewId, brewId)).orderBy(asc(fermentationReadings.id)).limit(1);
  await h.ctx.db.execute(
    sql`insert into ${fermentationReadings} (brew_id, kind, method, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, estimate, taken_at, note, source, dedupe_key)
        select brew_id, kind, method, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, estimate, taken_at + interval (s.seq * 15) minute, note, source, sha2(concat(dedupe_key, s.seq), 256)
        from ${fermentationReadings} r join ${sql.raw(`seq_1_to_${copies}`)} s where r.id = ${first.id}`,
  );
}

async function idsInOrder(brewId: number) {
  const rows = await h.ctx.db
    .select({ id: fermentationReadings.id })
    .from(fermentationReadings)
    .where(eq(fermentationReadings.brewId, brewId))
    .orderBy(asc(fermentationReadings.takenAt), asc(fermentationReadings.id));
  return rows.map((r) => r.id);
}

/** `total` readings: one at 17 °C on day 1 (below the test recipe's 18–20 °C range), then logger copies of it. */
async function longLog(total: number, options: { shared?: boolean } = {}): Promise<FermentationScene> {
  const s = await makeFermentationScene(h, { pitchedDaysAgo: 30, shared: options.shared });
  await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 17, takenAt: s.day(1) }).expect(201);
  if (total > 1) await fill(s.brewId, total - 1);
  return s;
}

const ids = (list: { id: number }[]) => list.map((r) => r.id);
const url = (s: FermentationScene) => `/api/brews/${s.brewId}/fermentation`;

describe('GET /api/brews/:brewId/fermentation with a long log', () => {
  it('sends the latest 50 readings whole, the count, a cursor, and every reading in the chart series', async () => {
    const s = await longLog(130);
    const all = await idsInOrder(s.brewId);
    const log = (await s.owner.agent.get(url(s)).expect(200)).body;
    expect(READINGS_WINDOW).toBe(50);
    expect(ids(log.readings)).toEqual(all.slice(-50));
    expect(log.readings[0]).toMatchObject({ kind: 'temperature', method: 'thermometer', raw: { tempC: 17 }, instrument: { kind: 'thermometer' } });
    expect(log.readingCount).toBe(130);
    expect(typeof log.olderReadings).toBe('string');
    expect(ids(log.series)).toEqual(all);
    expect(Object.keys(log.series[0]).sort()).toEqual(['corrected', 'estimate', 'id', 'kind', 'takenAt']);
    expect(log.series[0]).toMatchObject({ kind: 'temperature', estimate: false });
    expect(log.series[0].corrected).toBeCloseTo(17, 9);
  });

  it('judges the temperature summary from every reading, not only those sent', async () => {
    const s = await longLog(130);
    const log = (await s.owner.agent.get(url(s)).expect(200)).body;
    expect(log.temperature.overall.count).toBe(130);
    // Each copy sits at 17 °C: all 130 are out of range, counted, and the latest few listed.
    expect(log.temperature.excursionCount).toBe(130);
  });

  it('has no cursor when every reading is sent', async () => {
    const s = await longLog(50);
    const log = (await s.owner.agent.get(url(s)).expect(200)).body;
    expect(log.readings).toHaveLength(50);
    expect(log.readingCount).toBe(50);
    expect(log.olderReadings).toBeNull();
  });

  it('costs the same statements with 10 readings as with 2,000', async () => {
    const small = await longLog(10);
    const large = await longLog(2000);
    let statements = 0;
    const counted = createDb(h.ctx.env.DATABASE_URL, { poolSize: 2, logger: { logQuery: () => void statements++ } });
    try {
      const count = async (s: FermentationScene) => {
        const actor = (await loadSessionUser(h.ctx.db, s.owner.user.id))!;
        statements = 0;
        const log = await getLog(counted.db, actor, s.brewId);
        return { statements, sent: log.readings.length, series: log.series.length };
      };
      const a = await count(small);
      const b = await count(large);
      expect([a.sent, b.sent]).toEqual([10, 50]);
      expect([a.series, b.series]).toEqual([10, 2000]);
      expect(b.statements).toBe(a.statements);
    } finally {
      await counted.pool.end();
    }
  });
});

describe('GET /api/brews/:brewId/fermentation/readings', () => {
  it('pages back through every reading, oldest first within a page, none lost or repeated', async () => {
    const s = await longLog(130);
    const all = await idsInOrder(s.brewId);
    const log = (await s.owner.agent.get(url(s)).expect(200)).body;
    let seen: number[] = ids(log.readings);
    let cursor: string | null = log.olderReadings;
    const sizes: number[] = [];
    while (cursor) {
      const page = (await s.owner.agent.get(`${url(s)}/readings`).query({ cursor, pageSize: 37 }).expect(200)).body;
      expect(page.pageSize).toBe(37);
      sizes.push(page.items.length);
      seen = [...ids(page.items), ...seen];
      cursor = page.nextCursor;
    }
    // 130 - 50 sent with the log = 80 = 37 + 37 + 6.
    expect(sizes).toEqual([37, 37, 6]);
    expect(seen).toEqual(all);
  });

  it('answers the latest page of 50 without a cursor or page size', async () => {
    const s = await longLog(60);
    const page = (await s.owner.agent.get(`${url(s)}/readings`).expect(200)).body;
    expect(page.pageSize).toBe(50);
    expect(ids(page.items)).toEqual((await idsInOrder(s.brewId)).slice(-50));
    expect(typeof page.nextCursor).toBe('string');
  });

  it('refuses a bad page size or cursor with a 400 naming the field', async () => {
    const s = await longLog(3);
    for (const pageSize of ['0', '201', 'many', '2.5']) {
      const res = await s.owner.agent.get(`${url(s)}/readings`).query({ pageSize }).expect(400);
      expect(Object.keys(res.body.fields)).toEqual(['pageSize']);
    }
    // A brew-day readings cursor belongs to another list.
    const brewDayCursor = Buffer.from(JSON.stringify(['readings', '2025-01-01T00:00:00.000Z', 3])).toString('base64url');
    const bad = ['not-a-cursor', Buffer.from('["fermentation-readings","yesterday",3]').toString('base64url'), Buffer.from('["fermentation-readings","2025-01-01T00:00:00.000Z",0]').toString('base64url'), brewDayCursor];
    for (const cursor of bad) {
      const res = await s.owner.agent.get(`${url(s)}/readings`).query({ cursor }).expect(400);
      expect(res.body.fields).toEqual({ cursor: 'This list has changed since; start again from the top.' });
    }
  });

  it('is for those who may read the log: 404 for others, 200 for a club member once shared', async () => {
    const s = await longLog(3, { shared: true });
    await s.other.agent.get(`${url(s)}/readings`).expect(404);
    const page = (await s.member.agent.get(`${url(s)}/readings`).expect(200)).body;
    expect(page.items).toHaveLength(3);
  });
});

describe('DELETE /api/brews/:brewId/fermentation/readings/:id', () => {
  it('answers what the deletion changed, not the log', async () => {
    const s = await longLog(3);
    const [first] = await idsInOrder(s.brewId);
    const res = await s.owner.agent.delete(`${url(s)}/readings/${first}`).expect(200);
    expect(res.body).toMatchObject({ readingId: first, readingCount: 2, verdict: { state: 'no-reading' } });
    expect(res.body.temperature.overall.count).toBe(2);
    expect(res.body).not.toHaveProperty('readings');
    expect(res.body).not.toHaveProperty('series');
  });
});
