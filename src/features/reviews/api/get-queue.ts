import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReviewQueueItem } from '@shared/schemas/comments';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export const getQueue = (signal?: AbortSignal) => api.get<ReviewQueueItem[]>('/api/reviews/queue', { signal });

export const queueQueryOptions = () => queryOptions({ queryKey: reviewKeys.queue(), queryFn: ({ signal }) => getQueue(signal) });

export function useQueue() {
  return useQuery(queueQueryOptions());
}
