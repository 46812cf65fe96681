import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Instrument } from '@shared/schemas/instruments';
import { api, toQuery } from '@/lib/api-client';

export type ArchivedFilter = 'exclude' | 'include' | 'only';

export const listInstruments = (archived: ArchivedFilter = 'exclude') => api.get<Instrument[]>(`/api/instruments${toQuery({ archived })}`);

export const instrumentsQueryOptions = (archived: ArchivedFilter = 'exclude') =>
  queryOptions({ queryKey: ['instruments', 'list', archived], queryFn: () => listInstruments(archived) });

export function useInstruments(archived: ArchivedFilter = 'exclude') {
  return useQuery(instrumentsQueryOptions(archived));
}
