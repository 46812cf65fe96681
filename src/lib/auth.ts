/** The signed-in brewer, shared by every feature: who they are and which units they read. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import { api, ApiError } from './api-client';

/** The signed-in brewer, or null when nobody is signed in. */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    return await api.get<Me>('/api/auth/me', { signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: ({ signal }) => getMe(signal), staleTime: 5 * 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
