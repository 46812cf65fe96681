import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EquipmentProfile } from '@shared/schemas/equipment';
import { api } from '@/lib/api-client';
import { equipmentKeys } from './keys';

export const listEquipment = (signal?: AbortSignal) => api.get<EquipmentProfile[]>('/api/equipment', { signal });

export const equipmentQueryOptions = () => queryOptions({ queryKey: equipmentKeys.list(), queryFn: ({ signal }) => listEquipment(signal) });

export function useEquipment() {
  return useQuery(equipmentQueryOptions());
}
