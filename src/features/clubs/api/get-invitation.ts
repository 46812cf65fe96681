import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPreview } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { clubKeys } from './keys';

export const getInvitation = (token: string, signal?: AbortSignal) => api.get<InvitationPreview>(`/api/invitations/${encodeURIComponent(token)}`, { signal });

export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: clubKeys.invitation(token), queryFn: ({ signal }) => getInvitation(token, signal), staleTime: 0 });

/** `enabled: false` once the invitation is being accepted: asking again would only find it used. */
export function useInvitation(token: string, enabled = true) {
  return useQuery({ ...invitationQueryOptions(token), enabled });
}
