/**
 * `npm run dev`: MariaDB (started when needed), migrations and demo data, the fake SMTP and S3 servers,
 * the API in watch mode on API_PORT (default 3001) and Vite's dev server on :5173 proxying /api.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { createDb } from '../server/db/client';
import { migrateDatabase } from '../server/db/migrate';
import { seedDemo } from '../server/db/seed';
import '../server/demo-seeds';
import { startFakeSmtp } from '../server/mail/fake-smtp';
import { databaseUrl, ensureDatabase, ensureMariadb, projectRoot } from './lib/mariadb';
import { ensureLocalS3 } from './lib/s3';

const mariadb = process.env.DATABASE_URL ? null : await ensureMariadb();
const url = process.env.DATABASE_URL ?? databaseUrl('wortwise', mariadb!.port);
await ensureDatabase(url);
await migrateDatabase(url);
const { db, pool } = createDb(url);
await seedDemo(db);
await pool.end();
const smtp = await startFakeSmtp({ smtpPort: 2525, apiPort: 2526 }).catch(() => null);
const s3 = await ensureLocalS3();

const apiPort = process.env.API_PORT ?? '3001';
const env = {
  ...process.env,
  DATABASE_URL: url,
  PORT: apiPort,
  API_PORT: apiPort,
  APP_URL: 'http://127.0.0.1:5173',
  FAKE_SMTP_API_URL: 'http://127.0.0.1:2526',
};
const children: ChildProcess[] = [
  spawn('npx', ['tsx', 'watch', '--clear-screen=false', 'server/index.ts'], { cwd: projectRoot, stdio: 'inherit', env }),
  spawn('npx', ['vite'], { cwd: projectRoot, stdio: 'inherit', env }),
];

async function stop() {
  for (const child of children) child.kill('SIGTERM');
  await smtp?.close();
  await s3.stop();
  await mariadb?.stop();
  process.exit(0);
}
process.once('SIGINT', () => void stop());
process.once('SIGTERM', () => void stop());
