/**
 * Recipes: the request shapes, validated by the same zod schemas in the recipe form and in the API
 * (so a 400 and an inline error carry the same words), and the vocabulary both sides share.
 * Everything is SI and specific gravity; the form converts at its edges. Messages that quote a
 * number give it in both metric and US units, because the same message reaches brewers of either
 * preference. The answers are in responses.ts, the estimates in shared/recipes/estimates.ts.
 */
import { z } from 'zod';
import { pageCursorSchema } from '../common';
import { boilOffRateLPerHour } from '../../brewmath/boil';
import { BrewMathError } from '../../brewmath/errors';
import { POTENTIAL_MAX_POINTS_L_PER_KG, POTENTIAL_MIN_POINTS_L_PER_KG } from '../../brewmath/extract';
import { BEER_COLOUR_MAX_SRM, BEER_COLOUR_MIN_SRM, MALT_COLOUR_MAX_LOVIBOND, SRM_TO_EBC } from '../../brewmath/colour';
import { boundedNumber, num, pageSizeSchema, showF, showGal, type NumberRule } from '../fields';

// ---------------------------------------------------------------------------------------------
// Vocabulary

export const fermentableKinds = ['grain', 'dry-extract', 'liquid-extract', 'sugar', 'other'] as const;
export type RecipeFermentableKind = (typeof fermentableKinds)[number];

export const fermentableKindLabels: Record<RecipeFermentableKind, string> = {
  grain: 'Grain',
  'dry-extract': 'Dry malt extract',
  'liquid-extract': 'Liquid malt extract',
  sugar: 'Sugar',
  other: 'Other',
};

/**
 * A potential to start from when the author picks a kind, in gravity points × litres per kg.
 * Grain: a pale base malt's laboratory extract, about 36 points per pound per US gallon (common
 * practice, no source); the extracts and sugar are shared/brewmath's defaults. "Other" (honey,
 * fruit, lactose) varies too much to guess.
 */
export const defaultPotentialPointsLPerKg: Record<RecipeFermentableKind, number | null> = {
  grain: 300,
  'dry-extract': 367,
  'liquid-extract': 300,
  sugar: 384,
  other: null,
};

/** Souring target pH we accept; common practice is about 3.2 to 3.6 before the boil (no source). */
export const SOURING_PH_LIMITS = { min: 2.8, max: 4.6, usualMin: 3.2, usualMax: 3.6 } as const;

/** Mash pH target when the author gives none (common practice, no source). */
export const DEFAULT_MASH_PH_TARGET = 5.2;

/**
 * How far the post-boil volume may sit from what the boil-off rate and boil length predict
 * before we call the three contradictory: 0.5 L or 2 % of the pre-boil volume, whichever is
 * larger (common practice, no source: about what a kettle's sight glass or dipstick can resolve).
 */
export const BOIL_OFF_TOLERANCE_L = 0.5;
export const BOIL_OFF_TOLERANCE_FRACTION = 0.02;

/** Largest quantities we accept: beyond a home or pilot brewery, most likely a typo. */
export const RECIPE_LIMITS = {
  volumeL: 2000,
  boilMinutes: 360,
  boilOffLPerHour: 100,
  fermentableKg: 1000,
  hopG: 20_000,
  alphaAcidPercent: 25,
  targetIbu: 200,
  mashStepMinutes: 600,
  fermentables: 40,
  hops: 40,
  mashSteps: 12,
} as const;

// ---------------------------------------------------------------------------------------------
// Number fields with a brewer's messages

function volumeField(what: string, label: string) {
  return boundedNumber({
    what,
    label,
    min: 0,
    exclusiveMin: true,
    max: RECIPE_LIMITS.volumeL,
    rangeMessage: `${label} above ${RECIPE_LIMITS.volumeL} L (${showGal(RECIPE_LIMITS.volumeL)}) is more than Wortwise handles. Check the number.`,
  });
}

function temperatureField(what: string, label: string, minC: number, maxC: number) {
  return boundedNumber({
    what,
    label,
    min: minC,
    max: maxC,
    rangeOnly: true,
    rangeMessage: `${label} must be between ${minC} and ${maxC} °C (${showF(minC)} and ${showF(maxC)}).`,
  });
}

function textField(what: string, max: number, required: boolean) {
  const base = z.string({ error: `Enter ${what}.` }).trim().max(max, { error: `Use at most ${max} characters.` });
  return required ? base.min(1, { error: `Enter ${what}.` }) : base;
}

/** A number the author may leave empty: null (or absent) means "not set". */
function optionalNumberField(rule: NumberRule) {
  return boundedNumber(rule).nullable().default(null);
}

const ebc = (srmOrLovibond: number) => `${Number((srmOrLovibond * SRM_TO_EBC).toFixed(0))} EBC`;

// ---------------------------------------------------------------------------------------------
// Child rows

export const fermentableInputSchema = z.object({
  name: textField('a name for this fermentable', 120, true),
  kind: z.enum(fermentableKinds, { error: 'Choose grain, dry malt extract, liquid malt extract, sugar or other.' }),
  amountKg: boundedNumber({
    what: 'the amount',
    label: 'Amount',
    min: 0,
    exclusiveMin: true,
    max: RECIPE_LIMITS.fermentableKg,
    rangeMessage: `Amount above ${RECIPE_LIMITS.fermentableKg} kg is more than Wortwise handles. Check the number.`,
  }),
  potentialPointsLPerKg: boundedNumber({
    what: 'the extract potential',
    label: 'Potential',
    min: POTENTIAL_MIN_POINTS_L_PER_KG,
    max: POTENTIAL_MAX_POINTS_L_PER_KG,
    rangeMessage: `Potential must be between ${POTENTIAL_MIN_POINTS_L_PER_KG} and ${POTENTIAL_MAX_POINTS_L_PER_KG} points·L/kg (about 6 to 54 points per lb per gallon); table sugar is about 384 (46).`,
  }),
  /** Malt colour in °L (stored; the form shows EBC to those who prefer it). Empty: unknown. */
  colourLovibond: optionalNumberField({
    what: 'the malt colour',
    label: 'Malt colour',
    min: 0,
    max: MALT_COLOUR_MAX_LOVIBOND,
    rangeMessage: `Malt colour must be between 0 and ${MALT_COLOUR_MAX_LOVIBOND} °L (0 and ${ebc(MALT_COLOUR_MAX_LOVIBOND)}); black malt is about 500 °L.`,
  }),
});
export type FermentableInput = z.input<typeof fermentableInputSchema>;

export const hopInputSchema = z.object({
  name: textField('a name for this hop', 120, true),
  amountG: boundedNumber({
    what: 'the amount',
    label: 'Amount',
    min: 0,
    exclusiveMin: true,
    max: RECIPE_LIMITS.hopG,
    rangeMessage: `Amount above ${RECIPE_LIMITS.hopG} g is more than Wortwise handles. Check the number.`,
  }),
  minutes: boundedNumber({
    what: 'the minutes it boils',
    label: 'Minutes',
    min: 0,
    max: RECIPE_LIMITS.boilMinutes,
    rangeMessage: `Minutes must be between 0 and ${RECIPE_LIMITS.boilMinutes}.`,
  }),
  alphaAcidPercent: boundedNumber({
    what: 'the alpha acid',
    label: 'Alpha acid',
    min: 0,
    exclusiveMin: true,
    max: RECIPE_LIMITS.alphaAcidPercent,
    rangeMessage: `Alpha acid must be above 0 and at most ${RECIPE_LIMITS.alphaAcidPercent} %; hops are sold at about 2 to 20 %.`,
  }),
});
export type HopInput = z.input<typeof hopInputSchema>;

export const mashStepInputSchema = z.object({
  tempC: temperatureField('the step temperature', 'Step temperature', 20, 100),
  minutes: boundedNumber({
    what: 'the step length',
    label: 'Step length',
    min: 0,
    exclusiveMin: true,
    max: RECIPE_LIMITS.mashStepMinutes,
    rangeMessage: `Step length above ${RECIPE_LIMITS.mashStepMinutes} minutes is more than Wortwise handles. Check the number.`,
  }),
});
export type MashStepInput = z.input<typeof mashStepInputSchema>;

export const yeastInputSchema = z.object({
  name: textField('the yeast', 120, false).default(''),
  /** Free text: yeast comes in sachets, vials and slurries, not one unit. */
  amount: textField('how much yeast', 120, false).default(''),
});

// ---------------------------------------------------------------------------------------------
// The recipe

const recipeShape = {
  name: textField('a name for the recipe', 120, true),
  style: textField('a style', 80, false).default(''),
  notes: textField('notes', 5000, false).default(''),
  batchVolumeL: volumeField('the batch volume into the fermenter', 'Batch volume'),
  preBoilVolumeL: volumeField('the pre-boil volume', 'Pre-boil volume'),
  postBoilVolumeL: volumeField('the post-boil volume', 'Post-boil volume'),
  boilMinutes: boundedNumber({
    what: 'the boil length',
    label: 'Boil length',
    min: 0,
    max: RECIPE_LIMITS.boilMinutes,
    rangeMessage: `Boil length must be between 0 and ${RECIPE_LIMITS.boilMinutes} minutes.`,
  }),
  boilOffLPerHour: boundedNumber({
    what: 'the boil-off rate',
    label: 'Boil-off rate',
    min: 0,
    max: RECIPE_LIMITS.boilOffLPerHour,
    rangeMessage: `Boil-off above ${RECIPE_LIMITS.boilOffLPerHour} L (${showGal(RECIPE_LIMITS.boilOffLPerHour)}) per hour is more than Wortwise handles. Check the number.`,
  }),
  efficiency: boundedNumber({
    what: 'the brewhouse efficiency',
    label: 'Brewhouse efficiency',
    min: 0,
    exclusiveMin: true,
    max: 1,
    rangeMessage: 'Brewhouse efficiency must be above 0 % and at most 100 %.',
  }),
  targetOg: boundedNumber({
    what: 'the target OG',
    label: 'Target OG',
    min: 1,
    exclusiveMin: true,
    max: 1.2,
    rangeMessage: 'Target OG must be above 1.000 and at most 1.200 (about 44 °P).',
  }),
  targetFg: boundedNumber({
    what: 'the target FG',
    label: 'Target FG',
    min: 0.98,
    max: 1.2,
    rangeMessage: 'Target FG must be between 0.980 and 1.200.',
  }),
  targetIbu: optionalNumberField({
    what: 'the target bitterness',
    label: 'Target bitterness',
    min: 0,
    max: RECIPE_LIMITS.targetIbu,
    rangeMessage: `Target bitterness must be between 0 and ${RECIPE_LIMITS.targetIbu} IBU.`,
  }),
  targetColourSrm: optionalNumberField({
    what: 'the target colour',
    label: 'Target colour',
    min: BEER_COLOUR_MIN_SRM,
    max: BEER_COLOUR_MAX_SRM,
    rangeOnly: true,
    rangeMessage: `Target colour must be between ${BEER_COLOUR_MIN_SRM} and ${BEER_COLOUR_MAX_SRM} SRM (${ebc(BEER_COLOUR_MIN_SRM)} and ${ebc(BEER_COLOUR_MAX_SRM)}).`,
  }),
  /** Kettle souring: pH the wort is soured to before the boil (common practice about 3.2 to 3.6). */
  souringTargetPh: optionalNumberField({
    what: 'the souring target pH',
    label: 'Souring target pH',
    min: SOURING_PH_LIMITS.min,
    max: SOURING_PH_LIMITS.max,
    rangeOnly: true,
    rangeMessage: `Souring target pH must be between ${SOURING_PH_LIMITS.min} and ${SOURING_PH_LIMITS.max}; kettle sours usually aim for about 3.2 to 3.6 before the boil.`,
  }),
  mashPhTarget: boundedNumber({
    what: 'the mash pH target',
    label: 'Mash pH target',
    min: 4.5,
    max: 6.5,
    rangeMessage: 'Mash pH target must be between 4.5 and 6.5; most mashes aim for about 5.2 to 5.6.',
  }).default(DEFAULT_MASH_PH_TARGET),
  fermentationTempMinC: temperatureField('the lowest fermentation temperature', 'Lowest fermentation temperature', 0, 45),
  fermentationTempMaxC: temperatureField('the highest fermentation temperature', 'Highest fermentation temperature', 0, 45),
  yeast: yeastInputSchema.default({ name: '', amount: '' }),
  fermentables: z
    .array(fermentableInputSchema, { error: 'Add at least one fermentable.' })
    .min(1, { error: 'Add at least one fermentable.' })
    .max(RECIPE_LIMITS.fermentables, { error: `Use at most ${RECIPE_LIMITS.fermentables} fermentables.` }),
  hops: z.array(hopInputSchema).max(RECIPE_LIMITS.hops, { error: `Use at most ${RECIPE_LIMITS.hops} hop additions.` }).default([]),
  mashSteps: z.array(mashStepInputSchema).max(RECIPE_LIMITS.mashSteps, { error: `Use at most ${RECIPE_LIMITS.mashSteps} mash steps.` }).default([]),
};

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/**
 * The checks that need two or more fields. They run even while other fields are still invalid
 * (`when`), so the form shows every problem at once; each looks only at numbers that are there.
 */
function crossChecks(value: Record<string, unknown>, ctx: z.RefinementCtx) {
  const add = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message, input: value });
  const { targetOg, targetFg, preBoilVolumeL: pre, postBoilVolumeL: post, boilMinutes, boilOffLPerHour: rate } = value;
  const { fermentationTempMinC: tMin, fermentationTempMaxC: tMax } = value;

  // Only numbers that passed their own checks are compared, so one typo gives one message.
  if (isNum(targetOg) && isNum(targetFg) && targetOg > 1 && targetOg <= 1.2 && targetFg >= 0.98 && targetFg >= targetOg) {
    add(['targetFg'], 'Target FG must be below the target OG: fermentation only lowers gravity.');
  }
  if (isNum(tMin) && isNum(tMax) && tMin >= 0 && tMax <= 45 && tMax < tMin) {
    add(['fermentationTempMaxC'], 'The highest fermentation temperature cannot be below the lowest.');
  }
  const boilMessage = boilOffMismatch(pre, post, boilMinutes, rate);
  if (boilMessage) add([boilMessage.field], boilMessage.message);

  if (Array.isArray(value.hops) && isNum(boilMinutes)) {
    value.hops.forEach((hop: unknown, i) => {
      const minutes = (hop as { minutes?: unknown } | null)?.minutes;
      if (isNum(minutes) && minutes > boilMinutes) {
        add(['hops', i, 'minutes'], `A hop cannot boil longer than the ${boilMinutes}-minute boil. Use 0 for additions after the boil.`);
      }
    });
  }
}

/**
 * Post-boil above pre-boil, or a boil-off rate that does not turn the pre-boil volume into the
 * post-boil volume over the boil. Exported so the form can show the rate the volumes imply.
 */
export function boilOffMismatch(pre: unknown, post: unknown, boilMinutes: unknown, rate: unknown): { field: 'postBoilVolumeL' | 'boilOffLPerHour'; message: string } | null {
  if (!isNum(pre) || !isNum(post) || pre <= 0 || post <= 0) return null;
  if (post > pre) {
    return { field: 'postBoilVolumeL', message: 'Post-boil volume cannot be above the pre-boil volume: a boil only loses water.' };
  }
  if (!isNum(boilMinutes) || !isNum(rate) || boilMinutes < 0 || rate < 0) return null;
  const predictedPostL = pre - (rate * boilMinutes) / 60;
  const toleranceL = Math.max(BOIL_OFF_TOLERANCE_L, BOIL_OFF_TOLERANCE_FRACTION * pre);
  if (Math.abs(predictedPostL - post) <= toleranceL) return null;
  if (boilMinutes === 0) {
    return { field: 'postBoilVolumeL', message: 'With no boil, the post-boil volume should equal the pre-boil volume.' };
  }
  const implied = impliedBoilOffLPerHour(pre, post, boilMinutes);
  const impliedText = implied === null ? '' : ` The volumes imply about ${implied.toFixed(1)} L (${showGal(implied)}) per hour.`;
  return {
    field: 'boilOffLPerHour',
    message: `This boil-off rate does not match the volumes: over ${boilMinutes} minutes it would leave ${Math.max(predictedPostL, 0).toFixed(1)} L (${showGal(Math.max(predictedPostL, 0))}), not the post-boil ${post.toFixed(1)} L (${showGal(post)}).${impliedText}`,
  };
}

/** The boil-off rate the pre- and post-boil volumes and boil length imply, or null when they cannot. */
export function impliedBoilOffLPerHour(preL: number, postL: number, minutes: number): number | null {
  try {
    return boilOffRateLPerHour({ startL: preL, endL: postL, minutes });
  } catch (error) {
    if (error instanceof BrewMathError) return null;
    throw error;
  }
}

export const recipeInputSchema = z.object(recipeShape).superRefine(crossChecks, { when: () => true });
export type RecipeInput = z.input<typeof recipeInputSchema>;
export type RecipeData = z.output<typeof recipeInputSchema>;

/** A save carries the version it was edited from; an older version than stored is a 409. */
export const recipeUpdateSchema = z
  .object({
    ...recipeShape,
    version: num({ notNumber: 'The recipe version is missing; reload the recipe.' }).int().positive({ error: 'The recipe version is missing; reload the recipe.' }),
  })
  .superRefine(crossChecks, { when: () => true });
export type RecipeUpdateInput = z.input<typeof recipeUpdateSchema>;

// ---------------------------------------------------------------------------------------------
// Listing

export const recipeSorts = ['name', 'style', 'og', 'abv', 'updated'] as const;
export type RecipeSort = (typeof recipeSorts)[number];
export const recipeScopes = ['all', 'mine', 'shared'] as const;
export type RecipeScope = (typeof recipeScopes)[number];

export const listRecipesQuerySchema = z.object({
  q: z.string().trim().max(100, { error: 'Search for at most 100 characters.' }).optional(),
  scope: z.enum(recipeScopes, { error: 'Choose all, mine or shared.' }).default('all'),
  sort: z.enum(recipeSorts, { error: 'Sort by name, style, og, abv or updated.' }).default('updated'),
  dir: z.enum(['asc', 'desc'], { error: 'Sort direction is asc or desc.' }).optional(),
  /** Where the previous page ended (its `nextCursor`); absent for the first page. */
  cursor: pageCursorSchema,
  pageSize: pageSizeSchema('recipe', 100, 20),
});
/** What a client asks for; the server fills in the defaults. */
export interface ListRecipesQuery {
  q?: string;
  scope?: RecipeScope;
  sort?: RecipeSort;
  dir?: 'asc' | 'desc';
  cursor?: string;
  pageSize?: number;
}

export const recipeVersionParamsSchema = z.object({
  id: z.coerce.number({ error: 'The recipe id must be a number.' }).int().positive({ error: 'The recipe id must be a number.' }),
  version: z.coerce.number({ error: 'The version must be a number.' }).int().positive({ error: 'The version must be a whole number from 1.' }),
});

export const sharingInputSchema = z.object({
  clubIds: z
    .array(num({ notNumber: 'Each club is a number.' }).int().positive({ error: 'Each club is a number.' }), { error: 'Give a list of clubs (empty for private).' })
    .max(50, { error: 'Share with at most 50 clubs.' }),
});
export type SharingInput = z.input<typeof sharingInputSchema>;

// ---------------------------------------------------------------------------------------------
// The targets a brew day is judged against (a snapshot; see server/recipes/service.ts)

export const recipeTargetsSchema = z.object({
  recipeId: z.number().int().positive(),
  recipeVersion: z.number().int().positive(),
  name: z.string(),
  style: z.string(),
  batchVolumeL: z.number().positive(),
  preBoilVolumeL: z.number().positive(),
  postBoilVolumeL: z.number().positive(),
  boilMinutes: z.number().min(0),
  boilOffLPerHour: z.number().min(0),
  efficiency: z.number().gt(0).max(1),
  targetOg: z.number().gt(1).max(1.2),
  targetFg: z.number().min(0.98).max(1.2),
  /** Added with bitterness and colour; absent in brew days started before them. */
  targetIbu: z.number().nullable().optional(),
  targetColourSrm: z.number().nullable().optional(),
  souringTargetPh: z.number().nullable().optional(),
  /** What the late-boil check needs to predict bitterness and colour. */
  hops: z.array(z.object({ amountG: z.number(), minutes: z.number(), alphaAcidPercent: z.number() })).optional(),
  grist: z.array(z.object({ amountKg: z.number(), colourLovibond: z.number().nullable() })).optional(),
  mashPhTarget: z.number(),
  mashSteps: z.array(z.object({ tempC: z.number(), minutes: z.number() })),
  fermentationTempMinC: z.number(),
  fermentationTempMaxC: z.number(),
});
export type RecipeTargets = z.infer<typeof recipeTargetsSchema>;

// ---------------------------------------------------------------------------------------------
// Our file format (docs/recipe-format.md)

export const RECIPE_FILE_FORMAT = 'wortwise-recipe';
/** Version 2 added bitterness, colour and souring targets and each fermentable's colour; version 1 files still read. */
export const RECIPE_FILE_VERSION = 2;
export const RECIPE_FILE_VERSIONS_READ = [1, 2] as const;

export const recipeFileHeaderSchema = z.object({
  format: z.literal(RECIPE_FILE_FORMAT, { error: `This is not a Wortwise recipe file: "format" must be "${RECIPE_FILE_FORMAT}".` }),
  version: z.literal(RECIPE_FILE_VERSIONS_READ, { error: `Wortwise reads recipe files of versions ${RECIPE_FILE_VERSIONS_READ.join(' and ')}: "version" must be one of them.` }),
  recipe: z.record(z.string(), z.unknown(), { error: '"recipe" must be an object with the recipe in it.' }),
});
