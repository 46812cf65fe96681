import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Recipe, RecipeInput } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const createRecipe = (input: RecipeInput) => api.post<Recipe>('/api/recipes', input);

export function useCreateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRecipe,
    onSuccess: (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(recipe.id), recipe);
      void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
    },
  });
}
