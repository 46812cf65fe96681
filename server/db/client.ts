import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema';
import { retryTransactions } from './transaction';

export function createDb(url: string) {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: 10,
    connectTimeout: 5_000,
    // DATETIME/TIMESTAMP values are UTC on both sides.
    timezone: 'Z',
    enableKeepAlive: true,
  });
  // Every db.transaction retries a deadlock or lock-wait timeout: see transaction.ts.
  const db = retryTransactions(drizzle(pool, { schema, mode: 'default' }));
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>['db'];
/** A transaction handle has the same query API as the database. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;
