import { Plus } from 'lucide-react';
import { useState } from 'react';
import { DEFAULT_EQUIPMENT, type EquipmentProfile } from '@shared/schemas/equipment';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import type { Units } from '@/lib/units';
import { useDefaultEquipment } from '../api/get-default-equipment';
import { useEquipment } from '../api/list-equipment';
import { EquipmentCard } from './equipment-card';

const blankKettle: EquipmentProfile = {
  id: null,
  ...DEFAULT_EQUIPMENT,
  name: 'Another kettle',
  isDefault: false,
  boilOffMeasurement: null,
  source: 'common-practice',
  note: null,
  updatedAt: null,
};

/** The brewer's kettles; until one is saved, the common-practice values the brew day would use. */
export function EquipmentSection({ units }: { units: Units }) {
  const list = useEquipment();
  const fallback = useDefaultEquipment();
  const [adding, setAdding] = useState(false);
  if (list.isPending || fallback.isPending) return <Loading label="Loading your kettle…" />;
  if (list.error || fallback.error) {
    return (
      <Notice tone="error" title="Could not load your kettle">
        {(list.error ?? fallback.error)!.message}{' '}
        <Button variant="quiet" onClick={() => void Promise.all([list.refetch(), fallback.refetch()])}>
          Try again
        </Button>
      </Notice>
    );
  }
  const profiles = list.data.length > 0 ? list.data : [fallback.data];
  return (
    <div className="space-y-3">
      {profiles.map((p) => (
        <EquipmentCard key={p.id ?? 'defaults'} profile={p} units={units} canDelete={list.data.length > 1} />
      ))}
      {list.data.length > 0 &&
        (adding ? (
          <div className="space-y-2">
            <EquipmentCard profile={blankKettle} units={units} canDelete={false} onSaved={() => setAdding(false)} />
            <Button variant="quiet" onClick={() => setAdding(false)}>
              Cancel
            </Button>
          </div>
        ) : (
          <Button variant="secondary" icon={<Plus aria-hidden className="size-5" />} onClick={() => setAdding(true)}>
            Add another kettle
          </Button>
        ))}
    </div>
  );
}
