import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const deleteComment = (brewId: number, commentId: number) => api.delete(`/api/brews/${brewId}/comments/${commentId}`);

export function useDeleteComment(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: (commentId: number) => deleteComment(brewId, commentId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
