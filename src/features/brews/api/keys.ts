import type { ListBrewsQuery } from '@shared/schemas/brews';

/** Query keys: invalidating `all` refreshes every brew-day list and page. */
export const brewKeys = {
  all: ['brews'] as const,
  lists: () => [...brewKeys.all, 'list'] as const,
  list: (query: ListBrewsQuery) => [...brewKeys.lists(), query] as const,
  detail: (id: number) => [...brewKeys.all, 'detail', id] as const,
  /** Older readings of a brew day, page by page (the day itself carries the latest). */
  olderReadings: (id: number) => [...brewKeys.detail(id), 'older-readings'] as const,
};
