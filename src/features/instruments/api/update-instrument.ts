import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Instrument, UpdateInstrumentInput } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';
import { instrumentKeys } from './keys';

export const updateInstrument = (id: number, input: UpdateInstrumentInput) => api.patch<Instrument>(`/api/instruments/${id}`, input);

export function useUpdateInstrument(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateInstrumentInput) => updateInstrument(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: instrumentKeys.lists() }),
  });
}
