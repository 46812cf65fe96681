import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationSent, InviteInput } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { invitationsQueryOptions } from './list-invitations';

export const inviteMember = (clubId: number, input: InviteInput) => api.post<InvitationSent>(`/api/clubs/${clubId}/invitations`, input);

export function useInviteMember(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => inviteMember(clubId, input),
    onSuccess: () => queryClient.invalidateQueries(invitationsQueryOptions(clubId)),
  });
}
