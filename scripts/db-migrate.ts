// Applies the committed migrations to DATABASE_URL, or to the private MariaDB's "wortwise" database.
import { migrateDatabase } from '../server/db/migrate';
import { databaseUrl, ensureDatabase, ensureMariadb } from './lib/mariadb';

const running = process.env.DATABASE_URL ? null : await ensureMariadb();
const url = process.env.DATABASE_URL ?? databaseUrl('wortwise');
await ensureDatabase(url);
await migrateDatabase(url);
console.log('Migrations applied.');
await running?.stop();
