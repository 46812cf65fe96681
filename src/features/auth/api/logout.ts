import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const logout = () => api.post<void>('/api/auth/logout');

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}
