/**
 * Recipes: the targets a brew day is judged against. Every read and write goes through
 * loadRecipeForActor, which asks server/auth/permissions.ts; writes that touch several rows run
 * in one transaction; a save names the version it was edited from and is refused (409) when the
 * stored recipe has moved on, so nobody's edits are overwritten silently.
 */
import { and, asc, desc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import { unionAll } from 'drizzle-orm/mysql-core';
import {
  type ListRecipesQuery,
  type Recipe,
  type RecipeData,
  type RecipeList,
  type RecipeListItem,
  type RecipeSharing,
  type RecipeSort,
  type RecipeTargets,
  type RecipeVersion,
  type RecipeVersionSummary,
} from '@shared/schemas/recipes';
import { estimateRecipeColour, estimateRecipeIbu, estimateRecipeOg, recipeBuGu, targetAbv } from '@shared/recipes/estimates';
import type { listRecipesQuerySchema } from '@shared/schemas/recipes';
import type { z } from 'zod';
import { can, requireAccess, type Actor, type ResourceAction } from '../auth/permissions';
import { checkShareTargets, diffShares, lockShareTargets } from '../lib/sharing';
import { BAD_CURSOR, decodeCursor, encodeCursor } from '../lib/cursor';
import type { DbOrTx, Tx } from '../db/client';
import { inList, prepared } from '../db/prepared';
import { recipeClubShares, recipeFermentables, recipeHops, recipeMashSteps, recipes, recipeVersions, users, type RecipeRow } from '../db/schema';
import { BadRequest, Conflict, NotFound } from '../lib/errors';

/** A recipe as stored, with its child rows and the clubs it is shared with. */
export interface StoredRecipe {
  row: RecipeRow;
  ownerName: string;
  data: RecipeData;
  sharedWithClubIds: number[];
}

async function findStoredRecipe(db: DbOrTx, id: number): Promise<StoredRecipe | null> {
  const [found] = await db
    .select({ row: recipes, ownerName: users.displayName })
    .from(recipes)
    .innerJoin(users, eq(users.id, recipes.ownerId))
    .where(eq(recipes.id, id));
  if (!found) return null;
  const [fermentables, hops, mashSteps, shares] = await Promise.all([
    db.select().from(recipeFermentables).where(eq(recipeFermentables.recipeId, id)).orderBy(asc(recipeFermentables.position)),
    db.select().from(recipeHops).where(eq(recipeHops.recipeId, id)).orderBy(asc(recipeHops.position)),
    db.select().from(recipeMashSteps).where(eq(recipeMashSteps.recipeId, id)).orderBy(asc(recipeMashSteps.position)),
    db.select({ clubId: recipeClubShares.clubId }).from(recipeClubShares).where(eq(recipeClubShares.recipeId, id)).orderBy(asc(recipeClubShares.clubId)),
  ]);
  const { row } = found;
  return {
    row,
    ownerName: found.ownerName,
    sharedWithClubIds: shares.map((s) => s.clubId),
    data: {
      name: row.name,
      style: row.style,
      notes: row.notes,
      batchVolumeL: row.batchVolumeL,
      preBoilVolumeL: row.preBoilVolumeL,
      postBoilVolumeL: row.postBoilVolumeL,
      boilMinutes: row.boilMinutes,
      boilOffLPerHour: row.boilOffLPerHour,
      efficiency: row.efficiency,
      targetOg: row.targetOg,
      targetFg: row.targetFg,
      targetIbu: row.targetIbu,
      targetColourSrm: row.targetColourSrm,
      souringTargetPh: row.souringTargetPh,
      mashPhTarget: row.mashPhTarget,
      fermentationTempMinC: row.fermentationTempMinC,
      fermentationTempMaxC: row.fermentationTempMaxC,
      yeast: { name: row.yeastName, amount: row.yeastAmount },
      fermentables: fermentables.map((f) => ({ name: f.name, kind: f.kind, amountKg: f.amountKg, potentialPointsLPerKg: f.potentialPointsLPerKg, colourLovibond: f.colourLovibond })),
      hops: hops.map((h) => ({ name: h.name, amountG: h.amountG, minutes: h.minutes, alphaAcidPercent: h.alphaAcidPercent })),
      mashSteps: mashSteps.map((m) => ({ tempC: m.tempC, minutes: m.minutes })),
    },
  };
}

/**
 * Loads a recipe for what the actor wants to do with it: 404 when they may not see it (another
 * brewer's private recipe, or no such recipe), 403 when they may see but not do it (a club
 * member editing a shared recipe). The brew-day code calls this before starting a brew day.
 */
export async function loadRecipeForActor(db: DbOrTx, actor: Actor | null, id: number, action: ResourceAction): Promise<StoredRecipe> {
  const stored = await findStoredRecipe(db, id);
  requireAccess(actor, action, stored && { ownerId: stored.row.ownerId, sharedWithClubIds: stored.sharedWithClubIds }, 'Recipe');
  return stored!;
}

/** Only the clubs the viewer is in: a member never learns which other clubs see the recipe. */
function visibleClubIds(actor: Actor, ownerId: number, clubIds: number[]) {
  if (actor.id === ownerId) return clubIds;
  return clubIds.filter((id) => actor.memberships.some((m) => m.clubId === id));
}

export function toRecipe(actor: Actor, stored: StoredRecipe): Recipe {
  const { row, data } = stored;
  const resource = { ownerId: row.ownerId, sharedWithClubIds: stored.sharedWithClubIds };
  const abv = targetAbv(data.targetOg, data.targetFg);
  return {
    ...data,
    id: row.id,
    ownerId: row.ownerId,
    ownerName: stored.ownerName,
    version: row.version,
    clonedFromId: row.clonedFromId,
    sharedWithClubIds: visibleClubIds(actor, row.ownerId, stored.sharedWithClubIds),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    permissions: {
      edit: can(actor, 'update', resource),
      share: can(actor, 'share', resource),
      delete: can(actor, 'delete', resource),
      clone: can(actor, 'clone', resource),
    },
    estimatedOg: estimateRecipeOg(data).og,
    estimatedIbu: estimateRecipeIbu(data).ibu,
    estimatedColourSrm: estimateRecipeColour(data).srm,
    buToGu: recipeBuGu(data.targetIbu, data.targetOg),
    abvPercent: abv?.abvPercent ?? 0,
    apparentAttenuation: abv?.apparentAttenuation ?? 0,
  };
}

export async function getRecipe(db: DbOrTx, actor: Actor, id: number): Promise<Recipe> {
  return toRecipe(actor, await loadRecipeForActor(db, actor, id, 'read'));
}

// ---------------------------------------------------------------------------------------------
// Listing

/** LIKE treats % and _ as wildcards; a brewer searching for "50%" means the characters. */
function likePattern(q: string) {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Each sort but ABV has an owner-plus-column index (server/db/schema/recipes.ts), so a page of one's own recipes reads only that page. */
const sortColumns = {
  name: sql`${recipes.name}`,
  style: sql`${recipes.style}`,
  og: sql`${recipes.targetOg}`,
  abv: sql`(${recipes.targetOg} - ${recipes.targetFg})`,
  updated: sql`${recipes.updatedAt}`,
} as const;

type SortKey = string | number;

/** The cursor is the sort, the last row's sort value and its id (server/lib/cursor.ts). */
function decodeRecipeCursor(sort: RecipeSort, cursor: string): { value: SortKey; id: number } {
  return decodeCursor(cursor, (parts) => {
    if (parts.length !== 3 || parts[0] !== sort || !Number.isInteger(parts[2])) return null;
    const [, value, id] = parts as [string, unknown, number];
    const numeric = sort === 'og' || sort === 'abv';
    return (numeric ? typeof value === 'number' && Number.isFinite(value) : typeof value === 'string') ? { value: value as SortKey, id } : null;
  });
}


/**
 * Recipes the actor may read, a page at a time: their own and those shared with their clubs are
 * two branches of one UNION ALL, each reading at most a page from its index (owner and sort
 * column; shares by club), so other brewers' recipes are never scanned and the cost does not grow
 * with the table. Paged by key (the last row's sort value and id) rather than OFFSET, and "more"
 * is known from one extra row rather than a count of everything.
 */
/** A page's club shares, built once per database handle (server/db/prepared.ts). */
const sharesOfRecipes = (db: DbOrTx) =>
  db.select({ recipeId: recipeClubShares.recipeId, clubId: recipeClubShares.clubId }).from(recipeClubShares).where(inList(recipeClubShares.recipeId, 'ids')).orderBy(asc(recipeClubShares.clubId));

/** What decides a recipe-list statement's text; everything else is a placeholder value. */
interface ListShape {
  sort: RecipeSort;
  dir: 'asc' | 'desc';
  mine: boolean;
  shared: boolean;
  search: boolean;
  cursor: boolean;
}

function buildRecipeList(db: DbOrTx, shape: ListShape) {
  const key = sortColumns[shape.sort];
  const order = shape.dir === 'asc' ? asc : desc;
  const filters: SQL[] = [];
  if (shape.search) filters.push(sql`(${recipes.name} like ${sql.placeholder('pattern')} or ${recipes.style} like ${sql.placeholder('pattern')})`);
  if (shape.cursor) {
    const [value, id] = [sql.placeholder('cursorValue'), sql.placeholder('cursorId')];
    filters.push(shape.dir === 'asc' ? sql`(${key} > ${value} or (${key} = ${value} and ${recipes.id} > ${id}))` : sql`(${key} < ${value} or (${key} = ${value} and ${recipes.id} < ${id}))`);
  }
  const branch = (who: SQL) =>
    db
      .select({
        id: recipes.id,
        name: recipes.name,
        style: recipes.style,
        ownerId: recipes.ownerId,
        ownerName: users.displayName,
        version: recipes.version,
        batchVolumeL: recipes.batchVolumeL,
        targetOg: recipes.targetOg,
        targetFg: recipes.targetFg,
        updatedAt: recipes.updatedAt,
        sortKey: sql<SortKey>`${key}`.as('sort_key'),
      })
      .from(recipes)
      .innerJoin(users, eq(users.id, recipes.ownerId))
      .where(and(who, ...filters))
      .orderBy(order(key), order(recipes.id))
      .limit(sql.placeholder('take'));
  const mine = branch(sql`${recipes.ownerId} = ${sql.placeholder('actorId')}`);
  // A subquery, not a join, so a recipe shared with two of my clubs is listed once.
  const shared = branch(
    sql`${recipes.id} in (select ${recipeClubShares.recipeId} from ${recipeClubShares} where ${inList(recipeClubShares.clubId, 'clubIds')}) and ${recipes.ownerId} <> ${sql.placeholder('actorId')}`,
  );
  if (!shape.shared) return mine;
  if (!shape.mine) return shared;
  // The union is ordered by its own column name (a raw chunk: drizzle rewrites column chunks here).
  return unionAll(mine, shared)
    .orderBy(sql.raw(`sort_key ${shape.dir}, id ${shape.dir}`))
    .limit(sql.placeholder('take'));
}

/**
 * One builder per statement shape, made on first use, so server/db/prepared.ts builds each
 * shape's SQL once: at most 5 sorts × 2 directions × 3 branch sets × search × cursor.
 */
const recipeListBuilders = new Map<string, (db: DbOrTx) => ReturnType<typeof buildRecipeList>>();
function recipeListQuery(db: DbOrTx, shape: ListShape) {
  const id = `${shape.sort} ${shape.dir} ${shape.mine} ${shape.shared} ${shape.search} ${shape.cursor}`;
  let build = recipeListBuilders.get(id);
  if (!build) recipeListBuilders.set(id, (build = (handle: DbOrTx) => buildRecipeList(handle, shape)));
  return prepared(db, build);
}

export async function listRecipes(db: DbOrTx, actor: Actor, query: z.output<typeof listRecipesQuerySchema>): Promise<RecipeList> {
  const dir = query.dir ?? (query.sort === 'updated' ? 'desc' : 'asc');
  const cursor = query.cursor ? decodeRecipeCursor(query.sort, query.cursor) : null;
  const cursorValue = cursor && (query.sort === 'updated' ? new Date(cursor.value as string) : cursor.value);
  if (cursorValue instanceof Date && Number.isNaN(cursorValue.getTime())) throw new BadRequest(BAD_CURSOR, { cursor: BAD_CURSOR });
  const clubIds = actor.memberships.map((m) => m.clubId);
  const shape: ListShape = {
    sort: query.sort,
    dir,
    mine: query.scope !== 'shared',
    shared: query.scope !== 'mine' && clubIds.length > 0,
    search: Boolean(query.q),
    cursor: cursor !== null,
  };
  if (!shape.mine && !shape.shared) return { items: [], nextCursor: null, pageSize: query.pageSize };
  const rows = await recipeListQuery(db, shape).execute({
    actorId: actor.id,
    clubIds,
    take: query.pageSize + 1,
    pattern: query.q ? likePattern(query.q) : null,
    cursorValue,
    cursorId: cursor?.id ?? null,
  });
  const page = rows.slice(0, query.pageSize);
  const shares =
    page.length > 0
      ? await prepared(db, sharesOfRecipes).execute({ ids: page.map((r) => r.id) })
      : [];
  const items: RecipeListItem[] = page.map((r) => ({
    id: r.id,
    name: r.name,
    style: r.style,
    ownerId: r.ownerId,
    ownerName: r.ownerName,
    isOwner: r.ownerId === actor.id,
    version: r.version,
    batchVolumeL: r.batchVolumeL,
    targetOg: r.targetOg,
    targetFg: r.targetFg,
    abvPercent: targetAbv(r.targetOg, r.targetFg)?.abvPercent ?? 0,
    sharedWithClubIds: visibleClubIds(
      actor,
      r.ownerId,
      shares.filter((s) => s.recipeId === r.id).map((s) => s.clubId),
    ),
    updatedAt: r.updatedAt.toISOString(),
  }));
  const last = page[page.length - 1];
  const lastKey = last && (query.sort === 'updated' ? last.updatedAt.toISOString() : last.sortKey);
  const nextCursor = rows.length > query.pageSize && last ? encodeCursor([query.sort, query.sort === 'og' || query.sort === 'abv' ? Number(lastKey) : String(lastKey), last.id]) : null;
  return { items, nextCursor, pageSize: query.pageSize };
}
export type { ListRecipesQuery };

// ---------------------------------------------------------------------------------------------
// Writing

function columnsOf(data: RecipeData) {
  return {
    name: data.name,
    style: data.style,
    notes: data.notes,
    batchVolumeL: data.batchVolumeL,
    preBoilVolumeL: data.preBoilVolumeL,
    postBoilVolumeL: data.postBoilVolumeL,
    boilMinutes: data.boilMinutes,
    boilOffLPerHour: data.boilOffLPerHour,
    efficiency: data.efficiency,
    targetOg: data.targetOg,
    targetFg: data.targetFg,
    targetIbu: data.targetIbu,
    targetColourSrm: data.targetColourSrm,
    souringTargetPh: data.souringTargetPh,
    mashPhTarget: data.mashPhTarget,
    fermentationTempMinC: data.fermentationTempMinC,
    fermentationTempMaxC: data.fermentationTempMaxC,
    yeastName: data.yeast.name,
    yeastAmount: data.yeast.amount,
  };
}

async function insertChildren(tx: Tx, recipeId: number, data: RecipeData) {
  if (data.fermentables.length > 0) {
    await tx.insert(recipeFermentables).values(data.fermentables.map((f, position) => ({ recipeId, position, ...f })));
  }
  if (data.hops.length > 0) {
    await tx.insert(recipeHops).values(data.hops.map((h, position) => ({ recipeId, position, ...h })));
  }
  if (data.mashSteps.length > 0) {
    await tx.insert(recipeMashSteps).values(data.mashSteps.map((m, position) => ({ recipeId, position, ...m })));
  }
}

/** A new private recipe owned by the actor; returns its id. */
export async function createRecipe(db: DbOrTx, actor: Actor, data: RecipeData, clonedFromId: number | null = null): Promise<number> {
  // Inside a caller's transaction (the demo seed) this is a savepoint.
  return db.transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(recipes)
      .values({ ...columnsOf(data), ownerId: actor.id, clonedFromId })
      .$returningId();
    await insertChildren(tx, id, data);
    await tx.insert(recipeVersions).values({ recipeId: id, version: 1, data, savedById: actor.id });
    return id;
  });
}

function conflictMessage(editedVersion: number, current: { version: number; updatedAt: Date }) {
  const when = current.updatedAt.toISOString().replace('T', ' ').slice(0, 16);
  return (
    `This recipe was saved somewhere else (another tab or device) after you opened it: you were editing version ${editedVersion}, ` +
    `and version ${current.version} was saved at ${when} UTC. Your changes were not saved and nothing was overwritten. ` +
    'Load the latest version to edit it, or save what you typed as a new recipe.'
  );
}

/** Replaces the recipe's content, if `version` is still the stored one. */
export async function updateRecipe(db: DbOrTx, actor: Actor, id: number, data: RecipeData & { version: number }): Promise<Recipe> {
  await loadRecipeForActor(db, actor, id, 'update');
  await db.transaction(async (tx) => {
    // The version check and the write are one statement: of two saves from the same version,
    // the row lock lets exactly one through.
    const [result] = await tx
      .update(recipes)
      .set({ ...columnsOf(data), version: sql`${recipes.version} + 1`, updatedAt: new Date() })
      .where(and(eq(recipes.id, id), eq(recipes.version, data.version)));
    if (result.affectedRows === 0) {
      const [current] = await tx.select({ version: recipes.version, updatedAt: recipes.updatedAt }).from(recipes).where(eq(recipes.id, id));
      if (!current) throw new NotFound('Recipe was not found.');
      throw new Conflict(conflictMessage(data.version, current), {
        version: `You were editing version ${data.version}; the recipe is now at version ${current.version}.`,
      });
    }
    await tx.delete(recipeFermentables).where(eq(recipeFermentables.recipeId, id));
    await tx.delete(recipeHops).where(eq(recipeHops.recipeId, id));
    await tx.delete(recipeMashSteps).where(eq(recipeMashSteps.recipeId, id));
    await insertChildren(tx, id, data);
    const { version: _edited, ...content } = data;
    await tx.insert(recipeVersions).values({ recipeId: id, version: data.version + 1, data: content, savedById: actor.id });
  });
  return getRecipe(db, actor, id);
}

export async function deleteRecipe(db: DbOrTx, actor: Actor, id: number): Promise<void> {
  await loadRecipeForActor(db, actor, id, 'delete');
  // Child rows and shares go with it (ON DELETE CASCADE). Brew days keep their own snapshot.
  await db.delete(recipes).where(eq(recipes.id, id));
}

/** A private copy owned by the actor, remembering where it came from. */
export async function cloneRecipe(db: DbOrTx, actor: Actor, id: number): Promise<Recipe> {
  const source = await loadRecipeForActor(db, actor, id, 'clone');
  const suffix = ' (copy)';
  const name = source.data.name.length + suffix.length > 120 ? source.data.name.slice(0, 120 - suffix.length) + suffix : source.data.name + suffix;
  const newId = await createRecipe(db, actor, { ...source.data, name }, id);
  return getRecipe(db, actor, newId);
}

/**
 * Replaces the set of clubs the recipe is shared with (empty = private). Each club must be one
 * the owner belongs to. Sharing is not an edit of the recipe, so the version stays.
 */
export async function setRecipeSharing(db: DbOrTx, actor: Actor, id: number, clubIds: number[]): Promise<RecipeSharing> {
  await loadRecipeForActor(db, actor, id, 'share');
  const unique = checkShareTargets(actor, clubIds);
  await db.transaction(async (tx) => {
    await lockShareTargets(tx, actor.id, unique);
    const existing = await tx.select({ clubId: recipeClubShares.clubId }).from(recipeClubShares).where(eq(recipeClubShares.recipeId, id));
    const { gone, added } = diffShares(existing.map((e) => e.clubId), unique);
    if (gone.length > 0) await tx.delete(recipeClubShares).where(and(eq(recipeClubShares.recipeId, id), inArray(recipeClubShares.clubId, gone)));
    if (added.length > 0) await tx.insert(recipeClubShares).values(added.map((clubId) => ({ recipeId: id, clubId })));
  });
  return { recipeId: id, clubIds: unique };
}

// ---------------------------------------------------------------------------------------------
// History

/**
 * Every saved version, newest first. Recipes saved before history was kept have no rows for
 * their earlier versions; their current version is listed from the recipe itself.
 */
export async function listRecipeVersions(db: DbOrTx, actor: Actor, id: number): Promise<RecipeVersionSummary[]> {
  const stored = await loadRecipeForActor(db, actor, id, 'read');
  const rows = await db
    .select({ version: recipeVersions.version, savedAt: recipeVersions.savedAt, savedByName: users.displayName })
    .from(recipeVersions)
    .leftJoin(users, eq(users.id, recipeVersions.savedById))
    .where(eq(recipeVersions.recipeId, id))
    .orderBy(desc(recipeVersions.version));
  const list = rows.map((r) => ({ version: r.version, savedAt: r.savedAt.toISOString(), savedByName: r.savedByName }));
  if (!list.some((v) => v.version === stored.row.version)) {
    list.unshift({ version: stored.row.version, savedAt: stored.row.updatedAt.toISOString(), savedByName: null });
  }
  return list;
}

export async function getRecipeVersion(db: DbOrTx, actor: Actor, id: number, version: number): Promise<RecipeVersion> {
  const stored = await loadRecipeForActor(db, actor, id, 'read');
  const [row] = await db
    .select({ version: recipeVersions.version, savedAt: recipeVersions.savedAt, savedByName: users.displayName, data: recipeVersions.data })
    .from(recipeVersions)
    .leftJoin(users, eq(users.id, recipeVersions.savedById))
    .where(and(eq(recipeVersions.recipeId, id), eq(recipeVersions.version, version)));
  if (row) return { recipeId: id, version: row.version, savedAt: row.savedAt.toISOString(), savedByName: row.savedByName, data: row.data };
  if (version === stored.row.version) {
    return { recipeId: id, version, savedAt: stored.row.updatedAt.toISOString(), savedByName: null, data: stored.data };
  }
  throw new NotFound(`Version ${version} of this recipe was not kept (history starts with the versions saved since it was added).`);
}

// ---------------------------------------------------------------------------------------------
// The brew day's snapshot

/**
 * The targets a brew day is judged against, as they are now. The brew day stores this value;
 * later edits of the recipe make a new version and never reach a stored snapshot. No permission
 * check here: call loadRecipeForActor(db, user, id, 'read') first.
 */
export async function getRecipeTargets(db: DbOrTx, recipeId: number): Promise<RecipeTargets> {
  const stored = await findStoredRecipe(db, recipeId);
  if (!stored) throw new NotFound('Recipe was not found.');
  const { row, data } = stored;
  return {
    recipeId: row.id,
    recipeVersion: row.version,
    name: data.name,
    style: data.style,
    batchVolumeL: data.batchVolumeL,
    preBoilVolumeL: data.preBoilVolumeL,
    postBoilVolumeL: data.postBoilVolumeL,
    boilMinutes: data.boilMinutes,
    boilOffLPerHour: data.boilOffLPerHour,
    efficiency: data.efficiency,
    targetOg: data.targetOg,
    targetFg: data.targetFg,
    targetIbu: data.targetIbu,
    targetColourSrm: data.targetColourSrm,
    souringTargetPh: data.souringTargetPh,
    hops: data.hops.map((h) => ({ amountG: h.amountG, minutes: h.minutes, alphaAcidPercent: h.alphaAcidPercent })),
    grist: data.fermentables.map((f) => ({ amountKg: f.amountKg, colourLovibond: f.colourLovibond })),
    mashPhTarget: data.mashPhTarget,
    mashSteps: data.mashSteps.map((m) => ({ tempC: m.tempC, minutes: m.minutes })),
    fermentationTempMinC: data.fermentationTempMinC,
    fermentationTempMaxC: data.fermentationTempMaxC,
  };
}
