import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDetail, ReadingCreated, ReadingInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const addReading = (brewId: number, input: ReadingInput) => api.post<ReadingCreated>(`/api/brews/${brewId}/readings`, input);

/** The brew day with a new reading in time order and what the server says it changed. */
export function withReading(brew: BrewDetail, created: ReadingCreated): BrewDetail {
  const { brewDay, ...reading } = created;
  const readings = [...brew.readings.filter((r) => r.id !== reading.id), reading].sort((a, b) => a.takenAt.localeCompare(b.takenAt) || a.id - b.id);
  return { ...brew, ...brewDay, readings };
}

export function useAddReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: ReadingInput) => addReading(brewId, input),
    onSuccess: (created) => {
      // The day is updated from the answer rather than reloaded whole; only the lists (OG, stage) are asked again.
      const had = queryClient.getQueryData<BrewDetail>(brewKeys.detail(brewId));
      if (had) queryClient.setQueryData(brewKeys.detail(brewId), withReading(had, created));
      else void queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) });
      return queryClient.invalidateQueries({ queryKey: [...brewKeys.all, 'list'] });
    },
  });
}
