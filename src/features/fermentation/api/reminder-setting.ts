import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FermentationSettingsInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { fermentationKeys } from './keys';

export const updateFermentationSettings = (input: FermentationSettingsInput) => api.put<{ remindersEnabled: boolean }>('/api/fermentation/settings', input);

export function useUpdateReminderSetting() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFermentationSettings,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: fermentationKeys.all }),
  });
}
