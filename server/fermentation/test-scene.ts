/**
 * A fermentation scene for the API tests: the brew-day scene (owner, another brewer, a club with
 * a member and a mentor) with a brew day whose yeast was pitched some days ago.
 */
import type { TestHarness } from '../../tests/support/api';
import { makeScene, startBrewDay, type Scene } from '../brews/test-scene';
import { DAY_MS } from '@shared/dates';

export { DAY_MS };

export interface FermentationScene extends Scene {
  brewId: number;
  pitchedAt: Date;
  /** A moment `n` days after pitching, as ISO text. */
  day(n: number): string;
}

export async function makeFermentationScene(h: TestHarness, { pitchedDaysAgo = 20, shared = false, og = true } = {}): Promise<FermentationScene> {
  const scene = await makeScene(h);
  const brewId = await startBrewDay(scene);
  // Whole seconds, so the times in a test read cleanly.
  const pitchedAt = new Date(Math.floor((Date.now() - pitchedDaysAgo * DAY_MS) / 1000) * 1000);
  if (og) {
    const ogAt = new Date(pitchedAt.getTime() - 10 * 60_000).toISOString();
    await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'og', sg: 1.05, sampleTempC: 20, takenAt: ogAt }).expect(201);
  }
  await scene.owner.agent.post(`/api/brews/${brewId}/readings`).send({ kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true }).expect(201);
  if (shared) await scene.owner.agent.put(`/api/brews/${brewId}/sharing`).send({ clubIds: [scene.club.id] }).expect(200);
  return { ...scene, brewId, pitchedAt, day: (n: number) => new Date(pitchedAt.getTime() + n * DAY_MS).toISOString() };
}
