import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import type { PasswordResetInput, PasswordResetStatus } from '@shared/schemas/password-reset';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

const path = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;

export const checkResetLink = (token: string) => api.get<PasswordResetStatus>(path(token));

export const resetLinkQueryOptions = (token: string) => queryOptions({ queryKey: ['password-reset', token], queryFn: () => checkResetLink(token), staleTime: 0 });

export function useResetLink(token: string) {
  return useQuery(resetLinkQueryOptions(token));
}

export const resetPassword = (token: string, input: PasswordResetInput) => api.post<Me>(path(token), input);

export function useResetPassword(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PasswordResetInput) => resetPassword(token, input),
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, me);
    },
  });
}
