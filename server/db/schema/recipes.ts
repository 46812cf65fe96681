import { sql } from 'drizzle-orm';
import { double, index, int, uniqueIndex, mysqlEnum, mysqlTable, primaryKey, text, timestamp, varchar, type AnyMySqlColumn } from 'drizzle-orm/mysql-core';
import { fermentableKinds } from '../../../shared/schemas/recipes';
import type { RecipeData } from '../../../shared/schemas/recipes';
import { jsonDoc } from './columns';
import { clubs } from './clubs';
import { users } from './users';

/**
 * A recipe and the targets a brew day is judged against. SI and specific gravity throughout;
 * efficiency is a fraction. Fermentables, hops and mash steps are rows of their own tables
 * (docs/decisions/0004-recipe-storage-and-versions.md); `version` goes up by one on every save
 * and a save from an older version is refused, so concurrent edits never overwrite silently.
 */
export const recipes = mysqlTable(
  'recipes',
  {
    id: int('id').autoincrement().primaryKey(),
    ownerId: int('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    version: int('version').notNull().default(1),
    name: varchar('name', { length: 120 }).notNull(),
    style: varchar('style', { length: 80 }).notNull().default(''),
    notes: text('notes').notNull(),
    batchVolumeL: double('batch_volume_l').notNull(),
    preBoilVolumeL: double('pre_boil_volume_l').notNull(),
    postBoilVolumeL: double('post_boil_volume_l').notNull(),
    boilMinutes: double('boil_minutes').notNull(),
    boilOffLPerHour: double('boil_off_l_per_hour').notNull(),
    efficiency: double('efficiency').notNull(),
    targetOg: double('target_og').notNull(),
    targetFg: double('target_fg').notNull(),
    /** Bitterness and colour targets; null when the author sets none. */
    targetIbu: double('target_ibu'),
    targetColourSrm: double('target_colour_srm'),
    /** Kettle-soured beers: the pH the wort is soured to before the boil; null for other beers. */
    souringTargetPh: double('souring_target_ph'),
    mashPhTarget: double('mash_ph_target').notNull().default(5.2),
    fermentationTempMinC: double('fermentation_temp_min_c').notNull(),
    fermentationTempMaxC: double('fermentation_temp_max_c').notNull(),
    yeastName: varchar('yeast_name', { length: 120 }).notNull().default(''),
    yeastAmount: varchar('yeast_amount', { length: 120 }).notNull().default(''),
    clonedFromId: int('cloned_from_id').references((): AnyMySqlColumn => recipes.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: timestamp('updated_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  // Owner plus each sort column (InnoDB appends the id): a page of one brewer's recipes in any
  // order reads just that page (server/recipes/service.ts listRecipes pages by key).
  (t) => [
    index('recipes_owner_idx').on(t.ownerId),
    index('recipes_name_idx').on(t.name),
    index('recipes_owner_updated_idx').on(t.ownerId, t.updatedAt, t.id),
    index('recipes_owner_name_idx').on(t.ownerId, t.name, t.id),
    index('recipes_owner_style_idx').on(t.ownerId, t.style, t.id),
    index('recipes_owner_og_idx').on(t.ownerId, t.targetOg, t.id),
  ],
);

export const recipeFermentables = mysqlTable(
  'recipe_fermentables',
  {
    id: int('id').autoincrement().primaryKey(),
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id, { onDelete: 'cascade' }),
    position: int('position').notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    kind: mysqlEnum('kind', fermentableKinds).notNull(),
    amountKg: double('amount_kg').notNull(),
    potentialPointsLPerKg: double('potential_points_l_per_kg').notNull(),
    /** Malt colour in °L for Morey's equation; null when unknown (then no colour estimate). */
    colourLovibond: double('colour_lovibond'),
  },
  (t) => [index('recipe_fermentables_recipe_idx').on(t.recipeId, t.position)],
);

export const recipeHops = mysqlTable(
  'recipe_hops',
  {
    id: int('id').autoincrement().primaryKey(),
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id, { onDelete: 'cascade' }),
    position: int('position').notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    amountG: double('amount_g').notNull(),
    minutes: double('minutes').notNull(),
    alphaAcidPercent: double('alpha_acid_percent').notNull(),
  },
  (t) => [index('recipe_hops_recipe_idx').on(t.recipeId, t.position)],
);

export const recipeMashSteps = mysqlTable(
  'recipe_mash_steps',
  {
    id: int('id').autoincrement().primaryKey(),
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id, { onDelete: 'cascade' }),
    position: int('position').notNull(),
    tempC: double('temp_c').notNull(),
    minutes: double('minutes').notNull(),
  },
  (t) => [index('recipe_mash_steps_recipe_idx').on(t.recipeId, t.position)],
);

/** A recipe shared with a club: its members can view and clone it; only the owner edits it. */
export const recipeClubShares = mysqlTable(
  'recipe_club_shares',
  {
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id, { onDelete: 'cascade' }),
    clubId: int('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    sharedAt: timestamp('shared_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
  },
  (t) => [primaryKey({ columns: [t.recipeId, t.clubId] }), index('recipe_club_shares_club_idx').on(t.clubId)],
);

/**
 * Every saved version of a recipe, as the author saved it (docs/decisions/0017-bitterness-colour-and-recipe-history.md).
 * Written in the same transaction as the save, so the latest row always equals the recipe.
 */
export const recipeVersions = mysqlTable(
  'recipe_versions',
  {
    id: int('id').autoincrement().primaryKey(),
    recipeId: int('recipe_id')
      .notNull()
      .references(() => recipes.id, { onDelete: 'cascade' }),
    version: int('version').notNull(),
    data: jsonDoc<RecipeData>('data').notNull(),
    savedById: int('saved_by_id').references(() => users.id, { onDelete: 'set null' }),
    savedAt: timestamp('saved_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [uniqueIndex('recipe_versions_recipe_version_idx').on(t.recipeId, t.version)],
);

export type RecipeRow = typeof recipes.$inferSelect;
export type RecipeFermentableRow = typeof recipeFermentables.$inferSelect;
export type RecipeHopRow = typeof recipeHops.$inferSelect;
export type RecipeMashStepRow = typeof recipeMashSteps.$inferSelect;
