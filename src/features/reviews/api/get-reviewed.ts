import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { ReviewedItem, ReviewListQuery } from '@shared/schemas/comments';
import { api, toQuery } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const getReviewed = (query: ReviewListQuery = {}, signal?: AbortSignal) => api.get<Page<ReviewedItem>>(`/api/reviews/reviewed${toQuery({ ...query })}`, { signal });

/** The reviewed list a page at a time, latest comment first. */
export const reviewedQueryOptions = () =>
  infiniteQueryOptions({
    queryKey: reviewKeys.reviewed(),
    queryFn: ({ signal, pageParam }) => getReviewed({ cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export function useReviewed() {
  return useInfiniteQuery(reviewedQueryOptions());
}
