import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUserPage, AdminUsersQuery } from '@shared/schemas/admin';
import { api, toQuery } from '@/lib/api-client';

export const listUsers = (query: AdminUsersQuery) => api.get<AdminUserPage>(`/api/admin/users${toQuery({ ...query })}`);

export const usersQueryOptions = (query: AdminUsersQuery) =>
  queryOptions({ queryKey: ['admin', 'users', query], queryFn: () => listUsers(query), placeholderData: keepPreviousData });

/** `enabled: false` for anyone who is not a site admin: the API would answer 404 anyway. */
export function useUsers(query: AdminUsersQuery, enabled = true) {
  return useQuery({ ...usersQueryOptions(query), enabled });
}
