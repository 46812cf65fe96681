import { infiniteQueryOptions, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { BrewList, ListBrewsQuery } from '@shared/schemas/brews';
import { api, toQuery } from '@/lib/api-client';
import { brewKeys } from './keys';

type Scope = 'mine' | 'shared';

export const listBrews = (query: ListBrewsQuery, signal?: AbortSignal) => api.get<BrewList>(`/api/brews${toQuery({ ...query })}`, { signal });

/** One page (the first, or the one after `cursor`). */
export const brewsQueryOptions = (query: ListBrewsQuery) =>
  queryOptions({ queryKey: brewKeys.list(query), queryFn: ({ signal }) => listBrews(query, signal) });

export function useBrews(query: ListBrewsQuery) {
  return useQuery(brewsQueryOptions(query));
}

/** The brew-day list page: newest first, each "Show more" asks for the page after the last one shown. */
export const brewPagesQueryOptions = (scope: Scope) =>
  infiniteQueryOptions({
    queryKey: [...brewKeys.list({ scope }), 'pages'] as const,
    queryFn: ({ signal, pageParam }) => listBrews({ scope, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export function useBrewPages(scope: Scope) {
  return useInfiniteQuery(brewPagesQueryOptions(scope));
}
