import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PendingInvitation } from '@shared/schemas/clubs';
import { api } from '@/lib/api-client';

export const listInvitations = (clubId: number) => api.get<PendingInvitation[]>(`/api/clubs/${clubId}/invitations`);

export const invitationsQueryOptions = (clubId: number) =>
  queryOptions({ queryKey: ['clubs', clubId, 'invitations'], queryFn: () => listInvitations(clubId) });

/** Only organisers may list invitations; pass `enabled: false` for everyone else. */
export function useInvitations(clubId: number, enabled: boolean) {
  return useQuery({ ...invitationsQueryOptions(clubId), enabled });
}
