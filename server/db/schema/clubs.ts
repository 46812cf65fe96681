import { sql } from 'drizzle-orm';
import { char, index, int, mysqlEnum, mysqlTable, primaryKey, text, timestamp, varchar } from 'drizzle-orm/mysql-core';
import { users } from './users';

export const clubs = mysqlTable('clubs', {
  id: int('id').autoincrement().primaryKey(),
  name: varchar('name', { length: 120 }).notNull(),
  description: text('description'),
  createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
});

export const clubRoles = ['member', 'mentor', 'organiser'] as const;

export const clubMemberships = mysqlTable(
  'club_memberships',
  {
    clubId: int('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    userId: int('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: mysqlEnum('role', clubRoles).notNull().default('member'),
    joinedAt: timestamp('joined_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
  },
  (t) => [primaryKey({ columns: [t.clubId, t.userId] }), index('club_memberships_user_idx').on(t.userId)],
);

export type Club = typeof clubs.$inferSelect;
export type ClubMembership = typeof clubMemberships.$inferSelect;

/**
 * An organiser's invitation by e-mail. The link's token is never stored, only its SHA-256 hash,
 * so a leaked database cannot be turned into working links. A token is single-use and expires.
 */
export const clubInvitations = mysqlTable(
  'club_invitations',
  {
    id: int('id').autoincrement().primaryKey(),
    clubId: int('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    email: varchar('email', { length: 254 }).notNull(),
    role: mysqlEnum('role', clubRoles).notNull().default('member'),
    tokenHash: char('token_hash', { length: 64 }).notNull().unique(),
    invitedBy: int('invited_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
    expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
    acceptedAt: timestamp('accepted_at', { mode: 'date' }),
    acceptedBy: int('accepted_by').references(() => users.id, { onDelete: 'set null' }),
    /** Withdrawn by an organiser, or replaced by a newer invitation to the same address. */
    revokedAt: timestamp('revoked_at', { mode: 'date' }),
    revokedReason: mysqlEnum('revoked_reason', ['revoked', 'replaced']),
  },
  (t) => [index('club_invitations_club_email_idx').on(t.clubId, t.email)],
);

export type ClubInvitation = typeof clubInvitations.$inferSelect;
