import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { FermentationLog, FermentationReadingDeleted } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { dropFromOlderPages } from '@/lib/older-pages';
import { fermentationKeys } from './keys';

export const deleteFermentationReading = (brewId: number, readingId: number) =>
  api.delete<FermentationReadingDeleted>(`/api/brews/${brewId}/fermentation/readings/${readingId}`);

/** The log without the deleted reading, with the count, verdict, summary and progress the server answered. */
export function withoutFermentationReading(log: FermentationLog, deleted: FermentationReadingDeleted): FermentationLog {
  const { readingId, readingCount, verdict, temperature, progress, now } = deleted;
  const keep = <T extends { id: number }>(list: T[]) => list.filter((r) => r.id !== readingId);
  return { ...log, readings: keep(log.readings), series: log.series && keep(log.series), readingCount, verdict, temperature, progress, now };
}

/** Drops the reading wherever the page holds it (the log's latest readings, its series, an older page), instead of reloading the log. */
function applyDeleted(queryClient: QueryClient, brewId: number, deleted: FermentationReadingDeleted) {
  queryClient.setQueryData<FermentationLog>(fermentationKeys.log(brewId), (log) => log && withoutFermentationReading(log, deleted));
  dropFromOlderPages(queryClient, fermentationKeys.olderReadings(brewId), deleted.readingId);
}

export function useDeleteFermentationReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: number) => deleteFermentationReading(brewId, readingId),
    onSuccess: (deleted) => applyDeleted(queryClient, brewId, deleted),
  });
}
