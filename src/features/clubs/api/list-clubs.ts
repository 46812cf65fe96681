import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClubSummary } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { clubKeys } from './keys';

export const listClubs = (signal?: AbortSignal) => api.get<ClubSummary[]>('/api/clubs', { signal });

export const clubsQueryOptions = () => queryOptions({ queryKey: clubKeys.all, queryFn: ({ signal }) => listClubs(signal) });

export function useClubs() {
  return useQuery(clubsQueryOptions());
}
