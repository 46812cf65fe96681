/**
 * Moves photos uploaded before object storage out of `reading_photos.data` into the photo store.
 * Resumable and safe to run twice: each photo gets a key derived from its id, so a run cut off
 * between the upload and the update simply uploads the same bytes again; the update only touches a
 * row that has no key yet, and only then empties `data`.
 */
import { createHash } from 'node:crypto';
import { and, asc, eq, gt, isNotNull, isNull } from 'drizzle-orm';
import type { Db } from '../db/client';
import { readingPhotos } from '../db/schema';
import { photoKeyPrefix, type PhotoStore } from './photo-store';

export interface PhotoMove {
  moved: number;
  /** Rows whose bytes no longer match their SHA-256: left in place and named, never copied. */
  damaged: number[];
}

export const movedPhotoKey = (brewId: number, photoId: number) => `${photoKeyPrefix}brew-${brewId}/moved-${photoId}`;

export async function movePhotosToStore(db: Db, store: PhotoStore, { batchSize = 20, log = (_: string) => {} } = {}): Promise<PhotoMove> {
  const result: PhotoMove = { moved: 0, damaged: [] };
  let afterId = 0;
  for (;;) {
    const rows = await db
      .select({ id: readingPhotos.id, brewId: readingPhotos.brewId, mime: readingPhotos.mime, sha256: readingPhotos.sha256, data: readingPhotos.data })
      .from(readingPhotos)
      .where(and(isNull(readingPhotos.storageKey), isNotNull(readingPhotos.data), gt(readingPhotos.id, afterId)))
      .orderBy(asc(readingPhotos.id))
      .limit(batchSize);
    if (rows.length === 0) return result;
    for (const row of rows) {
      afterId = row.id;
      const bytes = row.data!;
      if (createHash('sha256').update(bytes).digest('hex') !== row.sha256) {
        result.damaged.push(row.id);
        log(`photo ${row.id}: bytes do not match the stored SHA-256; left in the database`);
        continue;
      }
      const key = movedPhotoKey(row.brewId, row.id);
      await store.put(key, bytes, row.mime);
      await db
        .update(readingPhotos)
        .set({ storageKey: key, data: null })
        .where(and(eq(readingPhotos.id, row.id), isNull(readingPhotos.storageKey)));
      result.moved += 1;
    }
    log(`moved ${result.moved} so far (last id ${afterId})`);
  }
}

/**
 * Removes objects no row points to: left by a deleted reading, brew day or account (MariaDB
 * cascades, the store has no foreign keys) or by an upload cut off between its two steps. Only
 * objects older than `olderThanMs` go, so an upload in progress (bytes stored, row not yet
 * inserted) is never touched.
 */
export async function sweepUnreferencedPhotos(db: Db, store: PhotoStore, { olderThanMs = 60 * 60 * 1000, now = new Date() } = {}): Promise<{ checked: number; removed: string[] }> {
  const referenced = new Set((await db.select({ key: readingPhotos.storageKey }).from(readingPhotos).where(isNotNull(readingPhotos.storageKey))).map((r) => r.key));
  const result = { checked: 0, removed: [] as string[] };
  for await (const object of store.list()) {
    result.checked += 1;
    if (referenced.has(object.key) || now.getTime() - object.lastModified.getTime() < olderThanMs) continue;
    // Read the rows again for this key: a photo moved or uploaded since the first read keeps its bytes.
    const [row] = await db.select({ id: readingPhotos.id }).from(readingPhotos).where(eq(readingPhotos.storageKey, object.key));
    if (row) continue;
    await store.remove(object.key);
    result.removed.push(object.key);
  }
  return result;
}
