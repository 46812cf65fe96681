import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { FermentationLog, FermentationReadingCreated, FermentationReadingInput } from '@shared/schemas/fermentation';
import { api } from '@/lib/api-client';
import type { QueuedItem } from '@/lib/offline/queue';
import { sendOrQueue } from '@/lib/offline/send';
import { fermentationKeys } from './keys';

export const addFermentationReading = (brewId: number, input: FermentationReadingInput) =>
  api.post<FermentationReadingCreated>(`/api/brews/${brewId}/fermentation/readings`, input);

const byTime = (a: { takenAt: string; id: number }, b: { takenAt: string; id: number }) => a.takenAt.localeCompare(b.takenAt) || a.id - b.id;

/** The log with a new reading in time order (in its readings and the chart's series) and the parts the server says it changed. */
export function withFermentationReading(log: FermentationLog, created: FermentationReadingCreated): FermentationLog {
  const { reading, verdict, temperature, progress, reminders, now, readingCount } = created;
  const readings = [...log.readings.filter((r) => r.id !== reading.id), reading].sort(byTime);
  const point = { id: reading.id, kind: reading.kind, takenAt: reading.takenAt, corrected: reading.corrected, estimate: reading.estimate };
  // A log kept on the device before the series existed draws its chart from its readings.
  const series = log.series && [...log.series.filter((p) => p.id !== reading.id), point].sort(byTime);
  return { ...log, readings, series, readingCount: readingCount ?? readings.length, verdict, temperature, progress, reminders, now };
}

/** Puts an accepted reading into the cached log; without a cached log, the log is asked for again. */
function applyCreated(queryClient: QueryClient, brewId: number, created: FermentationReadingCreated) {
  const had = queryClient.getQueryData<FermentationLog>(fermentationKeys.log(brewId));
  if (had) queryClient.setQueryData(fermentationKeys.log(brewId), withFermentationReading(had, created));
  else void queryClient.invalidateQueries({ queryKey: fermentationKeys.log(brewId) });
}

export function useAddFermentationReading(brewId: number) {
  const queryClient = useQueryClient();
  const logKey = fermentationKeys.log(brewId);
  // Items sent in the same run: this brew's fermentation readings patch the log from their answer;
  // anything else (older queued work) refreshes the pages as the app-wide handler would.
  const onAccepted = (item: QueuedItem, data: unknown) => {
    if (item.kind === 'fermentation-reading' && item.brewId === brewId) {
      applyCreated(queryClient, brewId, data as FermentationReadingCreated);
      // Everything but this log (which the answer has just updated) may show the reading's effects.
      void queryClient.invalidateQueries({ predicate: (q) => JSON.stringify(q.queryKey) !== JSON.stringify(logKey) });
    } else void queryClient.invalidateQueries();
  };
  return useMutation({
    // Run even when the browser says it is offline: the reading is kept on the device at once.
    networkMode: 'always',
    mutationFn: (input: FermentationReadingInput) => {
      const takenAt = input.takenAt ?? new Date().toISOString();
      return sendOrQueue<FermentationReadingCreated>(
        {
          brewId,
          kind: 'fermentation-reading',
          url: `/api/brews/${brewId}/fermentation/readings`,
          body: { ...input, takenAt },
          label: `Fermentation reading (${input.method})`,
          takenAt,
        },
        { onAccepted },
      );
    },
    // Kept on the device: nothing changed on the server yet. Sent: the log is updated from the answer, not reloaded whole.
    onSuccess: (outcome) => {
      if (outcome.status === 'sent') applyCreated(queryClient, brewId, outcome.data);
    },
  });
}
