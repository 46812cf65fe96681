import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import type { PasswordResetInput, PasswordResetStatus } from '@shared/schemas/password-reset';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { authKeys } from './keys';

const path = (token: string) => `/api/auth/password-reset/${encodeURIComponent(token)}`;

export const checkResetLink = (token: string, signal?: AbortSignal) => api.get<PasswordResetStatus>(path(token), { signal });

export const resetLinkQueryOptions = (token: string) => queryOptions({ queryKey: authKeys.resetLink(token), queryFn: ({ signal }) => checkResetLink(token, signal), staleTime: 0 });

export function useResetLink(token: string) {
  return useQuery(resetLinkQueryOptions(token));
}

export const resetPassword = (token: string, input: PasswordResetInput) => api.post<Me>(path(token), input);

export function useResetPassword(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PasswordResetInput) => resetPassword(token, input),
    onSuccess: (me) => {
      // Whoever was signed in on this device before is gone; keep only this link's status, so
      // the page does not ask about the link again (it is used up now) while it navigates away.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== 'password-reset' });
      queryClient.setQueryData(meQueryOptions().queryKey, me);
    },
  });
}
