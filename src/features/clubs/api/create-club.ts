import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClubDetail, CreateClubInput } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { clubQueryOptions } from './get-club';
import { clubsQueryOptions } from './list-clubs';

export const createClub = (input: CreateClubInput) => api.post<ClubDetail>('/api/clubs', input);

export function useCreateClub() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClub,
    onSuccess: (club) => {
      queryClient.setQueryData(clubQueryOptions(club.id).queryKey, club);
      void queryClient.invalidateQueries(clubsQueryOptions());
      // The signed-in brewer's own list of clubs (home page) changed too.
      void queryClient.invalidateQueries(meQueryOptions());
    },
  });
}
