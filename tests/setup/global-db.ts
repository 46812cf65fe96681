/**
 * Vitest global setup: our own MariaDB (installed and started when needed) and a fresh database
 * for this run, built from the committed migrations. The name is unique per run, so two runs
 * (or two projects) never share tables.
 */
import type { TestProject } from 'vitest/node';
import { migrateDatabase } from '../../server/db/migrate';
import { databaseUrl, ensureDatabase, ensureMariadb } from '../../scripts/lib/mariadb';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const running = await ensureMariadb();
  const name = `wortwise_test_${project.name}_${process.pid}`;
  const url = databaseUrl(name, running.port);
  await ensureDatabase(url, { fresh: true });
  await migrateDatabase(url);
  project.provide('databaseUrl', url);
  return async () => {
    const mysql = await import('mysql2/promise');
    const conn = await mysql.createConnection(databaseUrl('', running.port).replace(/\/$/, '/'));
    await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await conn.end();
    await running.stop();
  };
}
