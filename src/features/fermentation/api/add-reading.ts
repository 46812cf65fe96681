import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationLog, FermentationReading, FermentationReadingInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
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
    mutationFn: (input: FermentationReadingInput) => addFermentationReading(brewId, input),
    onSuccess: (result) => queryClient.setQueryData(fermentationKeys.log(brewId), result.log),
  });
}
