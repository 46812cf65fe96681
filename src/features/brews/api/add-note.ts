import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewNote, BrewNoteInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { brewKeys } from './keys';

export const addNote = (brewId: number, input: BrewNoteInput) => api.post<BrewNote>(`/api/brews/${brewId}/notes`, input);

export function useAddNote(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the note is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: BrewNoteInput) => {
      const writtenAt = input.writtenAt ?? new Date().toISOString();
      const text = input.body.trim();
      return sendOrQueue<BrewNote>({
        brewId,
        kind: 'note',
        url: `/api/brews/${brewId}/notes`,
        body: { ...input, writtenAt },
        label: `Note: ${text.length > 60 ? `${text.slice(0, 60)}…` : text}`,
        takenAt: writtenAt,
      });
    },
    onSuccess: (outcome) => outcome.status === 'sent' && queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
