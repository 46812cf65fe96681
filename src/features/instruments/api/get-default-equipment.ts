import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EquipmentProfile } from '@shared/schemas/instruments';
import { api } from '@/lib/api-client';

/** The default kettle, or common-practice values (source 'common-practice') when none is saved. */
export const getDefaultEquipment = () => api.get<EquipmentProfile>('/api/equipment/default');

export const defaultEquipmentQueryOptions = () => queryOptions({ queryKey: ['equipment', 'default'], queryFn: getDefaultEquipment });

export function useDefaultEquipment() {
  return useQuery(defaultEquipmentQueryOptions());
}
