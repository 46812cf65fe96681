import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me, SignupInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const signup = (input: SignupInput) => api.post<Me>('/api/auth/signup', input);

export function useSignup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signup,
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, me);
    },
  });
}
