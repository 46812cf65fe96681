import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import type { FermentationReading } from '@shared/schemas/fermentation';
import { countOf } from '@/lib/plural';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useUnits } from '@/lib/units';
import { useDeleteFermentationReading } from '../api/delete-reading';
import { dayLabel, methodLabels, shortDateTime } from './words';

/** Every reading, newest first, with the instrument and correction it was taken with. */
export function ReadingsList({ brewId, readings, pitchedAt, canEdit }: { brewId: number; readings: FermentationReading[]; pitchedAt: string | null; canEdit: boolean }) {
  const units = useUnits();
  const remove = useDeleteFermentationReading(brewId);
  const [confirm, setConfirm] = useState<number | null>(null);
  const [all, setAll] = useState(false);
  if (readings.length === 0) return <p className="text-ink-soft">No readings yet.</p>;
  const newestFirst = [...readings].reverse();
  const shown = all ? newestFirst : newestFirst.slice(0, SHOWN);
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
      {newestFirst.length > SHOWN && (
        <Button variant="secondary" className="mt-2 w-full sm:w-auto" onClick={() => setAll(!all)}>
          {all ? 'Show the latest only' : `Show all ${countOf(newestFirst.length, 'reading')}`}
        </Button>
      )}
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
