import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Recipe } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const getRecipe = (id: number, signal?: AbortSignal) => api.get<Recipe>(`/api/recipes/${id}`, { signal });

export const recipeQueryOptions = (id: number) => queryOptions({ queryKey: recipeKeys.detail(id), queryFn: ({ signal }) => getRecipe(id, signal) });

export function useRecipe(id: number) {
  return useQuery(recipeQueryOptions(id));
}
