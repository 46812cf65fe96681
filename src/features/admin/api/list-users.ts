import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AdminUserPage, AdminUsersQuery } from '@shared/schemas/admin';
import { api, toQuery } from '@/lib/api-client';
import { adminKeys } from './keys';

export const listUsers = (query: AdminUsersQuery, signal?: AbortSignal) => api.get<AdminUserPage>(`/api/admin/users${toQuery({ ...query })}`, { signal });

export const usersQueryOptions = (query: AdminUsersQuery) =>
  queryOptions({ queryKey: adminKeys.users(query), queryFn: ({ signal }) => listUsers(query, signal), placeholderData: keepPreviousData });

/** `enabled: false` for anyone who is not a site admin: the API would answer 404 anyway. */
export function useUsers(query: AdminUsersQuery, enabled = true) {
  return useQuery({ ...usersQueryOptions(query), enabled });
}
