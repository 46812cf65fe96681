import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { READINGS_WINDOW, type BrewDetail, type BrewReading, type BrewReadingPage, type BrewReadingsQuery } from '@shared/schemas/brews';
import { api, toQuery } from '@/lib/api-client';
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

export interface LoadedReadings {
  /** The older pages asked for so far and the day's own readings, in time order. */
  readings: BrewReading[];
  /** How many readings the brew day has in all. */
  total: number;
  hasOlder: boolean;
  loadingOlder: boolean;
  error: Error | null;
  showOlder: () => void;
}

const byTime = (a: BrewReading, b: BrewReading) => a.takenAt.localeCompare(b.takenAt) || a.id - b.id;

/** The readings on screen: the brew day's latest, and the older pages the brewer asked for (each reading once). */
export function useLoadedReadings(brew: Pick<BrewDetail, 'id' | 'readings' | 'olderReadings' | 'readingCount'>): LoadedReadings {
  const from = brew.olderReadings ?? null;
  const older = useInfiniteQuery(olderReadingsQueryOptions(brew.id, from));
  const pages = older.data?.pages ?? [];
  const readings = pages.length === 0 ? brew.readings : dedupe([...pages.flatMap((p) => p.items), ...brew.readings]).sort(byTime);
  const asked = older.data !== undefined;
  return {
    readings,
    // A day cached on the device before readings were paged has no count: all its readings came with it.
    total: Math.max(brew.readingCount ?? readings.length, readings.length),
    hasOlder: from !== null && (asked ? older.hasNextPage : true),
    loadingOlder: older.isFetching,
    error: older.error,
    showOlder: () => void (asked ? older.fetchNextPage() : older.refetch()),
  };
}

function dedupe(list: BrewReading[]) {
  const seen = new Set<number>();
  return list.filter((r) => (seen.has(r.id) ? false : (seen.add(r.id), true)));
}
