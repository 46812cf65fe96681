/**
 * Numbers derived from a recipe, the same on screen and in the API: the estimated OG, ABV and
 * attenuation of the targets, bitterness (Tinseth) and colour (Morey) through shared/brewmath.
 */
import { abvPercent, apparentAttenuation } from '../brewmath/abv';
import { BrewMathError } from '../brewmath/errors';
import { estimateOg, type FermentableKind } from '../brewmath/extract';
import { buToGu, ibuTinseth } from '../brewmath/bitterness';
import { moreyColour } from '../brewmath/colour';
import type { FermentableInput, HopInput, RecipeFermentableKind } from '../schemas/recipes';

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

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
