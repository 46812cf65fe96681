/**
 * Every clubs route against every kind of person. Each cell runs on a fresh club, so a removal
 * or a departure in one cell cannot change another. Outsiders get 404 (the club's existence is
 * not confirmed to them), members who may see but not manage get 403, anonymous visitors 401.
 */
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { makeClubScene, makeInvitation } from './test-scene';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

type Scene = Awaited<ReturnType<typeof makeClubScene>>;
type Who = 'organiser' | 'mentor' | 'member' | 'otherMentor' | 'otherBrewer' | 'admin' | 'anonymous';
const people: Who[] = ['organiser', 'mentor', 'member', 'otherMentor', 'otherBrewer', 'admin', 'anonymous'];

interface Route {
  name: string;
  call: (agent: ReturnType<typeof request.agent>, s: Scene, invitationId: number) => request.Test;
  expected: Record<Who, number>;
}

const manage = (ok: number): Record<Who, number> => ({ organiser: ok, mentor: 403, member: 403, otherMentor: 404, otherBrewer: 404, admin: ok, anonymous: 401 });

const routes: Route[] = [
  {
    name: 'GET /api/clubs/:id',
    call: (a, s) => a.get(`/api/clubs/${s.club.id}`),
    expected: { organiser: 200, mentor: 200, member: 200, otherMentor: 404, otherBrewer: 404, admin: 200, anonymous: 401 },
  },
  { name: 'PATCH /api/clubs/:id', call: (a, s) => a.patch(`/api/clubs/${s.club.id}`).send({ name: 'Renamed Club' }), expected: manage(200) },
  { name: 'GET /api/clubs/:id/invitations', call: (a, s) => a.get(`/api/clubs/${s.club.id}/invitations`), expected: manage(200) },
  {
    name: 'POST /api/clubs/:id/invitations',
    call: (a, s) => a.post(`/api/clubs/${s.club.id}/invitations`).send({ email: `matrix-${s.tag}@example.org` }),
    expected: manage(201),
  },
  { name: 'DELETE /api/clubs/:id/invitations/:invitationId', call: (a, s, inv) => a.delete(`/api/clubs/${s.club.id}/invitations/${inv}`), expected: manage(204) },
  {
    name: 'PATCH /api/clubs/:id/members/:userId',
    call: (a, s) => a.patch(`/api/clubs/${s.club.id}/members/${s.member.id}`).send({ role: 'mentor' }),
    expected: manage(200),
  },
  { name: 'DELETE /api/clubs/:id/members/:userId', call: (a, s) => a.delete(`/api/clubs/${s.club.id}/members/${s.member.id}`), expected: manage(204) },
  {
    name: 'POST /api/clubs/:id/leave',
    call: (a, s) => a.post(`/api/clubs/${s.club.id}/leave`),
    // The only organiser cannot leave (409); a site admin who is not a member has nothing to leave (403).
    expected: { organiser: 409, mentor: 204, member: 204, otherMentor: 404, otherBrewer: 404, admin: 403, anonymous: 401 },
  },
];

describe('clubs routes × people', () => {
  for (const route of routes) {
    describe(route.name, () => {
      it.each(people)('%s', async (who) => {
        const scene = await makeClubScene(h.ctx.db);
        const { id: invitationId } = await makeInvitation(h.ctx.db, { clubId: scene.club.id, email: `pending-${scene.tag}@example.org` });
        const agent = who === 'anonymous' ? request.agent(h.app) : await h.signIn(scene[who].email);
        const res = await route.call(agent, scene, invitationId);
        expect(res.status, res.body?.message).toBe(route.expected[who]);
      });
    });
  }

  it('GET /api/clubs lists only the clubs a person is in', async () => {
    const scene = await makeClubScene(h.ctx.db);
    const names = async (who: Exclude<Who, 'anonymous'>) => (await (await h.signIn(scene[who].email)).get('/api/clubs')).body.map((c: { name: string }) => c.name);
    expect(await names('member')).toEqual([scene.club.name]);
    expect(await names('otherMentor')).toEqual([scene.otherClub.name]);
    expect(await names('otherBrewer')).toEqual([]);
    expect(await names('admin')).toEqual([]);
    expect((await request(h.app).get('/api/clubs')).status).toBe(401);
  });
});
