import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalibrationEntry } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';
import { instrumentKeys } from './keys';

export const listCalibrations = (instrumentId: number, signal?: AbortSignal) => api.get<CalibrationEntry[]>(`/api/instruments/${instrumentId}/calibrations`, { signal });

export const calibrationsQueryOptions = (instrumentId: number) =>
  queryOptions({ queryKey: instrumentKeys.calibrations(instrumentId), queryFn: ({ signal }) => listCalibrations(instrumentId, signal) });

export function useCalibrations(instrumentId: number, enabled = true) {
  return useQuery({ ...calibrationsQueryOptions(instrumentId), enabled });
}
