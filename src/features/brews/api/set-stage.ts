import { useMutation, useQueryClient } from '@tanstack/react-query';
import { brewStageLabels, type BrewDetail, type BrewStage, type BrewStageAction } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { brewKeys } from './keys';

export const setStage = (id: number, stage: BrewStage, action: BrewStageAction) => api.post<BrewDetail>(`/api/brews/${id}/stages/${stage}`, { action });

const actionWords: Record<BrewStageAction, string> = { start: 'returned to', complete: 'done', skip: 'skipped' };

export function useSetStage(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the change is kept on the device at once.
    networkMode: 'always',
    mutationFn: ({ stage, action }: { stage: BrewStage; action: BrewStageAction }) => {
      const at = new Date().toISOString();
      return sendOrQueue<BrewDetail>({
        brewId: id,
        kind: 'stage',
        url: `/api/brews/${id}/stages/${stage}`,
        body: { action, at },
        label: `${brewStageLabels[stage]}: ${actionWords[action]}`,
        takenAt: at,
      });
    },
    onSuccess: (outcome) => outcome.status === 'sent' && queryClient.setQueryData(brewKeys.detail(id), outcome.data),
  });
}
