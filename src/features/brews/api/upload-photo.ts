import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PHOTO_MAX_BYTES, photoMimeTypes, type ReadingPhoto } from '@shared/schemas/brews';
import { api, ApiError } from '@/lib/api-client';
import { sendOrQueue } from '@/lib/offline/send';
import { updateCachedReading } from './reading-cache';

/** The server decides the type from the file's bytes; the name and type sent here are not trusted. */
export const uploadPhoto = (brewId: number, readingId: number, file: File) => {
  const form = new FormData();
  form.append('photo', file);
  return api.post<ReadingPhoto>(`/api/brews/${brewId}/readings/${readingId}/photos`, form);
};

/**
 * The limits the server applies, checked on the device first, so a photo kept offline is not
 * refused hours later for something the phone could have said at once.
 */
export function photoProblem(file: Blob): string | null {
  if (file.size > PHOTO_MAX_BYTES) return `The photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB. Take it at a lower resolution or crop it, then try again.`;
  if (file.type && !(photoMimeTypes as readonly string[]).includes(file.type)) return 'That file is not a JPEG, PNG or WebP image. Choose a photo taken with your camera.';
  return null;
}

export function useUploadPhoto(brewId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Run even when the browser says it is offline: the photo waits on the device with the queue.
    networkMode: 'always',
    mutationFn: ({ readingId, file }: { readingId: number; file: File }) => {
      const problem = photoProblem(file);
      if (problem) throw new ApiError(413, { error: 'photo_rejected', message: problem });
      const takenAt = new Date().toISOString();
      return sendOrQueue<ReadingPhoto>({
        brewId,
        kind: 'photo',
        url: `/api/brews/${brewId}/readings/${readingId}/photos`,
        body: { fileName: file.name },
        photo: file,
        label: 'Photo of a reading',
        takenAt,
      });
    },
    // A photo moves no deviation: it joins its reading on the page, without the day asked for again.
    onSuccess: (outcome) => {
      if (outcome.status !== 'sent') return;
      const photo = outcome.data;
      updateCachedReading(queryClient, brewId, photo.readingId, (r) => ({ ...r, photos: [...r.photos.filter((p) => p.id !== photo.id), photo] }));
    },
  });
}
