import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BrewReview } from '@shared/schemas/comments';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const getReview = (brewId: number, signal?: AbortSignal) => api.get<BrewReview>(`/api/brews/${brewId}/review`, { signal });

export const reviewQueryOptions = (brewId: number) => queryOptions({ queryKey: reviewKeys.review(brewId), queryFn: ({ signal }) => getReview(brewId, signal) });

export function useReview(brewId: number) {
  return useQuery(reviewQueryOptions(brewId));
}
