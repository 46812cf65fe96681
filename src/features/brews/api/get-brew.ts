import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BrewDetail } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const getBrew = (id: number, signal?: AbortSignal) => api.get<BrewDetail>(`/api/brews/${id}`, { signal });

export const brewQueryOptions = (id: number) => queryOptions({ queryKey: brewKeys.detail(id), queryFn: ({ signal }) => getBrew(id, signal) });

export function useBrew(id: number) {
  return useQuery(brewQueryOptions(id));
}
