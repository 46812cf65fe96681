import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeVersionSummary } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const listRecipeVersions = (id: number, signal?: AbortSignal) => api.get<RecipeVersionSummary[]>(`/api/recipes/${id}/versions`, { signal });

/** Every saved version, newest first; the key sits under the recipe, so a save refreshes it. */
export const recipeVersionsQueryOptions = (id: number) =>
  queryOptions({ queryKey: [...recipeKeys.detail(id), 'versions'] as const, queryFn: ({ signal }) => listRecipeVersions(id, signal) });

export function useRecipeVersions(id: number) {
  return useQuery(recipeVersionsQueryOptions(id));
}
