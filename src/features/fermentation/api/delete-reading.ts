import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationLog } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { fermentationKeys } from './keys';

export const deleteFermentationReading = (brewId: number, readingId: number) =>
  api.delete<FermentationLog>(`/api/brews/${brewId}/fermentation/readings/${readingId}`);

export function useDeleteFermentationReading(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (readingId: number) => deleteFermentationReading(brewId, readingId),
    onSuccess: (log) => queryClient.setQueryData(fermentationKeys.log(brewId), log),
  });
}
