/**
 * Our own recipe files, documented in docs/recipe-format.md: a JSON file that round-trips
 * exactly (export, then import, gives the same recipe), and a CSV for reading in a spreadsheet.
 * Values are SI and specific gravity, as stored.
 */
import {
  RECIPE_FILE_FORMAT,
  RECIPE_FILE_VERSION,
  fermentableInputSchema,
  hopInputSchema,
  mashStepInputSchema,
  recipeFileHeaderSchema,
  recipeInputSchema,
  yeastInputSchema,
  type RecipeData,
  type RecipeFile,
} from '@shared/schemas/recipes';
import { estimateRecipeColour, estimateRecipeIbu, estimateRecipeOg, recipeBuGu, targetAbv } from '@shared/recipes/estimates';
import { formulaSafe, writeCsv } from '../lib/csv';
import { fieldErrors } from '../lib/handle';
import { BadRequest } from '../lib/errors';

export function toRecipeFile(data: RecipeData, exportedAt = new Date()): RecipeFile {
  return { format: RECIPE_FILE_FORMAT, version: RECIPE_FILE_VERSION, exportedAt: exportedAt.toISOString(), recipe: data };
}

/** A file name from the recipe's name: letters, digits and dashes only. */
export function fileSlug(name: string) {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return slug || 'recipe';
}

// ---------------------------------------------------------------------------------------------
// CSV

export const CSV_COLUMNS = ['section', 'position', 'field', 'value', 'unit'] as const;

/** Typed text goes through the one formula guard; numbers are written at full precision. */
function cell(value: string | number | null | undefined, isText = false): string {
  const text = value === null || value === undefined ? '' : typeof value === 'number' ? numberText(value) : value;
  return isText ? formulaSafe(text) : text;
}

/** Full precision, minus binary float noise (0.72 × 100 = 72.00000000000001). */
function numberText(value: number) {
  return String(Number(value.toPrecision(12)));
}

type Row = [section: string, position: number | null, field: string, value: string | number | null, unit: string, isText?: boolean];

export function toRecipeCsv(data: RecipeData): string {
  const estimate = estimateRecipeOg(data).og;
  const abv = targetAbv(data.targetOg, data.targetFg);
  const rows: Row[] = [
    ['recipe', null, 'name', data.name, '', true],
    ['recipe', null, 'style', data.style, '', true],
    ['recipe', null, 'notes', data.notes, '', true],
    ['recipe', null, 'batch_volume', data.batchVolumeL, 'L'],
    ['recipe', null, 'pre_boil_volume', data.preBoilVolumeL, 'L'],
    ['recipe', null, 'post_boil_volume', data.postBoilVolumeL, 'L'],
    ['recipe', null, 'boil_length', data.boilMinutes, 'min'],
    ['recipe', null, 'boil_off_rate', data.boilOffLPerHour, 'L/h'],
    ['recipe', null, 'brewhouse_efficiency', data.efficiency * 100, '%'],
    ['recipe', null, 'target_og', data.targetOg, 'SG'],
    ['recipe', null, 'target_fg', data.targetFg, 'SG'],
    ['recipe', null, 'estimated_og', estimate, 'SG'],
    ['recipe', null, 'abv', abv?.abvPercent ?? null, '%'],
    ['recipe', null, 'apparent_attenuation', abv ? abv.apparentAttenuation * 100 : null, '%'],
    ['recipe', null, 'target_ibu', data.targetIbu, 'IBU'],
    ['recipe', null, 'estimated_ibu', estimateRecipeIbu(data).ibu, 'IBU'],
    ['recipe', null, 'bu_gu', recipeBuGu(data.targetIbu, data.targetOg), ''],
    ['recipe', null, 'target_colour', data.targetColourSrm, 'SRM'],
    ['recipe', null, 'estimated_colour', estimateRecipeColour(data).srm, 'SRM'],
    ['recipe', null, 'souring_target_ph', data.souringTargetPh, 'pH'],
    ['recipe', null, 'mash_ph_target', data.mashPhTarget, 'pH'],
    ['recipe', null, 'fermentation_temp_min', data.fermentationTempMinC, '°C'],
    ['recipe', null, 'fermentation_temp_max', data.fermentationTempMaxC, '°C'],
    ['yeast', null, 'name', data.yeast.name, '', true],
    ['yeast', null, 'amount', data.yeast.amount, '', true],
  ];
  data.fermentables.forEach((f, i) => {
    rows.push(
      ['fermentable', i + 1, 'name', f.name, '', true],
      ['fermentable', i + 1, 'kind', f.kind, ''],
      ['fermentable', i + 1, 'amount', f.amountKg, 'kg'],
      ['fermentable', i + 1, 'potential', f.potentialPointsLPerKg, 'points·L/kg'],
      ['fermentable', i + 1, 'colour', f.colourLovibond, '°L'],
    );
  });
  data.hops.forEach((h, i) => {
    rows.push(
      ['hop', i + 1, 'name', h.name, '', true],
      ['hop', i + 1, 'amount', h.amountG, 'g'],
      ['hop', i + 1, 'minutes', h.minutes, 'min'],
      ['hop', i + 1, 'alpha_acid', h.alphaAcidPercent, '%'],
    );
  });
  data.mashSteps.forEach((m, i) => {
    rows.push(['mash_step', i + 1, 'temperature', m.tempC, '°C'], ['mash_step', i + 1, 'minutes', m.minutes, 'min']);
  });
  const lines = [[...CSV_COLUMNS], ...rows.map(([section, position, field, value, unit, isText]) => [section, cell(position), field, cell(value, isText), unit])];
  // A byte-order mark so spreadsheet programs read the file as UTF-8 (°C, accented names).
  return writeCsv(lines, { bom: true });
}

// ---------------------------------------------------------------------------------------------
// Import

export interface ImportProblem {
  path: string;
  message: string;
}

const knownKeys = {
  file: new Set(['format', 'version', 'exportedAt', 'recipe']),
  recipe: new Set(Object.keys(recipeInputSchema.shape)),
  yeast: new Set(Object.keys(yeastInputSchema.shape)),
  fermentable: new Set(Object.keys(fermentableInputSchema.shape)),
  hop: new Set(Object.keys(hopInputSchema.shape)),
  mashStep: new Set(Object.keys(mashStepInputSchema.shape)),
};

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Keys our format does not have: reported, and left out of the saved recipe. */
function unknownKeys(file: Record<string, unknown>): ImportProblem[] {
  const ignored: ImportProblem[] = [];
  const check = (obj: unknown, known: Set<string>, prefix: string) => {
    if (!isObject(obj)) return;
    for (const key of Object.keys(obj)) {
      if (!known.has(key)) ignored.push({ path: `${prefix}${key}`, message: 'Not part of a Wortwise recipe: ignored.' });
    }
  };
  check(file, knownKeys.file, '');
  const recipe = file.recipe;
  check(recipe, knownKeys.recipe, 'recipe.');
  if (isObject(recipe)) {
    check(recipe.yeast, knownKeys.yeast, 'recipe.yeast.');
    const each = (list: unknown, known: Set<string>, name: string) => {
      if (Array.isArray(list)) list.forEach((item, i) => check(item, known, `recipe.${name}.${i}.`));
    };
    each(recipe.fermentables, knownKeys.fermentable, 'fermentables');
    each(recipe.hops, knownKeys.hop, 'hops');
    each(recipe.mashSteps, knownKeys.mashStep, 'mashSteps');
  }
  return ignored;
}

/**
 * Reads an uploaded recipe file. Throws a 400 listing every problem (field path → message) when
 * anything is wrong, so nothing is saved from an invalid file; otherwise returns the recipe and
 * the fields that were ignored.
 */
export function parseRecipeFile(buffer: Buffer | undefined): { data: RecipeData; ignored: ImportProblem[] } {
  if (!buffer || buffer.length === 0) {
    throw new BadRequest('Choose a Wortwise recipe file (.json) to import.', { file: 'Choose a Wortwise recipe file (.json) to import.' });
  }
  let json: unknown;
  try {
    json = JSON.parse(buffer.toString('utf8').replace(/^\ufeff/, ''));
  } catch (error) {
    const message = `Nothing was imported: the file is not valid JSON (${(error as Error).message}).`;
    throw new BadRequest(message, { file: message });
  }
  const header = recipeFileHeaderSchema.safeParse(json);
  if (!header.success) {
    const fields = fieldErrors(header.error);
    throw new BadRequest(`Nothing was imported: ${Object.values(fields)[0]}`, fields);
  }
  const parsed = recipeInputSchema.safeParse(header.data.recipe);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const [path, message] of Object.entries(fieldErrors(parsed.error))) fields[`recipe.${path}`] = message;
    const n = Object.keys(fields).length;
    throw new BadRequest(`Nothing was imported: the file has ${n} ${n === 1 ? 'problem' : 'problems'}.`, fields);
  }
  return { data: parsed.data, ignored: unknownKeys(json as Record<string, unknown>) };
}
