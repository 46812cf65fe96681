import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me, PreferencesInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const updatePreferences = (input: PreferencesInput) => api.patch<Me>('/api/auth/me', input);

export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (me) => queryClient.setQueryData(meQueryOptions().queryKey, me),
  });
}
