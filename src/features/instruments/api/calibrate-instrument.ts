import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CalibrateInstrumentInput, CalibrateResponse, Instrument } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';
import { calibrationsQueryOptions } from './list-calibrations';
import { equipmentKeys, instrumentKeys } from './keys';

/** Saving is the brewer accepting the calibration the page previewed. */
export const calibrateInstrument = (id: number, input: CalibrateInstrumentInput) => api.post<CalibrateResponse>(`/api/instruments/${id}/calibrations`, input);

export function useCalibrateInstrument(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CalibrateInstrumentInput) => calibrateInstrument(id, input),
    onSuccess: ({ instrument }) => {
      // The card shows the new calibration at once; the refetch confirms it.
      queryClient.setQueriesData<Instrument[]>({ queryKey: instrumentKeys.lists() }, (old) => old?.map((i) => (i.id === instrument.id ? instrument : i)));
      void queryClient.invalidateQueries({ queryKey: instrumentKeys.lists() });
      void queryClient.invalidateQueries(calibrationsQueryOptions(id));
      // A thermometer's boiling check remembers the elevation on the kettle profile.
      void queryClient.invalidateQueries({ queryKey: equipmentKeys.all });
    },
  });
}
