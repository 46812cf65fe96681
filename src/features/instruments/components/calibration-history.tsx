import type { CalibrationEntry } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import type { Units } from '@/lib/units';
import { useCalibrations } from '../api/list-calibrations';
import { methodLabels, snapshotSummary } from './describe';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function detail(entry: CalibrationEntry): string | null {
  const r = entry.result as { count?: number; spread?: number; expectedBoilingC?: number | null } | null;
  const note = typeof entry.inputs.note === 'string' ? entry.inputs.note : null;
  if (entry.method === 'wcf-pairs' && r?.count) return `${r.count} pairs, spread ${r.spread?.toFixed(3)}`;
  return note;
}

/** What changed when: every calibration the brewer accepted, newest first. */
export function CalibrationHistory({ instrumentId, units }: { instrumentId: number; units: Units }) {
  const { data, error, isPending, refetch, isRefetching } = useCalibrations(instrumentId);
  if (isPending) return <Loading label="Loading the log…" />;
  if (error) {
    return (
      <Notice tone="error" title="Could not load the log">
        {error.message}{' '}
        <Button variant="quiet" busy={isRefetching} onClick={() => refetch()}>
          Try again
        </Button>
      </Notice>
    );
  }
  return (
    <ol className="space-y-2" aria-label="Calibration log">
      {data.map((entry) => {
        const extra = detail(entry);
        return (
          <li key={entry.id} className="rounded-lg bg-white p-3 text-sm ring-1 ring-cellar-100">
            <p className="flex flex-wrap justify-between gap-x-2">
              <strong className="text-cellar-900">{methodLabels[entry.method]}</strong>
              <time dateTime={entry.createdAt} className="text-ink-faint">
                {when(entry.createdAt)}
              </time>
            </p>
            <p className="text-ink-soft">
              {entry.before ? (
                <>
                  {snapshotSummary(entry.before, units)} → <strong className="text-ink">{snapshotSummary(entry.after, units)}</strong>
                </>
              ) : (
                <>started with {snapshotSummary(entry.after, units)}</>
              )}
            </p>
            {extra && <p className="text-ink-faint">{extra}</p>}
          </li>
        );
      })}
    </ol>
  );
}
