/**
 * A brewer's kettle profiles: boil-off, losses, cooling shrinkage and elevation. One is the
 * default; the brew day copies it. Until a brewer saves one, common-practice values stand in and
 * the result says so.
 */
import { and, asc, desc, eq, ne } from 'drizzle-orm';
import { boilOffRateLPerHour } from '@shared/brewmath';
import { DEFAULT_EQUIPMENT, type EquipmentProfile, type EquipmentProfileInput, type EquipmentProfileUpdate } from '@shared/schemas/equipment';
import { requireAccess, type Actor, type ResourceAction } from '../auth/permissions';
import type { DbOrTx, Tx } from '../db/client';
import { lockUserRow } from '../db/locks';
import { equipmentProfiles, type EquipmentProfileRow } from '../db/schema';
import { mathFields } from '../lib/brewmath-fields';
import { BadRequest } from '../lib/errors';

type Values = Partial<Omit<EquipmentProfileRow, 'id' | 'ownerId' | 'createdAt' | 'updatedAt'>>;

export const commonPracticeNote =
  'No kettle saved yet: these are common-practice values (boil-off 4 L/h, trub 1 L, dead space 0.5 L, cooling shrinkage 4 %). Measure your own kettle on the instruments page for better predictions.';

export function commonPracticeProfile(): EquipmentProfile {
  return { id: null, ...DEFAULT_EQUIPMENT, isDefault: true, boilOffMeasurement: null, source: 'common-practice', note: commonPracticeNote, updatedAt: null };
}

export function toEquipmentProfile(row: EquipmentProfileRow): EquipmentProfile {
  return {
    id: row.id,
    name: row.name,
    boilOffLPerHour: row.boilOffLPerHour,
    trubLossL: row.trubLossL,
    deadSpaceL: row.deadSpaceL,
    coolingShrinkage: row.coolingShrinkage,
    elevationM: row.elevationM ?? null,
    kettleCapacityL: row.kettleCapacityL ?? null,
    isDefault: row.isDefault,
    boilOffMeasurement: row.boilOffMeasurement ?? null,
    source: 'saved',
    note: null,
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}

async function defaultRow(db: DbOrTx, userId: number): Promise<EquipmentProfileRow | undefined> {
  // The flagged default; failing that (never expected), the oldest profile.
  const [row] = await db
    .select()
    .from(equipmentProfiles)
    .where(eq(equipmentProfiles.ownerId, userId))
    .orderBy(desc(equipmentProfiles.isDefault), asc(equipmentProfiles.id))
    .limit(1);
  return row;
}

/** The brewer's default kettle, or common-practice values (marked as such) when none is saved. */
export async function getEquipmentProfile(db: DbOrTx, userId: number): Promise<EquipmentProfile> {
  const row = await defaultRow(db, userId);
  return row ? toEquipmentProfile(row) : commonPracticeProfile();
}

export async function listEquipment(db: DbOrTx, actor: Actor): Promise<EquipmentProfile[]> {
  const rows = await db
    .select()
    .from(equipmentProfiles)
    .where(eq(equipmentProfiles.ownerId, actor.id))
    .orderBy(desc(equipmentProfiles.isDefault), asc(equipmentProfiles.name), asc(equipmentProfiles.id));
  return rows.map(toEquipmentProfile);
}

async function findProfile(db: DbOrTx, actor: Actor, id: number, action: ResourceAction, forUpdate = false) {
  const query = db.select().from(equipmentProfiles).where(eq(equipmentProfiles.id, id));
  const [row] = forUpdate ? await query.for('update') : await query;
  requireAccess(actor, action, row ? { ownerId: row.ownerId, sharedWithClubIds: [] } : null, 'That kettle profile');
  return row!;
}

export async function getEquipment(db: DbOrTx, actor: Actor, id: number): Promise<EquipmentProfile> {
  return toEquipmentProfile(await findProfile(db, actor, id, 'read'));
}

/** Turns validated input into column values; a boil-off measurement decides the rate. */
function toValues(input: EquipmentProfileUpdate): Values {
  const values: Values = {};
  if (input.name !== undefined) values.name = input.name;
  if (input.boilOffLPerHour !== undefined) values.boilOffLPerHour = input.boilOffLPerHour;
  if (input.trubLossL !== undefined) values.trubLossL = input.trubLossL;
  if (input.deadSpaceL !== undefined) values.deadSpaceL = input.deadSpaceL;
  if (input.coolingShrinkage !== undefined) values.coolingShrinkage = input.coolingShrinkage;
  if (input.elevationM !== undefined) values.elevationM = input.elevationM ?? null;
  if (input.kettleCapacityL !== undefined) values.kettleCapacityL = input.kettleCapacityL ?? null;
  if (input.boilOffMeasurement) {
    const m = input.boilOffMeasurement;
    const rate = mathFields(() => boilOffRateLPerHour(m), { map: {
      startL: 'boilOffMeasurement.startL',
      endL: 'boilOffMeasurement.endL',
      minutes: 'boilOffMeasurement.minutes',
    } });
    if (rate > 30) {
      const message = `That is ${rate.toFixed(1)} L/h, beyond a home kettle (30 L/h at most). Check the volumes and the minutes.`;
      throw new BadRequest(message, { 'boilOffMeasurement.minutes': message });
    }
    values.boilOffLPerHour = rate;
    values.boilOffMeasurement = { startL: m.startL, endL: m.endL, minutes: m.minutes, measuredAt: new Date().toISOString() };
  } else if (input.boilOffMeasurement === null || input.boilOffLPerHour !== undefined) {
    // A rate typed in by hand no longer rests on the old measurement.
    values.boilOffMeasurement = null;
  }
  return values;
}

async function clearOtherDefaults(tx: DbOrTx, ownerId: number, keepId: number) {
  await tx
    .update(equipmentProfiles)
    .set({ isDefault: false })
    .where(and(eq(equipmentProfiles.ownerId, ownerId), ne(equipmentProfiles.id, keepId)));
}

export async function createEquipment(db: DbOrTx, actor: Actor, input: EquipmentProfileInput): Promise<EquipmentProfile> {
  return db.transaction(async (tx) => {
    // The owner's row first: two first profiles saved at once would otherwise both become the
    // default and deadlock clearing each other (see server/db/locks.ts).
    await lockUserRow(tx, actor.id);
    const existing = await defaultRow(tx, actor.id);
    const isDefault = input.isDefault ?? !existing;
    const values = toValues(input);
    const [{ id }] = await tx
      .insert(equipmentProfiles)
      .values({
        ownerId: actor.id,
        name: input.name,
        boilOffLPerHour: input.boilOffLPerHour,
        trubLossL: input.trubLossL,
        deadSpaceL: input.deadSpaceL,
        coolingShrinkage: input.coolingShrinkage,
        ...values,
        isDefault: isDefault || !existing,
      })
      .$returningId();
    if (isDefault || !existing) await clearOtherDefaults(tx, actor.id, id);
    return toEquipmentProfile((await tx.select().from(equipmentProfiles).where(eq(equipmentProfiles.id, id)))[0]);
  });
}

export async function updateEquipment(db: DbOrTx, actor: Actor, id: number, patch: EquipmentProfileUpdate): Promise<EquipmentProfile> {
  return db.transaction(async (tx) => {
    await lockUserRow(tx, actor.id);
    const row = await findProfile(tx, actor, id, 'update', true);
    const values = toValues(patch);
    // The default can be moved to another profile, not switched off: there is always one.
    if (patch.isDefault === true) values.isDefault = true;
    if (Object.keys(values).length > 0) await tx.update(equipmentProfiles).set(values).where(eq(equipmentProfiles.id, id));
    if (patch.isDefault === true) await clearOtherDefaults(tx, row.ownerId, id);
    return toEquipmentProfile((await tx.select().from(equipmentProfiles).where(eq(equipmentProfiles.id, id)))[0]);
  });
}

export async function deleteEquipment(db: DbOrTx, actor: Actor, id: number): Promise<void> {
  await db.transaction(async (tx) => {
    await lockUserRow(tx, actor.id);
    const row = await findProfile(tx, actor, id, 'delete', true);
    await tx.delete(equipmentProfiles).where(eq(equipmentProfiles.id, id));
    if (row.isDefault) {
      const next = await defaultRow(tx, row.ownerId);
      if (next) await tx.update(equipmentProfiles).set({ isDefault: true }).where(eq(equipmentProfiles.id, next.id));
    }
  });
}

/**
 * Keeps the elevation from a thermometer's boiling check on the default kettle profile, creating
 * one from common-practice values if the brewer has none. Called inside the calibration's transaction.
 */
export async function rememberElevation(tx: Tx, userId: number, elevationM: number): Promise<void> {
  await lockUserRow(tx, userId);
  const row = await defaultRow(tx, userId);
  if (row) {
    await tx.update(equipmentProfiles).set({ elevationM }).where(eq(equipmentProfiles.id, row.id));
    return;
  }
  const { name, boilOffLPerHour, trubLossL, deadSpaceL, coolingShrinkage } = DEFAULT_EQUIPMENT;
  await tx.insert(equipmentProfiles).values({ ownerId: userId, name, boilOffLPerHour, trubLossL, deadSpaceL, coolingShrinkage, elevationM, isDefault: true });
}
