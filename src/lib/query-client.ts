import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // A 4xx will not get better by asking again; a flaky connection might.
        retry: (count, error) => !(error instanceof ApiError && error.status < 500) && count < 2,
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
}

/**
 * What a feature's mutation makes stale in another feature, said as a fact (`meta` of the
 * mutation); src/app/query-links.ts knows which queries that is, since features never import
 * each other.
 */
export type StaleElsewhere = 'brew-status';
export const staleElsewhere = (what: StaleElsewhere) => ({ staleElsewhere: what });
