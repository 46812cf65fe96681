import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeImportResult } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

/** Uploads one of our recipe files; a 400 lists every problem and nothing is saved. */
export function importRecipe(file: File) {
  const form = new FormData();
  form.append('file', file);
  return api.post<RecipeImportResult>('/api/recipes/import', form);
}

export function useImportRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importRecipe,
    onSuccess: ({ recipe }) => {
      queryClient.setQueryData(recipeKeys.detail(recipe.id), recipe);
      void queryClient.invalidateQueries({ queryKey: recipeKeys.lists() });
    },
  });
}
