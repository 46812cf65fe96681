import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateInstrumentInput, Instrument } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';
import { instrumentKeys } from './keys';

export const createInstrument = (input: CreateInstrumentInput) => api.post<Instrument>('/api/instruments', input);

export function useCreateInstrument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInstrument,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: instrumentKeys.lists() }),
  });
}
