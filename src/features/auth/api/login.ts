import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput, Me } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const login = (input: LoginInput) => api.post<Me>('/api/auth/login', input);

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, me);
    },
  });
}
