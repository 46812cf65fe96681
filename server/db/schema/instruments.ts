import { sql } from 'drizzle-orm';
import { boolean, date, double, index, int, mysqlEnum, mysqlTable, text, timestamp, varchar } from 'drizzle-orm/mysql-core';
import { calibrationMethods, instrumentKinds, wcfSources, type InstrumentSnapshot } from '../../../shared/schemas/instruments';
import { users } from './users';
import { jsonDoc } from './columns';


/** A brewer's own instruments; several of each kind. Calibration fields apply to one kind each. */
export const instruments = mysqlTable(
  'instruments',
  {
    id: int('id').autoincrement().primaryKey(),
    ownerId: int('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kind: mysqlEnum('kind', instrumentKinds).notNull(),
    name: varchar('name', { length: 80 }).notNull(),
    notes: text('notes'),
    /** Hydrometer: the temperature at which it reads true, °C. */
    calibrationTempC: double('calibration_temp_c'),
    /** Hydrometer: its smallest scale step in SG (0.001 on most brewing hydrometers); null reads as 0.001. */
    resolutionSg: double('resolution_sg'),
    /** Refractometer: wort correction factor, and whether it is the default, typed in, or measured from pairs. */
    wcf: double('wcf'),
    wcfSource: mysqlEnum('wcf_source', wcfSources),
    /** Thermometer: how far it reads above (+) or below (−) true, °C, and when that was checked. */
    offsetC: double('offset_c'),
    /** Thermometer: the two-point slope, true = (reading − offset) × scale; null is 1 (one-point check). */
    offsetScale: double('offset_scale'),
    offsetCheckedOn: date('offset_checked_on', { mode: 'string' }),
    /** pH meter: display resolution, last two-point calibration, its buffers, and the reminder interval. */
    resolutionPh: double('resolution_ph'),
    calibratedOn: date('calibrated_on', { mode: 'string' }),
    bufferLowPh: double('buffer_low_ph'),
    bufferHighPh: double('buffer_high_ph'),
    reminderDays: int('reminder_days'),
    /** Archived instruments stay for the readings that name them, but are not offered for new ones. */
    archived: boolean('archived').notNull().default(false),
    createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
    updatedAt: timestamp('updated_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`).onUpdateNow(),
  },
  (t) => [index('instruments_owner_idx').on(t.ownerId, t.archived, t.kind)],
);

/** Every calibration a brewer accepted, with what they entered: the log of what changed when. */
export const instrumentCalibrations = mysqlTable(
  'instrument_calibrations',
  {
    id: int('id').autoincrement().primaryKey(),
    instrumentId: int('instrument_id')
      .notNull()
      .references(() => instruments.id, { onDelete: 'cascade' }),
    method: mysqlEnum('method', calibrationMethods).notNull(),
    inputs: jsonDoc<Record<string, unknown>>('inputs').notNull(),
    result: jsonDoc<Record<string, unknown> | null>('result'),
    before: jsonDoc<InstrumentSnapshot | null>('before_snapshot'),
    after: jsonDoc<InstrumentSnapshot>('after_snapshot').notNull(),
    createdAt: timestamp('created_at', { mode: 'date', fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index('instrument_calibrations_instrument_idx').on(t.instrumentId, t.createdAt)],
);

/** A brewer's kettle: boil-off, losses and cooling shrinkage. One is the default. */
export const equipmentProfiles = mysqlTable(
  'equipment_profiles',
  {
    id: int('id').autoincrement().primaryKey(),
    ownerId: int('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: varchar('name', { length: 80 }).notNull(),
    isDefault: boolean('is_default').notNull().default(false),
    boilOffLPerHour: double('boil_off_l_per_hour').notNull(),
    trubLossL: double('trub_loss_l').notNull(),
    deadSpaceL: double('dead_space_l').notNull(),
    /** A fraction: 0.04 is 4 %. */
    coolingShrinkage: double('cooling_shrinkage').notNull(),
    /** Remembered from the thermometer's boiling check. */
    elevationM: double('elevation_m'),
    kettleCapacityL: double('kettle_capacity_l'),
    /** The last boil-off measurement behind boilOffLPerHour, if it was measured. */
    boilOffMeasurement: jsonDoc<{ startL: number; endL: number; minutes: number; measuredAt: string } | null>('boil_off_measurement'),
    createdAt: timestamp('created_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
    updatedAt: timestamp('updated_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`).onUpdateNow(),
  },
  (t) => [index('equipment_profiles_owner_idx').on(t.ownerId, t.isDefault)],
);

export type InstrumentRow = typeof instruments.$inferSelect;
export type InstrumentCalibrationRow = typeof instrumentCalibrations.$inferSelect;
export type EquipmentProfileRow = typeof equipmentProfiles.$inferSelect;
