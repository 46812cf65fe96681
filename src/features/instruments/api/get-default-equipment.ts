import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EquipmentProfile } from '@shared/schemas/equipment';
import { api } from '@/lib/api-client';
import { equipmentKeys } from './keys';

/** The default kettle, or common-practice values (source 'common-practice') when none is saved. */
export const getDefaultEquipment = (signal?: AbortSignal) => api.get<EquipmentProfile>('/api/equipment/default', { signal });

export const defaultEquipmentQueryOptions = () => queryOptions({ queryKey: equipmentKeys.default(), queryFn: ({ signal }) => getDefaultEquipment(signal) });

export function useDefaultEquipment() {
  return useQuery(defaultEquipmentQueryOptions());
}
