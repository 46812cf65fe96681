/**
 * Demo review for the invented Hollow Oak Homebrew Circle: Ivo Brannock, the club's mentor, has
 * commented on Priya's shared brew day (on its late-boil decision and on the day as a whole), and
 * Jonah's porter, shared with the club three days ago, still waits in Ivo's review queue. Written
 * through the same services as the API; registered last, after the brew days and fermentation.
 */
import { and, eq } from 'drizzle-orm';
import { fToC } from '@shared/brewmath';
import { readingInputSchema, type ReadingInput } from '@shared/schemas/brews';
import { commentInputSchema } from '@shared/schemas/comments';
import { DEMO_BREW_NAME } from '../brews/demo-seed';
import { addReading } from '../brews/readings';
import { addNote, setBrewSharing, setStage, startBrew } from '../brews/service';
import type { Db } from '../db/client';
import { registerDemoSeed } from '../db/seed';
import { brewClubShares, brewDecisions, brews, instruments, recipes } from '../db/schema';
import { insertComment } from './service';
import { DAY_MS } from '@shared/dates';

/** Jonah's brew day waiting for a review: keep its name (the demo-seed test looks for it). */
export const DEMO_WAITING_BREW_NAME = 'Back Porch Robust Porter, October';

registerDemoSeed(async (db, people, club) => {
  const ivo = { id: people.mentor.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'mentor' as const }] };
  const jonah = { id: people.secondBrewer.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'member' as const }] };

  // Ivo's review of Priya's brew day.
  const [brew] = await db
    .select({ id: brews.id, pitchedAt: brews.pitchedAt })
    .from(brews)
    .where(and(eq(brews.ownerId, people.brewer.id), eq(brews.name, DEMO_BREW_NAME)));
  if (!brew?.pitchedAt) throw new Error(`Demo seed order: the brew day "${DEMO_BREW_NAME}" must be seeded before its review.`);
  const [decision] = await db.select({ id: brewDecisions.id }).from(brewDecisions).where(eq(brewDecisions.brewId, brew.id));
  if (!decision) throw new Error(`Demo seed order: "${DEMO_BREW_NAME}" needs its late-boil decision before the review.`);
  const reviewedAt = new Date(brew.pitchedAt.getTime() + 3 * DAY_MS);
  await insertComment(
    db,
    ivo,
    brew.id,
    commentInputSchema.parse({
      target: { kind: 'decision', id: decision.id },
      body: 'Good call to add the dry malt extract rather than boil on: with ten minutes left, the extra boil would have cost you volume and pushed the bitterness up. Stirring it into a jug of wort first is exactly right. Next time weigh out a small bag before the boil starts, so it is waiting by the kettle.',
    }),
    reviewedAt,
  );
  await insertComment(
    db,
    ivo,
    brew.id,
    commentInputSchema.parse({
      body: 'A tidy brew day: the mash stayed on its step, the pH was in the band and the OG landed on target after the correction. The one thing to watch is fermentation: the fermenter ran above 20 °C on day 2. You caught it with the wet towel; a tub of water round the fermenter from the start keeps it steadier. Check the gravity again before you bottle.',
    }),
    new Date(reviewedAt.getTime() + 5 * 60_000),
  );

  // Jonah's porter, shared with the club and not reviewed yet. He reads in US units; the store is SI.
  const [porter] = await db
    .select({ id: recipes.id })
    .from(recipes)
    .where(and(eq(recipes.ownerId, jonah.id), eq(recipes.name, 'Back Porch Robust Porter')));
  if (!porter) throw new Error('Demo seed order: Jonah’s porter recipe must be seeded before his brew day.');
  const [hydrometer] = await db
    .select({ id: instruments.id })
    .from(instruments)
    .where(and(eq(instruments.ownerId, jonah.id), eq(instruments.kind, 'hydrometer')));
  const brewedOn = new Date(Date.now() - 3 * DAY_MS).toISOString().slice(0, 10);
  const at = (hhmm: string) => `${brewedOn}T${hhmm}:00.000Z`;
  const id = await startBrew(db, jonah, { recipeId: porter.id, name: DEMO_WAITING_BREW_NAME, brewedOn }, new Date(at('14:00')));
  const read = (input: ReadingInput) => addReading(db as Db, jonah, id, readingInputSchema.parse(input));
  // No thermometer of his own yet: the readings use the common-practice defaults, and say so.
  await read({ kind: 'mash_temp', tempC: fToC(149), takenAt: at('14:20'), note: 'Strike water was cooler than I wanted.' });
  await setStage(db, jonah, id, 'mash', 'complete', new Date(at('15:15')));
  await setStage(db, jonah, id, 'boil', 'complete', new Date(at('16:35')));
  await read({ kind: 'og', instrumentId: hydrometer?.id ?? null, sg: 1.056, sampleTempC: fToC(68), volumeL: 5.5 * 3.785411784, takenAt: at('17:20') });
  await read({ kind: 'pitch_temp', tempC: fToC(72), pitched: true, takenAt: at('17:30'), note: 'The basement was warm today.' });
  await setStage(db, jonah, id, 'chill', 'complete', new Date(at('17:32')));
  await setStage(db, jonah, id, 'og', 'complete', new Date(at('17:35')));
  await addNote(db, jonah, id, { body: 'Came in low and warm. What should I change next time?', stage: null }, new Date(at('17:40')));
  await setBrewSharing(db, jonah, id, [club.id]);
  // Shared that evening, not when the seed ran.
  await db
    .update(brewClubShares)
    .set({ sharedAt: new Date(at('19:05')) })
    .where(and(eq(brewClubShares.brewId, id), eq(brewClubShares.clubId, club.id)));
});
