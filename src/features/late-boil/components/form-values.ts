/**
 * The late-boil form's values: SI numbers (or '' while a field is empty, NaN while it holds
 * text that is not a number), shaped like BoilCheckInput so a zod issue's path is the field's name.
 */
import type { BoilCheckInput } from '@shared/boil-check';
import { DEFAULT_CALIBRATION_TEMP_C } from '@shared/boil-check';
import { DEFAULT_COOLING_SHRINKAGE, DEFAULT_WCF, EXTRACT_KINDS, type ExtractKind } from '@shared/brewmath';
import { boilCheckInputSchema, type BoilCheckParsed } from '@shared/schemas/boil-check';

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
export interface LateBoilInitialValues {
  reading?: Partial<{ kind: ReadingKind; brix: number; wcf: number; sg: number; sampleTempC: number; calibrationTempC: number }>;
  volumeL?: number;
  minutesLeft?: number;
  boilOffLPerHour?: number;
  targetSg?: number;
  targetVolumeL?: number;
  targetFg?: number;
  extractsOnHand?: readonly ExtractKind[];
  potentials?: Partial<Record<ExtractKind, number>>;
  kettleCapacityL?: number;
  coolingShrinkage?: number;
  /** The kettle profile's trub loss plus dead space. */
  kettleLossL?: number;
}

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

export type ParsedCheck = { ok: true; input: BoilCheckParsed } | { ok: false; missing: string[]; problems: { path: string; message: string }[] };

/** Parses the form's values: the check's input, or what is missing and what is wrong. */
let lastParse: { key: string; raw: ReturnType<typeof toCheckInput>; parsed: ReturnType<typeof boilCheckInputSchema.safeParse> } | null = null;

/**
 * The schema's verdict on these values, parsed once per change: Formik's validation and the
 * answer panel both ask for the same values (as different objects) on every keystroke.
 */
export function safeParseCheck(values: LateBoilFormValues) {
  const raw = toCheckInput(values);
  const key = JSON.stringify(raw, (_k, v: unknown) => (typeof v === 'number' && Number.isNaN(v) ? 'NaN' : v));
  if (lastParse?.key !== key) lastParse = { key, raw, parsed: boilCheckInputSchema.safeParse(raw) };
  return lastParse;
}

export function parseCheck(values: LateBoilFormValues): ParsedCheck {
  const { raw, parsed } = safeParseCheck(values);
  if (parsed.success) return { ok: true, input: parsed.data satisfies BoilCheckInput };
  const missing: string[] = [];
  const problems: { path: string; message: string }[] = [];
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String).join('.');
    const value = issue.path.reduce<unknown>((node, key) => (node as Record<PropertyKey, unknown> | undefined)?.[key], raw);
    // An empty field is not a mistake yet: it goes on the list of what to fill in ("Enter the target OG.").
    if (value === '' || value === undefined || value === null) missing.push(issue.message.replace(/^Enter /, '').replace(/\.$/, ''));
    else problems.push({ path, message: issue.message });
  }
  return { ok: false, missing, problems };
}
