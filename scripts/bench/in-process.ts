/**
 * The in-process Wortwise the smaller benchmarks drive through supertest: a fresh database of its
 * own on the private MariaDB, migrated and seeded with the demo, and Priya signed in.
 */
import request from 'supertest';
import { createApp } from '../../server/app';
import { createDb } from '../../server/db/client';
import { migrateDatabase } from '../../server/db/migrate';
import { seedDemo } from '../../server/db/seed';
import '../../server/demo-seeds';
import { loadEnv } from '../../server/env';
import { createMailer } from '../../server/mail/mailer';
import { databaseUrl, ensureDatabase, ensureMariadb } from '../lib/mariadb';

export async function startInProcessApp(databaseName: string) {
  const mariadb = await ensureMariadb();
  const url = databaseUrl(`${databaseName}_${process.pid}`, mariadb.port);
  await ensureDatabase(url, { fresh: true });
  await migrateDatabase(url);
  const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: url, AUTH_RATE_LIMIT_MAX: '100000', CALC_RATE_LIMIT_MAX: '100000' });
  const { db, pool } = createDb(url);
  await seedDemo(db);
  const agent = request.agent(createApp({ env, db, pool, mailer: createMailer(env) }));
  await agent.post('/api/auth/login').send({ email: 'priya@hollow-oak.example', password: 'wortwise-demo' }).expect(200);
  const recipeId = (await agent.get('/api/recipes').expect(200)).body.items[0].id as number;
  /** Drops the database and stops what was started. */
  const stop = async () => {
    await pool.query(`DROP DATABASE \`${new URL(url).pathname.slice(1)}\``);
    await pool.end();
    await mariadb.stop();
  };
  return { db, pool, agent, recipeId, stop };
}
