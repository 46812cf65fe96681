import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClubDetail } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';

export const getClub = (id: number) => api.get<ClubDetail>(`/api/clubs/${id}`);

export const clubQueryOptions = (id: number) => queryOptions({ queryKey: ['clubs', id], queryFn: () => getClub(id) });

export function useClub(id: number) {
  return useQuery(clubQueryOptions(id));
}
