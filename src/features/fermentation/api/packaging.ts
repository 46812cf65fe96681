import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationLog, PackagingInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { staleElsewhere } from '@/lib/query-client';
import { fermentationKeys } from './keys';

export const recordPackaging = (brewId: number, input: PackagingInput) => api.post<FermentationLog>(`/api/brews/${brewId}/fermentation/packaging`, input);
export const undoPackaging = (brewId: number) => api.delete<FermentationLog>(`/api/brews/${brewId}/fermentation/packaging`);

export function useRecordPackaging(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PackagingInput) => recordPackaging(brewId, input),
    // The brew day's status changed too (refreshed by src/app/query-links.ts).
    meta: staleElsewhere('brew-status'),
    onSuccess: (log) => queryClient.setQueryData(fermentationKeys.log(brewId), log),
  });
}

export function useUndoPackaging(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => undoPackaging(brewId),
    meta: staleElsewhere('brew-status'),
    onSuccess: (log) => queryClient.setQueryData(fermentationKeys.log(brewId), log),
  });
}
