import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const deleteNote = (brewId: number, noteId: number) => api.delete(`/api/brews/${brewId}/notes/${noteId}`);

export function useDeleteNote(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (noteId: number) => deleteNote(brewId, noteId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
