import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { ReviewListQuery, ReviewQueueItem } from '@shared/schemas/comments';
import { api, toQuery } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const getQueue = (query: ReviewListQuery = {}, signal?: AbortSignal) => api.get<Page<ReviewQueueItem>>(`/api/reviews/queue${toQuery({ ...query })}`, { signal });

/** The queue a page at a time, newest share first: each "Show more" asks for the page after the last one shown. */
export const queueQueryOptions = () =>
  infiniteQueryOptions({
    queryKey: reviewKeys.queue(),
    queryFn: ({ signal, pageParam }) => getQueue({ cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export function useQueue() {
  return useInfiniteQuery(queueQueryOptions());
}
