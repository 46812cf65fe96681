import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RecipeVersion } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const getRecipeVersion = (id: number, version: number, signal?: AbortSignal) => api.get<RecipeVersion>(`/api/recipes/${id}/versions/${version}`, { signal });

/** A saved version never changes, so it is cached for good. */
export const recipeVersionQueryOptions = (id: number, version: number) =>
  queryOptions({ queryKey: [...recipeKeys.detail(id), 'version', version] as const, queryFn: ({ signal }) => getRecipeVersion(id, version, signal), staleTime: Infinity });

export function useRecipeVersion(id: number, version: number | null) {
  return useQuery({ ...recipeVersionQueryOptions(id, version ?? 0), enabled: version !== null });
}
