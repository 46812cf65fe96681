import { sql } from 'drizzle-orm';
import { index, int, mysqlTable, smallint, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { jsonDoc } from './columns';
import { users } from './users';

/**
 * The first answer to a create sent with an `Idempotency-Key` header, per user and key, so a
 * retry (a lost response, the offline brew day's queue) gets the same answer and stores nothing
 * new. In MariaDB, so every app instance sees it. `status` is null while the first request runs.
 */
export const idempotencyKeys = mysqlTable(
  'idempotency_keys',
  {
    id: int('id').autoincrement().primaryKey(),
    userId: int('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    key: varchar('idem_key', { length: 200 }).notNull(),
    /** Method and path of the first request: the same key on another route is refused. */
    request: varchar('request', { length: 300 }).notNull(),
    status: smallint('status'),
    body: jsonDoc<unknown>('body'),
    createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
    expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
  },
  (t) => [uniqueIndex('idempotency_keys_user_key_uq').on(t.userId, t.key), index('idempotency_keys_expires_idx').on(t.expiresAt)],
);

export type IdempotencyKeyRow = typeof idempotencyKeys.$inferSelect;
