import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EquipmentProfile, EquipmentProfileInput, EquipmentProfileUpdate } from '@shared/schemas/equipment';
import { api } from '@/lib/api-client';
import { equipmentKeys } from './keys';

export const createEquipment = (input: EquipmentProfileInput) => api.post<EquipmentProfile>('/api/equipment', input);
export const updateEquipment = (id: number, input: EquipmentProfileUpdate) => api.patch<EquipmentProfile>(`/api/equipment/${id}`, input);
export const deleteEquipment = (id: number) => api.delete(`/api/equipment/${id}`);

/** Creates a kettle profile (id null) or updates one. */
export function useSaveEquipment(id: number | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: EquipmentProfileInput) => (id === null ? createEquipment(input) : updateEquipment(id, input)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}

export function useDeleteEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteEquipment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}
