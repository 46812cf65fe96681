/**
 * The late-boil check: what the brewer entered (a refractometer or cooled hydrometer reading,
 * the kettle, the recipe's targets, the extracts on hand) → the current gravity and every
 * correction from `boilCorrection`. Pure, SI inside, no I/O: the React form calls it on every
 * keystroke and the server calls it again to recompute a saved decision, so the numbers on
 * screen and the numbers stored cannot disagree.
 */
import {
  BrewMathError,
  DEFAULT_WCF,
  EXTRACT_KINDS,
  boilCorrection,
  brixToSg,
  correctHydrometer,
  hydrometerTempWarning,
  type BoilCorrection,
  type ExtractKind,
} from '../brewmath';
import { requirePotential } from '../brewmath/extract';

/** Many hydrometers are calibrated at 20 °C (others at 15.56 °C / 60 °F; the brewer can say so). */
export const DEFAULT_CALIBRATION_TEMP_C = 20;

export interface RefractometerReading {
  kind: 'refractometer';
  /** °Brix as read from a drop of wort (the drop cools in seconds). */
  brix: number;
  /** The refractometer's wort correction factor; 1.04 when not given. */
  wcf?: number;
}

export interface HydrometerReading {
  kind: 'hydrometer';
  /** The hydrometer's reading at the sample's temperature (a sample cooled from the boil). */
  sg: number;
  sampleTempC: number;
  /** The hydrometer's calibration temperature; 20 °C when not given. */
  calibrationTempC?: number;
}

export type BoilCheckReading = RefractometerReading | HydrometerReading;

export interface BoilCheckInput {
  reading: BoilCheckReading;
  /** Hot wort in the kettle now, litres. */
  volumeL: number;
  minutesLeft: number;
  /** Hot litres lost per hour (from the equipment profile, editable). */
  boilOffLPerHour: number;
  /** The recipe's OG. */
  targetSg: number;
  /** The recipe's volume into the fermenter, cold. */
  targetVolumeL?: number;
  /** The recipe's FG, for ABV; 75 % apparent attenuation of the target when not given. */
  targetFg?: number;
  /** Which extracts the brewer has to hand; all four when not given. */
  extractsOnHand?: readonly ExtractKind[];
  /** Potentials in gravity points × litres per kg, where the brewer's extract differs from the default. */
  potentials?: Partial<Record<ExtractKind, number>>;
  kettleCapacityL?: number;
  /** Fraction the wort shrinks by on cooling; 0.04 when not given. */
  coolingShrinkage?: number;
  /** The kettle profile's trub loss plus dead space, litres left behind; 0 when not given. */
  kettleLossL?: number;
}

/** The reading with its defaults filled in, as it was used. */
export type UsedReading =
  | (Required<RefractometerReading> & { kind: 'refractometer' })
  | (Required<HydrometerReading> & { kind: 'hydrometer' });

export interface BoilCheckOutcome {
  /** The wort's gravity now, from the reading (read cold, at 20 °C). */
  currentSg: number;
  reading: UsedReading;
  /** boilCorrection's answer, with extract options only for the extracts on hand. */
  result: BoilCorrection;
  /** Cautions that do not stop the check (e.g. a hydrometer sample far from its calibration temperature). */
  warnings: string[];
}

/**
 * Where each BrewMathError field of the functions called below lives in BoilCheckInput, so the
 * error lands under the input the brewer typed. `sg` is the current gravity, i.e. the reading.
 */
function inputPath(field: string | undefined, reading: BoilCheckReading): string | undefined {
  if (field === undefined) return undefined;
  const fromReading: Record<string, string> =
    reading.kind === 'refractometer'
      ? { brix: 'reading.brix', wcf: 'reading.wcf', sg: 'reading.brix' }
      : { readingSg: 'reading.sg', sg: 'reading.sg', sampleTempC: 'reading.sampleTempC', calibrationTempC: 'reading.calibrationTempC' };
  if (field in fromReading) return fromReading[field];
  if (field === 'extract') return 'potentials';
  return field;
}

function readingToSg(reading: BoilCheckReading, unitSystem: 'metric' | 'us'): { currentSg: number; used: UsedReading; warnings: string[] } {
  if (reading.kind === 'refractometer') {
    const wcf = reading.wcf ?? DEFAULT_WCF;
    return { currentSg: brixToSg(reading.brix, wcf), used: { kind: 'refractometer', brix: reading.brix, wcf }, warnings: [] };
  }
  if (reading.kind === 'hydrometer') {
    const calibrationTempC = reading.calibrationTempC ?? DEFAULT_CALIBRATION_TEMP_C;
    const currentSg = correctHydrometer(reading.sg, reading.sampleTempC, calibrationTempC);
    const warning = hydrometerTempWarning(reading.sampleTempC, calibrationTempC, unitSystem);
    return {
      currentSg,
      used: { kind: 'hydrometer', sg: reading.sg, sampleTempC: reading.sampleTempC, calibrationTempC },
      warnings: warning ? [warning] : [],
    };
  }
  throw new BrewMathError('Choose a refractometer or a hydrometer reading.', 'inconsistent', 'reading.kind');
}

/**
 * Runs the late-boil check. Throws a BrewMathError for impossible input; its `field` is the
 * path in BoilCheckInput (e.g. `reading.brix`, `boilOffLPerHour`, `potentials.dme`).
 */
export function runBoilCheck(input: BoilCheckInput, { unitSystem = 'metric' }: { unitSystem?: 'metric' | 'us' } = {}): BoilCheckOutcome {
  const { reading } = input;
  try {
    const { currentSg, used, warnings } = readingToSg(reading, unitSystem);
    const onHand = new Set<ExtractKind>(input.extractsOnHand ?? EXTRACT_KINDS);
    const potentials = input.potentials;
    if (potentials) {
      for (const kind of EXTRACT_KINDS) {
        const p = potentials[kind];
        if (p !== undefined) requirePotential(p, `potentials.${kind}`);
      }
    }
    const full = boilCorrection({
      volumeL: input.volumeL,
      sg: currentSg,
      minutesLeft: input.minutesLeft,
      boilOffLPerHour: input.boilOffLPerHour,
      targetSg: input.targetSg,
      targetVolumeL: input.targetVolumeL,
      targetFg: input.targetFg,
      extract: potentials,
      kettleCapacityL: input.kettleCapacityL,
      coolingShrinkage: input.coolingShrinkage,
      kettleLossL: input.kettleLossL,
    });
    const result: BoilCorrection = { ...full, options: full.options.filter((o) => o.kind !== 'extract' || onHand.has(o.extract)) };
    return { currentSg, reading: used, result, warnings };
  } catch (error) {
    if (error instanceof BrewMathError && error.field && !error.field.includes('.')) {
      throw new BrewMathError(error.message, error.code, inputPath(error.field, reading));
    }
    throw error;
  }
}

