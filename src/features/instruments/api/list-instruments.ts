import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Instrument } from '@shared/schemas/instruments';
import { api, toQuery } from '@/lib/api-client';
import { withDeviceCopy } from '@/lib/offline/device-copy';
import { instrumentKeys } from './keys';

export type ArchivedFilter = 'exclude' | 'include' | 'only';

export const listInstruments = (archived: ArchivedFilter = 'exclude', signal?: AbortSignal) => api.get<Instrument[]>(`/api/instruments${toQuery({ archived })}`, { signal });

export const instrumentsQueryOptions = (archived: ArchivedFilter = 'exclude') =>
  // A device copy too: the offline brew day corrects readings with the brewer's own calibrations.
  queryOptions({
    queryKey: instrumentKeys.list(archived),
    queryFn: ({ signal }) => withDeviceCopy(`instruments:${archived}`, () => listInstruments(archived, signal)),
    networkMode: 'always',
  });

export function useInstruments(archived: ArchivedFilter = 'exclude') {
  return useQuery(instrumentsQueryOptions(archived));
}
