import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Recipe, RecipeUpdateInput } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

/** A 409 means the recipe was saved elsewhere since `input.version`; nothing was overwritten. */
export const updateRecipe = (id: number, input: RecipeUpdateInput) => api.put<Recipe>(`/api/recipes/${id}`, input);

export function useUpdateRecipe(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RecipeUpdateInput) => updateRecipe(id, input),
    onSuccess: (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(id), recipe);
      void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
    },
  });
}
