/**
 * The late-boil check: what the brewer enters (`boilCheckInputSchema`, used by the form and by a
 * saved decision) and the public calculator's body (`boilCorrectionRequestSchema`, the raw
 * `boilCorrection` input). Everything is SI and specific gravity; forms convert at their edges.
 * The limits are shared/brewmath's (Brix 0–40, SG 0.980–1.200, volume above 0, minutes not
 * below 0) plus upper bounds that catch typos; messages quote metric and US units because the
 * same message reaches brewers of either preference.
 */
import { z } from 'zod';
import { checkedNumber, showF, showGal } from './fields';
import { BrewMathError, BRIX_MAX, BRIX_MIN, EXTRACT_KINDS, SG_MAX, SG_MIN, WCF_MAX, WCF_MIN, type ExtractKind } from '../brewmath';
import { POTENTIAL_MAX_POINTS_L_PER_KG, POTENTIAL_MIN_POINTS_L_PER_KG } from '../brewmath/extract';
import { DEFAULT_CALIBRATION_TEMP_C, runBoilCheck, type BoilCheckInput } from '../boil-check';

/** Beyond a home or club brewery: most likely a typo (the same bounds as a recipe). */
export const BOIL_CHECK_LIMITS = {
  volumeL: 2000,
  minutesLeft: 360,
  boilOffLPerHour: 100,
  coolingShrinkage: 0.1,
  kettleLossL: 50,
  /**
   * The hydrometer correction assumes wort expands like water; far from the calibration
   * temperature that no longer holds well enough to decide a boil (common practice, no source).
   */
  hydrometerSampleMaxC: 40,
} as const;

const gal = showGal;
const f = showF;
const sg3 = (sg: number) => sg.toFixed(3);

const volume = (what: string, label: string) =>
  checkedNumber(what, label, (v) => v > 0 && v <= BOIL_CHECK_LIMITS.volumeL, (v) =>
    v <= 0
      ? `${label} must be more than 0.`
      : `${label} above ${BOIL_CHECK_LIMITS.volumeL} L (${gal(BOIL_CHECK_LIMITS.volumeL)}) is more than Wortwise handles. Check the number.`,
  );

const wortGravity = (what: string, label: string) =>
  checkedNumber(what, label, (v) => v >= SG_MIN && v <= SG_MAX, (v) =>
    `${label} ${sg3(v)} is outside ${sg3(SG_MIN)} to ${sg3(SG_MAX)}, the range wort can read. Check the reading.`,
  );

const boilCheckBrixSchema = checkedNumber('the Brix reading', 'Brix', (v) => v >= BRIX_MIN && v <= BRIX_MAX, (v) =>
  `Brix ${v} is outside ${BRIX_MIN} to ${BRIX_MAX} °Bx, the scale of a brewing refractometer. Check the reading.`,
);
export const wcfSchema = checkedNumber('the wort correction factor', 'Wort correction factor', (v) => v >= WCF_MIN && v <= WCF_MAX, (v) =>
  `Wort correction factor ${v} is outside ${WCF_MIN} to ${WCF_MAX}; most refractometers need about 1.00 to 1.10.`,
);
export const minutesLeftSchema = checkedNumber('the minutes left in the boil', 'Minutes left', (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.minutesLeft, (v) =>
  v < 0 ? 'Minutes left cannot be below 0.' : `Minutes left must be at most ${BOIL_CHECK_LIMITS.minutesLeft}.`,
);
export const boilOffSchema = checkedNumber('the boil-off rate', 'Boil-off rate', (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.boilOffLPerHour, (v) =>
  v < 0
    ? 'Boil-off rate cannot be below 0.'
    : `Boil-off rate above ${BOIL_CHECK_LIMITS.boilOffLPerHour} L/h (${gal(BOIL_CHECK_LIMITS.boilOffLPerHour)}/h) is more than Wortwise handles. Check the number.`,
);
export const targetSgSchema = checkedNumber('the target OG', 'Target OG', (v) => v > 1 && v <= SG_MAX, (v) =>
  `Target OG ${sg3(v)} must be above 1.000 and at most ${sg3(SG_MAX)}.`,
);
const shrinkageSchema = checkedNumber('the cooling shrinkage', 'Cooling shrinkage', (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.coolingShrinkage, () =>
  'Cooling shrinkage must be between 0 and 10 % (about 4 % is usual).',
);
const kettleLossSchema = checkedNumber('the kettle losses', 'Kettle losses', (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.kettleLossL, () =>
  `Kettle losses (trub and dead space) must be between 0 and ${BOIL_CHECK_LIMITS.kettleLossL} L (0 and ${gal(BOIL_CHECK_LIMITS.kettleLossL)}).`,
);
const potentialSchema = checkedNumber('the extract potential', 'Potential', (v) => v >= POTENTIAL_MIN_POINTS_L_PER_KG && v <= POTENTIAL_MAX_POINTS_L_PER_KG, () =>
  `Potential must be between ${POTENTIAL_MIN_POINTS_L_PER_KG} and ${POTENTIAL_MAX_POINTS_L_PER_KG} points·L/kg (about 6 to 54 points per lb per gallon); table sugar is about 384 (46).`,
);
export const potentialsSchema = z.object({
  dme: potentialSchema.optional(),
  lme: potentialSchema.optional(),
  sucrose: potentialSchema.optional(),
  dextrose: potentialSchema.optional(),
});

export const extractKindSchema = z.enum(EXTRACT_KINDS as [ExtractKind, ...ExtractKind[]], {
  error: 'Choose dry malt extract, liquid malt extract, table sugar or dextrose.',
});

export const refractometerReadingSchema = z.object({
  kind: z.literal('refractometer'),
  brix: boilCheckBrixSchema,
  wcf: wcfSchema.optional(),
});

export const hydrometerReadingSchema = z.object({
  kind: z.literal('hydrometer'),
  sg: wortGravity('the hydrometer reading', 'Hydrometer reading'),
  sampleTempC: checkedNumber('the sample temperature', 'Sample temperature', (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.hydrometerSampleMaxC, (v) =>
    v < 0
      ? `Sample temperature must be between 0 and ${BOIL_CHECK_LIMITS.hydrometerSampleMaxC} °C (${f(0)} and ${f(BOIL_CHECK_LIMITS.hydrometerSampleMaxC)}).`
      : `A sample at ${v} °C (${f(v)}) is too hot to decide the boil on: the hydrometer correction assumes wort expands like water, which holds only near room temperature. Cool the sample below ${BOIL_CHECK_LIMITS.hydrometerSampleMaxC} °C (${f(BOIL_CHECK_LIMITS.hydrometerSampleMaxC)}), ideally to the hydrometer's calibration temperature, and read it again.`,
  ),
  calibrationTempC: checkedNumber('the calibration temperature', 'Calibration temperature', (v) => v >= 0 && v <= 40, () =>
    `Calibration temperature must be between 0 and 40 °C (${f(0)} and ${f(40)}); most hydrometers say ${DEFAULT_CALIBRATION_TEMP_C} °C or 60 °F on the scale.`,
  ).optional(),
});

export const boilCheckReadingSchema = z.discriminatedUnion('kind', [refractometerReadingSchema, hydrometerReadingSchema], {
  error: 'Choose a refractometer or a hydrometer reading.',
});

const boilCheckFields = z.object({
  reading: boilCheckReadingSchema,
  volumeL: volume('the volume in the kettle', 'Kettle volume'),
  minutesLeft: minutesLeftSchema,
  boilOffLPerHour: boilOffSchema,
  targetSg: targetSgSchema,
  targetVolumeL: volume("the recipe's volume", "The recipe's volume").optional(),
  targetFg: wortGravity('the target FG', 'Target FG').optional(),
  extractsOnHand: z.array(extractKindSchema).max(EXTRACT_KINDS.length).default([...EXTRACT_KINDS]),
  potentials: potentialsSchema.optional(),
  kettleCapacityL: volume('the kettle size', 'Kettle size').optional(),
  coolingShrinkage: shrinkageSchema.optional(),
  kettleLossL: kettleLossSchema.optional(),
});

/**
 * What the brewer enters. Once every field is valid on its own, the check itself runs, so an
 * impossible combination (a boil-off that would empty the kettle, an FG above the OG) comes
 * back as a message under the input that causes it.
 */
export const boilCheckInputSchema = boilCheckFields.superRefine((input, ctx) => {
  try {
    runBoilCheck(input);
  } catch (error) {
    if (!(error instanceof BrewMathError)) throw error;
    ctx.addIssue({ code: 'custom', message: error.message, path: error.field ? error.field.split('.') : [] });
  }
});
export type BoilCheckFormInput = z.input<typeof boilCheckInputSchema>;
export type BoilCheckParsed = z.output<typeof boilCheckInputSchema>;

// The parsed input is exactly what runBoilCheck takes.
const _parsedIsInput = (parsed: BoilCheckParsed): BoilCheckInput => parsed;
void _parsedIsInput;

/** POST /api/calc/boil-correction: the `boilCorrection` input as JSON. */
export const boilCorrectionRequestSchema = z.object({
  volumeL: volume('the volume in the kettle', 'Kettle volume'),
  sg: wortGravity('the current gravity', 'Current gravity'),
  minutesLeft: minutesLeftSchema,
  boilOffLPerHour: boilOffSchema,
  targetSg: targetSgSchema,
  targetVolumeL: volume("the recipe's volume", "The recipe's volume").optional(),
  targetFg: wortGravity('the target FG', 'Target FG').optional(),
  extract: potentialsSchema.optional(),
  kettleCapacityL: volume('the kettle size', 'Kettle size').optional(),
  coolingShrinkage: shrinkageSchema.optional(),
  kettleLossL: kettleLossSchema.optional(),
});
export type BoilCorrectionRequest = z.input<typeof boilCorrectionRequestSchema>;
