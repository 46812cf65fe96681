/**
 * A brew-day scene for the API tests: a brewer with a recipe and instruments, another brewer,
 * and a club (a member and a mentor) the brew day can be shared with.
 */
import { recipeInputSchema, type RecipeInput } from '@shared/schemas/recipes';
import type { TestHarness } from '../../tests/support/api';
import { loadSessionUser } from '../auth/session';
import { addMember, makeClub, makeUser } from '../db/factories';
import { createRecipe } from '../recipes/service';

/**
 * An invented pale ale: 23 L into the fermenter at OG 1.050 and FG 1.011, a 66 °C rest and a
 * 76 °C step, fermenting at 18–20 °C.
 */
export const testRecipe: RecipeInput = {
  name: 'Scene Pale',
  style: 'Pale ale',
  notes: '',
  batchVolumeL: 23,
  preBoilVolumeL: 29,
  postBoilVolumeL: 25,
  boilMinutes: 60,
  boilOffLPerHour: 4,
  efficiency: 0.72,
  targetOg: 1.05,
  targetFg: 1.011,
  mashPhTarget: 5.2,
  fermentationTempMinC: 18,
  fermentationTempMaxC: 20,
  yeast: { name: 'Clean ale yeast', amount: '1 sachet' },
  fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 5.3, potentialPointsLPerKg: 300 }],
  hops: [],
  mashSteps: [
    { tempC: 66, minutes: 60 },
    { tempC: 76, minutes: 10 },
  ],
};

async function person(h: TestHarness) {
  const user = await makeUser(h.ctx.db);
  return { user, agent: await h.signIn(user.email) };
}

export async function makeScene(h: TestHarness) {
  const owner = await person(h);
  const other = await person(h);
  const member = await person(h);
  const mentor = await person(h);
  const club = await makeClub(h.ctx.db, { name: 'Scene club' });
  await addMember(h.ctx.db, club.id, owner.user.id, 'member');
  await addMember(h.ctx.db, club.id, member.user.id, 'member');
  await addMember(h.ctx.db, club.id, mentor.user.id, 'mentor');
  const ownerActor = (await loadSessionUser(h.ctx.db, owner.user.id))!;
  const recipeId = await createRecipe(h.ctx.db, ownerActor, recipeInputSchema.parse(testRecipe));
  return { owner, other, member, mentor, club, recipeId };
}

export type Scene = Awaited<ReturnType<typeof makeScene>>;

/** Starts a brew day as the scene's owner and returns its id. */
export async function startBrewDay(scene: Scene): Promise<number> {
  const res = await scene.owner.agent.post('/api/brews').send({ recipeId: scene.recipeId });
  if (res.status !== 201) throw new Error(`start failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

export async function makeInstrument(scene: Scene, body: Record<string, unknown>): Promise<number> {
  const res = await scene.owner.agent.post('/api/instruments').send(body);
  if (res.status !== 201) throw new Error(`instrument failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}
