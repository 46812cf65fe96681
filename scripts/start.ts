/**
 * `npm start`: everything on a fresh machine. MariaDB (installed and started when needed),
 * migrations, demo data once, the fake SMTP server, the fake S3 for photos, the built client and
 * the API on one port.
 * Run again, it reuses what is already running; Ctrl-C stops what it started.
 */
import { buildClientIfChanged } from './lib/client-build';
import { seedDemo } from '../server/db/seed';
import '../server/demo-seeds';
import { createDb } from '../server/db/client';
import { migrateDatabase } from '../server/db/migrate';
import { loadEnv } from '../server/env';
import { startServer } from '../server/index';
import { startFakeSmtp, type FakeSmtp } from '../server/mail/fake-smtp';
import { databaseUrl, ensureDatabase, ensureMariadb, projectRoot, type RunningMariadb } from './lib/mariadb';
import { ensureLocalS3 } from './lib/s3';

const stops: (() => Promise<void>)[] = [];
let stopping = false;
async function stopAll(code: number) {
  if (stopping) return;
  stopping = true;
  for (const stop of stops.reverse()) await stop().catch(() => {});
  process.exit(code);
}
process.once('SIGINT', () => void stopAll(0));
process.once('SIGTERM', () => void stopAll(0));

try {
  let mariadb: RunningMariadb | null = null;
  if (!process.env.DATABASE_URL) {
    mariadb = await ensureMariadb();
    stops.push(() => mariadb!.stop());
    process.env.DATABASE_URL = databaseUrl('wortwise', mariadb.port);
  }
  const url = process.env.DATABASE_URL;
  await ensureDatabase(url);
  await migrateDatabase(url);
  const { db, pool } = createDb(url);
  console.log((await seedDemo(db)) ? 'Demo data added.' : 'Demo data already present.');
  await pool.end();

  const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
  let smtp: FakeSmtp | null = null;
  if (!process.env.SMTP_HOST) {
    try {
      smtp = await startFakeSmtp({ smtpPort, apiPort: smtpPort + 1 });
      stops.push(() => smtp!.close());
      console.log(`Fake SMTP catching mail on 127.0.0.1:${smtp.smtpPort}; listing at ${smtp.apiUrl}/messages`);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EADDRINUSE') throw error;
      console.log(`Fake SMTP already running on 127.0.0.1:${smtpPort}; reusing it.`);
    }
    process.env.FAKE_SMTP_API_URL ??= `http://127.0.0.1:${smtpPort + 1}`;
  }

  const s3 = await ensureLocalS3();
  stops.push(() => s3.stop());

  if (!process.env.SKIP_BUILD) {
    console.log('Checking the client build…');
    const outcome = buildClientIfChanged(projectRoot);
    console.log(outcome === 'built' ? 'Client built.' : 'Client unchanged since the last build; reusing dist/.');
  }
  const server = await startServer(loadEnv());
  stops.push(() => server.stop());
  console.log(`Open http://127.0.0.1:${server.port} — demo sign-ins are in README.md. Ctrl-C stops.`);
} catch (error) {
  if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
    console.error('Port in use: is Wortwise already running? Set PORT to use another.');
  } else {
    console.error(error);
  }
  await stopAll(1);
}
