/** Query keys: invalidating `all` refreshes every brew-day list and page. */
export const brewKeys = {
  all: ['brews'] as const,
  list: (scope: 'mine' | 'shared') => [...brewKeys.all, 'list', scope] as const,
  detail: (id: number) => [...brewKeys.all, 'detail', id] as const,
};
