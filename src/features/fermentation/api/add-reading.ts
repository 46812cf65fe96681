import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationLog, FermentationReading, FermentationReadingInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { fermentationKeys } from './keys';

export interface AddReadingResult {
  reading: FermentationReading;
  /** The same reading was already saved (a retry after a lost answer). */
  duplicate: boolean;
  log: FermentationLog;
}

export const addFermentationReading = (brewId: number, input: FermentationReadingInput) =>
  api.post<AddReadingResult>(`/api/brews/${brewId}/fermentation/readings`, input);

export function useAddFermentationReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the reading is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: FermentationReadingInput) => {
      const takenAt = input.takenAt ?? new Date().toISOString();
      return sendOrQueue<AddReadingResult>({
        brewId,
        kind: 'fermentation-reading',
        url: `/api/brews/${brewId}/fermentation/readings`,
        body: { ...input, takenAt },
        label: `Fermentation reading (${input.method})`,
        takenAt,
      });
    },
    onSuccess: (outcome) => outcome.status === 'sent' && queryClient.setQueryData(fermentationKeys.log(brewId), outcome.data.log),
  });
}
