import { useInfiniteQuery } from '@tanstack/react-query';
import { READINGS_WINDOW } from '@shared/schemas/brews';
import type { FermentationLog, FermentationReading, FermentationReadingPage, FermentationReadingsQuery } from '@shared/schemas/fermentation';
import { api, toQuery } from '@/lib/api-client';
import { olderPagesQueryOptions, withOlderPages, type LoadedLog } from '@/lib/older-pages';
import { fermentationKeys } from './keys';

export const listFermentationReadings = (brewId: number, query: FermentationReadingsQuery, signal?: AbortSignal) =>
  api.get<FermentationReadingPage>(`/api/brews/${brewId}/fermentation/readings${toQuery({ ...query })}`, { signal });

/** The readings before those the log came with, a page at a time (src/lib/older-pages.ts). */
export const olderFermentationReadingsQueryOptions = (brewId: number, from: string | null) =>
  olderPagesQueryOptions(fermentationKeys.olderReadings(brewId), from, (cursor, signal) =>
    listFermentationReadings(brewId, { cursor, pageSize: READINGS_WINDOW }, signal),
  );

/** The readings on screen: the log's latest, and the older pages the brewer asked for (each reading once). */
export type LoadedFermentationReadings = LoadedLog<FermentationReading>;

export function useLoadedFermentationReadings(log: Pick<FermentationLog, 'brew' | 'readings' | 'readingCount' | 'olderReadings'>): LoadedFermentationReadings {
  const from = log.olderReadings ?? null;
  return withOlderPages(useInfiniteQuery(olderFermentationReadingsQueryOptions(log.brew.id, from)), log.readings, from, log.readingCount);
}
