import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListRecipesQuery, RecipeList } from '@shared/schemas/recipes';
import { api, toQuery } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const listRecipes = (query: ListRecipesQuery, signal?: AbortSignal) =>
  api.get<RecipeList>(`/api/recipes${toQuery({ ...query })}`, { signal });

export const recipesQueryOptions = (query: ListRecipesQuery) =>
  queryOptions({ queryKey: recipeKeys.list(query), queryFn: ({ signal }) => listRecipes(query, signal) });

/** Keeps the previous page on screen while the next search or page loads. */
export function useRecipes(query: ListRecipesQuery) {
  return useQuery({ ...recipesQueryOptions(query), placeholderData: keepPreviousData });
}
