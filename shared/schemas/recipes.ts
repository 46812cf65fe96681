/**
 * Recipes: the request and response shapes, validated by the same zod schemas in the recipe form
 * and in the API (so a 400 and an inline error carry the same words). Everything is SI and
 * specific gravity; the form converts at its edges. Messages that quote a number give it in both
 * metric and US units, because the same message reaches brewers of either preference.
 */
import { z } from 'zod';
import { abvPercent, apparentAttenuation } from '../brewmath/abv';
import { boilOffRateLPerHour } from '../brewmath/boil';
import { BrewMathError } from '../brewmath/errors';
import { estimateOg, POTENTIAL_MAX_POINTS_L_PER_KG, POTENTIAL_MIN_POINTS_L_PER_KG, type FermentableKind } from '../brewmath/extract';
import { buToGu, ibuTinseth } from '../brewmath/bitterness';
import { BEER_COLOUR_MAX_SRM, BEER_COLOUR_MIN_SRM, MALT_COLOUR_MAX_LOVIBOND, moreyColour, SRM_TO_EBC } from '../brewmath/colour';
import { boundedNumber, num, showF, showGal, type NumberRule } from './fields';

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
  cursor: z.string().max(300, { error: 'This list has changed since; start again from the top.' }).optional(),
  pageSize: z.coerce.number({ error: 'Page size must be a number.' }).int().min(1).max(100, { error: 'Ask for at most 100 recipes a page.' }).default(20),
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

export interface RecipeListItem {
  id: number;
  name: string;
  style: string;
  ownerId: number;
  ownerName: string;
  isOwner: boolean;
  version: number;
  batchVolumeL: number;
  targetOg: number;
  targetFg: number;
  abvPercent: number;
  sharedWithClubIds: number[];
  updatedAt: string;
}

/** One page of the list, paged by key: ask again with `cursor: nextCursor` for the next. No total is counted. */
export interface RecipeList {
  items: RecipeListItem[];
  /** Null on the last page. */
  nextCursor: string | null;
  pageSize: number;
}

// ---------------------------------------------------------------------------------------------
// Responses

export interface Recipe extends RecipeData {
  id: number;
  ownerId: number;
  ownerName: string;
  version: number;
  clonedFromId: number | null;
  sharedWithClubIds: number[];
  createdAt: string;
  updatedAt: string;
  /** What the signed-in user may do; the server enforces it regardless. */
  permissions: { edit: boolean; share: boolean; delete: boolean; clone: boolean };
  /** From the fermentables, efficiency and batch volume; null when they give no estimate. */
  estimatedOg: number | null;
  /** Tinseth from the hops; null with no hops. */
  estimatedIbu: number | null;
  /** Morey from the fermentables' colours; null while any colour is unknown. */
  estimatedColourSrm: number | null;
  /** Target IBU over target OG's gravity points; null without a target IBU. */
  buToGu: number | null;
  abvPercent: number;
  apparentAttenuation: number;
}

/** One saved version in a recipe's history. */
export interface RecipeVersionSummary {
  version: number;
  savedAt: string;
  savedByName: string | null;
}

export interface RecipeVersion extends RecipeVersionSummary {
  recipeId: number;
  data: RecipeData;
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

export interface RecipeSharing {
  recipeId: number;
  clubIds: number[];
}

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

export interface RecipeFile {
  format: typeof RECIPE_FILE_FORMAT;
  version: typeof RECIPE_FILE_VERSION;
  exportedAt: string;
  recipe: RecipeData;
}

export interface RecipeImportResult {
  recipe: Recipe;
  /** Fields in the file that are not part of our format, left out of the saved recipe. */
  ignored: { path: string; message: string }[];
}

// ---------------------------------------------------------------------------------------------
// Numbers derived from a recipe, the same on screen and in the API

/**
 * How our kinds map onto shared/brewmath's: only grain goes through the mash, so only grain is
 * scaled by the brewhouse efficiency; extracts, sugar and "other" (honey, fruit, lactose)
 * dissolve whole. Every recipe fermentable carries its own potential, so the extract kind chosen
 * for sugar and other never supplies a default.
 */
const brewmathKind: Record<RecipeFermentableKind, FermentableKind> = {
  grain: 'grain',
  'dry-extract': 'dme',
  'liquid-extract': 'lme',
  sugar: 'sucrose',
  other: 'sucrose',
};

export type OgEstimate = { og: number; reason?: undefined } | { og: null; reason: string };

/**
 * OG expected from the fermentables at the brewhouse efficiency, in the batch volume into the
 * fermenter. Brewhouse efficiency is extract into the fermenter over the grain's laboratory
 * extract, so the fermenter volume is the one it divides by
 * (docs/decisions/0004-recipe-storage-and-versions.md).
 */
export function estimateRecipeOg(recipe: { fermentables?: readonly Partial<Record<keyof FermentableInput, unknown>>[]; efficiency?: unknown; batchVolumeL?: unknown }): OgEstimate {
  const fermentables = recipe.fermentables ?? [];
  if (fermentables.length === 0) return { og: null, reason: 'Add fermentables to see an estimate.' };
  if (!isNum(recipe.batchVolumeL) || recipe.batchVolumeL <= 0) return { og: null, reason: 'Enter the batch volume to see an estimate.' };
  if (!isNum(recipe.efficiency) || recipe.efficiency <= 0 || recipe.efficiency > 1) return { og: null, reason: 'Enter the brewhouse efficiency to see an estimate.' };
  const mapped = [];
  for (const f of fermentables) {
    const kind = f.kind as RecipeFermentableKind;
    if (!isNum(f.amountKg) || !isNum(f.potentialPointsLPerKg) || !(kind in brewmathKind)) {
      return { og: null, reason: 'Complete every fermentable (amount and potential) to see an estimate.' };
    }
    mapped.push({ kg: f.amountKg, kind: brewmathKind[kind], potentialPointsLPerKg: f.potentialPointsLPerKg });
  }
  try {
    return { og: estimateOg({ fermentables: mapped, efficiency: recipe.efficiency, volumeL: recipe.batchVolumeL }) };
  } catch (error) {
    if (error instanceof BrewMathError) return { og: null, reason: error.message };
    throw error;
  }
}

/** Simple ABV and apparent attenuation from target OG and FG, or null while they are not a pair. */
export function targetAbv(targetOg: unknown, targetFg: unknown): { abvPercent: number; apparentAttenuation: number } | null {
  if (!isNum(targetOg) || !isNum(targetFg)) return null;
  try {
    return { abvPercent: abvPercent(targetOg, targetFg), apparentAttenuation: apparentAttenuation(targetOg, targetFg) };
  } catch (error) {
    if (error instanceof BrewMathError) return null;
    throw error;
  }
}

/** How close the estimate must be to the target to call them in agreement: 2 gravity points (common practice, no source). */
export const OG_AGREEMENT_SG = 0.002;

// ---------------------------------------------------------------------------------------------
// Bitterness and colour estimates (shared/brewmath: Tinseth, Morey)

export type IbuEstimateResult = { ibu: number; assumptions: string[]; reason?: undefined } | { ibu: null; assumptions: string[]; reason: string };
export type ColourEstimateResult = { srm: number; beyondFit: boolean; reason?: undefined } | { srm: null; beyondFit: false; reason: string };

type PartialRecipe = {
  fermentables?: readonly Partial<Record<keyof FermentableInput, unknown>>[];
  hops?: readonly Partial<Record<keyof HopInput, unknown>>[];
  efficiency?: unknown;
  batchVolumeL?: unknown;
  preBoilVolumeL?: unknown;
  postBoilVolumeL?: unknown;
  targetOg?: unknown;
};

/**
 * The average gravity the hops boil in, as Tinseth asks: midway between the pre-boil gravity and
 * the OG, the pre-boil gravity following from the OG by conserved extract over the boil's volumes.
 */
export function recipeBoilSg(og: number, preBoilVolumeL: unknown, postBoilVolumeL: unknown): number {
  if (!isNum(preBoilVolumeL) || !isNum(postBoilVolumeL) || preBoilVolumeL <= 0 || postBoilVolumeL <= 0 || postBoilVolumeL > preBoilVolumeL) return og;
  const preBoilSg = 1 + ((og - 1) * postBoilVolumeL) / preBoilVolumeL;
  return (preBoilSg + og) / 2;
}

/**
 * Bitterness from the hops by Tinseth, in the batch volume (as the OG estimate), at the recipe's
 * boil gravity from the estimated OG (the target OG while there is no estimate). No hops: no
 * estimate, never "0 IBU".
 */
export function estimateRecipeIbu(recipe: PartialRecipe): IbuEstimateResult {
  const hops = recipe.hops ?? [];
  if (hops.length === 0) return { ibu: null, assumptions: [], reason: 'No hops, so no bitterness estimate.' };
  if (!isNum(recipe.batchVolumeL) || recipe.batchVolumeL <= 0) return { ibu: null, assumptions: [], reason: 'Enter the batch volume to see an estimate.' };
  const og = estimateRecipeOg(recipe).og ?? (isNum(recipe.targetOg) && recipe.targetOg > 1 && recipe.targetOg <= 1.2 ? recipe.targetOg : null);
  if (og === null) return { ibu: null, assumptions: [], reason: 'Enter the target OG or the fermentables to see an estimate.' };
  const mapped = [];
  for (const h of hops) {
    if (!isNum(h.amountG) || !isNum(h.minutes) || !isNum(h.alphaAcidPercent)) {
      return { ibu: null, assumptions: [], reason: 'Complete every hop (amount, minutes and alpha acid) to see an estimate.' };
    }
    mapped.push({ massG: h.amountG, boilMinutes: h.minutes, alphaAcidPercent: h.alphaAcidPercent });
  }
  try {
    const result = ibuTinseth({ hops: mapped, boilSg: recipeBoilSg(og, recipe.preBoilVolumeL, recipe.postBoilVolumeL), volumeL: recipe.batchVolumeL });
    return { ibu: result.ibu, assumptions: result.assumptions };
  } catch (error) {
    if (error instanceof BrewMathError) return { ibu: null, assumptions: [], reason: error.message };
    throw error;
  }
}

/** Colour from the fermentables by Morey, in the batch volume. Every fermentable needs its colour. */
export function estimateRecipeColour(recipe: PartialRecipe): ColourEstimateResult {
  const fermentables = recipe.fermentables ?? [];
  if (fermentables.length === 0) return { srm: null, beyondFit: false, reason: 'Add fermentables to see a colour estimate.' };
  if (!isNum(recipe.batchVolumeL) || recipe.batchVolumeL <= 0) return { srm: null, beyondFit: false, reason: 'Enter the batch volume to see an estimate.' };
  const grist = [];
  for (const f of fermentables) {
    if (!isNum(f.amountKg) || !isNum(f.colourLovibond)) {
      return { srm: null, beyondFit: false, reason: 'Give every fermentable its colour to see a colour estimate.' };
    }
    grist.push({ massKg: f.amountKg, colourLovibond: f.colourLovibond });
  }
  try {
    const result = moreyColour(grist, recipe.batchVolumeL);
    return { srm: result.srm, beyondFit: result.beyondFit };
  } catch (error) {
    if (error instanceof BrewMathError) return { srm: null, beyondFit: false, reason: error.message };
    throw error;
  }
}

/** BU:GU from a bitterness and an OG, or null while either is missing. */
export function recipeBuGu(ibu: unknown, og: unknown): number | null {
  if (!isNum(ibu) || !isNum(og)) return null;
  try {
    return buToGu(ibu, og);
  } catch (error) {
    if (error instanceof BrewMathError) return null;
    throw error;
  }
}

/** How close the estimate must be to call it in agreement: 3 IBU and 1 SRM (common practice, no source). */
export const IBU_AGREEMENT = 3;
export const COLOUR_AGREEMENT_SRM = 1;
