import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeSharing, SharingInput } from '@shared/schemas/recipes';
import { api } from '@/lib/api-client';
import { recipeKeys } from './keys';

export const updateSharing = (id: number, input: SharingInput) => api.put<RecipeSharing>(`/api/recipes/${id}/sharing`, input);

export function useUpdateSharing(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SharingInput) => updateSharing(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recipeKeys.all }),
  });
}
