import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDetail, UpdateBrewInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const updateBrew = (id: number, input: UpdateBrewInput) => api.patch<BrewDetail>(`/api/brews/${id}`, input);

export function useUpdateBrew(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: (input: UpdateBrewInput) => updateBrew(id, input),
    onSuccess: (brew) => {
      queryClient.setQueryData(brewKeys.detail(id), brew);
      return queryClient.invalidateQueries({ queryKey: brewKeys.all, refetchType: 'none' });
    },
  });
}
