/**
 * The late-boil form's values: SI numbers (or '' while a field is empty, NaN while it holds
 * text that is not a number), shaped like BoilCheckInput so a zod issue's path is the field's name.
 */
import { DEFAULT_CALIBRATION_TEMP_C, runBoilCheck, type BoilCheckInput, type BoilCheckOutcome } from '@shared/boil-check/check';
import { BrewMathError, DEFAULT_COOLING_SHRINKAGE, DEFAULT_WCF, EXTRACT_KINDS, type ExtractKind } from '@shared/brewmath';
import { boilCheckFieldIssues, brewMathIssue, isMissing, type BoilCheckIssue } from '@shared/schemas/boil-check-rules';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';

export type NumberValue = number | '' | null;
export type ReadingKind = 'refractometer' | 'hydrometer';

export interface LateBoilFormValues {
  reading: {
    kind: ReadingKind;
    brix: NumberValue;
    wcf: NumberValue;
    sg: NumberValue;
    sampleTempC: NumberValue;
    calibrationTempC: NumberValue;
  };
  volumeL: NumberValue;
  minutesLeft: NumberValue;
  boilOffLPerHour: NumberValue;
  targetSg: NumberValue;
  targetVolumeL: NumberValue;
  targetFg: NumberValue;
  extractsOnHand: ExtractKind[];
  potentials: Record<ExtractKind, NumberValue>;
  kettleCapacityL: NumberValue;
  coolingShrinkage: NumberValue;
  kettleLossL: NumberValue;
}

/**
 * What a caller may prefill, all SI: a brew day passes its snapshot of the recipe's targets
 * and the equipment profile (boil-off, kettle size, refractometer WCF, hydrometer calibration).
 */
export type LateBoilInitialValues = Partial<Omit<BoilCheckInput, 'reading'>> & {
  reading?: Partial<{ kind: ReadingKind; brix: number; wcf: number; sg: number; sampleTempC: number; calibrationTempC: number }>;
};

const v = (value: number | null | undefined): NumberValue => (typeof value === 'number' ? value : '');

export function toFormValues(initial: LateBoilInitialValues = {}): LateBoilFormValues {
  const r = initial.reading ?? {};
  return {
    reading: {
      kind: r.kind ?? 'refractometer',
      brix: v(r.brix),
      wcf: v(r.wcf ?? DEFAULT_WCF),
      sg: v(r.sg),
      sampleTempC: v(r.sampleTempC),
      calibrationTempC: v(r.calibrationTempC ?? DEFAULT_CALIBRATION_TEMP_C),
    },
    // About ten minutes before the end of the boil is when the check is made (common practice, no source).
    volumeL: v(initial.volumeL),
    minutesLeft: v(initial.minutesLeft ?? 10),
    boilOffLPerHour: v(initial.boilOffLPerHour),
    targetSg: v(initial.targetSg),
    targetVolumeL: v(initial.targetVolumeL),
    targetFg: v(initial.targetFg),
    extractsOnHand: [...(initial.extractsOnHand ?? EXTRACT_KINDS)],
    potentials: {
      dme: v(initial.potentials?.dme),
      lme: v(initial.potentials?.lme),
      sucrose: v(initial.potentials?.sucrose),
      dextrose: v(initial.potentials?.dextrose),
    },
    kettleCapacityL: v(initial.kettleCapacityL),
    coolingShrinkage: v(initial.coolingShrinkage ?? DEFAULT_COOLING_SHRINKAGE),
    kettleLossL: v(initial.kettleLossL ?? 0),
  };
}

const isEmpty = (value: NumberValue) => value === '' || value === null;
const optional = (value: NumberValue) => (isEmpty(value) ? undefined : value);

/**
 * The form's values as the schema's input: required fields pass through (an empty one is
 * reported as "Enter …"), empty optional ones are left out, and only the chosen reading is sent.
 */
export function toCheckInput(values: LateBoilFormValues): Record<string, unknown> {
  const { reading } = values;
  const potentials: Partial<Record<ExtractKind, NumberValue>> = {};
  for (const kind of EXTRACT_KINDS) if (!isEmpty(values.potentials[kind])) potentials[kind] = values.potentials[kind];
  return {
    reading:
      reading.kind === 'hydrometer'
        ? { kind: 'hydrometer', sg: reading.sg, sampleTempC: reading.sampleTempC, calibrationTempC: optional(reading.calibrationTempC) }
        : { kind: 'refractometer', brix: reading.brix, wcf: optional(reading.wcf) },
    volumeL: values.volumeL,
    minutesLeft: values.minutesLeft,
    boilOffLPerHour: values.boilOffLPerHour,
    targetSg: values.targetSg,
    targetVolumeL: optional(values.targetVolumeL),
    targetFg: optional(values.targetFg),
    extractsOnHand: values.extractsOnHand,
    potentials: Object.keys(potentials).length > 0 ? potentials : undefined,
    kettleCapacityL: optional(values.kettleCapacityL),
    coolingShrinkage: optional(values.coolingShrinkage),
    kettleLossL: optional(values.kettleLossL),
  };
}

export type Check =
  | { ok: true; input: BoilCheckParsed; outcome: BoilCheckOutcome }
  | { ok: false; missing: string[]; problems: { path: string; message: string }[] };

export interface Evaluated {
  check: Check;
  /** The first message for each field path ("reading.brix"), as the API would return it. */
  errors: Partial<Record<string, string>>;
}

function errorsByPath(issues: BoilCheckIssue[]) {
  const errors: Partial<Record<string, string>> = {};
  for (const issue of issues) {
    const path = issue.path.join('.');
    if (path) errors[path] ??= issue.message;
  }
  return errors;
}

/**
 * The form's values checked once per change: the same rules (and messages) as the API's schema,
 * without zod, then the check itself, run once for both the verdict and the answer.
 */
export function evaluate(values: LateBoilFormValues, unitSystem: 'metric' | 'us'): Evaluated {
  const raw = toCheckInput(values);
  let issues = boilCheckFieldIssues(raw);
  if (issues.length === 0) {
    const input = { ...raw, extractsOnHand: raw.extractsOnHand ?? [...EXTRACT_KINDS] } as unknown as BoilCheckParsed;
    try {
      return { check: { ok: true, input, outcome: runBoilCheck(input, { unitSystem }) }, errors: {} };
    } catch (error) {
      if (!(error instanceof BrewMathError)) throw error;
      issues = [brewMathIssue(error)];
    }
  }
  const missing: string[] = [];
  const problems: { path: string; message: string }[] = [];
  for (const issue of issues) {
    const value = issue.path.reduce<unknown>((node, key) => (node as Record<PropertyKey, unknown> | undefined)?.[key], raw);
    // An empty field is not a mistake yet: it goes on the list of what to fill in ("Enter the target OG.").
    if (isMissing(value)) missing.push(issue.message.replace(/^Enter /, '').replace(/\.$/, ''));
    else problems.push({ path: issue.path.join('.'), message: issue.message });
  }
  return { check: { ok: false, missing, problems }, errors: errorsByPath(issues) };
}
