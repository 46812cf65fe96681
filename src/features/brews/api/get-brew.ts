import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BrewDetail } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { withDeviceCopy } from '@/lib/offline/device-copy';
import { brewKeys } from './keys';

export const getBrew = (id: number, signal?: AbortSignal) => api.get<BrewDetail>(`/api/brews/${id}`, { signal });

/** Each load keeps a copy on the device, so the brew day opens again with no connection. */
export const brewQueryOptions = (id: number) =>
  queryOptions({ queryKey: brewKeys.detail(id), queryFn: ({ signal }) => withDeviceCopy(`brew:${id}`, () => getBrew(id, signal)), networkMode: 'always' });

export function useBrew(id: number) {
  return useQuery(brewQueryOptions(id));
}
