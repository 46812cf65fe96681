/** Query keys: invalidating `all` refreshes every brew-day list and page. */
export const brewKeys = {
  all: ['brews'] as const,
  lists: () => [...brewKeys.all, 'list'] as const,
  list: (scope: 'mine' | 'shared') => [...brewKeys.lists(), scope] as const,
  detail: (id: number) => [...brewKeys.all, 'detail', id] as const,
};
