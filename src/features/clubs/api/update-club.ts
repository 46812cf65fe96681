import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClubDetail, UpdateClubInput } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { clubQueryOptions } from './get-club';
import { clubsQueryOptions } from './list-clubs';

export const updateClub = (id: number, input: UpdateClubInput) => api.patch<ClubDetail>(`/api/clubs/${id}`, input);

export function useUpdateClub(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateClubInput) => updateClub(id, input),
    onSuccess: (club) => {
      queryClient.setQueryData(clubQueryOptions(id).queryKey, club);
      void queryClient.invalidateQueries(clubsQueryOptions());
      void queryClient.invalidateQueries(meQueryOptions());
    },
  });
}
