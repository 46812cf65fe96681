/**
 * Browser tests: build the client, then serve it with the real API on a free port, backed by
 * this run's database, a fake SMTP server whose listing the tests read and a fake S3 for photos.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { seedDemo } from '../../server/db/seed';
import '../../server/demo-seeds';
import { createDb } from '../../server/db/client';
import { loadEnv } from '../../server/env';
import { startServer } from '../../server/index';
import { startFakeS3 } from '../../server/lib/fake-s3';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { ensureChromium } from '../../scripts/lib/chromium';
import { projectRoot } from '../../scripts/lib/mariadb';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    fakeSmtpApiUrl: string;
  }
}

export default async function setup(project: TestProject) {
  ensureChromium();
  // A private build per run, so parallel runs and a developer's own dist/ never collide.
  const clientDist = path.join(projectRoot, '.data', `test-dist-${process.pid}`);
  execFileSync('npx', ['vite', 'build', '--logLevel', 'error', '--outDir', clientDist, '--emptyOutDir'], { cwd: projectRoot, stdio: 'inherit' });
  const databaseUrl = project.getProvidedContext().databaseUrl;
  const { db, pool } = createDb(databaseUrl);
  await seedDemo(db);
  await pool.end();
  const smtp = await startFakeSmtp();
  const s3Dir = mkdtempSync(path.join(os.tmpdir(), 'wortwise-s3-'));
  const s3 = await startFakeS3({ directory: s3Dir, bucket: 'wortwise-test-photos' });
  const server = await startServer(
    loadEnv({
      NODE_ENV: 'test',
      PORT: '0',
      DATABASE_URL: databaseUrl,
      SMTP_PORT: String(smtp.smtpPort),
      FAKE_SMTP_API_URL: smtp.apiUrl,
      S3_ENDPOINT: s3.endpoint,
      S3_BUCKET: 'wortwise-test-photos',
      AUTH_RATE_LIMIT_MAX: '10000',
      CALC_RATE_LIMIT_MAX: '10000',
      CLIENT_DIST: clientDist,
    }),
  );
  project.provide('baseUrl', `http://127.0.0.1:${server.port}`);
  project.provide('fakeSmtpApiUrl', smtp.apiUrl);
  return async () => {
    await server.stop();
    await smtp.close();
    await s3.close();
    rmSync(s3Dir, { recursive: true, force: true });
    rmSync(clientDist, { recursive: true, force: true });
  };
}
