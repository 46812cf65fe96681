/**
 * `npm run photos:to-s3`: moves photos still kept in MariaDB (`reading_photos.data`) to the photo
 * store named by S3_* (server/env.ts). Resumable and safe to run twice; prints what it did. With
 * no S3_ENDPOINT set it uses the local fake S3, which it starts when nothing answers there.
 * With `--sweep` it then removes objects no photo row points to (older than an hour).
 */
import { createDb } from '../server/db/client';
import { loadEnv } from '../server/env';
import { createPhotoStore } from '../server/brews/photo-store';
import { movePhotosToStore, sweepUnreferencedPhotos } from '../server/brews/move-photos';
import { databaseUrl } from './lib/mariadb';
import { ensureLocalS3 } from './lib/s3';

process.env.DATABASE_URL ??= databaseUrl('wortwise');
const env = loadEnv();
const fake = await ensureLocalS3();
const { db, pool } = createDb(env.DATABASE_URL);
const store = createPhotoStore(env);
try {
  const result = await movePhotosToStore(db, store, { log: (line) => console.log(line) });
  console.log(`Photos moved to ${env.S3_ENDPOINT}/${env.S3_BUCKET}: ${result.moved}; damaged and left in place: ${result.damaged.length ? result.damaged.join(', ') : 'none'}`);
  if (process.argv.includes('--sweep')) {
    const swept = await sweepUnreferencedPhotos(db, store);
    console.log(`Objects checked: ${swept.checked}; removed because no photo row points to them: ${swept.removed.length}`);
  }
} finally {
  store.close();
  await pool.end();
  await fake.stop();
}
