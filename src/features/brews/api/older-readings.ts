import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { READINGS_WINDOW, type BrewDetail, type BrewReading, type BrewReadingPage, type BrewReadingsQuery } from '@shared/schemas/brews';
import { api, toQuery } from '@/lib/api-client';
import { withOlderPages, type LoadedLog } from '@/lib/older-pages';
import { brewKeys } from './keys';

export const listReadings = (brewId: number, query: BrewReadingsQuery, signal?: AbortSignal) =>
  api.get<BrewReadingPage>(`/api/brews/${brewId}/readings${toQuery({ ...query })}`, { signal });

/**
 * The readings before those the brew day came with, a page at a time, newest page first. Keyed by
 * where the day's own readings start, so a reloaded day starts its older pages afresh.
 */
export const olderReadingsQueryOptions = (brewId: number, from: string | null) =>
  infiniteQueryOptions({
    queryKey: [...brewKeys.olderReadings(brewId), from] as const,
    queryFn: ({ signal, pageParam }) => listReadings(brewId, { cursor: pageParam ?? undefined, pageSize: READINGS_WINDOW }, signal),
    initialPageParam: from,
    getNextPageParam: (last) => last.nextCursor,
    // Asked for only when the brewer wants older readings: the day opens with the latest ones.
    enabled: false,
  });

/** The readings on screen: the brew day's latest, and the older pages the brewer asked for (each reading once). */
export type LoadedReadings = LoadedLog<BrewReading>;

export function useLoadedReadings(brew: Pick<BrewDetail, 'id' | 'readings' | 'olderReadings' | 'readingCount'>): LoadedReadings {
  const from = brew.olderReadings ?? null;
  return withOlderPages(useInfiniteQuery(olderReadingsQueryOptions(brew.id, from)), brew.readings, from, brew.readingCount);
}
