import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Instrument } from '@shared/schemas/instruments';
import { api, toQuery } from '@/lib/api-client';
import { instrumentKeys } from './keys';

export type ArchivedFilter = 'exclude' | 'include' | 'only';

export const listInstruments = (archived: ArchivedFilter = 'exclude', signal?: AbortSignal) => api.get<Instrument[]>(`/api/instruments${toQuery({ archived })}`, { signal });

export const instrumentsQueryOptions = (archived: ArchivedFilter = 'exclude') =>
  queryOptions({ queryKey: instrumentKeys.list(archived), queryFn: ({ signal }) => listInstruments(archived, signal) });

export function useInstruments(archived: ArchivedFilter = 'exclude') {
  return useQuery(instrumentsQueryOptions(archived));
}
