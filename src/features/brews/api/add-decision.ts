import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDecision, DecisionInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { brewKeys } from './keys';

/** Only the check's input and the choice are sent: the server recomputes every number. */
export const addDecision = (brewId: number, input: DecisionInput) => api.post<BrewDecision>(`/api/brews/${brewId}/decisions`, input);

const choiceWords: Record<DecisionInput['choice']['kind'], string> = {
  'as-is': 'accept as it is',
  extract: 'add extract',
  water: 'add water',
  'boil-longer': 'boil longer',
  own: 'own action',
};

export function useAddDecision(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the decision is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: DecisionInput) => {
      const decidedAt = input.decidedAt ?? new Date().toISOString();
      return sendOrQueue<BrewDecision>({
        brewId,
        kind: 'decision',
        url: `/api/brews/${brewId}/decisions`,
        body: { ...input, decidedAt },
        label: `Late-boil decision: ${choiceWords[input.choice.kind]}`,
        takenAt: decidedAt,
      });
    },
    onSuccess: (outcome) => outcome.status === 'sent' && queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
