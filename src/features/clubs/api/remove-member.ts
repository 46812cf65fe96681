import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { clubQueryOptions } from './get-club';
import { clubsQueryOptions } from './list-clubs';

export const removeMember = (clubId: number, userId: number) => api.delete(`/api/clubs/${clubId}/members/${userId}`);

export function useRemoveMember(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(clubId, userId),
    onSuccess: () => {
      void queryClient.invalidateQueries(clubQueryOptions(clubId));
      void queryClient.invalidateQueries(clubsQueryOptions());
    },
  });
}
