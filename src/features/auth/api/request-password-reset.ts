import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequestInput } from '@shared/schemas/password-reset';
import { api } from '@/lib/api-client';

export const requestPasswordReset = (input: PasswordResetRequestInput) => api.post<{ message: string }>('/api/auth/password-reset', input);

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
