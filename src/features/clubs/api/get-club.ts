import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClubDetail } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { clubKeys } from './keys';

export const getClub = (id: number, signal?: AbortSignal) => api.get<ClubDetail>(`/api/clubs/${id}`, { signal });

export const clubQueryOptions = (id: number) => queryOptions({ queryKey: clubKeys.detail(id), queryFn: ({ signal }) => getClub(id, signal) });

export function useClub(id: number) {
  return useQuery(clubQueryOptions(id));
}
