import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const deleteRecipe = (id: number) => api.delete(`/api/recipes/${id}`);

export function useDeleteRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRecipe,
    onSuccess: (_void, id) => {
      queryClient.removeQueries({ queryKey: recipeKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
    },
  });
}
