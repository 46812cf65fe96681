import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalibrationEntry } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';

export const listCalibrations = (instrumentId: number) => api.get<CalibrationEntry[]>(`/api/instruments/${instrumentId}/calibrations`);

export const calibrationsQueryOptions = (instrumentId: number) =>
  queryOptions({ queryKey: ['instruments', 'calibrations', instrumentId], queryFn: () => listCalibrations(instrumentId) });

export function useCalibrations(instrumentId: number, enabled = true) {
  return useQuery({ ...calibrationsQueryOptions(instrumentId), enabled });
}
