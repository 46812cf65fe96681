import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadingPhoto } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { brewKeys } from './keys';

/** The server decides the type from the file's bytes; the name and type sent here are not trusted. */
export const uploadPhoto = (brewId: number, readingId: number, file: File) => {
  const form = new FormData();
  form.append('photo', file);
  return api.post<ReadingPhoto>(`/api/brews/${brewId}/readings/${readingId}/photos`, form);
};

export function useUploadPhoto(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: ({ readingId, file }: { readingId: number; file: File }) => uploadPhoto(brewId, readingId, file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: brewKeys.detail(brewId) }),
  });
}
