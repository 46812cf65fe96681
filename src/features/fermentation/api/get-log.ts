import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FermentationLog } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { withDeviceCopy } from '@/lib/offline/device-copy';
import { fermentationKeys } from './keys';

export const getFermentationLog = (brewId: number, signal?: AbortSignal) => api.get<FermentationLog>(`/api/brews/${brewId}/fermentation`, { signal });

export const fermentationLogQueryOptions = (brewId: number) =>
  queryOptions({
    queryKey: fermentationKeys.log(brewId),
    queryFn: ({ signal }) => withDeviceCopy(`fermentation:${brewId}`, () => getFermentationLog(brewId, signal)),
    networkMode: 'always',
  });

export function useFermentationLog(brewId: number) {
  return useQuery(fermentationLogQueryOptions(brewId));
}
