import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPreview } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';

export const getInvitation = (token: string) => api.get<InvitationPreview>(`/api/invitations/${encodeURIComponent(token)}`);

export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token), staleTime: 0 });

/** `enabled: false` once the invitation is being accepted: asking again would only find it used. */
export function useInvitation(token: string, enabled = true) {
  return useQuery({ ...invitationQueryOptions(token), enabled });
}
