import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Recipe } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const cloneRecipe = (id: number) => api.post<Recipe>(`/api/recipes/${id}/clone`);

export function useCloneRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cloneRecipe,
    onSuccess: (copy) => {
      queryClient.setQueryData(recipeKeys.detail(copy.id), copy);
      void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
    },
  });
}
