/**
 * A log that opens with its latest entries and pages back on request (brew-day readings,
 * fermentation readings): the entries on screen from the log's own and the older pages of its
 * `useInfiniteQuery`, each once, in time order. Each feature names its own query key and fetch.
 */
import { infiniteQueryOptions, type InfiniteData, type QueryClient } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';

/**
 * The older pages of a log, newest page first, from `from` (where the log's own entries start:
 * part of the key, so a reloaded log starts its older pages afresh). Fetched only when the brewer
 * asks: the log opens with its latest entries.
 */
export function olderPagesQueryOptions<T>(key: readonly unknown[], from: string | null, fetchPage: (cursor: string | undefined, signal: AbortSignal) => Promise<Page<T>>) {
  return infiniteQueryOptions({
    queryKey: [...key, from],
    queryFn: ({ signal, pageParam }) => fetchPage(pageParam ?? undefined, signal),
    initialPageParam: from,
    getNextPageParam: (last) => last.nextCursor,
    enabled: false,
  });
}

/** Takes entry `id` out of every older page cached under `key` (after the server deleted it), instead of fetching them again. */
export function dropFromOlderPages(queryClient: QueryClient, key: readonly unknown[], id: number) {
  queryClient.setQueriesData<InfiniteData<Page<{ id: number }>>>(
    { queryKey: key },
    (older) => older && { ...older, pages: older.pages.map((p) => ({ ...p, items: p.items.filter((r) => r.id !== id) })) },
  );
}

/** What this needs of a `useInfiniteQuery` result over pages of `T`. */
export interface OlderPagesQuery<T> {
  data: { pages: readonly Page<T>[] } | undefined;
  hasNextPage: boolean;
  isFetching: boolean;
  error: Error | null;
  fetchNextPage: () => Promise<unknown>;
  refetch: () => Promise<unknown>;
}

export interface LoadedLog<T> {
  /** The older pages asked for so far and the log's own entries, in time order. */
  readings: T[];
  /** How many entries the log has in all. */
  total: number;
  hasOlder: boolean;
  loadingOlder: boolean;
  error: Error | null;
  /** The next older page (the first one when none was asked for yet). */
  showOlder: () => Promise<unknown>;
}

type Timed = { id: number; takenAt: string };

const byTime = (a: Timed, b: Timed) => a.takenAt.localeCompare(b.takenAt) || a.id - b.id;

/**
 * `latest` are the entries the log came with, `from` its cursor for older ones (null: all came),
 * `count` how many it has in all (absent on a copy kept on the device before logs were paged:
 * then everything came with it). The older query is disabled until the brewer asks.
 */
export function withOlderPages<T extends Timed>(older: OlderPagesQuery<T>, latest: T[], from: string | null, count: number | undefined): LoadedLog<T> {
  const pages = older.data?.pages ?? [];
  const readings = pages.length === 0 ? latest : dedupe([...pages.flatMap((p) => p.items), ...latest]).sort(byTime);
  const asked = older.data !== undefined;
  return {
    readings,
    total: Math.max(count ?? readings.length, readings.length),
    hasOlder: from !== null && (asked ? older.hasNextPage : true),
    loadingOlder: older.isFetching,
    error: older.error,
    showOlder: () => (asked ? older.fetchNextPage() : older.refetch()),
  };
}

function dedupe<T extends Timed>(list: T[]) {
  const seen = new Set<number>();
  return list.filter((r) => (seen.has(r.id) ? false : (seen.add(r.id), true)));
}
