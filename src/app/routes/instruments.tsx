import type { QueryClient } from '@tanstack/react-query';
import { defaultEquipmentQueryOptions, useDefaultEquipment } from '@/features/instruments/api/get-default-equipment';
import { equipmentQueryOptions } from '@/features/instruments/api/list-equipment';
import { instrumentsQueryOptions } from '@/features/instruments/api/list-instruments';
import { EquipmentSection } from '@/features/instruments/components/equipment-section';
import { InstrumentList } from '@/features/instruments/components/instrument-list';
import { PageHeader } from '@/components/ui/page';
import { useUnits } from '@/lib/units';

export const loader = (queryClient: QueryClient) => () =>
  Promise.all([
    queryClient.prefetchQuery(instrumentsQueryOptions()),
    queryClient.prefetchQuery(equipmentQueryOptions()),
    queryClient.prefetchQuery(defaultEquipmentQueryOptions()),
  ]);

export function Component() {
  const units = useUnits();
  const kettle = useDefaultEquipment();
  return (
    <>
      <PageHeader title="Instruments" subtitle="Your own instruments and kettle, so every reading gets the right correction without any arithmetic." />
      <div className="space-y-10">
        <InstrumentList units={units} elevationM={kettle.data?.elevationM ?? null} />
        <section aria-labelledby="kettle-heading" className="space-y-3">
          <h2 id="kettle-heading" className="text-xl font-bold text-cellar-900">
            Kettle and losses
          </h2>
          <p className="text-ink-soft">What the boil takes away: the brew day starts from your default kettle.</p>
          <EquipmentSection units={units} />
        </section>
      </div>
    </>
  );
}
