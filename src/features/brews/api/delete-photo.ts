import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadingPhoto } from '@shared/schemas/brews';
import { api } from '@/lib/api-client';
import { updateCachedReading } from './reading-cache';

export const deletePhoto = (photo: Pick<ReadingPhoto, 'id' | 'readingId' | 'url'>) => api.delete(photo.url);

export function useDeletePhoto(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Send even when the browser says it is offline: a failed save must say so and offer a retry, not wait silently.
    networkMode: 'always',
    mutationFn: deletePhoto,
    onSuccess: (_void, photo) => updateCachedReading(queryClient, brewId, photo.readingId, (r) => ({ ...r, photos: r.photos.filter((p) => p.id !== photo.id) })),
  });
}
