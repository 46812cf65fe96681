// Starts the private MariaDB and keeps it running until Ctrl-C (handy beside `npm run dev`).
import { databaseUrl, ensureMariadb } from './lib/mariadb';

const db = await ensureMariadb();
console.log(`MariaDB ready: ${databaseUrl('wortwise', db.port)}`);
if (db.child) {
  const stop = () => void db.stop().then(() => process.exit(0));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
} else {
  process.exit(0);
}
