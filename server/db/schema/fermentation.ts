import { sql } from 'drizzle-orm';
import { boolean, char, double, index, int, mysqlEnum, mysqlTable, text, timestamp, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import {
  fermentationMethods,
  fermentationReadingKinds,
  packagingContainers,
  packagingSugars,
  readingSources,
  reminderKinds,
  type FermentationRaw,
} from '../../../shared/schemas/fermentation';
import type { InstrumentSnapshot } from '../../../shared/schemas/instruments';
import { brews } from './brews';
import { users } from './users';
import { jsonDoc } from './columns';


const stamp = (name: string) => timestamp(name, { mode: 'date', fsp: 3 });
const created = (name: string) => stamp(name).notNull().default(sql`CURRENT_TIMESTAMP(3)`);
const fgStates = ['no-reading', 'too-early', 'moving', 'stuck', 'stable'] as const;

/**
 * One fermentation reading (gravity or fermenter temperature) with its instrument's calibration
 * at that moment, like brew_readings. `dedupe_key` is the SHA-256 of the brew, the time, the kind
 * and the instrument's own value (shared/fermentation/import.ts), unique per brew, so importing
 * the same file twice adds nothing the second time.
 */
export const fermentationReadings = mysqlTable(
  'fermentation_readings',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    kind: mysqlEnum('kind', fermentationReadingKinds).notNull(),
    method: mysqlEnum('method', fermentationMethods).notNull(),
    /** No foreign key on purpose: the snapshot stands for the instrument even after it is deleted. */
    instrumentId: int('instrument_id'),
    instrumentSnapshot: jsonDoc<InstrumentSnapshot>('instrument_snapshot').notNull(),
    raw: jsonDoc<FermentationRaw>('raw').notNull(),
    /** SG or °C. */
    correctedValue: double('corrected_value').notNull(),
    correction: jsonDoc<Record<string, unknown>>('correction'),
    warnings: jsonDoc<string[]>('warnings').notNull(),
    /** An alcohol-corrected refractometer estimate. */
    estimate: boolean('estimate').notNull().default(false),
    takenAt: stamp('taken_at').notNull(),
    note: varchar('note', { length: 500 }).notNull().default(''),
    source: mysqlEnum('source', readingSources).notNull().default('manual'),
    dedupeKey: char('dedupe_key', { length: 64 }).notNull(),
    createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: created('created_at'),
  },
  (t) => [uniqueIndex('fermentation_readings_dedupe_uq').on(t.brewId, t.dedupeKey), index('fermentation_readings_brew_idx').on(t.brewId, t.takenAt)],
);

/** How a brew was packaged; one per brew. A package before the verdict is stable records why. */
export const packagingRecords = mysqlTable('packaging_records', {
  id: int('id').autoincrement().primaryKey(),
  brewId: int('brew_id')
    .notNull()
    .unique('packaging_records_brew_uq')
    .references(() => brews.id, { onDelete: 'cascade' }),
  container: mysqlEnum('container', packagingContainers).notNull(),
  volumeL: double('volume_l').notNull(),
  warmestTempC: double('warmest_temp_c').notNull(),
  targetCo2Volumes: double('target_co2_volumes').notNull(),
  sugar: mysqlEnum('sugar', packagingSugars).notNull(),
  primingSugarG: double('priming_sugar_g'),
  residualCo2Volumes: double('residual_co2_volumes').notNull(),
  verdictState: mysqlEnum('verdict_state', fgStates).notNull(),
  verdictReason: text('verdict_reason').notNull(),
  override: boolean('override').notNull().default(false),
  overrideReason: varchar('override_reason', { length: 500 }).notNull().default(''),
  note: varchar('note', { length: 500 }).notNull().default(''),
  packagedAt: stamp('packaged_at').notNull(),
  createdBy: int('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: created('created_at'),
});

/**
 * E-mail reminders, scheduled in the database so that with several API instances each is sent
 * once: a worker claims due rows with one UPDATE (claimed_by, claimed_until), sends, and stamps
 * sent_at. A claim that outlives claimed_until (a crashed instance) can be taken over.
 */
export const fermentationReminders = mysqlTable(
  'fermentation_reminders',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    kind: mysqlEnum('kind', reminderKinds).notNull(),
    dueAt: stamp('due_at').notNull(),
    /** For a re-check: the reading that was still moving. */
    readingId: int('reading_id'),
    claimedBy: varchar('claimed_by', { length: 64 }),
    claimedUntil: stamp('claimed_until'),
    attempts: int('attempts').notNull().default(0),
    sentAt: stamp('sent_at'),
    outcome: mysqlEnum('outcome', ['sent', 'skipped', 'failed']),
    outcomeNote: varchar('outcome_note', { length: 200 }),
    createdAt: created('created_at'),
  },
  (t) => [uniqueIndex('fermentation_reminders_uq').on(t.brewId, t.kind, t.dueAt), index('fermentation_reminders_due_idx').on(t.sentAt, t.dueAt)],
);

/** Per-brewer switches; no row means the defaults (reminders on). */
export const fermentationSettings = mysqlTable('fermentation_settings', {
  userId: int('user_id')
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  remindersEnabled: boolean('reminders_enabled').notNull().default(true),
  updatedAt: created('updated_at'),
});

export type FermentationReadingRow = typeof fermentationReadings.$inferSelect;
export type PackagingRecordRow = typeof packagingRecords.$inferSelect;
export type FermentationReminderRow = typeof fermentationReminders.$inferSelect;
