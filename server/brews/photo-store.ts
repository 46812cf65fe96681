/**
 * Where the bytes of reading photos live: an S3-compatible object store through the AWS SDK
 * (docs/decisions/0018-photos-in-object-storage.md). MariaDB keeps each photo's row (type, size,
 * SHA-256, who may see it) and its `storage_key`; the store keeps only bytes. Locally and in tests
 * the store is the fake S3 server our scripts start (server/lib/fake-s3.ts).
 */
import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, paginateListObjectsV2 } from '@aws-sdk/client-s3';
import type { Env } from '../env';
import { HttpError } from '../lib/errors';

export class StorageUnavailable extends HttpError {
  constructor() {
    super(503, 'storage_unavailable', 'Photos cannot be reached just now. Please try again in a minute.');
  }
}

export interface PhotoStore {
  /** A fresh key for a new upload; keys are never reused, so a retried upload cannot overwrite another photo. */
  newKey(brewId: number): string;
  put(key: string, bytes: Buffer, mime: string): Promise<void>;
  /** The bytes as a stream; NotFound in the store is a StorageUnavailable too: the row says it should be there. */
  get(key: string): Promise<Readable>;
  /** Removes the object; missing objects are not an error (S3 deletes are idempotent). */
  remove(key: string): Promise<void>;
  /** Every object under our prefix, with when it was written (for the sweep of unreferenced objects). */
  list(): AsyncIterable<{ key: string; lastModified: Date }>;
  readonly bucket: string;
  close(): void;
}

export function s3ClientFromEnv(env: Env): S3Client {
  return new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    // Checksums only where S3 demands them: the fake server (and some S3-compatible stores) do not
    // understand the SDK's default trailing CRC checksums. The SHA-256 in our row covers integrity.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  });
}

async function unavailableOnFailure<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    console.warn(`[photo-store] ${(error as Error).name}: ${(error as Error).message}`);
    throw new StorageUnavailable();
  }
}

export const photoKeyPrefix = 'reading-photos/';

export function createPhotoStore(env: Env, client: S3Client = s3ClientFromEnv(env)): PhotoStore {
  const Bucket = env.S3_BUCKET;
  return {
    bucket: Bucket,
    newKey: (brewId) => `${photoKeyPrefix}brew-${brewId}/${randomUUID()}`,
    put: (Key, Body, ContentType) =>
      unavailableOnFailure(async () => {
        await client.send(new PutObjectCommand({ Bucket, Key, Body, ContentType, ContentLength: Body.length }));
      }),
    get: (Key) =>
      unavailableOnFailure(async () => {
        const answer = await client.send(new GetObjectCommand({ Bucket, Key }));
        return answer.Body as Readable;
      }),
    remove: (Key) =>
      unavailableOnFailure(async () => {
        await client.send(new DeleteObjectCommand({ Bucket, Key }));
      }),
    async *list() {
      for await (const page of paginateListObjectsV2({ client }, { Bucket, Prefix: photoKeyPrefix })) {
        for (const object of page.Contents ?? []) {
          if (object.Key) yield { key: object.Key, lastModified: object.LastModified ?? new Date(0) };
        }
      }
    },
    close: () => client.destroy(),
  };
}
