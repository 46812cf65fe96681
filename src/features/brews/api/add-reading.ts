import { useMutation, useQueryClient } from '@tanstack/react-query';
import { readingKindLabels, type BrewDetail, type ReadingCreated, type ReadingInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { brewKeys } from './keys';

export const addReading = (brewId: number, input: ReadingInput) => api.post<ReadingCreated>(`/api/brews/${brewId}/readings`, input);

/** The brew day with a new reading in time order and what the server says it changed. */
export function withReading(brew: BrewDetail, created: ReadingCreated): BrewDetail {
  const { brewDay, ...reading } = created;
  const readings = [...brew.readings.filter((r) => r.id !== reading.id), reading].sort((a, b) => a.takenAt.localeCompare(b.takenAt) || a.id - b.id);
  return { ...brew, ...brewDay, readings };
}

/** Kept on the device first, with its idempotency key and the time it was read; sent now or when the connection returns. */
export const addReadingOrQueue = (brewId: number, input: ReadingInput) => {
  const takenAt = input.takenAt ?? new Date().toISOString();
  return sendOrQueue<ReadingCreated>({ brewId, kind: 'reading', url: `/api/brews/${brewId}/readings`, body: { ...input, takenAt }, label: readingKindLabels[input.kind], takenAt });
};

export function useAddReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the reading is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: ReadingInput) => addReadingOrQueue(brewId, input),
    onSuccess: (outcome) => {
      // Kept on the device: nothing changed on the server yet.
      if (outcome.status !== 'sent') return;
      // The day is updated from the answer rather than reloaded whole; only the lists (OG, stage) are asked again.
      const had = queryClient.getQueryData<BrewDetail>(brewKeys.detail(brewId));
      if (had) queryClient.setQueryData(brewKeys.detail(brewId), withReading(had, outcome.data));
      else void queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) });
      return queryClient.invalidateQueries({ queryKey: brewKeys.lists() });
    },
  });
}
