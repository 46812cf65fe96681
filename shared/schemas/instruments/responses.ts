/** Instruments: what the API answers, and the calibration snapshot a reading keeps. */
import { z } from 'zod';
import { type CalibrationMethod, type InstrumentKind, type WcfSource, wcfSources } from './inputs';

// ---------------------------------------------------------------------------------------------
// The calibration snapshot a reading keeps (see docs/decisions/0005-readings-keep-their-calibration.md).

const snapshotBase = {
  /** null for a common-practice default used without a saved instrument. */
  instrumentId: z.number().int().positive().nullable(),
  name: z.string(),
  /** The calibration history entry in force when the snapshot was taken, if any. */
  calibrationId: z.number().int().positive().nullable(),
};

export const hydrometerSnapshotSchema = z.object({
  ...snapshotBase,
  kind: z.literal('hydrometer'),
  calibrationTempC: z.number(),
  /** Absent in snapshots taken before hydrometers had a scale step: read as 0.001. */
  resolutionSg: z.number().optional(),
});
export const refractometerSnapshotSchema = z.object({ ...snapshotBase, kind: z.literal('refractometer'), wcf: z.number(), wcfSource: z.enum(wcfSources) });
export const thermometerSnapshotSchema = z.object({
  ...snapshotBase,
  kind: z.literal('thermometer'),
  offsetC: z.number(),
  /** Two-point (ice and boil) correction: true = (reading − offsetC) × scale; absent means 1. */
  scale: z.number().optional(),
  checkedOn: z.string().nullable(),
});
export const phMeterSnapshotSchema = z.object({
  ...snapshotBase,
  kind: z.literal('ph_meter'),
  resolutionPh: z.number(),
  calibratedOn: z.string().nullable(),
  reminderDays: z.number().int(),
  bufferLowPh: z.number().nullable(),
  bufferHighPh: z.number().nullable(),
});

export const instrumentSnapshotSchema = z.discriminatedUnion('kind', [hydrometerSnapshotSchema, refractometerSnapshotSchema, thermometerSnapshotSchema, phMeterSnapshotSchema]);
export type InstrumentSnapshot = z.infer<typeof instrumentSnapshotSchema>;
export type HydrometerSnapshot = z.infer<typeof hydrometerSnapshotSchema>;
export type RefractometerSnapshot = z.infer<typeof refractometerSnapshotSchema>;
export type ThermometerSnapshot = z.infer<typeof thermometerSnapshotSchema>;
export type PhMeterSnapshot = z.infer<typeof phMeterSnapshotSchema>;

// ---------------------------------------------------------------------------------------------
// Responses.

export interface Instrument {
  id: number;
  kind: InstrumentKind;
  name: string;
  notes: string | null;
  archived: boolean;
  calibrationTempC: number | null;
  resolutionSg: number | null;
  wcf: number | null;
  wcfSource: WcfSource | null;
  offsetC: number | null;
  /** Date (YYYY-MM-DD) of the last thermometer check. */
  offsetCheckedOn: string | null;
  resolutionPh: number | null;
  /** Date (YYYY-MM-DD) of the last two-point calibration. */
  calibratedOn: string | null;
  bufferLowPh: number | null;
  bufferHighPh: number | null;
  reminderDays: number | null;
  createdAt: string;
  updatedAt: string;
  /** What a reading taken now would keep. */
  snapshot: InstrumentSnapshot;
}

export interface CalibrationEntry {
  id: number;
  instrumentId: number;
  method: CalibrationMethod;
  /** What the brewer entered. */
  inputs: Record<string, unknown>;
  /** What was worked out from it (per-pair factors, offsets, expected boiling point). */
  result: Record<string, unknown> | null;
  before: InstrumentSnapshot | null;
  after: InstrumentSnapshot;
  createdAt: string;
}

export interface CalibrateResponse {
  instrument: Instrument;
  calibration: CalibrationEntry;
}
