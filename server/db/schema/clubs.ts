import { sql } from 'drizzle-orm';
import { index, int, mysqlEnum, mysqlTable, primaryKey, text, timestamp, varchar } from 'drizzle-orm/mysql-core';
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
