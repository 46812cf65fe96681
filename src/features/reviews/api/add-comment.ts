import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentCreated, CommentInput } from '@shared/schemas/comments';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const addComment = (brewId: number, input: CommentInput) => api.post<CommentCreated>(`/api/brews/${brewId}/comments`, input);

export function useAddComment(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry.
    networkMode: 'always',
    mutationFn: (input: CommentInput) => addComment(brewId, input),
    // The queue too: a first mentor comment takes the brew day off it. Not after a refusal: the
    // form keeps the text and shows why, rather than the page turning into a 404 under it.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}
