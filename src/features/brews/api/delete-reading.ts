import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDetail, ReadingDeleted } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { dropFromOlderPages } from '@/lib/older-pages';
import { brewKeys } from './keys';

export const deleteReading = (brewId: number, readingId: number) => api.delete<ReadingDeleted>(`/api/brews/${brewId}/readings/${readingId}`);

/** The brew day without the deleted reading, with what the server says the deletion changed (OG, count, deviations…). */
export function withoutReading(brew: BrewDetail, deleted: ReadingDeleted): BrewDetail {
  return { ...brew, ...deleted.brewDay, readings: brew.readings.filter((r) => r.id !== deleted.readingId) };
}

export function useDeleteReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (readingId: number) => deleteReading(brewId, readingId),
    // The day is updated from the answer rather than reloaded whole; only the lists (OG) are asked again.
    onSuccess: (deleted) => {
      const had = queryClient.getQueryData<BrewDetail>(brewKeys.detail(brewId));
      if (had) queryClient.setQueryData(brewKeys.detail(brewId), withoutReading(had, deleted));
      else void queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) });
      dropFromOlderPages(queryClient, brewKeys.olderReadings(brewId), deleted.readingId);
      return queryClient.invalidateQueries({ queryKey: brewKeys.lists() });
    },
  });
}
