import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewNote, BrewNoteInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const addNote = (brewId: number, input: BrewNoteInput) => api.post<BrewNote>(`/api/brews/${brewId}/notes`, input);

export function useAddNote(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: BrewNoteInput) => addNote(brewId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
