import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewReading, ReadingInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const addReading = (brewId: number, input: ReadingInput) => api.post<BrewReading>(`/api/brews/${brewId}/readings`, input);

export function useAddReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: ReadingInput) => addReading(brewId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.all }),
  });
}
