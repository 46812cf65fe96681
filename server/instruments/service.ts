/**
 * A brewer's instruments and their calibrations. Instruments are private: another brewer's
 * instrument is reported as not found. Every accepted calibration is saved with its inputs in
 * `instrument_calibrations`; readings keep a snapshot and are never rewritten from here.
 */
import { and, desc, eq, inArray, max } from 'drizzle-orm';
import { thermometerCheck, wcfCalibration } from '@shared/instruments';
import {
  DEFAULT_HYDROMETER_CALIBRATION_C,
  DEFAULT_HYDROMETER_RESOLUTION_SG,
  DEFAULT_PH_REMINDER_DAYS,
  DEFAULT_PH_RESOLUTION,
  DEFAULT_WCF,
  instrumentKindLabels,
  methodsByKind,
  settableByKind,
  type CalibrateInstrumentBody,
  type CalibrationEntry,
  type CalibrationMethod,
  type CreateInstrumentInput,
  type Instrument,
  type InstrumentKind,
  type InstrumentSnapshot,
  type UpdateInstrumentInput,
} from '@shared/schemas/instruments';
import { requireAccess, type Actor, type ResourceAction } from '../auth/permissions';
import type { DbOrTx, Tx } from '../db/client';
import { instrumentCalibrations, instruments, type InstrumentCalibrationRow, type InstrumentRow } from '../db/schema';
import { rememberElevation } from '../equipment/service';
import { BadRequest, NotFound } from '../lib/errors';
import { utcDay } from '@shared/dates';

type InstrumentValues = Partial<Omit<InstrumentRow, 'id' | 'ownerId' | 'kind' | 'createdAt' | 'updatedAt'>>;

const todayIso = (now = new Date()) => utcDay(now);
const iso = (d: Date | string) => (d instanceof Date ? d.toISOString() : new Date(d).toISOString());

/** The calibration a reading taken now would keep. */
export function toSnapshot(row: InstrumentRow, calibrationId: number | null): InstrumentSnapshot {
  const base = { instrumentId: row.id, name: row.name, calibrationId };
  switch (row.kind) {
    case 'hydrometer':
      return {
        ...base,
        kind: 'hydrometer',
        calibrationTempC: row.calibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C,
        resolutionSg: row.resolutionSg ?? DEFAULT_HYDROMETER_RESOLUTION_SG,
      };
    case 'refractometer':
      return { ...base, kind: 'refractometer', wcf: row.wcf ?? DEFAULT_WCF, wcfSource: row.wcfSource ?? 'default' };
    case 'thermometer':
      return {
        ...base,
        kind: 'thermometer',
        offsetC: row.offsetC ?? 0,
        ...(row.offsetScale !== null && row.offsetScale !== 1 ? { scale: row.offsetScale } : {}),
        checkedOn: row.offsetCheckedOn ?? null,
      };
    case 'ph_meter':
      return {
        ...base,
        kind: 'ph_meter',
        resolutionPh: row.resolutionPh ?? DEFAULT_PH_RESOLUTION,
        calibratedOn: row.calibratedOn ?? null,
        reminderDays: row.reminderDays ?? DEFAULT_PH_REMINDER_DAYS,
        bufferLowPh: row.bufferLowPh ?? null,
        bufferHighPh: row.bufferHighPh ?? null,
      };
  }
}

export function toInstrument(row: InstrumentRow, calibrationId: number | null): Instrument {
  return {
    id: row.id,
    kind: row.kind,
    name: row.name,
    notes: row.notes ?? null,
    archived: row.archived,
    calibrationTempC: row.calibrationTempC ?? null,
    resolutionSg: row.kind === 'hydrometer' ? (row.resolutionSg ?? DEFAULT_HYDROMETER_RESOLUTION_SG) : null,
    wcf: row.wcf ?? null,
    wcfSource: row.wcfSource ?? null,
    offsetC: row.offsetC ?? null,
    offsetCheckedOn: row.offsetCheckedOn ?? null,
    resolutionPh: row.resolutionPh ?? null,
    calibratedOn: row.calibratedOn ?? null,
    bufferLowPh: row.bufferLowPh ?? null,
    bufferHighPh: row.bufferHighPh ?? null,
    reminderDays: row.reminderDays ?? null,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
    snapshot: toSnapshot(row, calibrationId),
  };
}

function toCalibrationEntry(row: InstrumentCalibrationRow): CalibrationEntry {
  return {
    id: row.id,
    instrumentId: row.instrumentId,
    method: row.method,
    inputs: row.inputs,
    result: row.result ?? null,
    before: row.before ?? null,
    after: row.after,
    createdAt: iso(row.createdAt),
  };
}

const asOwned = (row: InstrumentRow | undefined) => (row ? { ownerId: row.ownerId, sharedWithClubIds: [] } : null);

/** Loads an instrument the actor may act on, or throws 404 (never says whose it is). */
async function findInstrument(db: DbOrTx, actor: Actor, id: number, action: ResourceAction, forUpdate = false): Promise<InstrumentRow> {
  const query = db.select().from(instruments).where(eq(instruments.id, id));
  const [row] = forUpdate ? await query.for('update') : await query;
  requireAccess(actor, action, asOwned(row), 'That instrument');
  return row!;
}

async function latestCalibrationIds(db: DbOrTx, ids: number[]): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({ instrumentId: instrumentCalibrations.instrumentId, id: max(instrumentCalibrations.id) })
    .from(instrumentCalibrations)
    .where(inArray(instrumentCalibrations.instrumentId, ids))
    .groupBy(instrumentCalibrations.instrumentId);
  return new Map(rows.map((r) => [r.instrumentId, Number(r.id)]));
}

async function latestCalibrationId(db: DbOrTx, id: number): Promise<number | null> {
  return (await latestCalibrationIds(db, [id])).get(id) ?? null;
}

export async function listInstruments(
  db: DbOrTx,
  actor: Actor,
  options: { archived?: 'include' | 'only' | 'exclude'; kind?: InstrumentKind } = {},
): Promise<Instrument[]> {
  const conditions = [eq(instruments.ownerId, actor.id)];
  if (options.archived === 'only') conditions.push(eq(instruments.archived, true));
  else if (options.archived !== 'include') conditions.push(eq(instruments.archived, false));
  if (options.kind) conditions.push(eq(instruments.kind, options.kind));
  const rows = await db
    .select()
    .from(instruments)
    .where(and(...conditions))
    .orderBy(instruments.kind, instruments.name, instruments.id);
  const latest = await latestCalibrationIds(
    db,
    rows.map((r) => r.id),
  );
  return rows.map((r) => toInstrument(r, latest.get(r.id) ?? null));
}

export async function getInstrument(db: DbOrTx, actor: Actor, id: number): Promise<Instrument> {
  const row = await findInstrument(db, actor, id, 'read');
  return toInstrument(row, await latestCalibrationId(db, id));
}

/** The calibration fields a new instrument starts with, with common-practice defaults. */
function initialValues(input: CreateInstrumentInput): InstrumentValues {
  switch (input.kind) {
    case 'hydrometer':
      return {
        calibrationTempC: input.calibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C,
        resolutionSg: input.resolutionSg ?? DEFAULT_HYDROMETER_RESOLUTION_SG,
      };
    case 'refractometer':
      return input.wcf === undefined ? { wcf: DEFAULT_WCF, wcfSource: 'default' } : { wcf: input.wcf, wcfSource: 'entered' };
    case 'thermometer':
      return { offsetC: input.offsetC ?? 0, offsetCheckedOn: input.offsetC ? todayIso() : null };
    case 'ph_meter':
      return {
        resolutionPh: input.resolutionPh ?? DEFAULT_PH_RESOLUTION,
        reminderDays: input.reminderDays ?? DEFAULT_PH_REMINDER_DAYS,
        calibratedOn: input.calibratedOn ?? null,
        bufferLowPh: input.bufferLowPh ?? null,
        bufferHighPh: input.bufferHighPh ?? null,
      };
  }
}

export async function createInstrument(db: DbOrTx, actor: Actor, input: CreateInstrumentInput): Promise<Instrument> {
  const values = initialValues(input);
  return db.transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(instruments)
      .values({ ownerId: actor.id, kind: input.kind, name: input.name, notes: input.notes ?? null, ...values })
      .$returningId();
    const [row] = await tx.select().from(instruments).where(eq(instruments.id, id));
    const { kind: _kind, name: _name, notes: _notes, ...inputs } = input;
    const [{ id: calibrationId }] = await tx
      .insert(instrumentCalibrations)
      .values({ instrumentId: id, method: 'created', inputs, result: null, before: null, after: toSnapshot(row, null) })
      .$returningId();
    // The snapshot names the calibration entry it came from; the first entry names itself.
    const after = toSnapshot(row, calibrationId);
    await tx.update(instrumentCalibrations).set({ after }).where(eq(instrumentCalibrations.id, calibrationId));
    return toInstrument(row, calibrationId);
  });
}

export async function updateInstrument(db: DbOrTx, actor: Actor, id: number, patch: UpdateInstrumentInput): Promise<Instrument> {
  await findInstrument(db, actor, id, 'update');
  const values: InstrumentValues = {};
  if (patch.name !== undefined) values.name = patch.name;
  if (patch.notes !== undefined) values.notes = patch.notes ?? null;
  if (patch.archived !== undefined) values.archived = patch.archived;
  if (Object.keys(values).length > 0) await db.update(instruments).set(values).where(eq(instruments.id, id));
  return getInstrument(db, actor, id);
}

export async function listCalibrations(db: DbOrTx, actor: Actor, id: number): Promise<CalibrationEntry[]> {
  await findInstrument(db, actor, id, 'read');
  const rows = await db
    .select()
    .from(instrumentCalibrations)
    .where(eq(instrumentCalibrations.instrumentId, id))
    .orderBy(desc(instrumentCalibrations.id));
  return rows.map(toCalibrationEntry);
}

interface Worked {
  values: InstrumentValues;
  inputs: Record<string, unknown>;
  result: Record<string, unknown> | null;
  /** Written in the same transaction (the thermometer check remembers the elevation). */
  also?: (tx: Tx) => Promise<void>;
}

const kindArticle = (kind: InstrumentKind) => (kind === 'hydrometer' ? 'a hydrometer' : `a ${instrumentKindLabels[kind].toLowerCase()}`);

/** Works out a calibration without saving it; throws 400 for input that cannot be right. */
async function workCalibration(db: DbOrTx, actor: Actor, row: InstrumentRow, body: CalibrateInstrumentBody): Promise<Worked> {
  switch (body.method) {
    case 'wcf-pairs': {
      let calibrationTempC = body.hydrometerCalibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C;
      if (body.hydrometerId) {
        const hydrometer = await findInstrument(db, actor, body.hydrometerId, 'read').catch((error: unknown) => {
          if (!(error instanceof NotFound)) throw error;
          throw new BadRequest('That hydrometer was not found.', { hydrometerId: 'That hydrometer was not found among your instruments.' });
        });
        if (hydrometer.kind !== 'hydrometer') {
          throw new BadRequest('Choose a hydrometer for the paired readings.', { hydrometerId: `That is ${kindArticle(hydrometer.kind)}, not a hydrometer.` });
        }
        calibrationTempC = hydrometer.calibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C;
      }
      const result = wcfCalibration({ pairs: body.pairs, hydrometerCalibrationTempC: calibrationTempC });
      return {
        values: { wcf: result.wcf, wcfSource: 'measured' },
        inputs: { pairs: body.pairs, hydrometerId: body.hydrometerId ?? null, hydrometerCalibrationTempC: calibrationTempC },
        result: { ...result },
      };
    }
    case 'thermometer-check': {
      const result = thermometerCheck(body);
      const elevationM = body.elevationM ?? null;
      return {
        values: { offsetC: result.offsetC, offsetScale: result.scale === 1 ? null : result.scale, offsetCheckedOn: todayIso() },
        inputs: { iceReadingC: body.iceReadingC ?? null, boilingReadingC: body.boilingReadingC ?? null, elevationM },
        result: { ...result },
        also: elevationM === null ? undefined : (tx) => rememberElevation(tx, actor.id, elevationM),
      };
    }
    case 'ph-two-point':
      return {
        values: { calibratedOn: body.calibratedOn, bufferLowPh: body.bufferLowPh, bufferHighPh: body.bufferHighPh },
        inputs: { calibratedOn: body.calibratedOn, bufferLowPh: body.bufferLowPh, bufferHighPh: body.bufferHighPh },
        result: null,
      };
    case 'set': {
      const allowed = settableByKind[row.kind];
      const given = (['calibrationTempC', 'resolutionSg', 'wcf', 'offsetC', 'resolutionPh', 'reminderDays'] as const).filter((k) => body[k] !== undefined);
      const fields: Record<string, string> = {};
      for (const key of given) if (!allowed.includes(key)) fields[key] = `${instrumentKindLabels[row.kind]}s have no such setting.`;
      if (given.length === 0) fields[allowed[0]] = 'Enter the new value.';
      if (Object.keys(fields).length > 0) throw new BadRequest('Some fields need attention.', fields);
      const values: InstrumentValues = {};
      const inputs: Record<string, unknown> = { note: body.note ?? null };
      for (const key of given) {
        values[key] = body[key] as number;
        inputs[key] = body[key];
      }
      if (values.wcf !== undefined) values.wcfSource = 'entered';
      if (values.offsetC !== undefined) {
        values.offsetCheckedOn = todayIso();
        // A typed-in offset is a one-point correction.
        values.offsetScale = null;
      }
      return { values, inputs, result: null };
    }
  }
}

/**
 * Saves a calibration the brewer accepted: the instrument's new values and a history entry with
 * the inputs, the worked result and the snapshot before and after, in one transaction.
 */
export async function calibrateInstrument(db: DbOrTx, actor: Actor, id: number, body: CalibrateInstrumentBody) {
  return db.transaction(async (tx) => {
    const row = await findInstrument(tx, actor, id, 'update', true);
    if (!(methodsByKind[row.kind] as readonly CalibrationMethod[]).includes(body.method)) {
      throw new BadRequest(`That is not how ${kindArticle(row.kind)} is calibrated.`, {
        method: `${instrumentKindLabels[row.kind]}s are calibrated by: ${methodsByKind[row.kind].join(', ')}.`,
      });
    }
    const worked = await workCalibration(tx, actor, row, body);
    const before = toSnapshot(row, await latestCalibrationId(tx, id));
    await tx.update(instruments).set(worked.values).where(eq(instruments.id, id));
    const [updated] = await tx.select().from(instruments).where(eq(instruments.id, id));
    const [{ id: calibrationId }] = await tx
      .insert(instrumentCalibrations)
      .values({ instrumentId: id, method: body.method, inputs: worked.inputs, result: worked.result, before, after: toSnapshot(updated, null) })
      .$returningId();
    const after = toSnapshot(updated, calibrationId);
    await tx.update(instrumentCalibrations).set({ after }).where(eq(instrumentCalibrations.id, calibrationId));
    await worked.also?.(tx);
    const [entry] = await tx.select().from(instrumentCalibrations).where(eq(instrumentCalibrations.id, calibrationId));
    return { instrument: toInstrument(updated, calibrationId), calibration: toCalibrationEntry(entry) };
  });
}

/**
 * For the brew-day log: the calibration of one of the brewer's instruments at this moment, to be
 * stored with the reading. 404 for another brewer's instrument; 400 when it is archived or of
 * another kind than the reading needs (`field` names the form field for that message).
 */
export async function loadInstrumentSnapshot(
  db: DbOrTx,
  user: Actor,
  instrumentId: number,
  options: { kind?: InstrumentKind; allowArchived?: boolean; field?: string } = {},
): Promise<InstrumentSnapshot> {
  const row = await findInstrument(db, user, instrumentId, 'read');
  const field = options.field ?? 'instrumentId';
  if (options.kind && row.kind !== options.kind) {
    throw new BadRequest(`Choose ${kindArticle(options.kind)} for this reading.`, {
      [field]: `${row.name} is ${kindArticle(row.kind)}, not ${kindArticle(options.kind)}.`,
    });
  }
  if (row.archived && !options.allowArchived) {
    throw new BadRequest(`${row.name} is archived.`, { [field]: `${row.name} is archived; restore it on the instruments page to use it.` });
  }
  return toSnapshot(row, await latestCalibrationId(db, instrumentId));
}
