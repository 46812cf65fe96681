import request from 'supertest';
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MAX_CHARS } from '@shared/schemas/comments';
import { createDb } from '../db/client';
import { brewClubShares, comments } from '../db/schema';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';
import { NO_LONGER_SHARED } from './service';
import { makeReviewScene, sharedBrewWithDecision } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function commentCount(brewId: number) {
  return (await h.ctx.db.select({ id: comments.id }).from(comments).where(eq(comments.brewId, brewId))).length;
}

describe('POST /api/brews/:brewId/comments: who may comment', () => {
  it('lets a mentor of the club comment; a member may read but not comment (403); everyone else gets 404, anonymous 401', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    const body = { body: 'Nice steady mash.' };

    const byMentor = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send(body);
    expect(byMentor.status).toBe(201);
    expect(byMentor.body.comment).toMatchObject({ body: 'Nice steady mash.', author: { id: s.mentor.user.id, role: 'mentor' }, target: { kind: 'brew', id: null }, canDelete: true });

    const byMember = await s.member.agent.post(`/api/brews/${brewId}/comments`).send(body);
    expect(byMember.status).toBe(403);
    expect(byMember.body.message).toMatch(/Only the club’s mentors comment/);

    for (const outsider of [s.otherMentor, s.other]) {
      const res = await outsider.agent.post(`/api/brews/${brewId}/comments`).send(body);
      expect(res.status).toBe(404);
      expect(res.body.message).toBe(NO_LONGER_SHARED);
    }
    expect((await request(h.app).post(`/api/brews/${brewId}/comments`).send(body)).status).toBe(401);
    expect(await commentCount(brewId)).toBe(1);
  });

  it('lets the brewer reply on their own brew day, without mailing themselves', async () => {
    const s = await makeReviewScene(h);
    const { brewId, decisionId } = await sharedBrewWithDecision(s);
    const res = await s.owner.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'I had no extract left.', target: { kind: 'decision', id: decisionId } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ noticeSent: null, comment: { author: { role: 'brewer' }, target: { kind: 'decision', id: decisionId, label: 'Late-boil decision' } } });
    expect(h.smtp.messages.filter((m) => m.to.includes(s.owner.user.email))).toEqual([]);
  });

  it('answers the same 404 for a brew day that does not exist', async () => {
    const s = await makeReviewScene(h);
    const res = await s.mentor.agent.post('/api/brews/999999999/comments').send({ body: 'Hello?' });
    expect(res.status).toBe(404);
    expect(res.body.message).toBe(NO_LONGER_SHARED);
  });
});

describe('POST /api/brews/:brewId/comments: bad input changes nothing', () => {
  it('refuses an empty or overlong comment with a per-field message', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    const empty = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.fields).toEqual({ body: 'Write the comment.' });
    const long = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'x'.repeat(COMMENT_MAX_CHARS + 1) });
    expect(long.status).toBe(400);
    expect(long.body.fields.body).toBe(`Use at most ${COMMENT_MAX_CHARS} characters.`);
    const exact = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'y'.repeat(COMMENT_MAX_CHARS) });
    expect(exact.status).toBe(201);
    const badKind = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'On the hops', target: { kind: 'hop', id: 1 } });
    expect(badKind.status).toBe(400);
    expect(badKind.body.fields['target.kind']).toBe('Comment on the brew day, a reading, a decision or a fermentation reading.');
    expect(await commentCount(brewId)).toBe(1);
  });

  it('refuses a reading or decision of another brew day (404), saving nothing', async () => {
    const s = await makeReviewScene(h);
    const first = await sharedBrewWithDecision(s);
    const second = await sharedBrewWithDecision(s);
    const onOtherReading = await s.mentor.agent.post(`/api/brews/${first.brewId}/comments`).send({ body: 'Hm.', target: { kind: 'reading', id: second.readingId } });
    expect(onOtherReading.status).toBe(404);
    expect(onOtherReading.body.message).toMatch(/That reading is not part of this brew day/);
    const onOtherDecision = await s.mentor.agent.post(`/api/brews/${first.brewId}/comments`).send({ body: 'Hm.', target: { kind: 'decision', id: second.decisionId } });
    expect(onOtherDecision.status).toBe(404);
    const onMissing = await s.mentor.agent.post(`/api/brews/${first.brewId}/comments`).send({ body: 'Hm.', target: { kind: 'fermentation_reading', id: 999999999 } });
    expect(onMissing.status).toBe(404);
    expect(await commentCount(first.brewId)).toBe(0);
  });

  it('refuses a comment on a brew day that was unshared a second ago: a clear message, nothing saved', async () => {
    const s = await makeReviewScene(h);
    const { brewId, readingId } = await sharedBrewWithDecision(s);
    await s.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [] }).expect(200);
    const res = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Good reading.', target: { kind: 'reading', id: readingId } });
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: 'not_found', message: 'This brew day is no longer shared with your club.' });
    expect(await commentCount(brewId)).toBe(0);
    expect(h.smtp.messages.filter((m) => m.to.includes(s.owner.user.email))).toEqual([]);
  });

  it('refuses the comment when the unsharing commits while the comment waits on the share rows', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    // The brewer's "stop sharing" in its own connection, not yet committed: it holds the share row.
    const other = createDb(h.ctx.env.DATABASE_URL);
    const conn = await other.pool.getConnection();
    try {
      await conn.query('START TRANSACTION');
      await conn.query('DELETE FROM brew_club_shares WHERE brew_id = ?', [brewId]);
      const pending = s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Looks fine to me.' }).then((r) => r);
      // Wait until the comment's transaction is blocked on the locked share row, then commit the unsharing.
      const deadline = Date.now() + 5_000;
      for (;;) {
        const [rows] = await other.pool.query("SELECT COUNT(*) AS n FROM information_schema.PROCESSLIST WHERE ID <> CONNECTION_ID() AND INFO LIKE '%brew_club_shares%for update%'");
        if ((rows as { n: number }[])[0].n > 0) break;
        if (Date.now() > deadline) throw new Error('The comment never waited on the share row.');
        await new Promise((r) => setTimeout(r, 20));
      }
      await conn.query('COMMIT');
      const res = await pending;
      expect(res.status).toBe(404);
      expect(res.body.message).toBe(NO_LONGER_SHARED);
    } finally {
      conn.release();
      await other.pool.end();
    }
    expect(await commentCount(brewId)).toBe(0);
    expect(await h.ctx.db.select().from(brewClubShares).where(eq(brewClubShares.brewId, brewId))).toEqual([]);
  });
});

describe('the brewer’s notice', () => {
  it('mails the brewer when a mentor comments, quoting the comment and linking to the log', async () => {
    const s = await makeReviewScene(h);
    const { brewId, decisionId } = await sharedBrewWithDecision(s);
    const body = 'Three points short and left as is: fine for a first batch, but next time keep a bag of dry malt extract by the kettle.';
    const res = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body, target: { kind: 'decision', id: decisionId } });
    expect(res.status).toBe(201);
    expect(res.body.noticeSent).toBe(true);
    const mail = await waitForMail(h.smtp, s.owner.user.email);
    expect(mail.subject).toBe(`${s.mentor.user.displayName} commented on Scene Pale`);
    expect(mail.text).toContain(`> ${body}`);
    expect(mail.text).toContain(`${h.ctx.env.APP_URL}/brews/${brewId}/log#comments`);
  });
});

describe('reading and deleting comments', () => {
  it('shows the comments to the brewer and club readers, threaded by target; a deleted reading leaves its comments marked', async () => {
    const s = await makeReviewScene(h);
    const { brewId, readingId } = await sharedBrewWithDecision(s);
    await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Was the sample cooled?', target: { kind: 'reading', id: readingId } }).expect(201);
    await s.owner.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Yes, to 20 °C.', target: { kind: 'reading', id: readingId } }).expect(201);

    for (const reader of [s.owner, s.member, s.mentor]) {
      const list = await reader.agent.get(`/api/brews/${brewId}/comments`).expect(200);
      expect(list.body.map((c: { body: string; target: { label: string } }) => [c.body, c.target.label])).toEqual([
        ['Was the sample cooled?', 'Late-boil gravity reading'],
        ['Yes, to 20 °C.', 'Late-boil gravity reading'],
      ]);
    }
    await s.otherMentor.agent.get(`/api/brews/${brewId}/comments`).expect(404);
    await request(h.app).get(`/api/brews/${brewId}/comments`).expect(401);

    await s.owner.agent.delete(`/api/brews/${brewId}/readings/${readingId}`).expect(200);
    const after = await s.mentor.agent.get(`/api/brews/${brewId}/comments`).expect(200);
    expect(after.body[0].target).toEqual({ kind: 'reading', id: readingId, label: 'A brew-day reading, since deleted', at: null, missing: true });
  });

  it('lets only the author delete a comment; the brew day is untouched', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    const created = await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Delete me later.' }).expect(201);
    const id = created.body.comment.id;
    const before = (await s.owner.agent.get(`/api/brews/${brewId}`).expect(200)).body;

    const byOwner = await s.owner.agent.delete(`/api/brews/${brewId}/comments/${id}`);
    expect(byOwner.status).toBe(403);
    expect(byOwner.body.message).toBe('Only its author can delete a comment.');
    await s.member.agent.delete(`/api/brews/${brewId}/comments/${id}`).expect(403);
    await s.otherMentor.agent.delete(`/api/brews/${brewId}/comments/${id}`).expect(404);
    await s.other.agent.delete(`/api/brews/${brewId}/comments/${id}`).expect(404);
    await s.mentor.agent.delete(`/api/brews/${brewId}/comments/${id}`).expect(204);
    await s.mentor.agent.delete(`/api/brews/${brewId}/comments/${id}`).expect(404);
    expect(await commentCount(brewId)).toBe(0);

    const after = (await s.owner.agent.get(`/api/brews/${brewId}`).expect(200)).body;
    expect(after).toEqual(before);
  });

  it('never lets a mentor edit the brew day', async () => {
    const s = await makeReviewScene(h);
    const { brewId, readingId } = await sharedBrewWithDecision(s);
    await s.mentor.agent.patch(`/api/brews/${brewId}`).send({ notes: 'Mentor was here.' }).expect(403);
    await s.mentor.agent.delete(`/api/brews/${brewId}/readings/${readingId}`).expect(403);
    await s.mentor.agent.post(`/api/brews/${brewId}/notes`).send({ body: 'A note.' }).expect(403);
    const review = await s.mentor.agent.get(`/api/brews/${brewId}/review`).expect(200);
    expect(review.body.brew.permissions).toEqual({ edit: false, share: false, delete: false, comment: true });
    expect(review.body.permissions).toEqual({ comment: true });
  });
});

describe('stopping sharing hides the brew day at once', () => {
  it('takes the brew day, its fermentation, review and comments away from the club, and the recipe likewise', async () => {
    const s = await makeReviewScene(h);
    const { brewId } = await sharedBrewWithDecision(s);
    await s.mentor.agent.post(`/api/brews/${brewId}/comments`).send({ body: 'Before unsharing.' }).expect(201);
    await s.owner.agent.put(`/api/recipes/${s.recipeId}/sharing`).send({ clubIds: [s.club.id] }).expect(200);
    const paths = [`/api/brews/${brewId}`, `/api/brews/${brewId}/fermentation`, `/api/brews/${brewId}/review`, `/api/brews/${brewId}/comments`];
    for (const reader of [s.mentor, s.member]) {
      for (const path of paths) await reader.agent.get(path).expect(200);
      await reader.agent.get(`/api/recipes/${s.recipeId}`).expect(200);
    }

    await s.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [] }).expect(200);
    await s.owner.agent.put(`/api/recipes/${s.recipeId}/sharing`).send({ clubIds: [] }).expect(200);
    for (const reader of [s.mentor, s.member]) {
      for (const path of paths) await reader.agent.get(path).expect(404);
      await reader.agent.get(`/api/recipes/${s.recipeId}`).expect(404);
    }
    const queue = await s.mentor.agent.get('/api/reviews/queue').expect(200);
    expect(queue.body.items.map((q: { brewId: number }) => q.brewId)).not.toContain(brewId);
    // The owner still has everything, comments included.
    expect((await s.owner.agent.get(`/api/brews/${brewId}/comments`).expect(200)).body).toHaveLength(1);
  });
});
