import { Plus } from 'lucide-react';
import { useState } from 'react';
import { instrumentKindLabels, instrumentKinds, type Instrument } from '@shared/schemas/instruments';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import type { Units } from '@/lib/units';
import { useInstruments } from '../api/list-instruments';
import { AddInstrumentForm } from './add-instrument-form';
import { InstrumentCard } from './instrument-card';

/** The brewer's instruments, grouped by kind, with a form to add one and the archived ones on request. */
export function InstrumentList({ units, elevationM }: { units: Units; elevationM: number | null }) {
  const { data, error, isPending, refetch, isRefetching } = useInstruments();
  const [adding, setAdding] = useState(false);
  const [showArchived, setShowArchived] = useState(false);
  const archived = useInstruments('only');

  if (isPending) return <Loading label="Loading your instruments…" />;
  if (error) {
    return (
      <Notice tone="error" title="Could not load your instruments">
        {error.message}{' '}
        <Button variant="quiet" busy={isRefetching} onClick={() => refetch()}>
          Try again
        </Button>
      </Notice>
    );
  }
  const hydrometers = data.filter((i) => i.kind === 'hydrometer');
  const groups = instrumentKinds.map((kind) => ({ kind, items: data.filter((i) => i.kind === kind) })).filter((g) => g.items.length > 0);
  const archivedItems: Instrument[] = archived.data ?? [];

  return (
    <div className="space-y-6">
      {adding ? (
        <section aria-label="Add an instrument" className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
          <h2 className="mb-3 text-lg font-semibold text-cellar-900">Add an instrument</h2>
          <AddInstrumentForm units={units} onAdded={() => setAdding(false)} onCancel={() => setAdding(false)} />
        </section>
      ) : (
        <Button icon={<Plus aria-hidden className="size-5" />} onClick={() => setAdding(true)}>
          Add an instrument
        </Button>
      )}

      {groups.length === 0 && !adding && (
        <p className="text-ink-soft">No instruments yet. Add the hydrometer, refractometer, thermometer and pH meter you read from, and each reading gets its own correction.</p>
      )}

      {groups.map((g) => (
        <section key={g.kind} aria-label={`${instrumentKindLabels[g.kind]}s`} className="space-y-3">
          <h2 className="text-lg font-bold text-cellar-900">{g.kind === 'ph_meter' ? 'pH meters' : `${instrumentKindLabels[g.kind]}s`}</h2>
          <div className="grid items-start gap-3 lg:grid-cols-2">
            {g.items.map((instrument) => (
              <InstrumentCard key={instrument.id} instrument={instrument} hydrometers={hydrometers} units={units} elevationM={elevationM} />
            ))}
          </div>
        </section>
      ))}

      {archivedItems.length > 0 && (
        <section aria-label="Archived instruments" className="space-y-3">
          <Button variant="quiet" aria-expanded={showArchived} onClick={() => setShowArchived((s) => !s)}>
            {showArchived ? 'Hide' : 'Show'} archived instruments ({archivedItems.length})
          </Button>
          {showArchived &&
            archivedItems.map((instrument) => <InstrumentCard key={instrument.id} instrument={instrument} hydrometers={hydrometers} units={units} elevationM={elevationM} />)}
        </section>
      )}
    </div>
  );
}
