import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const logout = () => api.post<void>('/api/auth/logout');
/** Ends every session of the account, on every device. */
export const logoutEverywhere = () => api.post<void>('/api/auth/logout-everywhere');

export function useLogout({ everywhere = false }: { everywhere?: boolean } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: everywhere ? logoutEverywhere : logout,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}
