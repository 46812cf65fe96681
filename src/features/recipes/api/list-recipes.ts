import { infiniteQueryOptions, keepPreviousData, queryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { ListRecipesQuery, RecipeList } from '@shared/schemas/recipes';
import { api, toQuery } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const listRecipes = (query: ListRecipesQuery, signal?: AbortSignal) =>
  api.get<RecipeList>(`/api/recipes${toQuery({ ...query })}`, { signal });

/** One page (the first, or the one after `cursor`). */
export const recipesQueryOptions = (query: ListRecipesQuery) =>
  queryOptions({ queryKey: recipeKeys.list(query), queryFn: ({ signal }) => listRecipes(query, signal) });

/** The list page: pages by key, each "Show more" asks for the page after the last one shown. */
export const recipePagesQueryOptions = (query: Omit<ListRecipesQuery, 'cursor'>) =>
  infiniteQueryOptions({
    queryKey: [...recipeKeys.list(query), 'pages'] as const,
    queryFn: ({ signal, pageParam }) => listRecipes({ ...query, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

/** Keeps the previous list on screen while the next search loads. */
export function useRecipePages(query: Omit<ListRecipesQuery, 'cursor'>) {
  return useInfiniteQuery({ ...recipePagesQueryOptions(query), placeholderData: keepPreviousData });
}
