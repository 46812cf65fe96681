import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitationsQueryOptions } from './list-invitations';

export const revokeInvitation = (clubId: number, invitationId: number) => api.delete(`/api/clubs/${clubId}/invitations/${invitationId}`);

export function useRevokeInvitation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => revokeInvitation(clubId, invitationId),
    onSettled: () => queryClient.invalidateQueries(invitationsQueryOptions(clubId)),
  });
}
