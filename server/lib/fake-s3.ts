/**
 * A local stand-in for S3: `s3rver`, a real S3 HTTP API kept in a folder, with our bucket made at
 * start. Used by our scripts and tests only (like the fake SMTP server), never in production.
 * Its fixed credentials are S3RVER / S3RVER, the defaults in server/env.ts.
 */
import type { AddressInfo } from 'node:net';
import S3rver from 's3rver';

export interface FakeS3 {
  port: number;
  endpoint: string;
  close(): Promise<void>;
}

export async function startFakeS3({ port = 0, directory, bucket }: { port?: number; directory: string; bucket: string }): Promise<FakeS3> {
  const server = new S3rver({ address: '127.0.0.1', port, silent: true, directory, configureBuckets: [{ name: bucket, configs: [] }] });
  const address = (await server.run()) as AddressInfo;
  return {
    port: address.port,
    endpoint: `http://127.0.0.1:${address.port}`,
    close: () => server.close(),
  };
}
