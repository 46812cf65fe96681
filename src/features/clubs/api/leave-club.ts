import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { clubQueryOptions } from './get-club';
import { clubsQueryOptions } from './list-clubs';

export const leaveClub = (clubId: number) => api.post<void>(`/api/clubs/${clubId}/leave`);

export function useLeaveClub(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => leaveClub(clubId),
    onSuccess: () => {
      queryClient.removeQueries(clubQueryOptions(clubId));
      void queryClient.invalidateQueries(clubsQueryOptions());
      void queryClient.invalidateQueries(meQueryOptions());
    },
  });
}
