/**
 * A review scene for the API tests: the brew-day scene (owner, another brewer, a club with a
 * member and a mentor) plus a mentor of another club, and helpers to share a brew day with a
 * late-boil decision on it.
 */
import type { TestHarness } from '../../tests/support/api';
import { addMember, makeClub, makeUser } from '../db/factories';
import { makeScene, startBrewDay, type Scene } from '../brews/test-scene';

/**
 * The late-boil check of the brew-day tests: a cooled sample reads 1.046 at the hydrometer's own
 * 20 °C, 24 L hot with 10 minutes left, against a 1.050 recipe (worked in server/brews/decisions.test.ts).
 */
export const lateBoilInput = {
  reading: { kind: 'hydrometer', sg: 1.046, sampleTempC: 20, calibrationTempC: 20 },
  volumeL: 24,
  minutesLeft: 10,
  boilOffLPerHour: 3,
  targetSg: 1.05,
  targetVolumeL: 21,
  targetFg: 1.011,
  extractsOnHand: ['dme', 'sucrose'],
  coolingShrinkage: 0.04,
};

export async function makeReviewScene(h: TestHarness) {
  const scene = await makeScene(h);
  const otherClub = await makeClub(h.ctx.db, { name: 'Other review club' });
  const otherMentorUser = await makeUser(h.ctx.db, { displayName: 'Otto Othermentor' });
  await addMember(h.ctx.db, otherClub.id, otherMentorUser.id, 'mentor');
  const otherMentor = { user: otherMentorUser, agent: await h.signIn(otherMentorUser.email) };
  return { ...scene, otherClub, otherMentor };
}

export type ReviewScene = Awaited<ReturnType<typeof makeReviewScene>>;

/** A brew day of the scene's owner with a late-boil reading and a decision, shared with the club. */
export async function sharedBrewWithDecision(scene: Scene, { share = true } = {}) {
  const brewId = await startBrewDay(scene);
  const reading = await scene.owner.agent
    .post(`/api/brews/${brewId}/readings`)
    .send({ kind: 'late_boil_gravity', method: 'hydrometer', sg: 1.046, sampleTempC: 20, volumeL: 24, minutesLeft: 10 });
  if (reading.status !== 201) throw new Error(`reading failed: ${reading.status} ${JSON.stringify(reading.body)}`);
  const decision = await scene.owner.agent.post(`/api/brews/${brewId}/decisions`).send({ input: lateBoilInput, choice: { kind: 'as-is' }, note: 'Out of extract.' });
  if (decision.status !== 201) throw new Error(`decision failed: ${decision.status} ${JSON.stringify(decision.body)}`);
  if (share) await scene.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
  return { brewId, readingId: reading.body.id as number, decisionId: decision.body.id as number };
}
