import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BrewComment } from '@shared/schemas/comments';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const listComments = (brewId: number, signal?: AbortSignal) => api.get<BrewComment[]>(`/api/brews/${brewId}/comments`, { signal });

export const commentsQueryOptions = (brewId: number) => queryOptions({ queryKey: reviewKeys.comments(brewId), queryFn: ({ signal }) => listComments(brewId, signal) });

export function useComments(brewId: number) {
  return useQuery(commentsQueryOptions(brewId));
}
