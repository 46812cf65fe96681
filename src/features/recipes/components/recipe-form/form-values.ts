import { DEFAULT_MASH_PH_TARGET, type RecipeData, type RecipeFermentableKind } from '@shared/schemas/recipes';

/** A number input's value: SI once typed, '' while empty. */
export type Num = number | '';

export interface FermentableValues {
  name: string;
  kind: RecipeFermentableKind;
  amountKg: Num;
  potentialPointsLPerKg: Num;
  colourLovibond: Num;
}
export interface HopValues {
  name: string;
  amountG: Num;
  minutes: Num;
  alphaAcidPercent: Num;
}
export interface MashStepValues {
  tempC: Num;
  minutes: Num;
}

export interface RecipeFormValues {
  name: string;
  style: string;
  notes: string;
  batchVolumeL: Num;
  preBoilVolumeL: Num;
  postBoilVolumeL: Num;
  boilMinutes: Num;
  boilOffLPerHour: Num;
  efficiency: Num;
  targetOg: Num;
  targetFg: Num;
  targetIbu: Num;
  targetColourSrm: Num;
  souringTargetPh: Num;
  mashPhTarget: Num;
  fermentationTempMinC: Num;
  fermentationTempMaxC: Num;
  yeast: { name: string; amount: string };
  fermentables: FermentableValues[];
  hops: HopValues[];
  mashSteps: MashStepValues[];
}

export const emptyFermentable = (): FermentableValues => ({ name: '', kind: 'grain', amountKg: '', potentialPointsLPerKg: 300, colourLovibond: '' });
export const emptyHop = (): HopValues => ({ name: '', amountG: '', minutes: '', alphaAcidPercent: '' });
export const emptyMashStep = (): MashStepValues => ({ tempC: '', minutes: '' });

/**
 * A new recipe starts with what most recipes share (a 60-minute boil, 72 % brewhouse
 * efficiency, mash pH 5.2: common practice, no source) and leaves every quantity that depends on
 * the brewer's kit empty, so no metric number is put in front of a US brewer.
 */
export function newRecipeValues(): RecipeFormValues {
  return {
    name: '',
    style: '',
    notes: '',
    batchVolumeL: '',
    preBoilVolumeL: '',
    postBoilVolumeL: '',
    boilMinutes: 60,
    boilOffLPerHour: '',
    efficiency: 0.72,
    targetOg: '',
    targetFg: '',
    targetIbu: '',
    targetColourSrm: '',
    souringTargetPh: '',
    mashPhTarget: DEFAULT_MASH_PH_TARGET,
    fermentationTempMinC: '',
    fermentationTempMaxC: '',
    yeast: { name: '', amount: '' },
    fermentables: [emptyFermentable()],
    hops: [],
    mashSteps: [],
  };
}

export function toFormValues(recipe: RecipeData): RecipeFormValues {
  return {
    name: recipe.name,
    style: recipe.style,
    notes: recipe.notes,
    batchVolumeL: recipe.batchVolumeL,
    preBoilVolumeL: recipe.preBoilVolumeL,
    postBoilVolumeL: recipe.postBoilVolumeL,
    boilMinutes: recipe.boilMinutes,
    boilOffLPerHour: recipe.boilOffLPerHour,
    efficiency: recipe.efficiency,
    targetOg: recipe.targetOg,
    targetFg: recipe.targetFg,
    targetIbu: recipe.targetIbu ?? '',
    targetColourSrm: recipe.targetColourSrm ?? '',
    souringTargetPh: recipe.souringTargetPh ?? '',
    mashPhTarget: recipe.mashPhTarget,
    fermentationTempMinC: recipe.fermentationTempMinC,
    fermentationTempMaxC: recipe.fermentationTempMaxC,
    yeast: { ...recipe.yeast },
    fermentables: recipe.fermentables.map((f) => ({ ...f, colourLovibond: f.colourLovibond ?? '' })),
    hops: recipe.hops.map((h) => ({ ...h })),
    mashSteps: recipe.mashSteps.map((m) => ({ ...m })),
  };
}

/**
 * The optional numbers (bitterness, colour and souring targets, malt colours) are '' in the form
 * while empty and null in the API: "not set".
 */
export function toRecipeInput(values: RecipeFormValues): unknown {
  const blank = (v: Num) => (v === '' ? null : v);
  return {
    ...values,
    targetIbu: blank(values.targetIbu),
    targetColourSrm: blank(values.targetColourSrm),
    souringTargetPh: blank(values.souringTargetPh),
    fermentables: values.fermentables.map((f) => ({ ...f, colourLovibond: blank(f.colourLovibond) })),
  };
}
