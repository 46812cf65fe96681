import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FermentationLog } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { fermentationKeys } from './keys';

export const getFermentationLog = (brewId: number, signal?: AbortSignal) => api.get<FermentationLog>(`/api/brews/${brewId}/fermentation`, { signal });

export const fermentationLogQueryOptions = (brewId: number) =>
  queryOptions({ queryKey: fermentationKeys.log(brewId), queryFn: ({ signal }) => getFermentationLog(brewId, signal) });

export function useFermentationLog(brewId: number) {
  return useQuery(fermentationLogQueryOptions(brewId));
}
