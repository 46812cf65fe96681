import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

export const deleteBrew = (id: number) => api.delete(`/api/brews/${id}`);

export function useDeleteBrew() {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: deleteBrew,
    onSuccess: (_void, id) => {
      queryClient.removeQueries({ queryKey: brewKeys.detail(id) });
      // Lists only: refetching the deleted brew day would only answer 404.
      return queryClient.invalidateQueries({ queryKey: brewKeys.lists() });
    },
  });
}
