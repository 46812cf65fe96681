import type { Redis } from 'ioredis';
import type { Pool } from 'mysql2/promise';
import type { Db } from './db/client';
import type { Env } from './env';
import type { RateLimits } from './lib/rate-limit';
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

/**
 * What every router receives, and its only argument: `xRouter(ctx: RouterContext)`. The rate
 * limits are built once per app (server/lib/rate-limit.ts) and a router picks its own by name.
 */
export interface RouterContext extends AppContext {
  limits: RateLimits;
}
