import { useState } from 'react';
import { packagingSugarLabels, type PackagingRecord } from '@shared/schemas/fermentation';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useUnits } from '@/lib/units';
import { useUndoPackaging } from '../api/packaging';
import { shortDateTime, verdictTitles } from './words';
import { Figure } from '@/components/ui/figure';

/** How the beer was packaged; an override is shown plainly, for the brewer and a mentor alike. */
export function PackagingRecordView({ brewId, record, canEdit }: { brewId: number; record: PackagingRecord; canEdit: boolean }) {
  const units = useUnits();
  const undo = useUndoPackaging(brewId);
  const [confirm, setConfirm] = useState(false);
  return (
    <div className="space-y-3">
      {record.override ? (
        <Notice tone="error" title="Packaged before the gravity was proven stable">
          <p>
            Verdict at the time: {verdictTitles[record.verdictState]}. {record.verdictReason}
          </p>
          <p className="mt-1">
            <span className="font-semibold">Reason given:</span> {record.overrideReason}
          </p>
        </Notice>
      ) : (
        <Notice tone="success">Packaged with a stable final gravity.</Notice>
      )}
      <dl className="grid grid-cols-2 gap-3 text-sm">
        <Figure labelStyle="plain" size="sm" label="Into" value={record.container === 'bottles' ? 'Bottles' : 'Keg'} />
        <Figure labelStyle="plain" size="sm" label="When" value={shortDateTime(record.packagedAt)} />
        <Figure labelStyle="plain" size="sm" label="Volume" value={units.format('volume', record.volumeL)} />
        <Figure labelStyle="plain" size="sm" label="Warmest temperature" value={units.format('temperature', record.warmestTempC)} />
        <Figure labelStyle="plain" size="sm" label="Carbonation wanted" value={`${record.targetCo2Volumes} volumes`} />
        <Figure labelStyle="plain" size="sm" label="Priming sugar" value={record.primingSugarG === null ? 'None (CO2)' : `${units.format('smallMass', record.primingSugarG)} ${packagingSugarLabels[record.sugar].toLowerCase()}`} />
      </dl>
      {record.note && <p className="text-sm">{record.note}</p>}
      {canEdit &&
        (confirm ? (
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" busy={undo.isPending} onClick={() => undo.mutate(undefined, { onSuccess: () => setConfirm(false) })}>
              Undo the packaging record
            </Button>
            <Button variant="quiet" onClick={() => setConfirm(false)}>
              Keep it
            </Button>
          </div>
        ) : (
          <Button variant="secondary" onClick={() => setConfirm(true)}>
            Undo packaging
          </Button>
        ))}
      {undo.error && <Notice tone="error">{undo.error.message}</Notice>}
    </div>
  );
}
