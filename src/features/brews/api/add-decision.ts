import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDecision, DecisionInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

/** Only the check's input and the choice are sent: the server recomputes every number. */
export const addDecision = (brewId: number, input: DecisionInput) => api.post<BrewDecision>(`/api/brews/${brewId}/decisions`, input);

export function useAddDecision(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: DecisionInput) => addDecision(brewId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
