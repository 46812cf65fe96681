import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CsvImportResult, CsvMapping, CsvPreview } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import { fermentationKeys } from './keys';

function form(file: File, mapping: CsvMapping | null) {
  const data = new FormData();
  if (mapping) data.append('mapping', JSON.stringify(mapping));
  data.append('file', file);
  return data;
}

/** Stateless: the file goes up again with each step, so nothing waits on the server between them. */
export const previewCsv = (brewId: number, file: File, mapping: CsvMapping | null) =>
  api.post<CsvPreview>(`/api/brews/${brewId}/fermentation/import/preview`, form(file, mapping));

export const importCsv = (brewId: number, file: File, mapping: CsvMapping) => api.post<CsvImportResult>(`/api/brews/${brewId}/fermentation/import`, form(file, mapping));

export function usePreviewCsv(brewId: number) {
  return useMutation({ mutationFn: ({ file, mapping }: { file: File; mapping: CsvMapping | null }) => previewCsv(brewId, file, mapping) });
}

export function useImportCsv(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, mapping }: { file: File; mapping: CsvMapping }) => importCsv(brewId, file, mapping),
    onSuccess: (result) => queryClient.setQueryData(fermentationKeys.log(brewId), result.log),
  });
}

export const fermentationCsvUrl = (brewId: number) => `/api/brews/${brewId}/fermentation.csv`;
