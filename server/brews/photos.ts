/**
 * Photos of a reading (a hydrometer in its trial jar, a refractometer's scale). The row (type,
 * size, SHA-256) is in MariaDB, the bytes in object storage (./photo-store.ts), so every API
 * instance serves the same photo: see docs/decisions/0018-photos-in-object-storage.md. The type
 * is read from the file's first bytes; the name and Content-Type the client sends are not trusted.
 */
import { createHash } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import type { Request, Response } from 'express';
import { and, count, eq } from 'drizzle-orm';
import { PHOTO_MAX_BYTES, type PhotoMime, type ReadingPhoto } from '@shared/schemas/brews';
import type { Actor } from '../auth/permissions';
import type { Db } from '../db/client';
import { lockBrewRow } from '../db/locks';
import { readingPhotos } from '../db/schema';
import { BadRequest, HttpError, NotFound } from '../lib/errors';
import { singleUpload } from '../lib/upload';
import type { PhotoStore } from './photo-store';
import { loadReading } from './readings';
import { loadBrewForActor, photoUrl } from './service';

export const PHOTOS_PER_READING = 6;

class UnsupportedMediaType extends HttpError {
  constructor(message: string) {
    super(415, 'unsupported_media_type', message, { photo: message });
  }
}

/** JPEG, PNG or WebP by their signatures (JPEG: FF D8 FF; PNG: the 8-byte PNG signature; WebP: a RIFF container of type WEBP). */
export function sniffImageType(bytes: Buffer): PhotoMime | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length >= 8 && png.every((b, i) => bytes[i] === b)) return 'image/png';
  if (bytes.length >= 12 && bytes.toString('latin1', 0, 4) === 'RIFF' && bytes.toString('latin1', 8, 12) === 'WEBP') return 'image/webp';
  return null;
}

export const receivePhoto = singleUpload({
  field: 'photo',
  what: 'photo',
  maxBytes: PHOTO_MAX_BYTES,
  tooLargeTip: 'Take it at a lower resolution or crop it, then try again.',
});

function toPhoto(brewId: number, row: { id: number; readingId: number; mime: PhotoMime; sizeBytes: number; sha256: string; createdAt: Date }): ReadingPhoto {
  return { ...row, createdAt: row.createdAt.toISOString(), url: photoUrl(brewId, row.readingId, row.id) };
}

export async function addPhoto(db: Db, store: PhotoStore, actor: Actor, brewId: number, readingId: number, file: Express.Multer.File | undefined): Promise<ReadingPhoto> {
  await loadBrewForActor(db, actor, brewId, 'update');
  await loadReading(db, brewId, readingId);
  if (!file || file.size === 0) {
    const message = 'Choose a photo to upload.';
    throw new BadRequest(message, { photo: message });
  }
  const mime = sniffImageType(file.buffer);
  if (!mime) throw new UnsupportedMediaType('That file is not a JPEG, PNG or WebP image. Choose a photo taken with your camera.');
  const sha256 = createHash('sha256').update(file.buffer).digest('hex');
  // Bytes first, under a key never used before; the row only appears once they are stored.
  const storageKey = store.newKey(brewId);
  await store.put(storageKey, file.buffer, mime);
  const values = { readingId, brewId, mime, sizeBytes: file.size, sha256, storageKey };
  const id = await db
    .transaction(async (tx) => {
      // Counted under the brew row lock, so twelve uploads at once still keep at most six.
      await lockBrewRow(tx, brewId);
      const [{ n }] = await tx.select({ n: count() }).from(readingPhotos).where(eq(readingPhotos.readingId, readingId));
      if (Number(n) >= PHOTOS_PER_READING) {
        const message = `A reading keeps at most ${PHOTOS_PER_READING} photos. Delete one first.`;
        throw new BadRequest(message, { photo: message });
      }
      const [{ id }] = await tx.insert(readingPhotos).values(values).$returningId();
      return id;
    })
    .catch(async (error: unknown) => {
      // Nothing points at the bytes: take them away again.
      await store.remove(storageKey).catch(() => {});
      throw error;
    });
  const [row] = await db
    .select({ id: readingPhotos.id, readingId: readingPhotos.readingId, mime: readingPhotos.mime, sizeBytes: readingPhotos.sizeBytes, sha256: readingPhotos.sha256, createdAt: readingPhotos.createdAt })
    .from(readingPhotos)
    .where(eq(readingPhotos.id, id));
  return toPhoto(brewId, row);
}

async function findPhoto(db: Db, brewId: number, readingId: number, photoId: number) {
  const [row] = await db
    .select()
    .from(readingPhotos)
    .where(and(eq(readingPhotos.id, photoId), eq(readingPhotos.readingId, readingId), eq(readingPhotos.brewId, brewId)));
  if (!row) throw new NotFound('That photo was not found.');
  return row;
}

/** Sends the image to someone who may read the brew day; never cached by shared caches, never sniffed. */
export async function sendPhoto(db: Db, store: PhotoStore, actor: Actor, brewId: number, readingId: number, photoId: number, req: Request, res: Response) {
  await loadBrewForActor(db, actor, brewId, 'read');
  const row = await findPhoto(db, brewId, readingId, photoId);
  const etag = `"${row.sha256}"`;
  const fresh = req.headers['if-none-match'] === etag;
  // Asked before any header is set, so a store that cannot answer gives a plain 503.
  const body = !fresh && row.storageKey ? await store.get(row.storageKey) : null;
  res.set({
    'Content-Type': row.mime,
    'X-Content-Type-Options': 'nosniff',
    'Cache-Control': 'private, max-age=3600',
    'Content-Disposition': `inline; filename="reading-${readingId}-photo-${photoId}.${row.mime.split('/')[1]}"`,
    ETag: etag,
  });
  if (fresh) {
    res.status(304).end();
    return;
  }
  // Rows from before object storage keep their bytes until `npm run photos:to-s3` moves them.
  if (!body) {
    res.status(200).end(row.data);
    return;
  }
  res.set('Content-Length', String(row.sizeBytes)).status(200);
  await pipeline(body, res);
}

export async function deletePhoto(db: Db, store: PhotoStore, actor: Actor, brewId: number, readingId: number, photoId: number) {
  await loadBrewForActor(db, actor, brewId, 'update');
  const row = await findPhoto(db, brewId, readingId, photoId);
  await db.delete(readingPhotos).where(eq(readingPhotos.id, photoId));
  // The row is gone, so the photo is; an object left behind by a failure here is swept later.
  if (row.storageKey) await store.remove(row.storageKey).catch(() => {});
}
