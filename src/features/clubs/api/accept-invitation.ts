import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import type { NewcomerInput } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export interface Accepted {
  clubId: number;
  me: Me;
}

export const acceptInvitation = (token: string, newcomer?: NewcomerInput) =>
  api.post<Accepted>(`/api/invitations/${encodeURIComponent(token)}/accept`, newcomer ?? {});

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (newcomer?: NewcomerInput) => acceptInvitation(token, newcomer),
    onSuccess: ({ me }) => {
      // Possibly a brand-new account: start from a clean cache, as after sign-up.
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, me);
    },
  });
}
