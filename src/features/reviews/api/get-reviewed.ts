import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReviewedItem } from '@shared/schemas/comments';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const getReviewed = (signal?: AbortSignal) => api.get<ReviewedItem[]>('/api/reviews/reviewed', { signal });

export const reviewedQueryOptions = () => queryOptions({ queryKey: reviewKeys.reviewed(), queryFn: ({ signal }) => getReviewed(signal) });

export function useReviewed() {
  return useQuery(reviewedQueryOptions());
}
