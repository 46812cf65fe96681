import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewReading } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

/** Re-applies the instrument's current calibration to a stored reading; the log records old and new values. */
export const recomputeReading = (brewId: number, readingId: number) => api.post<BrewReading>(`/api/brews/${brewId}/readings/${readingId}/recompute`);

export function useRecomputeReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (readingId: number) => recomputeReading(brewId, readingId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
