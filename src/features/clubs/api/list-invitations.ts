import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PendingInvitation } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';
import { clubKeys } from './keys';

export const listInvitations = (clubId: number, signal?: AbortSignal) => api.get<PendingInvitation[]>(`/api/clubs/${clubId}/invitations`, { signal });

export const invitationsQueryOptions = (clubId: number) =>
  queryOptions({ queryKey: clubKeys.invitations(clubId), queryFn: ({ signal }) => listInvitations(clubId, signal) });

/** Only organisers may list invitations; pass `enabled: false` for everyone else. */
export function useInvitations(clubId: number, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(clubId), enabled });
}
