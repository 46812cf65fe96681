import request from 'supertest';
import { and, asc, eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { recipeInputSchema } from '@shared/schemas/recipes';
import { loadSessionUser } from '../auth/session';
import { createDb } from '../db/client';
import { addMember, makeUser } from '../db/factories';
import { brewClubShares, fermentationReadings } from '../db/schema';
import { createRecipe } from '../recipes/service';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { testRecipe } from '../brews/test-scene';
import { makeFermentationScene } from '../fermentation/test-scene';
import { listQueue, listReviewed } from './service';
import { makeReviewScene, sharedBrewWithDecision } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const HOUR_MS = 3_600_000;

/** Moves a share's time, so the queue's order does not hang on the clock's second. */
async function sharedHoursAgo(brewId: number, clubId: number, hours: number) {
  await h.ctx.db
    .update(brewClubShares)
    .set({ sharedAt: new Date(Math.floor((Date.now() - hours * HOUR_MS) / 1000) * 1000) })
    .where(and(eq(brewClubShares.brewId, brewId), eq(brewClubShares.clubId, clubId)));
}

describe('GET /api/reviews/queue', () => {
  it('lists the club’s shared brew days that no mentor of the club has commented on yet, newest share first', async () => {
    const s = await makeReviewScene(h);
    const secondMentorUser = await makeUser(h.ctx.db, { displayName: 'Second Mentor' });
    await addMember(h.ctx.db, s.club.id, secondMentorUser.id, 'mentor');
    const secondMentor = await h.signIn(secondMentorUser.email);

    const oldest = await sharedBrewWithDecision(s);
    const newest = await sharedBrewWithDecision(s);
    const reviewed = await sharedBrewWithDecision(s);
    const repliedByBrewer = await sharedBrewWithDecision(s);
    const unshared = await sharedBrewWithDecision(s, { share: false });
    await sharedHoursAgo(oldest.brewId, s.club.id, 3);
    await sharedHoursAgo(newest.brewId, s.club.id, 1);
    await sharedHoursAgo(reviewed.brewId, s.club.id, 2);
    await sharedHoursAgo(repliedByBrewer.brewId, s.club.id, 2.5);
    // A comment by the other mentor of the club takes a brew day off both mentors' queues;
    // the brewer's own words do not count as a review.
    await secondMentor.post(`/api/brews/${reviewed.brewId}/comments`).send({ body: 'Reviewed.' }).expect(201);
    await s.owner.agent.post(`/api/brews/${repliedByBrewer.brewId}/comments`).send({ body: 'Any thoughts?' }).expect(201);
    // The mentor's own brew day, shared with the same club, is not theirs to review.
    const mentorActor = (await loadSessionUser(h.ctx.db, s.mentor.user.id))!;
    const mentorRecipe = await createRecipe(h.ctx.db, mentorActor, recipeInputSchema.parse(testRecipe));
    const own = await s.mentor.agent.post('/api/brews').send({ recipeId: mentorRecipe }).expect(201);
    await s.mentor.agent.put(`/api/brews/${own.body.id}/sharing`).send({ clubIds: [s.club.id] }).expect(200);

    const expected = [newest.brewId, repliedByBrewer.brewId, oldest.brewId];
    for (const mentor of [s.mentor.agent, secondMentor]) {
      const queue = await mentor.get('/api/reviews/queue').expect(200);
      const ids = queue.body.items.map((q: { brewId: number }) => q.brewId);
      expect(ids.filter((id: number) => [...expected, reviewed.brewId, unshared.brewId, own.body.id].includes(id))).toEqual(
        // The second mentor reviews the first mentor's brew day, shared just now.
        mentor === secondMentor ? [own.body.id, ...expected] : expected,
      );
    }

    const queue = (await s.mentor.agent.get('/api/reviews/queue').expect(200)).body.items;
    const item = queue.find((q: { brewId: number }) => q.brewId === newest.brewId);
    expect(item).toMatchObject({
      brewName: 'Scene Pale',
      brewerName: 'Test Brewer',
      recipeName: 'Scene Pale',
      status: 'brewing',
      clubs: [{ id: s.club.id, name: 'Scene club' }],
      og: null,
      targetOg: 1.05,
    });
    // The same count as the review page: the decision left 1.0470 against 1.050 (worked example in
    // server/brews/decisions.test.ts: 1059.84 points·L over 22.56 L = 46.98 points, 3 short) and
    // the late-boil reading was taken with the common-practice hydrometer, not one of the brewer's own.
    const review = (await s.mentor.agent.get(`/api/brews/${newest.brewId}/review`).expect(200)).body;
    expect(review.deviations.map((d: { code: string }) => d.code)).toEqual(['instrument-uncalibrated', 'accepted-off-target']);
    expect(review.deviations[1].actual).toBeCloseTo(1 + 1059.84 / 22.56 / 1000, 9);
    expect(item.deviationCount).toBe(2);

    // Commenting takes it off the queue.
    await s.mentor.agent.post(`/api/brews/${newest.brewId}/comments`).send({ body: 'On target apart from the late boil.' }).expect(201);
    const after = (await s.mentor.agent.get('/api/reviews/queue').expect(200)).body.items.map((q: { brewId: number }) => q.brewId);
    expect(after).not.toContain(newest.brewId);
    expect(after).toContain(oldest.brewId);
  });

  it('comes a page at a time, newest share first, each brew day once, with a cursor for the next page', async () => {
    const s = await makeReviewScene(h);
    const ids: number[] = [];
    for (let i = 0; i < 23; i++) ids.push((await sharedBrewWithDecision(s)).brewId);
    // Shares an hour apart, the last made the newest.
    for (const [i, id] of ids.entries()) await sharedHoursAgo(id, s.club.id, ids.length - i);
    const newestFirst = [...ids].reverse();

    const first = (await s.mentor.agent.get('/api/reviews/queue').expect(200)).body;
    expect(first.items.map((q: { brewId: number }) => q.brewId)).toEqual(newestFirst.slice(0, 20));
    expect(typeof first.nextCursor).toBe('string');
    const second = (await s.mentor.agent.get('/api/reviews/queue').query({ cursor: first.nextCursor }).expect(200)).body;
    expect(second.items.map((q: { brewId: number }) => q.brewId)).toEqual(newestFirst.slice(20));
    expect(second.nextCursor).toBeNull();

    const small = (await s.mentor.agent.get('/api/reviews/queue').query({ pageSize: 10 }).expect(200)).body;
    expect(small.items).toHaveLength(10);
    // A cursor of another list, or one tampered with, is a 400 under the field, never a 500.
    const bad = await s.mentor.agent.get('/api/reviews/reviewed').query({ cursor: first.nextCursor }).expect(400);
    expect(bad.body.fields.cursor).toMatch(/start again from the top/);
    await s.mentor.agent.get('/api/reviews/queue').query({ cursor: 'not-a-cursor' }).expect(400);
    const tooMany = await s.mentor.agent.get('/api/reviews/queue').query({ pageSize: 101 }).expect(400);
    expect(tooMany.body.fields.pageSize).toBe('Ask for at most 100 brew days a page.');
  });

  it('is empty for people who mentor no club it is shared with; anonymous visitors get 401', async () => {
    const s = await makeReviewScene(h);
    await sharedBrewWithDecision(s);
    for (const agent of [s.member.agent, s.otherMentor.agent, s.other.agent, s.owner.agent]) {
      expect((await agent.get('/api/reviews/queue').expect(200)).body.items).toEqual([]);
    }
    await request(h.app).get('/api/reviews/queue').expect(401);
  });
});

describe('GET /api/reviews/reviewed', () => {
  it('finds again the brew days a mentor of the club has commented on, latest comment first, with the same summary as the queue', async () => {
    const s = await makeReviewScene(h);
    const first = await sharedBrewWithDecision(s);
    const second = await sharedBrewWithDecision(s);
    const waiting = await sharedBrewWithDecision(s);
    const queued = (await s.mentor.agent.get('/api/reviews/queue').expect(200)).body.items;
    const before = queued.find((q: { brewId: number }) => q.brewId === first.brewId);

    await s.mentor.agent.post(`/api/brews/${first.brewId}/comments`).send({ body: 'Good mash.' }).expect(201);
    await s.mentor.agent.post(`/api/brews/${second.brewId}/comments`).send({ body: 'Check the boil-off.' }).expect(201);
    // A later comment on the first brings it to the top.
    await new Promise((r) => setTimeout(r, 1100));
    await s.mentor.agent.post(`/api/brews/${first.brewId}/comments`).send({ body: 'And the late boil.' }).expect(201);

    const reviewed = (await s.mentor.agent.get('/api/reviews/reviewed').expect(200)).body.items;
    const ids = reviewed.map((r: { brewId: number }) => r.brewId);
    expect(ids.filter((id: number) => [first.brewId, second.brewId, waiting.brewId].includes(id))).toEqual([first.brewId, second.brewId]);
    const item = reviewed.find((r: { brewId: number }) => r.brewId === first.brewId);
    const { reviewedAt, ...summary } = item;
    expect(summary).toEqual(before);
    expect(Date.parse(reviewedAt)).toBeGreaterThan(Date.parse(reviewed.find((r: { brewId: number }) => r.brewId === second.brewId).reviewedAt));
    const queue = (await s.mentor.agent.get('/api/reviews/queue').expect(200)).body.items.map((q: { brewId: number }) => q.brewId);
    expect(queue).toContain(waiting.brewId);
    expect(queue).not.toContain(first.brewId);

    // Members, mentors of other clubs and the brewer have no reviewed list of this club.
    for (const agent of [s.member.agent, s.otherMentor.agent, s.owner.agent]) {
      const list = (await agent.get('/api/reviews/reviewed').expect(200)).body.items.map((r: { brewId: number }) => r.brewId);
      expect(list).not.toContain(first.brewId);
    }
    await request(h.app).get('/api/reviews/reviewed').expect(401);
  });
});

describe('the queue and the reviewed list read each table once, whatever their length', () => {
  it('issues the same number of statements for 2 shared brew days as for 12', async () => {
    const s = await makeReviewScene(h);
    let statements = 0;
    const counted = createDb(h.ctx.env.DATABASE_URL, { poolSize: 2, logger: { logQuery: () => void statements++ } });
    try {
      const actor = (await loadSessionUser(h.ctx.db, s.mentor.user.id))!;
      const count = async (list: typeof listQueue) => {
        statements = 0;
        const page = await list(counted.db, actor);
        return { statements, length: page.items.length };
      };
      for (let i = 0; i < 2; i++) await sharedBrewWithDecision(s);
      const reviewedBrew = await sharedBrewWithDecision(s);
      await s.mentor.agent.post(`/api/brews/${reviewedBrew.brewId}/comments`).send({ body: 'Seen.' }).expect(201);
      const small = { queue: await count(listQueue), reviewed: await count(listReviewed) };
      expect(small.queue.length).toBe(2);
      expect(small.reviewed.length).toBe(1);

      for (let i = 0; i < 10; i++) await sharedBrewWithDecision(s);
      const more = await sharedBrewWithDecision(s);
      await s.mentor.agent.post(`/api/brews/${more.brewId}/comments`).send({ body: 'Seen too.' }).expect(201);
      const large = { queue: await count(listQueue), reviewed: await count(listReviewed) };
      expect(large.queue.length).toBe(12);
      expect(large.reviewed.length).toBe(2);
      expect(large.queue.statements).toBe(small.queue.statements);
      expect(large.reviewed.statements).toBe(small.reviewed.statements);
      // Two to find the shares and the comments, seven to read the brew days' rows.
      expect(large.queue.statements).toBeLessThanOrEqual(9);
    } finally {
      await counted.pool.end();
    }
  });
});

describe('a shared brew day with a long fermentation log', () => {
  it('costs the queue no more statements, and counts the same deviations as its review lists, every warm spell', async () => {
    const s = await makeFermentationScene(h, { shared: true, pitchedDaysAgo: 30 });
    await s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send({ method: 'thermometer', tempC: 21.5, takenAt: s.day(1) }).expect(201);
    let statements = 0;
    const counted = createDb(h.ctx.env.DATABASE_URL, { poolSize: 2, logger: { logQuery: () => void statements++ } });
    try {
      const actor = (await loadSessionUser(h.ctx.db, s.mentor.user.id))!;
      const queue = async () => {
        statements = 0;
        const page = await listQueue(counted.db, actor);
        return { statements, item: page.items.find((i) => i.brewId === s.brewId)! };
      };
      const short = await queue();
      // A logger every 15 minutes for three weeks: 21.5 °C (above the recipe's 18–20 °C) with every
      // 50th reading back in range, so about forty warm spells, far more than a log lists (EXCURSIONS_LISTED).
      const [first] = await h.ctx.db.select().from(fermentationReadings).where(eq(fermentationReadings.brewId, s.brewId)).orderBy(asc(fermentationReadings.id)).limit(1);
      await h.ctx.db.execute(
        sql`insert into ${fermentationReadings} (brew_id, kind, method, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, estimate, taken_at, note, source, dedupe_key)
            select brew_id, kind, method, instrument_id, instrument_snapshot, raw, if(s.seq mod 50 = 0, 19, 21.5), correction, warnings, estimate, taken_at + interval (s.seq * 15) minute, note, source, sha2(concat(dedupe_key, s.seq), 256)
            from ${fermentationReadings} r join seq_1_to_1999 s where r.id = ${first.id}`,
      );
      const long = await queue();
      expect(long.statements).toBe(short.statements);
      const review = (await s.mentor.agent.get(`/api/brews/${s.brewId}/review`).expect(200)).body;
      const spells = review.deviations.filter((d: { code: string }) => d.code === 'ferment-temp-high');
      // 2,000 readings, 39 of them (every 50th copy) in range: 40 warm spells.
      expect(spells).toHaveLength(40);
      expect(long.item.deviationCount).toBe(review.deviations.length);
      expect(long.item.deviationCount).toBeGreaterThan(short.item.deviationCount);
    } finally {
      await counted.pool.end();
    }
  });
});

describe('GET /api/brews/:brewId/review', () => {
  it('adds fermentation to the brew day’s deviations: a warm spell and packaging before the gravity was stable', async () => {
    const s = await makeFermentationScene(h, { shared: true });
    const add = (body: Record<string, unknown>) => s.owner.agent.post(`/api/brews/${s.brewId}/fermentation/readings`).send(body).expect(201);
    // The recipe ferments at 18–20 °C (server/brews/test-scene.ts): two readings above it make one spell.
    await add({ method: 'thermometer', tempC: 19.5, takenAt: s.day(1) });
    await add({ method: 'thermometer', tempC: 21.5, takenAt: s.day(2) });
    await add({ method: 'thermometer', tempC: 22.0, takenAt: s.day(2.5) });
    await add({ method: 'thermometer', tempC: 19.0, takenAt: s.day(3) });
    await add({ method: 'hydrometer', sg: 1.014, sampleTempC: 20, takenAt: s.day(12) });
    await s.owner.agent
      .post(`/api/brews/${s.brewId}/fermentation/packaging`)
      .send({ container: 'keg', volumeL: 19, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'none', override: true, overrideReason: 'Moving house tomorrow.' })
      .expect(201);

    const review = (await s.mentor.agent.get(`/api/brews/${s.brewId}/review`).expect(200)).body;
    const fermentation = review.deviations.filter((d: { stage: string }) => d.stage === 'fermentation');
    expect(fermentation.map((d: { code: string }) => d.code)).toEqual(['ferment-temp-high', 'packaged-before-stable']);
    expect(fermentation[0]).toMatchObject({ expected: 20, actual: 22, span: { count: 2, from: s.day(2), to: s.day(2.5) } });
    expect(fermentation[0].fermentationReadingId).toBe(review.fermentation.readings.find((r: { corrected: number }) => r.corrected === 22).id);
    expect(fermentation[1].message).toMatch(/^Packaged day \d+\.\d while the final gravity was too early to tell.* Reason given: Moving house tomorrow\.$/);
    // The brew day's own deviations come first, exactly as the brewer's log shows them.
    expect(review.deviations.slice(0, review.brew.deviations.length)).toEqual(review.brew.deviations);
    expect(review.fermentation.readings).toHaveLength(5);
    expect(review.fermentation.packaging).toMatchObject({ override: true, overrideReason: 'Moving house tomorrow.' });
    expect(review.brew.log.map((n: { body: string }) => n.body).join('\n')).toMatch(/Packaged before the final gravity was proven stable/);

    // A mentor may comment on one fermentation reading.
    const onReading = await s.mentor.agent
      .post(`/api/brews/${s.brewId}/comments`)
      .send({ body: 'What happened on day 2?', target: { kind: 'fermentation_reading', id: fermentation[0].fermentationReadingId } });
    expect(onReading.status).toBe(201);
    expect(onReading.body.comment.target).toMatchObject({ kind: 'fermentation_reading', label: 'Fermentation temperature reading', at: s.day(2.5), missing: false });
  });

  it('is a 404 for people outside the club and 401 for anonymous visitors', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    await s.member.agent.get(`/api/brews/${brewId}/review`).expect(200);
    await s.otherMentor.agent.get(`/api/brews/${brewId}/review`).expect(404);
    await s.other.agent.get(`/api/brews/${brewId}/review`).expect(404);
    await request(h.app).get(`/api/brews/${brewId}/review`).expect(401);
  });
});
