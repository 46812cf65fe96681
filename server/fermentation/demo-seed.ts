/**
 * Demo fermentation for Priya's brew day "Hollow Oak Harvest Pale, first batch" (pitched nine days
 * before the seed runs): fermenter temperatures twice a day, with one warm spell on day 2, a
 * refractometer estimate on day 3 and hydrometer readings on days 6 and 8. Written through the
 * same service as the API, so every corrected value comes from her instruments.
 */
import { and, eq } from 'drizzle-orm';
import { sgToBrix } from '@shared/brewmath';
import { fermentationReadingInputSchema, type FermentationReadingInput } from '@shared/schemas/fermentation';
import { DEMO_BREW_NAME } from '../brews/demo-seed';
import { registerDemoSeed } from '../db/seed';
import { brews, instruments } from '../db/schema';
import { addReading } from './readings';
import { measuredOg } from './service';
import { DAY_MS } from '@shared/dates';

registerDemoSeed(async (db, people, club) => {
  const priya = { id: people.brewer.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'member' as const }] };
  const [brew] = await db
    .select({ id: brews.id, pitchedAt: brews.pitchedAt })
    .from(brews)
    .where(and(eq(brews.ownerId, priya.id), eq(brews.name, DEMO_BREW_NAME)));
  if (!brew?.pitchedAt) throw new Error(`Demo seed order: the brew day "${DEMO_BREW_NAME}" with a pitch time must be seeded before its fermentation.`);
  const owned = await db.select({ id: instruments.id, kind: instruments.kind, wcf: instruments.wcf }).from(instruments).where(eq(instruments.ownerId, priya.id));
  const instrument = (kind: string) => owned.find((i) => i.kind === kind) ?? null;
  const pitched = brew.pitchedAt.getTime();
  const at = (days: number) => new Date(pitched + days * DAY_MS).toISOString();
  const now = new Date();
  const add = async (input: FermentationReadingInput) => {
    if (Date.parse(input.takenAt!) > now.getTime()) return;
    await addReading(db, priya, brew.id, fermentationReadingInputSchema.parse(input), now);
  };

  const thermometer = instrument('thermometer')?.id ?? null;
  // Morning and evening; the yeast warmed the beer past the recipe's 20 °C on day 2.
  const temps = [19.2, 19.6, 20.4, 21.3, 20.6, 19.8, 19.4, 19.1, 19.0, 18.8, 18.9, 18.7, 18.8, 18.6, 18.7, 18.6, 18.5, 18.6];
  for (let i = 0; i < temps.length; i++) {
    await add({
      method: 'thermometer',
      instrumentId: thermometer,
      tempC: temps[i],
      takenAt: at(0.25 + i * 0.5),
      note: i === 3 ? 'Vigorous krausen; moved the fermenter to the cooler corner and wrapped a wet towel round it.' : '',
    });
  }
  const refractometer = instrument('refractometer');
  const og = (await measuredOg(db, brew.id)) ?? 1.0495;
  await add({
    method: 'refractometer',
    instrumentId: refractometer?.id ?? null,
    brix: 9.4,
    originalBrix: Number(sgToBrix(og, refractometer?.wcf ?? 1.04).toFixed(1)),
    takenAt: at(3.1),
    note: 'A few drops from the sampling tap, just to see it moving.',
  });
  const hydrometer = instrument('hydrometer')?.id ?? null;
  await add({ method: 'hydrometer', instrumentId: hydrometer, sg: 1.016, sampleTempC: 19.5, takenAt: at(6.1), note: 'Krausen falling.' });
  await add({ method: 'hydrometer', instrumentId: hydrometer, sg: 1.013, sampleTempC: 19, takenAt: at(8.1) });
});
