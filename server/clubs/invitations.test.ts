import { eq } from 'drizzle-orm';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { clubInvitations, clubMemberships, users } from '../db/schema';
import { makeUser } from '../db/factories';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';
import { invitationRow, linkToken, makeClubScene, makeInvitation } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function membersOf(clubId: number) {
  return h.ctx.db.select({ userId: clubMemberships.userId, role: clubMemberships.role }).from(clubMemberships).where(eq(clubMemberships.clubId, clubId));
}
async function accountFor(email: string) {
  const [row] = await h.ctx.db.select().from(users).where(eq(users.email, email));
  return row ?? null;
}

describe('GET /api/invitations/:token', () => {
  it('shows the club, the inviter, the address and whether it has an account, without signing in', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const email = `preview-${scene.tag}@example.org`;
    await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email, role: 'mentor' }).expect(201);
    const token = linkToken((await waitForMail(h.smtp, email)).text, 'invitations');
    const res = await request(h.app).get(`/api/invitations/${token}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ clubId: scene.club.id, clubName: scene.club.name, inviterName: 'Orla Organiser', email, role: 'mentor', accountExists: false });

    const existing = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: scene.otherBrewer.email });
    expect((await request(h.app).get(`/api/invitations/${existing.token}`)).body.accountExists).toBe(true);
  });

  it('is a 404 for a token that was never issued', async () => {
    const res = await request(h.app).get('/api/invitations/not-a-real-token-at-all');
    expect(res.status).toBe(404);
    expect(res.body.message).toBe('This invitation link is not valid. Check that the whole link was copied from the e-mail.');
  });

  it('is 410 Gone for an expired invitation, saying so', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const { token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `late-${scene.tag}@example.org`, expiresAt: new Date('2026-03-02T10:00:00Z') });
    const res = await request(h.app).get(`/api/invitations/${token}`);
    expect(res.status).toBe(410);
    expect(res.body.message).toBe('This invitation expired on 2 March 2026. Ask the club’s organiser to invite you again.');
  });
});

describe('POST /api/invitations/:token/accept', () => {
  it('signs up a newcomer, signs them in and joins them with the role offered, once', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const email = `newcomer-${scene.tag}@example.org`;
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email, role: 'mentor', invitedBy: scene.organiser.id });
    const agent = request.agent(h.app);
    const res = await agent.post(`/api/invitations/${token}/accept`).send({ displayName: 'Nell Newcomer', password: 'a-long-password' });
    expect(res.status).toBe(200);
    expect(res.body.clubId).toBe(scene.club.id);
    expect(res.body.me).toMatchObject({ email, displayName: 'Nell Newcomer', clubs: [{ id: scene.club.id, name: scene.club.name, role: 'mentor' }] });
    expect(String(res.headers['set-cookie'])).toMatch(/wortwise_session=.*HttpOnly/);
    expect((await agent.get('/api/auth/me')).body.email).toBe(email);
    expect((await agent.get(`/api/clubs/${scene.club.id}`)).status).toBe(200);
    // The new password works for signing in.
    await request(h.app).post('/api/auth/login').send({ email, password: 'a-long-password' }).expect(200);
    const row = await invitationRow(h.ctx.db, id);
    expect(row.acceptedAt).not.toBeNull();
    expect(row.acceptedBy).toBe(res.body.me.id);

    const again = await request(h.app).post(`/api/invitations/${token}/accept`).send({ displayName: 'Someone Else', password: 'another-long-password' });
    expect(again.status).toBe(410);
    expect(again.body.message).toBe('This invitation has already been used. If that was you, sign in and open Clubs.');
    expect((await membersOf(scene.club.id)).length).toBe(4);
    expect((await accountFor(email))!.displayName).toBe('Nell Newcomer');
  });

  it('asks a newcomer for a name and password per field, and creates nothing without them', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const email = `bare-${scene.tag}@example.org`;
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email });
    const res = await request(h.app).post(`/api/invitations/${token}/accept`).send({});
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ displayName: 'Tell us what to call you.', password: 'Choose a password.' });
    const short = await request(h.app).post(`/api/invitations/${token}/accept`).send({ displayName: 'Short', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.fields).toEqual({ password: 'Use at least 10 characters.' });
    expect(await accountFor(email)).toBeNull();
    expect((await invitationRow(h.ctx.db, id)).acceptedAt).toBeNull();
  });

  it('joins a signed-in brewer whose address matches', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const { token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: scene.otherBrewer.email.toUpperCase() });
    const agent = await h.signIn(scene.otherBrewer.email);
    const res = await agent.post(`/api/invitations/${token}/accept`).send({});
    expect(res.status).toBe(200);
    expect(res.body.me.clubs).toEqual([{ id: scene.club.id, name: scene.club.name, role: 'member' }]);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('sends an anonymous visitor whose address has an account to sign in (409), changing nothing', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: scene.otherBrewer.email });
    const res = await request(h.app).post(`/api/invitations/${token}/accept`).send({ displayName: 'Impostor', password: 'a-long-password' });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe(`An account for ${scene.otherBrewer.email} already exists: sign in to accept the invitation.`);
    expect((await invitationRow(h.ctx.db, id)).acceptedAt).toBeNull();
    expect((await accountFor(scene.otherBrewer.email))!.displayName).toBe('Bea Otherbrewer');
  });

  it('refuses a signed-in brewer with another address (403), changing nothing', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const email = `someone-${scene.tag}@example.org`;
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email });
    const agent = await h.signIn(scene.otherBrewer.email);
    const res = await agent.post(`/api/invitations/${token}/accept`).send({});
    expect(res.status).toBe(403);
    expect(res.body.message).toContain(`sent to ${email}, but you are signed in as ${scene.otherBrewer.email}`);
    expect((await invitationRow(h.ctx.db, id)).acceptedAt).toBeNull();
    expect((await membersOf(scene.club.id)).length).toBe(3);
  });

  it('refuses an expired invitation with 410 and creates no account', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const email = `expired-${scene.tag}@example.org`;
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email });
    // Expiry set in the past directly in the database.
    await h.ctx.db.update(clubInvitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(clubInvitations.id, id));
    const res = await request(h.app).post(`/api/invitations/${token}/accept`).send({ displayName: 'Too Late', password: 'a-long-password' });
    expect(res.status).toBe(410);
    expect(res.body.message).toMatch(/^This invitation expired on .+\. Ask the club’s organiser to invite you again\.$/);
    expect(await accountFor(email)).toBeNull();
    expect((await membersOf(scene.club.id)).length).toBe(3);
  });

  it('refuses a brewer who is already in the club (409), leaving the link unused', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const { id, token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: scene.member.email, role: 'organiser' });
    const agent = await h.signIn(scene.member.email);
    const res = await agent.post(`/api/invitations/${token}/accept`).send({});
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('You are already a member of this club.');
    expect((await invitationRow(h.ctx.db, id)).acceptedAt).toBeNull();
    expect((await membersOf(scene.club.id)).find((m) => m.userId === scene.member.id)?.role).toBe('member');
  });

  it('lets only one of two simultaneous acceptances through', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const email = `racer-${scene.tag}@example.org`;
    const { token } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email });
    const results = await Promise.all(
      [1, 2].map((n) => request(h.app).post(`/api/invitations/${token}/accept`).send({ displayName: `Racer ${n}`, password: 'a-long-password' })),
    );
    const statuses = results.map((r) => r.status).sort();
    expect(statuses[0]).toBe(200);
    expect([409, 410]).toContain(statuses[1]);
    expect((await membersOf(scene.club.id)).length).toBe(4);
    expect(await h.ctx.db.select({ id: users.id }).from(users).where(eq(users.email, email))).toHaveLength(1);
  });

  it('does not let a token from one invitation reveal or join another club', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const outsider = await makeUser(h.ctx.db);
    const agent = await h.signIn(outsider.email);
    expect((await agent.post('/api/invitations/forged-token/accept').send({})).status).toBe(404);
    expect((await agent.get(`/api/clubs/${scene.club.id}`)).status).toBe(404);
  });
});
