import { useInfiniteQuery } from '@tanstack/react-query';
import { READINGS_WINDOW, type BrewDetail, type BrewReading, type BrewReadingPage, type BrewReadingsQuery } from '@shared/schemas/brews';
import { api, toQuery } from '@/lib/api-client';
import { olderPagesQueryOptions, withOlderPages, type LoadedLog } from '@/lib/older-pages';
import { brewKeys } from './keys';

export const listReadings = (brewId: number, query: BrewReadingsQuery, signal?: AbortSignal) =>
  api.get<BrewReadingPage>(`/api/brews/${brewId}/readings${toQuery({ ...query })}`, { signal });

/** The readings before those the brew day came with, a page at a time (src/lib/older-pages.ts). */
export const olderReadingsQueryOptions = (brewId: number, from: string | null) =>
  olderPagesQueryOptions(brewKeys.olderReadings(brewId), from, (cursor, signal) => listReadings(brewId, { cursor, pageSize: READINGS_WINDOW }, signal));

/** The readings on screen: the brew day's latest, and the older pages the brewer asked for (each reading once). */
export type LoadedReadings = LoadedLog<BrewReading>;

export function useLoadedReadings(brew: Pick<BrewDetail, 'id' | 'readings' | 'olderReadings' | 'readingCount'>): LoadedReadings {
  const from = brew.olderReadings ?? null;
  return withOlderPages(useInfiniteQuery(olderReadingsQueryOptions(brew.id, from)), brew.readings, from, brew.readingCount);
}
