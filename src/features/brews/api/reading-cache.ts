import type { InfiniteData, QueryClient } from '@tanstack/react-query';
import type { BrewDetail, BrewReading, BrewReadingPage } from '@shared/schemas/brews';
import { brewKeys } from './keys';

/**
 * Changes one reading wherever the page holds it (the brew day's latest readings or an older page)
 * from a write's answer, instead of asking for the whole day again. For writes that cannot move a
 * deviation, such as photos.
 */
export function updateCachedReading(queryClient: QueryClient, brewId: number, readingId: number, update: (reading: BrewReading) => BrewReading) {
  const apply = (list: BrewReading[]) => list.map((r) => (r.id === readingId ? update(r) : r));
  queryClient.setQueryData<BrewDetail>(brewKeys.detail(brewId), (brew) => brew && { ...brew, readings: apply(brew.readings) });
  queryClient.setQueriesData<InfiniteData<BrewReadingPage>>(
    { queryKey: brewKeys.olderReadings(brewId) },
    (older) => older && { ...older, pages: older.pages.map((p) => ({ ...p, items: apply(p.items) })) },
  );
}
