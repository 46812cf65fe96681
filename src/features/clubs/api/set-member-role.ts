import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClubDetail, ClubRole } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { clubQueryOptions } from './get-club';
import { clubsQueryOptions } from './list-clubs';

export const setMemberRole = (clubId: number, userId: number, role: ClubRole) => api.patch<ClubDetail>(`/api/clubs/${clubId}/members/${userId}`, { role });

export function useSetMemberRole(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: ClubRole }) => setMemberRole(clubId, userId, role),
    onSuccess: (club) => {
      queryClient.setQueryData(clubQueryOptions(clubId).queryKey, club);
      void queryClient.invalidateQueries(clubsQueryOptions());
      // An organiser may have changed their own role.
      void queryClient.invalidateQueries(meQueryOptions());
    },
  });
}
