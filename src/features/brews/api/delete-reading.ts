import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const deleteReading = (brewId: number, readingId: number) => api.delete(`/api/brews/${brewId}/readings/${readingId}`);

export function useDeleteReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (readingId: number) => deleteReading(brewId, readingId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.all }),
  });
}
