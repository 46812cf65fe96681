/**
 * A finished demo brew day: Priya's "Hollow Oak Harvest Pale", shared with the invented club.
 * Written through the same services as the API, so every corrected value comes from her
 * instruments' calibrations and the late-boil decision is computed by runBoilCheck, never typed in.
 */
import { and, eq } from 'drizzle-orm';
import type { InstrumentKind } from '@shared/schemas/instruments';
import type { Db } from '../db/client';
import { registerDemoSeed } from '../db/seed';
import { instruments, recipes } from '../db/schema';
import { DEMO_SHARED_RECIPE_NAME } from '../recipes/demo-seed';
import { addDecision } from './decisions';
import { addReading } from './readings';
import { addNote, setBrewSharing, setStage, startBrew } from './service';
import { decisionInputSchema, readingInputSchema, type ReadingInput } from '@shared/schemas/brews';
import { DAY_MS } from '@shared/dates';

/** The clubs helper's mentor comment hangs off this brew day: keep its name. */
export const DEMO_BREW_NAME = 'Hollow Oak Harvest Pale, first batch';
const DAYS_AGO = 9;

registerDemoSeed(async (db, people, club) => {
  const priya = { id: people.brewer.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'member' as const }] };
  const [recipe] = await db
    .select({ id: recipes.id })
    .from(recipes)
    .where(and(eq(recipes.ownerId, priya.id), eq(recipes.name, DEMO_SHARED_RECIPE_NAME)));
  if (!recipe) throw new Error(`Demo seed order: the recipe "${DEMO_SHARED_RECIPE_NAME}" must be seeded before brew days.`);
  const owned = await db.select({ id: instruments.id, kind: instruments.kind }).from(instruments).where(eq(instruments.ownerId, priya.id));
  const instrument = (kind: InstrumentKind) => owned.find((i) => i.kind === kind)?.id ?? null;

  const day = new Date(Date.now() - DAYS_AGO * DAY_MS);
  const brewedOn = day.toISOString().slice(0, 10);
  const at = (hhmm: string) => `${brewedOn}T${hhmm}:00.000Z`;
  // A brew day that happened: every time is of that day, not of when the seed ran.
  const id = await startBrew(db, priya, { recipeId: recipe.id, name: DEMO_BREW_NAME, brewedOn }, new Date(at('09:40')));
  const read = (input: ReadingInput) => addReading(db as Db, priya, id, readingInputSchema.parse(input));

  await read({ kind: 'mash_temp', instrumentId: instrument('thermometer'), tempC: 66.6, takenAt: at('10:05'), note: 'Stirred, probe in the middle of the tun.' });
  await read({ kind: 'mash_ph', instrumentId: instrument('ph_meter'), ph: 5.27, takenAt: at('10:20'), note: 'Sample cooled to room temperature first.' });
  await read({ kind: 'mash_temp', instrumentId: instrument('thermometer'), tempC: 65.9, takenAt: at('10:50') });
  await setStage(db, priya, id, 'mash', 'complete', new Date(at('11:05')));
  await read({ kind: 'pre_boil_gravity', instrumentId: instrument('refractometer'), method: 'refractometer', brix: 10.9, volumeL: 29.2, takenAt: at('11:35') });
  const lateBoil = { brix: 12.0, volumeL: 25.8, minutesLeft: 10 };
  const lateReading = await read({ kind: 'late_boil_gravity', instrumentId: instrument('refractometer'), method: 'refractometer', ...lateBoil, takenAt: at('12:30') });
  const wcf = lateReading.instrument?.kind === 'refractometer' ? lateReading.instrument.wcf : undefined;
  const decision = decisionInputSchema.parse({
    input: {
      reading: { kind: 'refractometer', brix: lateBoil.brix, wcf },
      volumeL: lateBoil.volumeL,
      minutesLeft: lateBoil.minutesLeft,
      boilOffLPerHour: 4,
      targetSg: 1.05,
      targetVolumeL: 23,
      targetFg: 1.011,
      extractsOnHand: ['dme', 'sucrose'],
      kettleCapacityL: 35,
      coolingShrinkage: 0.04,
      // Priya's kettle profile: 1.5 L trub loss and 0.5 L dead space (server/instruments/demo-seed.ts).
      kettleLossL: 2,
    },
    choice: { kind: 'extract', extract: 'dme' },
    note: 'A little short after a vigorous mash-out. Stirred the dry malt extract into a jug of wort first so it would not clump.',
  });
  await addDecision(db as Db, priya, id, decision, new Date(at('12:32')));
  await setStage(db, priya, id, 'boil', 'complete', new Date(at('12:45')));
  await setStage(db, priya, id, 'chill', 'start', new Date(at('12:50')));
  await read({ kind: 'og', instrumentId: instrument('hydrometer'), sg: 1.0495, sampleTempC: 21, volumeL: 22.8, takenAt: at('13:30'), note: 'Spun the hydrometer to shed bubbles; read at the bottom of the meniscus.' });
  await read({ kind: 'pitch_temp', instrumentId: instrument('thermometer'), tempC: 19.2, pitched: true, takenAt: at('13:40'), note: 'Rehydrated yeast pitched.' });
  await setStage(db, priya, id, 'chill', 'complete', new Date(at('13:42')));
  await setStage(db, priya, id, 'og', 'complete', new Date(at('13:45')));
  await addNote(db, priya, id, { body: 'Chilled to 19 °C in 25 minutes with the immersion chiller. Trub left behind nicely.', stage: 'chill' }, new Date(at('13:50')));
  await setBrewSharing(db, priya, id, [club.id]);
});
