import { char, index, mysqlTable, timestamp } from 'drizzle-orm/mysql-core';

/**
 * Sessions signed out on one device before their token expired. Signing out everywhere bumps
 * the user's token version instead; rows here go once the token would have expired anyway.
 */
export const revokedSessions = mysqlTable(
  'revoked_sessions',
  {
    sessionId: char('session_id', { length: 22 }).primaryKey(),
    expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
  },
  (t) => [index('revoked_sessions_expires_idx').on(t.expiresAt)],
);
