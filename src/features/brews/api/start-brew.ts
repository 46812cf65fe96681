import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BrewDetail, StartBrewInput } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const startBrew = (input: StartBrewInput) => api.post<BrewDetail>('/api/brews', input);

export function useStartBrew() {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: startBrew,
    onSuccess: (brew) => {
      queryClient.setQueryData(brewKeys.detail(brew.id), brew);
      return queryClient.invalidateQueries({ queryKey: brewKeys.lists() });
    },
  });
}
