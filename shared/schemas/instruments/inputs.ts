/**
 * Instruments: the request shapes shared by the API and the forms (creating, editing and
 * calibrating), and their vocabulary. SI inside (°C, SG); the forms convert at the edge. The
 * answers and the calibration snapshot a reading keeps are in responses.ts; kettles in ../equipment.ts.
 */
import { z } from 'zod';
import { DEFAULT_WCF, ELEVATION_MAX_M, ELEVATION_MIN_M, WCF_MAX, WCF_MIN } from '../../brewmath';
import { num } from '../fields';

export const instrumentKinds = ['hydrometer', 'refractometer', 'thermometer', 'ph_meter'] as const;
export type InstrumentKind = (typeof instrumentKinds)[number];

export const instrumentKindLabels: Record<InstrumentKind, string> = {
  hydrometer: 'Hydrometer',
  refractometer: 'Refractometer',
  thermometer: 'Thermometer',
  ph_meter: 'pH meter',
};

/** Many hydrometers are calibrated at 20 °C; older and US ones at 60 °F = 15.56 °C. */
export const DEFAULT_HYDROMETER_CALIBRATION_C = 20;
export const HYDROMETER_CALIBRATION_PRESETS_C = [20, 15.56] as const;
export const HYDROMETER_CALIBRATION_MIN_C = 10;
export const HYDROMETER_CALIBRATION_MAX_C = 30;

/** An offset beyond this is worth a second look (common practice, no source). */
export const THERMOMETER_OFFSET_FLAG_C = 1;
/** Beyond this the thermometer is broken or was misread: replace it, do not correct it. */
export const THERMOMETER_OFFSET_MAX_C = 10;

export const DEFAULT_PH_RESOLUTION = 0.01;
/** Most brewing hydrometers are marked every 0.001; finer lab ones every 0.0005, coarse ones every 0.002. */
export const DEFAULT_HYDROMETER_RESOLUTION_SG = 0.001;
export const HYDROMETER_RESOLUTION_PRESETS_SG = [0.0005, 0.001, 0.002] as const;
export const DEFAULT_PH_REMINDER_DAYS = 30;
/** The usual pair of buffers for a two-point calibration around mash pH (common practice, no source). */
export const DEFAULT_PH_BUFFERS = { low: 4.01, high: 7.0 } as const;

export const wcfSources = ['default', 'entered', 'measured'] as const;
export type WcfSource = (typeof wcfSources)[number];

// ---------------------------------------------------------------------------------------------
// Field schemas, each with a message a brewer can act on.

export const instrumentNameSchema = z
  .string({ error: 'Give the instrument a name.' })
  .trim()
  .min(1, { error: 'Give the instrument a name.' })
  .max(80, { error: 'Use at most 80 characters.' });

const notesSchema = z.string().trim().max(500, { error: 'Use at most 500 characters.' }).nullish();

export const calibrationTempSchema = num({ notNumber: 'Calibration temperature: enter a number.' })
  .min(HYDROMETER_CALIBRATION_MIN_C, { error: 'Hydrometers are calibrated between 10 and 30 °C (usually 20 °C or 15.56 °C / 60 °F).' })
  .max(HYDROMETER_CALIBRATION_MAX_C, { error: 'Hydrometers are calibrated between 10 and 30 °C (usually 20 °C or 15.56 °C / 60 °F).' });

const wcfMessage = `The wort correction factor must be between ${WCF_MIN} and ${WCF_MAX}; most refractometers need about 1.00 to 1.10.`;
export const wcfSchema = num({ notNumber: 'Wort correction factor: enter a number.' }).min(WCF_MIN, { error: wcfMessage }).max(WCF_MAX, { error: wcfMessage });

const offsetMessage = `An offset over ${THERMOMETER_OFFSET_MAX_C} °C means the thermometer is broken or was misread: replace it rather than correct it.`;
export const offsetSchema = num({ notNumber: 'Offset: enter a number.' }).min(-THERMOMETER_OFFSET_MAX_C, { error: offsetMessage }).max(THERMOMETER_OFFSET_MAX_C, { error: offsetMessage });

export const hydrometerResolutionSchema = num({ notNumber: 'Scale step: enter a number.' })
  .min(0.0001, { error: 'The scale step is the gap between two marks on the hydrometer: between 0.0001 and 0.005 (usually 0.001).' })
  .max(0.005, { error: 'The scale step is the gap between two marks on the hydrometer: between 0.0001 and 0.005 (usually 0.001).' });

export const phResolutionSchema = num({ notNumber: 'Resolution: enter a number.' })
  .positive({ error: 'The resolution is the smallest step the meter shows, e.g. 0.01.' })
  .max(0.5, { error: 'A meter that shows only 0.5 pH steps cannot tell a good mash from a poor one.' });

export const reminderDaysSchema = num({ notNumber: 'Reminder interval: enter a number.' })
  .int({ error: 'Use whole days.' })
  .min(1, { error: 'Choose between 1 and 365 days.' })
  .max(365, { error: 'Calibrate at least once a year: choose 365 days or fewer.' });

const bufferSchema = (label: string) =>
  num({ notNumber: `${label}: enter a number.` }).min(1, { error: 'Calibration buffers lie between pH 1 and 13.' }).max(13, { error: 'Calibration buffers lie between pH 1 and 13.' });

/**
 * The last calendar day anywhere on Earth (UTC+14), so a brewer ahead of UTC can record today's
 * calibration while a date that is tomorrow everywhere is refused.
 */
export function latestTodayIso(now: Date = new Date()): string {
  return new Date(now.getTime() + 14 * 3600_000).toISOString().slice(0, 10);
}

export const pastDateSchema = z
  .string({ error: 'Enter the date.' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'Enter a date as YYYY-MM-DD.' })
  .pipe(z.iso.date({ error: 'Enter a real calendar date.' }))
  .refine((d) => d <= latestTodayIso(), { error: 'The calibration date cannot be in the future.' })
  .refine((d) => d >= '2000-01-01', { error: 'Enter a date after 2000.' });

export const elevationSchema = num({ notNumber: 'Elevation: enter a number.' })
  .min(ELEVATION_MIN_M, { error: `Elevation must be between ${ELEVATION_MIN_M} and ${ELEVATION_MAX_M} m.` })
  .max(ELEVATION_MAX_M, { error: `Elevation must be between ${ELEVATION_MIN_M} and ${ELEVATION_MAX_M} m.` });

// ---------------------------------------------------------------------------------------------
// Creating and editing instruments.

const hydrometerCreate = z.object({
  kind: z.literal('hydrometer'),
  name: instrumentNameSchema,
  notes: notesSchema,
  calibrationTempC: calibrationTempSchema.default(DEFAULT_HYDROMETER_CALIBRATION_C),
  resolutionSg: hydrometerResolutionSchema.default(DEFAULT_HYDROMETER_RESOLUTION_SG),
});
const refractometerCreate = z.object({
  kind: z.literal('refractometer'),
  name: instrumentNameSchema,
  notes: notesSchema,
  /** Leave out to start from the common-practice 1.04 until the brewer measures their own. */
  wcf: wcfSchema.optional(),
});
const thermometerCreate = z.object({
  kind: z.literal('thermometer'),
  name: instrumentNameSchema,
  notes: notesSchema,
  offsetC: offsetSchema.default(0),
});
const phMeterCreate = z.object({
  kind: z.literal('ph_meter'),
  name: instrumentNameSchema,
  notes: notesSchema,
  resolutionPh: phResolutionSchema.default(DEFAULT_PH_RESOLUTION),
  reminderDays: reminderDaysSchema.default(DEFAULT_PH_REMINDER_DAYS),
  calibratedOn: pastDateSchema.nullish(),
  bufferLowPh: bufferSchema('Low buffer').nullish(),
  bufferHighPh: bufferSchema('High buffer').nullish(),
});

export const createInstrumentSchema = z
  .discriminatedUnion('kind', [hydrometerCreate, refractometerCreate, thermometerCreate, phMeterCreate], {
    error: 'Choose a hydrometer, refractometer, thermometer or pH meter.',
  })
  .superRefine((v, ctx) => {
    if (v.kind === 'ph_meter') checkBuffers(v.bufferLowPh, v.bufferHighPh, ctx);
  });
export type CreateInstrumentInput = z.input<typeof createInstrumentSchema>;

function checkBuffers(low: number | null | undefined, high: number | null | undefined, ctx: z.RefinementCtx) {
  if (typeof low === 'number' && typeof high === 'number' && high - low < 1) {
    ctx.addIssue({ code: 'custom', path: ['bufferHighPh'], message: 'The high buffer must be at least 1 pH above the low one (e.g. 4.01 and 7.00).' });
  }
}

/** Renaming, notes and archiving. Calibration values change only through a calibration. */
export const updateInstrumentSchema = z.object({
  name: instrumentNameSchema.optional(),
  notes: notesSchema,
  archived: z.boolean({ error: 'Archived is yes or no.' }).optional(),
});
export type UpdateInstrumentInput = z.input<typeof updateInstrumentSchema>;

export const listInstrumentsQuerySchema = z.object({
  archived: z.enum(['include', 'only', 'exclude'], { error: 'Use include, only or exclude.' }).default('exclude'),
  kind: z.enum(instrumentKinds, { error: 'Unknown instrument kind.' }).optional(),
});

// ---------------------------------------------------------------------------------------------
// Calibrations: each one accepted by the brewer is saved with its inputs.

export const calibrationMethods = ['created', 'wcf-pairs', 'thermometer-check', 'ph-two-point', 'set'] as const;
export type CalibrationMethod = (typeof calibrationMethods)[number];

export const wcfPairInputSchema = z.object({
  brix: num({ notNumber: 'Brix: enter a number.' }).min(0, { error: 'Brix is between 0 and 40.' }).max(40, { error: 'Brix is between 0 and 40.' }),
  /** The hydrometer as read. */
  sg: num({ notNumber: 'Hydrometer reading: enter a number.' }).min(1, { error: 'Unfermented wort reads above 1.000.' }).max(1.2, { error: 'A hydrometer reading is below 1.200.' }),
  /** When given, the reading is corrected from this temperature to the hydrometer's calibration temperature. */
  sampleTempC: num({ notNumber: 'Sample temperature: enter a number.' })
    .min(0, { error: 'Read the sample between 0 and 60 °C; cool hot wort first.' })
    .max(60, { error: 'Read the sample between 0 and 60 °C; cool hot wort first.' })
    .nullish(),
});
export type WcfPairInput = z.input<typeof wcfPairInputSchema>;

export const MAX_WCF_PAIRS = 12;

const wcfPairsCalibration = z.object({
  method: z.literal('wcf-pairs'),
  pairs: z
    .array(wcfPairInputSchema, { error: 'Add the paired readings.' })
    .min(1, { error: 'Add at least one pair: refractometer Brix and hydrometer SG of the same unfermented wort.' })
    .max(MAX_WCF_PAIRS, { error: `Use at most ${MAX_WCF_PAIRS} pairs.` }),
  /** The hydrometer used; its calibration temperature corrects the readings. */
  hydrometerId: z.number().int().positive().nullish(),
  /** Used when no hydrometer profile is named. */
  hydrometerCalibrationTempC: calibrationTempSchema.nullish(),
});

const readingTempSchema = (label: string, min: number, max: number, hint: string) =>
  num({ notNumber: `${label}: enter a number.` }).min(min, { error: hint }).max(max, { error: hint });

const thermometerCheckCalibration = z
  .object({
    method: z.literal('thermometer-check'),
    /** The thermometer's reading in a stirred slurry of crushed ice and water: truly 0 °C. */
    iceReadingC: readingTempSchema('Ice-bath reading', -10, 10, 'In an ice bath a working thermometer reads within 10 °C of 0 °C.').nullish(),
    /** The reading in water at a rolling boil. */
    boilingReadingC: readingTempSchema('Boiling-water reading', 80, 110, 'In boiling water a working thermometer reads between 80 and 110 °C.').nullish(),
    elevationM: elevationSchema.nullish(),
  })
  .superRefine((v, ctx) => {
    if (v.iceReadingC == null && v.boilingReadingC == null) {
      ctx.addIssue({ code: 'custom', path: ['iceReadingC'], message: 'Enter the ice-bath reading, the boiling-water reading, or both.' });
    }
    if (v.boilingReadingC != null && v.elevationM == null) {
      ctx.addIssue({ code: 'custom', path: ['elevationM'], message: 'Enter your elevation: water boils cooler the higher you are.' });
    }
  });

const phTwoPointCalibration = z
  .object({
    method: z.literal('ph-two-point'),
    calibratedOn: pastDateSchema,
    bufferLowPh: bufferSchema('Low buffer'),
    bufferHighPh: bufferSchema('High buffer'),
  })
  .superRefine((v, ctx) => checkBuffers(v.bufferLowPh, v.bufferHighPh, ctx));

/** Typing a value in directly (a factor measured elsewhere, a different calibration temperature). */
const setCalibration = z.object({
  method: z.literal('set'),
  calibrationTempC: calibrationTempSchema.optional(),
  resolutionSg: hydrometerResolutionSchema.optional(),
  wcf: wcfSchema.optional(),
  offsetC: offsetSchema.optional(),
  resolutionPh: phResolutionSchema.optional(),
  reminderDays: reminderDaysSchema.optional(),
  note: z.string().trim().max(200, { error: 'Use at most 200 characters.' }).nullish(),
});

export const calibrateInstrumentSchema = z.discriminatedUnion('method', [wcfPairsCalibration, thermometerCheckCalibration, phTwoPointCalibration, setCalibration], {
  error: 'Choose how the instrument was calibrated.',
});
export type CalibrateInstrumentInput = z.input<typeof calibrateInstrumentSchema>;
export type CalibrateInstrumentBody = z.output<typeof calibrateInstrumentSchema>;

/** Which calibration methods apply to which instrument. */
export const methodsByKind: Record<InstrumentKind, readonly CalibrationMethod[]> = {
  hydrometer: ['set'],
  refractometer: ['wcf-pairs', 'set'],
  thermometer: ['thermometer-check', 'set'],
  ph_meter: ['ph-two-point', 'set'],
};

/** Which directly settable values belong to which instrument. */
export const settableByKind: Record<InstrumentKind, readonly ('calibrationTempC' | 'resolutionSg' | 'wcf' | 'offsetC' | 'resolutionPh' | 'reminderDays')[]> = {
  hydrometer: ['calibrationTempC', 'resolutionSg'],
  refractometer: ['wcf'],
  thermometer: ['offsetC'],
  ph_meter: ['resolutionPh', 'reminderDays'],
};

export { DEFAULT_WCF };
