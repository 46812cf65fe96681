/**
 * `npm run cluster`: Wortwise beyond one machine, on loopback. Three MariaDB Galera nodes, two
 * API instances, HAProxy in front of both tiers, Redis for the shared rate limits, the fake S3 and
 * fake SMTP, migrations and the demo data. Everything is installed from Debian's packages when
 * missing. Ctrl-C stops all of it. Topology and ports: docs/deploy.md.
 */
import { execFileSync } from 'node:child_process';
import { createDb } from '../server/db/client';
import { migrateDatabase } from '../server/db/migrate';
import { seedDemo } from '../server/db/seed';
import '../server/demo-seeds';
import { startFakeSmtp } from '../server/mail/fake-smtp';
import { clusterRoot, ports, startCluster, stopEverything } from './lib/cluster';
import { projectRoot } from './lib/mariadb';
import { ensureLocalS3 } from './lib/s3';

let stopping = false;
async function stop(code = 0) {
  if (stopping) return;
  stopping = true;
  console.log('Stopping the cluster…');
  await stopEverything();
  await smtp?.close();
  await s3?.stop();
  process.exit(code);
}
process.once('SIGINT', () => void stop());
process.once('SIGTERM', () => void stop());

let smtp: Awaited<ReturnType<typeof startFakeSmtp>> | null = null;
let s3: Awaited<ReturnType<typeof ensureLocalS3>> | null = null;
if (!process.env.SKIP_BUILD) {
  console.log('Building the client…');
  execFileSync('npx', ['vite', 'build', '--logLevel', 'warn'], { cwd: projectRoot, stdio: 'inherit' });
}
s3 = await ensureLocalS3();
smtp = await startFakeSmtp({ smtpPort: ports.smtp, apiPort: ports.smtpApi });
const cluster = await startCluster({
  async afterDatabase(url) {
    await migrateDatabase(url);
    const { db, pool } = createDb(url);
    console.log((await seedDemo(db)) ? 'Demo data added.' : 'Demo data already present.');
    await pool.end();
  },
}).catch(async (error: unknown) => {
  console.error(error);
  await stop(1);
  throw error;
});

console.log(`
Wortwise on a local cluster (logs and data in ${clusterRoot}):
  open            ${cluster.webUrl}   (HAProxy → API instances on ${ports.apps.join(', ')})
  database        127.0.0.1:${ports.dbBalancer}   (HAProxy → Galera nodes on ${ports.nodes.join(', ')})
  rate limits     Redis on 127.0.0.1:${ports.redis}
  mail            http://127.0.0.1:${ports.smtpApi}/messages
Ctrl-C stops everything.`);

