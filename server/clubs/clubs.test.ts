import { and, eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { EquipmentProfile } from '@shared/schemas/equipment';
import type { RecipeTargets } from '@shared/schemas/recipes';
import { brewClubShares, brews, clubInvitations, clubMemberships, recipeClubShares, recipes } from '../db/schema';
import { makeUser } from '../db/factories';
import { hashLinkToken } from '../lib/tokens';
import { createHarness, waitForMail, type TestHarness } from '../../tests/support/api';
import { linkToken, makeClubScene, makeInvitation } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

async function memberRole(clubId: number, userId: number) {
  const [row] = await h.ctx.db
    .select({ role: clubMemberships.role })
    .from(clubMemberships)
    .where(and(eq(clubMemberships.clubId, clubId), eq(clubMemberships.userId, userId)));
  return row?.role ?? null;
}

describe('creating and listing clubs', () => {
  it('makes the creator the organiser, and lists my clubs with my role and the member count', async () => {
    const brewer = await makeUser(h.ctx.db, { displayName: 'Fennick Rowe' });
    const agent = await h.signIn(brewer.email);
    const created = await agent.post('/api/clubs').send({ name: '  Lantern Street Brewers ', description: 'Second Sundays.' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Lantern Street Brewers', description: 'Second Sundays.', myRole: 'organiser', canManage: true });
    expect(created.body.members).toEqual([expect.objectContaining({ userId: brewer.id, role: 'organiser', email: brewer.email })]);

    const scene = await makeClubScene(h.ctx.db);
    const member = await h.signIn(scene.member.email);
    const list = await member.get('/api/clubs');
    expect(list.status).toBe(200);
    expect(list.body).toEqual([{ id: scene.club.id, name: scene.club.name, description: null, role: 'member', memberCount: 3 }]);
  });

  it('lets a brewer be in several clubs', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    await organiser.post('/api/clubs').send({ name: 'Second Club' }).expect(201);
    const list = await organiser.get('/api/clubs');
    expect(list.body.map((c: { role: string }) => c.role)).toEqual(['organiser', 'organiser']);
    expect((await organiser.get('/api/auth/me')).body.clubs).toHaveLength(2);
  });

  it('answers 400 with a message per field, and saves nothing', async () => {
    const brewer = await makeUser(h.ctx.db);
    const agent = await h.signIn(brewer.email);
    const res = await agent.post('/api/clubs').send({ name: ' ', description: 'x'.repeat(2001) });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ name: 'Use at least 2 characters.', description: 'Use at most 2000 characters.' });
    expect((await agent.get('/api/clubs')).body).toEqual([]);
  });

  it('needs a signed-in brewer', async () => {
    expect((await request(h.app).get('/api/clubs')).status).toBe(401);
    expect((await request(h.app).post('/api/clubs').send({ name: 'Nope' })).status).toBe(401);
  });
});

describe('reading and renaming a club', () => {
  it('shows members to members, and their e-mail addresses only to organisers', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const member = await h.signIn(scene.member.email);
    const res = await member.get(`/api/clubs/${scene.club.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ myRole: 'member', canManage: false });
    expect(res.body.members.map((m: { role: string }) => m.role)).toEqual(['organiser', 'mentor', 'member']);
    expect(res.body.members.every((m: object) => !('email' in m))).toBe(true);

    const organiser = await h.signIn(scene.organiser.email);
    const asOrganiser = await organiser.get(`/api/clubs/${scene.club.id}`);
    expect(asOrganiser.body.members.map((m: { email: string }) => m.email).sort()).toEqual([scene.organiser.email, scene.mentor.email, scene.member.email].sort());
  });

  it('is a 404 to anyone outside the club, and for a club that does not exist', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const outsider = await h.signIn(scene.otherMentor.email);
    const res = await outsider.get(`/api/clubs/${scene.club.id}`);
    expect(res.status).toBe(404);
    expect(res.body.message).toBe('That club was not found.');
    const admin = await h.signIn(scene.admin.email);
    expect((await admin.get('/api/clubs/999999999')).status).toBe(404);
    expect((await admin.get('/api/clubs/abc')).status).toBe(400);
  });

  it('lets an organiser rename and describe the club; a mentor may not', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.patch(`/api/clubs/${scene.club.id}`).send({ name: 'Copper Kettle', description: '' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Copper Kettle', description: null });
    const mentor = await h.signIn(scene.mentor.email);
    const refused = await mentor.patch(`/api/clubs/${scene.club.id}`).send({ name: 'Mine Now' });
    expect(refused.status).toBe(403);
    expect(refused.body.message).toBe('Only the club’s organisers may do that.');
    expect((await organiser.patch(`/api/clubs/${scene.club.id}`).send({})).status).toBe(400);
  });
});

describe('inviting by e-mail', () => {
  it('stores only the hash of the token and mails a link that expires in 7 days', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const email = `newcomer-${scene.tag}@example.org`;
    const before = Date.now();
    const res = await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email: email.toUpperCase(), role: 'mentor' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ mailSent: true, invitation: { email, role: 'mentor', invitedBy: 'Orla Organiser' } });
    const expires = Date.parse(res.body.invitation.expiresAt);
    // Seven days, allowing a few seconds for the request (the timestamp column keeps whole seconds).
    expect(expires - before).toBeGreaterThan(7 * 24 * 3600 * 1000 - 5_000);
    expect(expires - before).toBeLessThan(7 * 24 * 3600 * 1000 + 5_000);

    const mail = await waitForMail(h.smtp, email);
    expect(mail.subject).toBe(`Orla Organiser invites you to ${scene.club.name} on Wortwise`);
    expect(mail.text).toContain('as a mentor');
    const token = linkToken(mail.text, 'invitations');
    expect(mail.text).toContain(`${h.ctx.env.APP_URL}/invitations/${token}`);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const [row] = await h.ctx.db.select().from(clubInvitations).where(eq(clubInvitations.id, res.body.invitation.id));
    expect(row.tokenHash).toBe(hashLinkToken(token));
    expect(JSON.stringify(row)).not.toContain(token);
  });

  it('refuses an address that already belongs to a member (409) and creates nothing', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email: scene.member.email });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe(`${scene.member.email} is already a member of ${scene.club.name}.`);
    expect(res.body.fields).toEqual({ email: 'This address already belongs to a member of the club.' });
    expect((await organiser.get(`/api/clubs/${scene.club.id}/invitations`)).body).toEqual([]);
  });

  it('replaces the pending invitation when the same address is invited again', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const email = `twice-${scene.tag}@example.org`;
    await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email }).expect(201);
    const first = linkToken((await waitForMail(h.smtp, email)).text, 'invitations');
    await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email, role: 'mentor' }).expect(201);
    await vi.waitFor(() => expect(h.smtp.messages.filter((m) => m.to.includes(email))).toHaveLength(2));
    const second = linkToken((await waitForMail(h.smtp, email)).text, 'invitations');
    expect(second).not.toBe(first);

    const pending = await organiser.get(`/api/clubs/${scene.club.id}/invitations`);
    expect(pending.body).toEqual([expect.objectContaining({ email, role: 'mentor' })]);
    const old = await request(h.app).get(`/api/invitations/${first}`);
    expect(old.status).toBe(410);
    expect(old.body.message).toBe('This invitation was replaced by a newer one: use the link in the most recent e-mail.');
    expect((await request(h.app).get(`/api/invitations/${second}`)).status).toBe(200);
  });

  it('lets an organiser withdraw an invitation; the link then says so', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const email = `withdrawn-${scene.tag}@example.org`;
    const sent = await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email }).expect(201);
    const token = linkToken((await waitForMail(h.smtp, email)).text, 'invitations');
    const mentor = await h.signIn(scene.mentor.email);
    expect((await mentor.delete(`/api/clubs/${scene.club.id}/invitations/${sent.body.invitation.id}`)).status).toBe(403);
    // An invitation of another club is not found through this one.
    const otherOrganiser = await makeUser(h.ctx.db);
    const otherAgent = await h.signIn(otherOrganiser.email);
    const otherClub = await otherAgent.post('/api/clubs').send({ name: 'Elsewhere' });
    expect((await otherAgent.delete(`/api/clubs/${otherClub.body.id}/invitations/${sent.body.invitation.id}`)).status).toBe(404);

    await organiser.delete(`/api/clubs/${scene.club.id}/invitations/${sent.body.invitation.id}`).expect(204);
    expect((await organiser.get(`/api/clubs/${scene.club.id}/invitations`)).body).toEqual([]);
    const res = await request(h.app).get(`/api/invitations/${token}`);
    expect(res.status).toBe(410);
    expect(res.body.message).toBe('This invitation was withdrawn by the club’s organiser.');
    expect((await organiser.delete(`/api/clubs/${scene.club.id}/invitations/${sent.body.invitation.id}`)).status).toBe(404);
  });

  it('lists pending invitations to organisers, marking the expired ones', async () => {
    const scene = await makeClubScene(h.ctx.db);
    await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `fresh-${scene.tag}@example.org`, invitedBy: scene.organiser.id });
    await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `stale-${scene.tag}@example.org`, expiresAt: new Date(Date.now() - 60_000) });
    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.get(`/api/clubs/${scene.club.id}/invitations`);
    expect(res.status).toBe(200);
    const byEmail = Object.fromEntries(res.body.map((i: { email: string; expired: boolean }) => [i.email.split('-')[0], i]));
    expect(byEmail.fresh).toMatchObject({ expired: false, invitedBy: 'Orla Organiser', role: 'member' });
    expect(byEmail.stale).toMatchObject({ expired: true, invitedBy: null });
  });

  it('answers 400 per field for a bad address or role', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email: 'not-an-address', role: 'boss' });
    expect(res.status).toBe(400);
    expect(res.body.fields.email).toBe('Enter a valid e-mail address.');
    expect(res.body.fields.role).toBeDefined();
  });

  it('keeps the invitation when the mail cannot be sent, and says so', async () => {
    // Port 1 on the loopback address: nothing listens there, so the SMTP connection is refused.
    const broken = await createHarness({ SMTP_PORT: '1' });
    const scene = await makeClubScene(broken.ctx.db);
    const organiser = await broken.signIn(scene.organiser.email);
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    const res = await organiser.post(`/api/clubs/${scene.club.id}/invitations`).send({ email: `unlucky-${scene.tag}@example.org` });
    expect(res.status).toBe(201);
    expect(res.body.mailSent).toBe(false);
    expect(warn).toHaveBeenCalledWith(expect.stringContaining('could not be sent'), expect.any(String));
    warn.mockRestore();
    expect((await organiser.get(`/api/clubs/${scene.club.id}/invitations`)).body).toHaveLength(1);
  });
});

describe('roles, removal and leaving', () => {
  it('lets an organiser name a mentor, and keeps at least one organiser', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.member.id}`).send({ role: 'mentor' });
    expect(res.status).toBe(200);
    expect(await memberRole(scene.club.id, scene.member.id)).toBe('mentor');

    const alone = await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.organiser.id}`).send({ role: 'member' });
    expect(alone.status).toBe(409);
    expect(alone.body.message).toBe('A club needs at least one organiser: name another organiser first, then change this role.');
    expect(await memberRole(scene.club.id, scene.organiser.id)).toBe('organiser');

    await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.mentor.id}`).send({ role: 'organiser' }).expect(200);
    const stepDown = await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.organiser.id}`).send({ role: 'member' });
    expect(stepDown.status).toBe(200);
    expect(stepDown.body).toMatchObject({ myRole: 'member', canManage: false });
  });

  it('refuses a role change from a non-organiser, to someone outside the club, or to an unknown role', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const mentor = await h.signIn(scene.mentor.email);
    expect((await mentor.patch(`/api/clubs/${scene.club.id}/members/${scene.member.id}`).send({ role: 'mentor' })).status).toBe(403);
    const organiser = await h.signIn(scene.organiser.email);
    const outsider = await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.otherBrewer.id}`).send({ role: 'mentor' });
    expect(outsider.status).toBe(404);
    expect(outsider.body.message).toBe('That person is not a member of this club.');
    const bad = await organiser.patch(`/api/clubs/${scene.club.id}/members/${scene.member.id}`).send({ role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.role).toBe('Choose member, mentor or organiser.');
    expect(await memberRole(scene.club.id, scene.member.id)).toBe('member');
  });

  it('lets an organiser remove a member, who then no longer sees the club', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const organiser = await h.signIn(scene.organiser.email);
    const member = await h.signIn(scene.member.email);
    await organiser.delete(`/api/clubs/${scene.club.id}/members/${scene.member.id}`).expect(204);
    expect((await member.get(`/api/clubs/${scene.club.id}`)).status).toBe(404);
    expect((await organiser.delete(`/api/clubs/${scene.club.id}/members/${scene.member.id}`)).status).toBe(404);
    const last = await organiser.delete(`/api/clubs/${scene.club.id}/members/${scene.organiser.id}`);
    expect(last.status).toBe(409);
    expect(last.body.message).toMatch(/last organiser/);
  });

  it('lets a member leave, but not the last organiser', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const member = await h.signIn(scene.member.email);
    await member.post(`/api/clubs/${scene.club.id}/leave`).expect(204);
    expect(await memberRole(scene.club.id, scene.member.id)).toBeNull();
    expect((await member.post(`/api/clubs/${scene.club.id}/leave`)).status).toBe(404);

    const organiser = await h.signIn(scene.organiser.email);
    const res = await organiser.post(`/api/clubs/${scene.club.id}/leave`);
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('You are the club’s last organiser: name another member as organiser before you leave.');
    expect(await memberRole(scene.club.id, scene.organiser.id)).toBe('organiser');
  });

  it('stops sharing a leaver’s recipes and brew days with the club, and only with that club', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const db = h.ctx.db;
    await db.insert(clubMemberships).values({ clubId: scene.otherClub.id, userId: scene.member.id, role: 'member' });
    const recipe = { name: 'Leaver Amber', notes: '', batchVolumeL: 20, preBoilVolumeL: 26, postBoilVolumeL: 22, boilMinutes: 60, boilOffLPerHour: 4, efficiency: 0.72, targetOg: 1.05, targetFg: 1.012, fermentationTempMinC: 18, fermentationTempMaxC: 20 };
    const [{ id: mine }] = await db.insert(recipes).values({ ...recipe, ownerId: scene.member.id }).$returningId();
    const [{ id: theirs }] = await db.insert(recipes).values({ ...recipe, ownerId: scene.mentor.id }).$returningId();
    const [{ id: brew }] = await db.insert(brews).values({ ownerId: scene.member.id, name: 'Leaver Amber, day 1', brewedOn: '2026-03-01', targetsSnapshot: {} as RecipeTargets, equipmentSnapshot: {} as EquipmentProfile, notes: '' }).$returningId();
    await db.insert(recipeClubShares).values([
      { recipeId: mine, clubId: scene.club.id },
      { recipeId: mine, clubId: scene.otherClub.id },
      { recipeId: theirs, clubId: scene.club.id },
    ]);
    await db.insert(brewClubShares).values([{ brewId: brew, clubId: scene.club.id }]);

    const member = await h.signIn(scene.member.email);
    await member.post(`/api/clubs/${scene.club.id}/leave`).expect(204);
    const recipeShares = await db.select().from(recipeClubShares).where(inArray(recipeClubShares.recipeId, [mine, theirs]));
    expect(recipeShares.map((r) => [r.recipeId, r.clubId]).sort()).toEqual(
      [
        [mine, scene.otherClub.id],
        [theirs, scene.club.id],
      ].sort(),
    );
    expect(await db.select().from(brewClubShares).where(eq(brewClubShares.brewId, brew))).toEqual([]);
  });

  it('lets only one of two organisers step down when both try at once', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const first = await h.signIn(scene.organiser.email);
    await first.patch(`/api/clubs/${scene.club.id}/members/${scene.mentor.id}`).send({ role: 'organiser' }).expect(200);
    const second = await h.signIn(scene.mentor.email);
    const results = await Promise.all([first.post(`/api/clubs/${scene.club.id}/leave`), second.post(`/api/clubs/${scene.club.id}/leave`)]);
    expect(results.map((r) => r.status).sort()).toEqual([204, 409]);
    const club = await h.signIn(scene.member.email).then((a) => a.get(`/api/clubs/${scene.club.id}`));
    expect(club.body.members.filter((m: { role: string }) => m.role === 'organiser')).toHaveLength(1);
  });
});
