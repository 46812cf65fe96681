import type { ListRecipesQuery } from '@shared/schemas/recipes';

/** Query keys: invalidating `all` refreshes every recipe list and page. */
export const recipeKeys = {
  all: ['recipes'] as const,
  lists: () => [...recipeKeys.all, 'list'] as const,
  list: (query: ListRecipesQuery) => [...recipeKeys.lists(), query] as const,
  detail: (id: number) => [...recipeKeys.all, 'detail', id] as const,
};
