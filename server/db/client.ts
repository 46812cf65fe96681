import { drizzle } from 'drizzle-orm/mysql2';
import type { Logger } from 'drizzle-orm/logger';
import mysql from 'mysql2/promise';
import * as schema from './schema';
import { retryTransactions } from './transaction';

/** Ten connections suit one instance on a small machine; DB_POOL_SIZE changes it (server/env.ts). */
export const DEFAULT_POOL_SIZE = 10;

export interface DbOptions {
  /** At most this many connections to MariaDB at once; requests beyond it wait their turn. */
  poolSize?: number;
  /** Drizzle's query logger: the tests count statements with it. */
  logger?: Logger;
  /**
   * mysql2 captures a stack trace before every statement so an error can point at the caller
   * (its `trace` option, on by default). Worth it while developing; production turns it off,
   * since it is paid on every statement and not only on failures (issue 14: per-request cost).
   */
  trace?: boolean;
}

export function createDb(url: string, options: DbOptions = {}) {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: options.poolSize ?? DEFAULT_POOL_SIZE,
    connectTimeout: 5_000,
    // DATETIME/TIMESTAMP values are UTC on both sides.
    timezone: 'Z',
    // Dates and times arrive as text, as drizzle's own per-field typeCast makes them; prepared
    // queries (prepared.ts) rely on this to skip that per-field call.
    dateStrings: ['TIMESTAMP', 'DATETIME', 'DATE'],
    enableKeepAlive: true,
    trace: options.trace ?? true,
  });
  // Every db.transaction retries a deadlock or lock-wait timeout: see transaction.ts.
  const db = retryTransactions(drizzle(pool, { schema, mode: 'default', logger: options.logger ?? false }));
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>['db'];
/** A transaction handle has the same query API as the database. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;
