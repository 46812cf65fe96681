import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationLog, PackagingInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { fermentationKeys } from './keys';

export const recordPackaging = (brewId: number, input: PackagingInput) => api.post<FermentationLog>(`/api/brews/${brewId}/fermentation/packaging`, input);
export const undoPackaging = (brewId: number) => api.delete<FermentationLog>(`/api/brews/${brewId}/fermentation/packaging`);

export function useRecordPackaging(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PackagingInput) => recordPackaging(brewId, input),
    onSuccess: (log) => {
      queryClient.setQueryData(fermentationKeys.log(brewId), log);
      // The brew day's status changed too.
      void queryClient.invalidateQueries({ queryKey: ['brews'] });
    },
  });
}

export function useUndoPackaging(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => undoPackaging(brewId),
    onSuccess: (log) => {
      queryClient.setQueryData(fermentationKeys.log(brewId), log);
      void queryClient.invalidateQueries({ queryKey: ['brews'] });
    },
  });
}
