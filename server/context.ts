import type { Redis } from 'ioredis';
import type { Pool } from 'mysql2/promise';
import type { Db } from './db/client';
import type { Env } from './env';
import type { Mailer } from './mail/mailer';

/** What every router and service may depend on; built once in index.ts (or by a test). */
export interface AppContext {
  env: Env;
  db: Db;
  pool: Pool;
  mailer: Mailer;
  /** Shared rate-limit counts (REDIS_URL); absent, each process counts in memory. */
  redis?: Redis | null;
}
