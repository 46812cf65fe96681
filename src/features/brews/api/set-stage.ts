import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDetail, BrewStage, BrewStageAction } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const setStage = (id: number, stage: BrewStage, action: BrewStageAction) => api.post<BrewDetail>(`/api/brews/${id}/stages/${stage}`, { action });

export function useSetStage(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: ({ stage, action }: { stage: BrewStage; action: BrewStageAction }) => setStage(id, stage, action),
    onSuccess: (brew) => queryClient.setQueryData(brewKeys.detail(id), brew),
  });
}
