/**
 * One reading through one instrument's calibration: the function the brew-day log, the
 * instruments page's "Check a reading" box and the API all call, so a corrected number shown
 * and a corrected number stored can never disagree. The snapshot is the calibration at the
 * moment of the reading; see docs/decisions/0005-readings-keep-their-calibration.md.
 */
import { BrewMathError, brixToSg, correctHydrometer, fermentingRefractometerSg, hydrometerTempWarning } from '../brewmath';
import {
  DEFAULT_HYDROMETER_CALIBRATION_C,
  DEFAULT_HYDROMETER_RESOLUTION_SG,
  DEFAULT_PH_REMINDER_DAYS,
  DEFAULT_PH_RESOLUTION,
  DEFAULT_WCF,
  THERMOMETER_OFFSET_FLAG_C,
  type HydrometerSnapshot,
  type InstrumentKind,
  type InstrumentSnapshot,
  type PhMeterSnapshot,
  type RefractometerSnapshot,
  type ThermometerSnapshot,
} from '../schemas/instruments';
import { DAY_MS } from '../dates';

export interface HydrometerRaw {
  /** As read at the bottom of the meniscus. */
  sg: number;
  sampleTempC: number;
}
export interface RefractometerRaw {
  brix: number;
  /** The Brix of the same batch before fermentation began; needed once it has. */
  originalBrix?: number | null;
  fermentationStarted?: boolean;
}
export interface ThermometerRaw {
  tempC: number;
}
export interface PhMeterRaw {
  ph: number;
}

export interface RawByKind {
  hydrometer: HydrometerRaw;
  refractometer: RefractometerRaw;
  thermometer: ThermometerRaw;
  ph_meter: PhMeterRaw;
}

export type Correction =
  | { kind: 'temperature'; calibrationTempC: number; sampleTempC: number }
  | { kind: 'wcf'; wcf: number }
  /** Alcohol-corrected estimate: S. Terrill (2011) cubic, with the original Brix. */
  | {
      kind: 'wcf-alcohol';
      wcf: number;
      originalBrix: number;
      /** 'unfermented': no drop from the original reading yet, so the plain conversion. */
      formula: 'terrill-2011-cubic' | 'unfermented';
      /** Outside the range the correction was fitted to (absent on readings stored before it was flagged). */
      rough?: boolean;
    }
  /** true = (reading − offsetC) × scale; scale is absent (1) for a one-point check. */
  | { kind: 'offset'; offsetC: number; scale?: number }
  /** A pH meter corrects itself through its two-point calibration; we only record its state. */
  | { kind: 'ph-calibration'; calibratedOn: string | null; daysSinceCalibration: number | null; reminderDays: number };

export interface CorrectedReading {
  /** SG for hydrometer and refractometer, °C for a thermometer, pH for a pH meter. */
  corrected: number;
  correction: Correction;
  /** Short cautions in plain words, for the form and the log. */
  warnings: string[];
}

type SnapshotOf<K extends InstrumentKind> = Extract<InstrumentSnapshot, { kind: K }>;

/** How warnings are worded: temperatures in the brewer's units (metric unless told). */
export interface WordsOptions {
  unitSystem?: 'metric' | 'us';
}

/**
 * Applies a calibration snapshot to a raw reading. Throws a BrewMathError (with `field` naming
 * the raw input) for impossible input; `now` decides whether a pH meter is overdue.
 */
export function correctReading<K extends InstrumentKind>(snapshot: SnapshotOf<K>, raw: RawByKind[K], now?: Date, options?: WordsOptions): CorrectedReading;
export function correctReading(snapshot: InstrumentSnapshot, raw: RawByKind[InstrumentKind], now: Date = new Date(), options: WordsOptions = {}): CorrectedReading {
  switch (snapshot.kind) {
    case 'hydrometer':
      return correctHydrometerReading(snapshot, raw as HydrometerRaw, options.unitSystem);
    case 'refractometer':
      return correctRefractometerReading(snapshot, raw as RefractometerRaw);
    case 'thermometer':
      return correctThermometerReading(snapshot, raw as ThermometerRaw);
    case 'ph_meter':
      return correctPhReading(snapshot, raw as PhMeterRaw, now);
  }
}

function requireNumber(value: unknown, field: string, label: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new BrewMathError(`${label} is missing or not a number.`, 'not-a-number', field);
  }
  return value;
}

const fmt = (value: number, digits: number) => Number(value.toFixed(digits)).toString();

function correctHydrometerReading(snapshot: HydrometerSnapshot, raw: HydrometerRaw, unitSystem: 'metric' | 'us' = 'metric'): CorrectedReading {
  const sg = requireNumber(raw?.sg, 'sg', 'Hydrometer reading');
  const sampleTempC = requireNumber(raw?.sampleTempC, 'sampleTempC', 'Sample temperature');
  const calibrationTempC = snapshot.calibrationTempC;
  let corrected: number;
  try {
    corrected = correctHydrometer(sg, sampleTempC, calibrationTempC);
  } catch (error) {
    // Name the fields as the caller spells them.
    if (error instanceof BrewMathError && error.field === 'readingSg') throw new BrewMathError(error.message, error.code, 'sg');
    throw error;
  }
  const warnings: string[] = [];
  const tempWarning = hydrometerTempWarning(sampleTempC, calibrationTempC, unitSystem);
  if (tempWarning) warnings.push(tempWarning);
  if (sampleTempC >= 60) {
    warnings.push('Hot wort and steam burn: cool the sample in the trial jar before reading, and never put a hydrometer in boiling wort.');
  }
  return { corrected, correction: { kind: 'temperature', calibrationTempC, sampleTempC }, warnings };
}

function correctRefractometerReading(snapshot: RefractometerSnapshot, raw: RefractometerRaw): CorrectedReading {
  const brix = requireNumber(raw?.brix, 'brix', 'Brix reading');
  const wcf = snapshot.wcf;
  const warnings: string[] = [];
  if (snapshot.wcfSource === 'default') {
    warnings.push(`The factor ${fmt(wcf, 3)} is the common-practice default, not measured for this refractometer. Calibrate it from paired hydrometer readings for better numbers.`);
  }
  if (raw.fermentationStarted) {
    if (raw.originalBrix === undefined || raw.originalBrix === null) {
      throw new BrewMathError(
        'Fermentation has started: alcohol skews a refractometer, so this reading means nothing without the Brix of the same wort before fermentation. Enter the original Brix, or use a hydrometer.',
        'inconsistent',
        'originalBrix',
      );
    }
    const originalBrix = requireNumber(raw.originalBrix, 'originalBrix', 'Original Brix reading');
    const estimate = withField(() => fermentingRefractometerSg(originalBrix, brix, wcf), { currentBrix: 'brix' });
    if (estimate.method === 'unfermented') {
      warnings.push('No drop from the original reading yet, so nothing has fermented: this is the plain Brix-to-gravity conversion.');
    } else {
      warnings.push(
        'Alcohol skews a refractometer once fermentation starts: this is an alcohol-corrected estimate from the original Brix. Confirm the final gravity with a hydrometer before packaging.',
      );
      if (estimate.roughReason) warnings.push(estimate.roughReason);
    }
    return { corrected: estimate.sg, correction: { kind: 'wcf-alcohol', wcf, originalBrix, formula: estimate.method, rough: estimate.rough }, warnings };
  }
  return { corrected: brixToSg(brix, wcf), correction: { kind: 'wcf', wcf }, warnings };
}

/** The math names its own parameters; a form names its fields. */
function withField<T>(fn: () => T, fields: Record<string, string>): T {
  try {
    return fn();
  } catch (error) {
    if (error instanceof BrewMathError && error.field && fields[error.field]) throw new BrewMathError(error.message, error.code, fields[error.field]);
    throw error;
  }
}

function correctThermometerReading(snapshot: ThermometerSnapshot, raw: ThermometerRaw): CorrectedReading {
  const tempC = requireNumber(raw?.tempC, 'tempC', 'Temperature');
  if (tempC < -30 || tempC > 130) {
    throw new BrewMathError(`A temperature of ${fmt(tempC, 1)} °C is outside −30 to 130 °C, beyond anything in brewing. Check the reading.`, 'out-of-range', 'tempC');
  }
  const offsetC = snapshot.offsetC;
  const warnings: string[] = [];
  if (Math.abs(offsetC) > THERMOMETER_OFFSET_FLAG_C) {
    warnings.push(
      `This thermometer reads ${fmt(Math.abs(offsetC), 1)} °C ${offsetC > 0 ? 'high' : 'low'}, more than 1 °C off. The correction is applied, but check it again in an ice bath and consider a better thermometer.`,
    );
  }
  if (snapshot.checkedOn === null && offsetC === 0) {
    warnings.push('This thermometer has not been checked yet. Built-in gauges and stick-on strips can be several degrees off: check it in an ice bath.');
  }
  const scale = snapshot.scale ?? 1;
  return { corrected: (tempC - offsetC) * scale, correction: scale === 1 ? { kind: 'offset', offsetC } : { kind: 'offset', offsetC, scale }, warnings };
}

export interface PhCalibrationStatus {
  calibratedOn: string | null;
  /** Whole days since the last two-point calibration; null when never calibrated. */
  daysSince: number | null;
  /** The day the next calibration is due (YYYY-MM-DD), or null when never calibrated. */
  dueOn: string | null;
  overdue: boolean;
  message: string | null;
}

/** Is this pH meter due for its two-point calibration? */
export function phCalibrationStatus(snapshot: Pick<PhMeterSnapshot, 'calibratedOn' | 'reminderDays'>, now: Date = new Date()): PhCalibrationStatus {
  const { calibratedOn, reminderDays } = snapshot;
  if (!calibratedOn) {
    return {
      calibratedOn: null,
      daysSince: null,
      dueOn: null,
      overdue: true,
      message: 'No two-point calibration on record. Calibrate the meter in two buffers before trusting a mash pH.',
    };
  }
  const calibratedMs = Date.parse(`${calibratedOn}T00:00:00Z`);
  const todayMs = Date.parse(`${now.toISOString().slice(0, 10)}T00:00:00Z`);
  const daysSince = Math.max(0, Math.round((todayMs - calibratedMs) / DAY_MS));
  const dueOn = new Date(calibratedMs + reminderDays * DAY_MS).toISOString().slice(0, 10);
  const overdue = daysSince > reminderDays;
  return {
    calibratedOn,
    daysSince,
    dueOn,
    overdue,
    message: overdue
      ? `Last calibrated ${daysSince} days ago, beyond your ${reminderDays}-day interval. Calibrate it in two buffers before trusting a mash pH.`
      : null,
  };
}

function correctPhReading(snapshot: PhMeterSnapshot, raw: PhMeterRaw, now: Date): CorrectedReading {
  const ph = requireNumber(raw?.ph, 'ph', 'pH reading');
  if (ph < 0 || ph > 14) throw new BrewMathError(`pH ${fmt(ph, 2)} is outside the 0 to 14 scale. Check the reading.`, 'out-of-range', 'ph');
  const status = phCalibrationStatus(snapshot, now);
  const warnings: string[] = [];
  if (status.message) warnings.push(status.message);
  if (snapshot.resolutionPh > 0.01 + 1e-9) {
    warnings.push(
      `This meter shows ${fmt(snapshot.resolutionPh, 3)} pH steps; mash pH needs 0.01 or finer. Paper strips and pool meters are not good enough.`,
    );
  }
  return {
    corrected: ph,
    correction: { kind: 'ph-calibration', calibratedOn: status.calibratedOn, daysSinceCalibration: status.daysSince, reminderDays: snapshot.reminderDays },
    warnings,
  };
}

/** Common-practice stand-ins for a reading taken with an instrument the brewer has not profiled. */
export function defaultSnapshot<K extends InstrumentKind>(kind: K): SnapshotOf<K>;
export function defaultSnapshot(kind: InstrumentKind): InstrumentSnapshot {
  const base = { instrumentId: null, calibrationId: null } as const;
  switch (kind) {
    case 'hydrometer':
      return {
        ...base,
        kind,
        name: 'Hydrometer (20 °C, assumed)',
        calibrationTempC: DEFAULT_HYDROMETER_CALIBRATION_C,
        resolutionSg: DEFAULT_HYDROMETER_RESOLUTION_SG,
      };
    case 'refractometer':
      return { ...base, kind, name: `Refractometer (factor ${DEFAULT_WCF}, assumed)`, wcf: DEFAULT_WCF, wcfSource: 'default' };
    case 'thermometer':
      return { ...base, kind, name: 'Thermometer (unchecked)', offsetC: 0, checkedOn: null };
    case 'ph_meter':
      return {
        ...base,
        kind,
        name: 'pH meter (uncalibrated)',
        resolutionPh: DEFAULT_PH_RESOLUTION,
        calibratedOn: null,
        reminderDays: DEFAULT_PH_REMINDER_DAYS,
        bufferLowPh: null,
        bufferHighPh: null,
      };
  }
}
