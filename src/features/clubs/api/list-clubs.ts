import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClubSummary } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';

export const listClubs = () => api.get<ClubSummary[]>('/api/clubs');

export const clubsQueryOptions = () => queryOptions({ queryKey: ['clubs'], queryFn: listClubs });

export function useClubs() {
  return useQuery(clubsQueryOptions());
}
