import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewSharing, BrewSharingInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const updateBrewSharing = (brewId: number, input: BrewSharingInput) => api.put<BrewSharing>(`/api/brews/${brewId}/sharing`, input);

export function useUpdateBrewSharing(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: BrewSharingInput) => updateBrewSharing(brewId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.all }),
  });
}
