import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Instrument } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';
import { withDeviceCopy } from '@/lib/offline/device-copy';
import { fermentationKeys } from './keys';

/** The brewer's own instruments, for the reading form's picker. */
export const listMyInstruments = (signal?: AbortSignal) => api.get<Instrument[]>('/api/instruments', { signal });

export const myInstrumentsQueryOptions = () => queryOptions({ queryKey: fermentationKeys.instruments(), queryFn: ({ signal }) => withDeviceCopy('instruments:exclude', () => listMyInstruments(signal)), staleTime: 60_000, networkMode: 'always' });

export function useMyInstruments(enabled = true) {
  return useQuery({ ...myInstrumentsQueryOptions(), enabled });
}
