import { useMutation, useQueryClient } from '@tanstack/react-query';
import { readingKindLabels, type BrewReading, type ReadingInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { brewKeys } from './keys';

export const addReading = (brewId: number, input: ReadingInput) => api.post<BrewReading>(`/api/brews/${brewId}/readings`, input);

/** Kept on the device first, with its idempotency key and the time it was read; sent now or when the connection returns. */
export const addReadingOrQueue = (brewId: number, input: ReadingInput) => {
  const takenAt = input.takenAt ?? new Date().toISOString();
  return sendOrQueue<BrewReading>({ brewId, kind: 'reading', url: `/api/brews/${brewId}/readings`, body: { ...input, takenAt }, label: readingKindLabels[input.kind], takenAt });
};

export function useAddReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the reading is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: ReadingInput) => addReadingOrQueue(brewId, input),
    onSuccess: (outcome) => outcome.status === 'sent' && queryClient.invalidateQueries({ queryKey: brewKeys.all }),
  });
}
