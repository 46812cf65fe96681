import { sql } from 'drizzle-orm';
import { int, mysqlEnum, mysqlTable, timestamp, varchar } from 'drizzle-orm/mysql-core';

export const users = mysqlTable('users', {
  id: int('id').autoincrement().primaryKey(),
  email: varchar('email', { length: 254 }).notNull().unique(),
  passwordHash: varchar('password_hash', { length: 255 }).notNull(),
  displayName: varchar('display_name', { length: 80 }).notNull(),
  unitSystem: mysqlEnum('unit_system', ['metric', 'us']).notNull().default('metric'),
  gravityUnit: mysqlEnum('gravity_unit', ['sg', 'plato']).notNull().default('sg'),
  colourScale: mysqlEnum('colour_scale', ['srm', 'ebc']).notNull().default('srm'),
  /** With US units, which gallon volumes are shown in. */
  gallonUnit: mysqlEnum('gallon_unit', ['us', 'imperial']).notNull().default('us'),
  siteRole: mysqlEnum('site_role', ['user', 'admin']).notNull().default('user'),
  /** Bumped to revoke every token issued before (password change or reset). */
  tokenVersion: int('token_version').notNull().default(0),
  createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
});

export type User = typeof users.$inferSelect;
