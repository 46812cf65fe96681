/** Recipes: what the API answers (the requests are in inputs.ts). */
import { RECIPE_FILE_FORMAT, RECIPE_FILE_VERSION, type RecipeData } from './inputs';

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

export interface RecipeSharing {
  recipeId: number;
  clubIds: number[];
}

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
