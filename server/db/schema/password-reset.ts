import { sql } from 'drizzle-orm';
import { char, index, int, mysqlTable, timestamp } from 'drizzle-orm/mysql-core';
import { users } from './users';

/** Single-use, short-lived password reset links; only the SHA-256 hash of each token is kept. */
export const passwordResetTokens = mysqlTable(
  'password_reset_tokens',
  {
    id: int('id').autoincrement().primaryKey(),
    userId: int('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
    expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
    usedAt: timestamp('used_at', { mode: 'date' }),
  },
  (t) => [index('password_reset_tokens_user_idx').on(t.userId, t.createdAt)],
);

export type PasswordResetToken = typeof passwordResetTokens.$inferSelect;
