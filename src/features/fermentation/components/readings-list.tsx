import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import { READINGS_WINDOW } from '@shared/schemas/brews';
import type { FermentationLog, FermentationReading } from '@shared/schemas/fermentation';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ShowMore, type NextPages } from '@/components/ui/show-more';
import { useUnits } from '@/lib/units';
import { useDeleteFermentationReading } from '../api/delete-reading';
import { useLoadedFermentationReadings } from '../api/older-readings';
import { dayLabel, methodLabels, shortDateTime } from './words';

/**
 * The readings, newest first, with the instrument and correction each was taken with: the latest
 * few of those the log came with, then older ones on "Show older readings", first from what is
 * already here, then a page at a time from the server.
 */
export function ReadingsList({ log, canEdit }: { log: Pick<FermentationLog, 'brew' | 'readings' | 'readingCount' | 'olderReadings'>; canEdit: boolean }) {
  const brewId = log.brew.id;
  const pitchedAt = log.brew.pitchedAt;
  const units = useUnits();
  const remove = useDeleteFermentationReading(brewId);
  const loaded = useLoadedFermentationReadings(log);
  const [confirm, setConfirm] = useState<number | null>(null);
  const [limit, setLimit] = useState(SHOWN);
  const { readings } = loaded;
  if (readings.length === 0 && !loaded.hasOlder) return <p className="text-ink-soft">No readings yet.</p>;
  // Only the rows shown are copied and drawn: a long log (thousands of readings) opens at once.
  const shown: FermentationReading[] = [];
  for (let i = readings.length - 1; i >= 0 && shown.length < limit; i--) shown.push(readings[i]);
  const hidden = readings.length - shown.length;
  const older: NextPages = {
    hasNextPage: hidden > 0 || loaded.hasOlder,
    isFetchingNextPage: loaded.loadingOlder,
    fetchNextPage: async () => {
      setLimit(shown.length + READINGS_WINDOW);
      // What is here first; the server's next page when that is not enough.
      if (hidden < READINGS_WINDOW && loaded.hasOlder) await loaded.showOlder();
    },
  };
  return (
    <>
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
      <ol className="divide-y divide-cellar-100" aria-label="Readings">
        {shown.map((r) => {
          const value = r.kind === 'gravity' ? units.format('gravity', r.corrected) : units.format('temperature', r.corrected);
          return (
            <li key={r.id} className="py-3" data-testid="fermentation-reading">
              <div className="flex items-start justify-between gap-3">
                <div className="min-w-0">
                  <p className="text-sm text-ink-faint">
                    <span className="font-semibold text-ink-soft">{dayLabel(r.takenAt, pitchedAt)}</span> · {shortDateTime(r.takenAt)}
                  </p>
                  <p className="text-xl font-bold tabular-nums text-cellar-900">
                    {value}
                    {r.estimate && <span className="ml-2 rounded bg-malt-100 px-1.5 py-0.5 align-middle text-xs font-semibold text-malt-700">estimate</span>}
                  </p>
                  <p className="text-sm text-ink-soft">
                    {describe(r, units)} · {r.instrument.name}
                    {r.source === 'csv' && ' · imported'}
                  </p>
                  {r.note && <p className="mt-1 text-sm">{r.note}</p>}
                  {r.warnings.length > 0 && (
                    <ul className="mt-1 list-disc pl-5 text-sm text-malt-700">
                      {r.warnings.map((w) => (
                        <li key={w}>{w}</li>
                      ))}
                    </ul>
                  )}
                </div>
                {canEdit &&
                  (confirm === r.id ? (
                    <div className="flex shrink-0 flex-col gap-1">
                      <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(r.id, { onSuccess: () => setConfirm(null) })}>
                        Delete
                      </Button>
                      <Button variant="quiet" onClick={() => setConfirm(null)}>
                        Keep
                      </Button>
                    </div>
                  ) : (
                    <Button variant="quiet" aria-label={`Delete the reading of ${shortDateTime(r.takenAt)}`} onClick={() => setConfirm(r.id)} icon={<Trash2 aria-hidden className="size-5" />} />
                  ))}
              </div>
            </li>
          );
        })}
      </ol>
      {(older.hasNextPage || limit > SHOWN) && (
        <div className="mt-2 flex flex-col gap-2 sm:flex-row sm:flex-wrap sm:items-center">
          <p className="text-sm text-ink-soft" role="status">
            {shown.length >= loaded.total
              ? `All ${loaded.total.toLocaleString('en')} readings shown.`
              : `Showing the latest ${shown.length.toLocaleString('en')} of ${loaded.total.toLocaleString('en')} readings.`}
          </p>
          <ShowMore pages={older} label="Show older readings" />
          {limit > SHOWN && (
            <Button variant="quiet" className="w-full sm:w-auto" onClick={() => setLimit(SHOWN)}>
              Show the latest only
            </Button>
          )}
        </div>
      )}
      {loaded.error && <Notice tone="error">Older readings could not be loaded: {loaded.error.message} Try again.</Notice>}
    </>
  );
}

/** The latest few; a phone should not scroll past a month of temperatures to reach packaging. */
const SHOWN = 6;

function describe(r: FermentationReading, units: ReturnType<typeof useUnits>) {
  switch (r.raw.method) {
    case 'hydrometer':
      return `${methodLabels.hydrometer}: read ${units.format('gravity', r.raw.sg)}${r.raw.sampleTempC !== null ? ` at ${units.format('temperature', r.raw.sampleTempC)}` : ''}`;
    case 'refractometer':
      return `${methodLabels.refractometer}: ${r.raw.brix} °Bx now, original ${r.raw.originalBrix} °Bx${r.raw.originalBrixSource === 'from-og' ? ' (from the OG)' : ''}, alcohol-corrected`;
    case 'thermometer':
      return `${methodLabels.thermometer}: read ${units.format('temperature', r.raw.tempC)}`;
  }
}
