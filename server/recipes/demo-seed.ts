/**
 * Demo recipes: invented, for the invented Hollow Oak Homebrew Circle. Priya brews in metric,
 * Jonah in US units, so Jonah's quantities are round numbers of pounds, ounces, gallons and °F
 * converted to SI (the store is always SI). Each passes the same schema as the API.
 */
import { fToC, KG_PER_LB, LITRES_PER_US_GALLON, ozToG } from '@shared/brewmath';
import { recipeInputSchema, type RecipeInput } from '@shared/schemas/recipes';
import { registerDemoSeed } from '../db/seed';
import { createRecipe, setRecipeSharing } from './service';

/** The brew-day browser test starts a brew day from this one: keep its name and numbers. */
export const DEMO_SHARED_RECIPE_NAME = 'Hollow Oak Harvest Pale';

const lb = (pounds: number) => pounds * KG_PER_LB;
const gal = (gallons: number) => gallons * LITRES_PER_US_GALLON;

export const priyaRecipes: RecipeInput[] = [
  {
    // 72 % of (4.8 × 300 + 0.3 × 270 + 0.25 × 305) points·L over 23 L: an estimate of 1.050.
    name: DEMO_SHARED_RECIPE_NAME,
    style: 'Pale ale',
    notes: 'The club’s autumn pale: bright, a little bready, a citrus finish. Chill hard before transfer so the trub stays behind.',
    batchVolumeL: 23,
    preBoilVolumeL: 29,
    postBoilVolumeL: 25,
    boilMinutes: 60,
    boilOffLPerHour: 4,
    efficiency: 0.72,
    targetOg: 1.05,
    targetFg: 1.011,
    targetIbu: 25,
    targetColourSrm: 8,
    mashPhTarget: 5.2,
    fermentationTempMinC: 18,
    fermentationTempMaxC: 20,
    yeast: { name: 'Clean American-style ale yeast, dry', amount: '1 sachet (11 g), rehydrated' },
    fermentables: [
      { name: 'Pale ale malt', kind: 'grain', amountKg: 4.8, potentialPointsLPerKg: 300, colourLovibond: 3 },
      { name: 'Crystal malt, medium', kind: 'grain', amountKg: 0.3, potentialPointsLPerKg: 270, colourLovibond: 60 },
      { name: 'Wheat malt', kind: 'grain', amountKg: 0.25, potentialPointsLPerKg: 305, colourLovibond: 2 },
    ],
    hops: [
      { name: 'Cascade', amountG: 20, minutes: 60, alphaAcidPercent: 6.5 },
      { name: 'Cascade', amountG: 30, minutes: 10, alphaAcidPercent: 6.5 },
      { name: 'Cascade', amountG: 40, minutes: 0, alphaAcidPercent: 6.5 },
    ],
    mashSteps: [
      { tempC: 66, minutes: 60 },
      { tempC: 76, minutes: 10 },
    ],
  },
  {
    // (3.2 × 300 + 0.25 × 270) × 72 % + 0.15 × 384 points·L over 20 L: an estimate of 1.040.
    name: 'Lantern Light Bitter',
    style: 'Ordinary bitter',
    notes: 'A session bitter for the quiz night. The sugar goes in for the last 10 minutes of the boil.',
    batchVolumeL: 20,
    preBoilVolumeL: 25,
    postBoilVolumeL: 21.5,
    boilMinutes: 60,
    boilOffLPerHour: 3.5,
    efficiency: 0.72,
    targetOg: 1.038,
    targetFg: 1.01,
    targetIbu: 24,
    targetColourSrm: 10,
    mashPhTarget: 5.3,
    fermentationTempMinC: 18,
    fermentationTempMaxC: 19,
    yeast: { name: 'English ale yeast, liquid', amount: '1 pack with a 1 L starter' },
    fermentables: [
      { name: 'Maris Otter pale malt', kind: 'grain', amountKg: 3.2, potentialPointsLPerKg: 300, colourLovibond: 3 },
      { name: 'Crystal malt, dark', kind: 'grain', amountKg: 0.25, potentialPointsLPerKg: 270, colourLovibond: 120 },
      { name: 'Brewing sugar', kind: 'sugar', amountKg: 0.15, potentialPointsLPerKg: 384, colourLovibond: 0 },
    ],
    hops: [
      { name: 'East Kent Goldings', amountG: 28, minutes: 60, alphaAcidPercent: 5 },
      { name: 'Fuggle', amountG: 15, minutes: 15, alphaAcidPercent: 4.5 },
    ],
    mashSteps: [{ tempC: 67, minutes: 60 }],
  },
];

export const jonahRecipes: RecipeInput[] = [
  {
    // 70 % of (11.5 lb × 300 + 0.75 lb × 280 + 1 lb × 270 + 0.5 lb × 250) points·L over 5.5 gal: about 1.062.
    name: 'Back Porch Robust Porter',
    style: 'Robust porter',
    notes: 'Roasty but smooth. Keep the fermenter in the basement closet, away from the furnace.',
    batchVolumeL: gal(5.5),
    preBoilVolumeL: gal(7),
    postBoilVolumeL: gal(6),
    boilMinutes: 60,
    boilOffLPerHour: gal(1),
    efficiency: 0.7,
    targetOg: 1.062,
    targetFg: 1.016,
    targetIbu: 40,
    targetColourSrm: 35,
    mashPhTarget: 5.4,
    fermentationTempMinC: fToC(64),
    fermentationTempMaxC: fToC(68),
    yeast: { name: 'London-style ale yeast, liquid', amount: '2 packs' },
    fermentables: [
      { name: 'Two-row pale malt', kind: 'grain', amountKg: lb(11.5), potentialPointsLPerKg: 300, colourLovibond: 2 },
      { name: 'Chocolate malt', kind: 'grain', amountKg: lb(0.75), potentialPointsLPerKg: 280, colourLovibond: 350 },
      { name: 'Crystal malt, 60 °L', kind: 'grain', amountKg: lb(1), potentialPointsLPerKg: 270, colourLovibond: 60 },
      { name: 'Black malt', kind: 'grain', amountKg: lb(0.5), potentialPointsLPerKg: 250, colourLovibond: 500 },
    ],
    hops: [
      { name: 'Northern Brewer', amountG: ozToG(1.5), minutes: 60, alphaAcidPercent: 8.5 },
      { name: 'Willamette', amountG: ozToG(0.5), minutes: 15, alphaAcidPercent: 5 },
    ],
    mashSteps: [{ tempC: fToC(154), minutes: 60 }],
  },
  {
    // 65 % of (17 lb × 300 + 1 lb × 270) plus 1 lb DME × 367 and 0.5 lb sugar × 384, over 5 gal: about 1.097.
    name: 'Midwinter Barleywine',
    style: 'Barleywine',
    notes: 'Brewed in December, opened next December. A long, hard boil; top up the kettle if it drops below the line.',
    batchVolumeL: gal(5),
    preBoilVolumeL: gal(7.5),
    postBoilVolumeL: gal(5.5),
    boilMinutes: 90,
    boilOffLPerHour: gal(2 / 1.5),
    efficiency: 0.65,
    targetOg: 1.098,
    targetFg: 1.024,
    targetIbu: 70,
    targetColourSrm: 10,
    mashPhTarget: 5.3,
    fermentationTempMinC: fToC(62),
    fermentationTempMaxC: fToC(66),
    yeast: { name: 'High-gravity ale yeast, dry', amount: '3 sachets, rehydrated' },
    fermentables: [
      { name: 'Two-row pale malt', kind: 'grain', amountKg: lb(17), potentialPointsLPerKg: 300, colourLovibond: 2 },
      { name: 'Crystal malt, 40 °L', kind: 'grain', amountKg: lb(1), potentialPointsLPerKg: 270, colourLovibond: 40 },
      { name: 'Light dry malt extract', kind: 'dry-extract', amountKg: lb(1), potentialPointsLPerKg: 367, colourLovibond: 4 },
      { name: 'Table sugar', kind: 'sugar', amountKg: lb(0.5), potentialPointsLPerKg: 384, colourLovibond: 0 },
    ],
    hops: [
      { name: 'Magnum', amountG: ozToG(2), minutes: 90, alphaAcidPercent: 12 },
      { name: 'East Kent Goldings', amountG: ozToG(1), minutes: 10, alphaAcidPercent: 5 },
    ],
    mashSteps: [
      { tempC: fToC(150), minutes: 90 },
      { tempC: fToC(168), minutes: 10 },
    ],
  },
];

registerDemoSeed(async (db, people, club) => {
  const priya = { id: people.brewer.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'member' as const }] };
  const jonah = { id: people.secondBrewer.id, siteRole: 'user' as const, memberships: [{ clubId: club.id, role: 'member' as const }] };
  for (const recipe of priyaRecipes) {
    const id = await createRecipe(db, priya, recipeInputSchema.parse(recipe));
    if (recipe.name === DEMO_SHARED_RECIPE_NAME) await setRecipeSharing(db, priya, id, [club.id]);
  }
  for (const recipe of jonahRecipes) await createRecipe(db, jonah, recipeInputSchema.parse(recipe));
});
