/**
 * The local fake S3 for `npm start`, `npm run dev`, the cluster and the photo move: started on the
 * port of the default S3_ENDPOINT (4568) with its files in .data/s3, or reused when something
 * already answers there. Skipped entirely when S3_ENDPOINT points at a real store.
 */
import { mkdirSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { loadEnv } from '../../server/env';
import { startFakeS3 } from '../../server/lib/fake-s3';
import { dataRoot } from './mariadb';

function answers(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: '127.0.0.1', port }, () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

export async function ensureLocalS3(): Promise<{ stop(): Promise<void> }> {
  if (process.env.S3_ENDPOINT) return { stop: async () => {} };
  const { S3_ENDPOINT, S3_BUCKET } = loadEnv({ ...process.env, S3_ENDPOINT: undefined });
  const port = Number(new URL(S3_ENDPOINT).port);
  if (await answers(port)) {
    console.log(`Fake S3 already running on 127.0.0.1:${port}; reusing it.`);
    return { stop: async () => {} };
  }
  const directory = path.join(dataRoot, 's3');
  mkdirSync(directory, { recursive: true });
  const fake = await startFakeS3({ port, directory, bucket: S3_BUCKET });
  console.log(`Fake S3 keeping photos in ${path.relative(process.cwd(), directory)} on ${fake.endpoint} (bucket ${S3_BUCKET})`);
  return { stop: () => fake.close() };
}
