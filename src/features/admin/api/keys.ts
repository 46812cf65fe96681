import type { AdminUsersQuery } from '@shared/schemas/admin';

/** Query keys for the site admin's pages. */
export const adminKeys = {
  all: ['admin'] as const,
  users: (query: AdminUsersQuery) => [...adminKeys.all, 'users', query] as const,
  mail: () => [...adminKeys.all, 'mail'] as const,
};
