import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BrewSummary } from '@shared/schemas/brews';
import { api, toQuery } from '@/lib/api-client';
import { brewKeys } from './keys';

export const listBrews = (scope: 'mine' | 'shared', signal?: AbortSignal) => api.get<BrewSummary[]>(`/api/brews${toQuery({ scope })}`, { signal });

export const brewsQueryOptions = (scope: 'mine' | 'shared' = 'mine') =>
  queryOptions({ queryKey: brewKeys.list(scope), queryFn: ({ signal }) => listBrews(scope, signal) });

export function useBrews(scope: 'mine' | 'shared' = 'mine') {
  return useQuery(brewsQueryOptions(scope));
}
