import { sql } from 'drizzle-orm';
import {
  char,
  customType,
  date,
  double,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  text,
  timestamp,
  varchar,
} from 'drizzle-orm/mysql-core';
import { brewStages, brewStatuses, photoMimeTypes, readingKinds, type BrewReading, type DecisionChoice } from '../../../shared/schemas/brews';
import type { InstrumentSnapshot } from '../../../shared/schemas/instruments';
import type { EquipmentProfile } from '../../../shared/schemas/equipment';
import type { RecipeTargets } from '../../../shared/schemas/recipes';
import { clubs } from './clubs';
import { recipes } from './recipes';
import { users } from './users';
import { jsonDoc } from './columns';


/** Up to 16 MiB of bytes; photos are capped far below that at upload. */
const mediumBlob = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'mediumblob' });

const stamp = (name: string) => timestamp(name, { mode: 'date', fsp: 3 });
const created = (name: string) => stamp(name).notNull().default(sql`CURRENT_TIMESTAMP(3)`);

/**
 * A brew day. It keeps a snapshot of the recipe's targets and of the equipment profile, so editing
 * or deleting the recipe later never changes what the day was judged against.
 */
export const brews = mysqlTable(
  'brews',
  {
    id: int('id').autoincrement().primaryKey(),
    ownerId: int('owner_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    recipeId: int('recipe_id').references(() => recipes.id, { onDelete: 'set null' }),
    name: varchar('name', { length: 120 }).notNull(),
    status: mysqlEnum('status', brewStatuses).notNull().default('brewing'),
    brewedOn: date('brewed_on', { mode: 'string' }).notNull(),
    /** RecipeTargets (shared/schemas/recipes) at the start of the day. */
    targetsSnapshot: jsonDoc<RecipeTargets>('targets_snapshot').notNull(),
    /** EquipmentProfile (shared/schemas/equipment.ts) at the start of the day. */
    equipmentSnapshot: jsonDoc<EquipmentProfile>('equipment_snapshot').notNull(),
    /** Today's boil-off rate, when the brewer changed it from the equipment profile's. */
    boilOffLPerHour: double('boil_off_l_per_hour'),
    currentStage: mysqlEnum('current_stage', brewStages).notNull().default('mash'),
    /** When the yeast went in: fermentation (issue 7) counts its days from here. */
    pitchedAt: stamp('pitched_at'),
    notes: text('notes').notNull(),
    createdAt: created('created_at'),
    updatedAt: created('updated_at'),
  },
  (t) => [index('brews_owner_idx').on(t.ownerId, t.brewedOn), index('brews_recipe_idx').on(t.recipeId)],
);

/** When each stage was started, completed or skipped; a stage can be returned to. */
export const brewStagesTable = mysqlTable(
  'brew_stages',
  {
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    stage: mysqlEnum('stage', brewStages).notNull(),
    startedAt: stamp('started_at'),
    completedAt: stamp('completed_at'),
    skippedAt: stamp('skipped_at'),
  },
  (t) => [primaryKey({ columns: [t.brewId, t.stage] })],
);

/**
 * One reading: what the brewer typed, the instrument's calibration at that moment and the
 * correction it gave. A later calibration never rewrites it (recompute is a deliberate act,
 * logged in brew_notes with the old and new values).
 */
export const brewReadings = mysqlTable(
  'brew_readings',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    stage: mysqlEnum('stage', brewStages).notNull(),
    kind: mysqlEnum('kind', readingKinds).notNull(),
    /** No foreign key on purpose: the snapshot stands for the instrument even after it is deleted. */
    instrumentId: int('instrument_id'),
    instrumentSnapshot: jsonDoc<InstrumentSnapshot>('instrument_snapshot').notNull(),
    raw: jsonDoc<Record<string, number | boolean | string>>('raw').notNull(),
    correctedValue: double('corrected_value').notNull(),
    correction: jsonDoc<BrewReading['correction']>('correction'),
    warnings: jsonDoc<string[]>('warnings').notNull(),
    volumeL: double('volume_l'),
    takenAt: stamp('taken_at').notNull(),
    note: text('note').notNull(),
    recomputedAt: stamp('recomputed_at'),
    recomputedFrom: jsonDoc<BrewReading['recomputedFrom']>('recomputed_from'),
    /**
     * What its instrument is called out for (instrumentNoteKey in shared/brew-deviations.ts), '' for
     * nothing; null on readings stored before it was kept, which are then judged from their snapshot.
     */
    instrumentNote: varchar('instrument_note', { length: 80 }),
    createdAt: created('created_at'),
  },
  (t) => [
    index('brew_readings_brew_idx').on(t.brewId, t.takenAt),
    index('brew_readings_kind_idx').on(t.brewId, t.kind, t.takenAt),
    index('brew_readings_note_idx').on(t.brewId, t.instrumentNote, t.takenAt),
  ],
);

/**
 * A late-boil decision: the check's input as the brewer entered it, the result recomputed on the
 * server from that input, and the option chosen.
 */
export const brewDecisions = mysqlTable(
  'brew_decisions',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    input: jsonDoc<Record<string, unknown>>('input').notNull(),
    /** The recomputed check, with the chosen option's figures under `chosen`. */
    result: jsonDoc<Record<string, unknown>>('result').notNull(),
    choice: jsonDoc<DecisionChoice>('choice').notNull(),
    note: text('note').notNull(),
    decidedAt: created('decided_at'),
  },
  (t) => [index('brew_decisions_brew_idx').on(t.brewId, t.decidedAt)],
);

/** The brewer's notes, and entries the app writes itself (a reading recomputed on purpose). */
export const brewNotes = mysqlTable(
  'brew_notes',
  {
    id: int('id').autoincrement().primaryKey(),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    kind: mysqlEnum('kind', ['note', 'recompute']).notNull().default('note'),
    stage: mysqlEnum('stage', brewStages),
    body: text('body').notNull(),
    details: jsonDoc<Record<string, unknown>>('details'),
    authorId: int('author_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: created('created_at'),
  },
  (t) => [index('brew_notes_brew_idx').on(t.brewId, t.createdAt)],
);

/**
 * Photos of a reading: the row here, the bytes in object storage under `storage_key`
 * (docs/decisions/0018-photos-in-object-storage.md). The type is the one the bytes show, not the client's.
 */
export const readingPhotos = mysqlTable(
  'reading_photos',
  {
    id: int('id').autoincrement().primaryKey(),
    readingId: int('reading_id')
      .notNull()
      .references(() => brewReadings.id, { onDelete: 'cascade' }),
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    mime: mysqlEnum('mime', photoMimeTypes).notNull(),
    sizeBytes: int('size_bytes').notNull(),
    sha256: char('sha256', { length: 64 }).notNull(),
    /** The object's key in the photo store (server/brews/photo-store.ts); null only for a photo not yet moved out of `data`. */
    storageKey: varchar('storage_key', { length: 255 }),
    /** The bytes of a photo uploaded before object storage; emptied by `npm run photos:to-s3`. */
    data: mediumBlob('data'),
    createdAt: created('created_at'),
  },
  (t) => [index('reading_photos_reading_idx').on(t.readingId), index('reading_photos_brew_idx').on(t.brewId)],
);

/** A brew day shared with a club: its members can read it, its mentors comment; only the owner edits. */
export const brewClubShares = mysqlTable(
  'brew_club_shares',
  {
    brewId: int('brew_id')
      .notNull()
      .references(() => brews.id, { onDelete: 'cascade' }),
    clubId: int('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    sharedAt: timestamp('shared_at', { mode: 'date' }).notNull().default(sql`CURRENT_TIMESTAMP`),
  },
  (t) => [primaryKey({ columns: [t.brewId, t.clubId] }), index('brew_club_shares_club_idx').on(t.clubId)],
);

export type BrewRow = typeof brews.$inferSelect;
export type BrewReadingRow = typeof brewReadings.$inferSelect;
export type BrewDecisionRow = typeof brewDecisions.$inferSelect;
export type BrewNoteRow = typeof brewNotes.$inferSelect;
export type BrewStageRow = typeof brewStagesTable.$inferSelect;
export type ReadingPhotoRow = typeof readingPhotos.$inferSelect;
