/**
 * The late-boil check's field rules, without zod: each number's name, limits and messages once.
 * `boil-check.ts` builds the zod schemas the server validates with from these rules, and
 * `validateBoilCheck` applies the same rules in plain code, so the public check in the browser
 * says exactly what the API would without shipping zod to a visitor (issue 14: JavaScript size).
 * boil-check-rules.test.ts checks that both give the same verdict on the same input.
 */
import { BrewMathError, BRIX_MAX, BRIX_MIN, EXTRACT_KINDS, SG_MAX, SG_MIN, WCF_MAX, WCF_MIN, type ExtractKind } from '../brewmath';
import { POTENTIAL_MAX_POINTS_L_PER_KG, POTENTIAL_MIN_POINTS_L_PER_KG } from '../brewmath/extract';
import { DEFAULT_CALIBRATION_TEMP_C, runBoilCheck, type BoilCheckInput } from '../boil-check/check';
import { showF, showGal } from './unit-text';

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

/** One number a brewer enters: "Enter {what}." when missing, "{label} must be a number." when not one, `message` when out of range. */
export interface NumberRule {
  what: string;
  label: string;
  inRange: (v: number) => boolean;
  message: string | ((v: number) => string);
}

const gal = showGal;
const f = showF;
const sg3 = (sg: number) => sg.toFixed(3);

const volume = (what: string, label: string): NumberRule => ({
  what,
  label,
  inRange: (v) => v > 0 && v <= BOIL_CHECK_LIMITS.volumeL,
  message: (v) =>
    v <= 0
      ? `${label} must be more than 0.`
      : `${label} above ${BOIL_CHECK_LIMITS.volumeL} L (${gal(BOIL_CHECK_LIMITS.volumeL)}) is more than Wortwise handles. Check the number.`,
});

const wortGravity = (what: string, label: string): NumberRule => ({
  what,
  label,
  inRange: (v) => v >= SG_MIN && v <= SG_MAX,
  message: (v) => `${label} ${sg3(v)} is outside ${sg3(SG_MIN)} to ${sg3(SG_MAX)}, the range wort can read. Check the reading.`,
});

export const boilCheckRules = {
  brix: {
    what: 'the Brix reading',
    label: 'Brix',
    inRange: (v) => v >= BRIX_MIN && v <= BRIX_MAX,
    message: (v) => `Brix ${v} is outside ${BRIX_MIN} to ${BRIX_MAX} °Bx, the scale of a brewing refractometer. Check the reading.`,
  },
  wcf: {
    what: 'the wort correction factor',
    label: 'Wort correction factor',
    inRange: (v) => v >= WCF_MIN && v <= WCF_MAX,
    message: (v) => `Wort correction factor ${v} is outside ${WCF_MIN} to ${WCF_MAX}; most refractometers need about 1.00 to 1.10.`,
  },
  hydrometerSg: wortGravity('the hydrometer reading', 'Hydrometer reading'),
  sampleTempC: {
    what: 'the sample temperature',
    label: 'Sample temperature',
    inRange: (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.hydrometerSampleMaxC,
    message: (v) =>
      v < 0
        ? `Sample temperature must be between 0 and ${BOIL_CHECK_LIMITS.hydrometerSampleMaxC} °C (${f(0)} and ${f(BOIL_CHECK_LIMITS.hydrometerSampleMaxC)}).`
        : `A sample at ${v} °C (${f(v)}) is too hot to decide the boil on: the hydrometer correction assumes wort expands like water, which holds only near room temperature. Cool the sample below ${BOIL_CHECK_LIMITS.hydrometerSampleMaxC} °C (${f(BOIL_CHECK_LIMITS.hydrometerSampleMaxC)}), ideally to the hydrometer's calibration temperature, and read it again.`,
  },
  calibrationTempC: {
    what: 'the calibration temperature',
    label: 'Calibration temperature',
    inRange: (v) => v >= 0 && v <= 40,
    message: () =>
      `Calibration temperature must be between 0 and 40 °C (${f(0)} and ${f(40)}); most hydrometers say ${DEFAULT_CALIBRATION_TEMP_C} °C or 60 °F on the scale.`,
  },
  volumeL: volume('the volume in the kettle', 'Kettle volume'),
  currentSg: wortGravity('the current gravity', 'Current gravity'),
  minutesLeft: {
    what: 'the minutes left in the boil',
    label: 'Minutes left',
    inRange: (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.minutesLeft,
    message: (v) => (v < 0 ? 'Minutes left cannot be below 0.' : `Minutes left must be at most ${BOIL_CHECK_LIMITS.minutesLeft}.`),
  },
  boilOffLPerHour: {
    what: 'the boil-off rate',
    label: 'Boil-off rate',
    inRange: (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.boilOffLPerHour,
    message: (v) =>
      v < 0
        ? 'Boil-off rate cannot be below 0.'
        : `Boil-off rate above ${BOIL_CHECK_LIMITS.boilOffLPerHour} L/h (${gal(BOIL_CHECK_LIMITS.boilOffLPerHour)}/h) is more than Wortwise handles. Check the number.`,
  },
  targetSg: {
    what: 'the target OG',
    label: 'Target OG',
    inRange: (v) => v > 1 && v <= SG_MAX,
    message: (v) => `Target OG ${sg3(v)} must be above 1.000 and at most ${sg3(SG_MAX)}.`,
  },
  targetVolumeL: volume("the recipe's volume", "The recipe's volume"),
  targetFg: wortGravity('the target FG', 'Target FG'),
  kettleCapacityL: volume('the kettle size', 'Kettle size'),
  coolingShrinkage: {
    what: 'the cooling shrinkage',
    label: 'Cooling shrinkage',
    inRange: (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.coolingShrinkage,
    message: 'Cooling shrinkage must be between 0 and 10 % (about 4 % is usual).',
  },
  kettleLossL: {
    what: 'the kettle losses',
    label: 'Kettle losses',
    inRange: (v) => v >= 0 && v <= BOIL_CHECK_LIMITS.kettleLossL,
    message: () => `Kettle losses (trub and dead space) must be between 0 and ${BOIL_CHECK_LIMITS.kettleLossL} L (0 and ${gal(BOIL_CHECK_LIMITS.kettleLossL)}).`,
  },
  potential: {
    what: 'the extract potential',
    label: 'Potential',
    inRange: (v) => v >= POTENTIAL_MIN_POINTS_L_PER_KG && v <= POTENTIAL_MAX_POINTS_L_PER_KG,
    message: () =>
      `Potential must be between ${POTENTIAL_MIN_POINTS_L_PER_KG} and ${POTENTIAL_MAX_POINTS_L_PER_KG} points·L/kg (about 6 to 54 points per lb per gallon); table sugar is about 384 (46).`,
  },
} satisfies Record<string, NumberRule>;

export const EXTRACT_KIND_MESSAGE = 'Choose dry malt extract, liquid malt extract, table sugar or dextrose.';
export const READING_KIND_MESSAGE = 'Choose a refractometer or a hydrometer reading.';

export const isMissing = (value: unknown) => value === undefined || value === null || value === '';

/** A rule's message for this value, or null when it is fine (a finite number in range). */
export function numberProblem(rule: NumberRule, value: unknown): string | null {
  if (typeof value !== 'number' || !Number.isFinite(value)) return isMissing(value) ? `Enter ${rule.what}.` : `${rule.label} must be a number.`;
  if (!rule.inRange(value)) return typeof rule.message === 'string' ? rule.message : rule.message(value);
  return null;
}

export interface BoilCheckIssue {
  path: string[];
  message: string;
}

type Raw = Record<string, unknown>;
const isObject = (value: unknown): value is Raw => typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * Each field on its own, in the order the schema reports them: what is missing or wrong. The
 * input is the schema's (BoilCheckFormInput); an optional field may be absent.
 */
export function boilCheckFieldIssues(raw: Raw): BoilCheckIssue[] {
  const issues: BoilCheckIssue[] = [];
  const check = (path: string[], rule: NumberRule, value: unknown, optional = false) => {
    if (optional && value === undefined) return;
    const message = numberProblem(rule, value);
    if (message) issues.push({ path, message });
  };
  const reading = raw.reading;
  if (isObject(reading) && reading.kind === 'refractometer') {
    check(['reading', 'brix'], boilCheckRules.brix, reading.brix);
    check(['reading', 'wcf'], boilCheckRules.wcf, reading.wcf, true);
  } else if (isObject(reading) && reading.kind === 'hydrometer') {
    check(['reading', 'sg'], boilCheckRules.hydrometerSg, reading.sg);
    check(['reading', 'sampleTempC'], boilCheckRules.sampleTempC, reading.sampleTempC);
    check(['reading', 'calibrationTempC'], boilCheckRules.calibrationTempC, reading.calibrationTempC, true);
  } else {
    issues.push({ path: ['reading'], message: READING_KIND_MESSAGE });
  }
  check(['volumeL'], boilCheckRules.volumeL, raw.volumeL);
  check(['minutesLeft'], boilCheckRules.minutesLeft, raw.minutesLeft);
  check(['boilOffLPerHour'], boilCheckRules.boilOffLPerHour, raw.boilOffLPerHour);
  check(['targetSg'], boilCheckRules.targetSg, raw.targetSg);
  check(['targetVolumeL'], boilCheckRules.targetVolumeL, raw.targetVolumeL, true);
  check(['targetFg'], boilCheckRules.targetFg, raw.targetFg, true);
  const onHand = raw.extractsOnHand;
  if (Array.isArray(onHand)) {
    onHand.forEach((kind, i) => {
      if (!EXTRACT_KINDS.includes(kind as ExtractKind)) issues.push({ path: ['extractsOnHand', String(i)], message: EXTRACT_KIND_MESSAGE });
    });
  }
  if (raw.potentials !== undefined) {
    const potentials = isObject(raw.potentials) ? raw.potentials : {};
    for (const kind of EXTRACT_KINDS) check(['potentials', kind], boilCheckRules.potential, potentials[kind], true);
  }
  check(['kettleCapacityL'], boilCheckRules.kettleCapacityL, raw.kettleCapacityL, true);
  check(['coolingShrinkage'], boilCheckRules.coolingShrinkage, raw.coolingShrinkage, true);
  check(['kettleLossL'], boilCheckRules.kettleLossL, raw.kettleLossL, true);
  return issues;
}

/** A BrewMathError from running the check, as an issue under the field that causes it (the schema's last step). */
export function brewMathIssue(error: BrewMathError): BoilCheckIssue {
  return { path: error.field ? error.field.split('.') : [], message: error.message };
}

/**
 * The whole verdict without zod, for input shaped like the form's: every field on its own, then,
 * once all are valid, the check itself (an impossible combination comes back under its field).
 * Only for well-formed shapes (a reading object, an array of extracts): the API validates
 * arbitrary JSON with the zod schema.
 */
export function validateBoilCheck(raw: Raw): { ok: true; input: BoilCheckInput } | { ok: false; issues: BoilCheckIssue[] } {
  const issues = boilCheckFieldIssues(raw);
  if (issues.length > 0) return { ok: false, issues };
  const input = { ...raw, extractsOnHand: raw.extractsOnHand ?? [...EXTRACT_KINDS] } as unknown as BoilCheckInput;
  try {
    runBoilCheck(input);
  } catch (error) {
    if (!(error instanceof BrewMathError)) throw error;
    return { ok: false, issues: [brewMathIssue(error)] };
  }
  return { ok: true, input };
}
