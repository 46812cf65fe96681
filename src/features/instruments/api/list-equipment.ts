import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EquipmentProfile } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';

export const listEquipment = () => api.get<EquipmentProfile[]>('/api/equipment');

export const equipmentQueryOptions = () => queryOptions({ queryKey: ['equipment', 'list'], queryFn: listEquipment });

export function useEquipment() {
  return useQuery(equipmentQueryOptions());
}
