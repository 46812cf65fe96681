/**
 * The late-boil check: what the brewer enters (`boilCheckInputSchema`, used by the form and by a
 * saved decision) and the public calculator's body (`boilCorrectionRequestSchema`, the raw
 * `boilCorrection` input). Everything is SI and specific gravity; forms convert at their edges.
 * The limits are shared/brewmath's (Brix 0–40, SG 0.980–1.200, volume above 0, minutes not
 * below 0) plus upper bounds that catch typos; messages quote metric and US units because the
 * same message reaches brewers of either preference.
 */
import { z } from 'zod';
import { checkedNumber } from './fields';
import { BrewMathError, EXTRACT_KINDS, type ExtractKind } from '../brewmath';
import { runBoilCheck, type BoilCheckInput } from '../boil-check';
import { boilCheckRules, brewMathIssue, EXTRACT_KIND_MESSAGE, READING_KIND_MESSAGE, type NumberRule } from './boil-check-rules';

export { BOIL_CHECK_LIMITS } from './boil-check-rules';

/** A rule of boil-check-rules.ts as a zod schema: the same messages, in the same cases. */
const fromRule = ({ what, label, inRange, message }: NumberRule) => checkedNumber(what, label, inRange, message);

const boilCheckBrixSchema = fromRule(boilCheckRules.brix);
export const wcfSchema = fromRule(boilCheckRules.wcf);
export const minutesLeftSchema = fromRule(boilCheckRules.minutesLeft);
export const boilOffSchema = fromRule(boilCheckRules.boilOffLPerHour);
export const targetSgSchema = fromRule(boilCheckRules.targetSg);
const shrinkageSchema = fromRule(boilCheckRules.coolingShrinkage);
const kettleLossSchema = fromRule(boilCheckRules.kettleLossL);
const potentialSchema = fromRule(boilCheckRules.potential);
export const potentialsSchema = z.object({
  dme: potentialSchema.optional(),
  lme: potentialSchema.optional(),
  sucrose: potentialSchema.optional(),
  dextrose: potentialSchema.optional(),
});

export const extractKindSchema = z.enum(EXTRACT_KINDS as [ExtractKind, ...ExtractKind[]], { error: EXTRACT_KIND_MESSAGE });

export const refractometerReadingSchema = z.object({
  kind: z.literal('refractometer'),
  brix: boilCheckBrixSchema,
  wcf: wcfSchema.optional(),
});

export const hydrometerReadingSchema = z.object({
  kind: z.literal('hydrometer'),
  sg: fromRule(boilCheckRules.hydrometerSg),
  sampleTempC: fromRule(boilCheckRules.sampleTempC),
  calibrationTempC: fromRule(boilCheckRules.calibrationTempC).optional(),
});

export const boilCheckReadingSchema = z.discriminatedUnion('kind', [refractometerReadingSchema, hydrometerReadingSchema], { error: READING_KIND_MESSAGE });

const boilCheckFields = z.object({
  reading: boilCheckReadingSchema,
  volumeL: fromRule(boilCheckRules.volumeL),
  minutesLeft: minutesLeftSchema,
  boilOffLPerHour: boilOffSchema,
  targetSg: targetSgSchema,
  targetVolumeL: fromRule(boilCheckRules.targetVolumeL).optional(),
  targetFg: fromRule(boilCheckRules.targetFg).optional(),
  extractsOnHand: z.array(extractKindSchema).max(EXTRACT_KINDS.length).default([...EXTRACT_KINDS]),
  potentials: potentialsSchema.optional(),
  kettleCapacityL: fromRule(boilCheckRules.kettleCapacityL).optional(),
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
    const { message, path } = brewMathIssue(error);
    ctx.addIssue({ code: 'custom', message, path });
  }
});
export type BoilCheckFormInput = z.input<typeof boilCheckInputSchema>;
export type BoilCheckParsed = z.output<typeof boilCheckInputSchema>;

// The parsed input is exactly what runBoilCheck takes.
const _parsedIsInput = (parsed: BoilCheckParsed): BoilCheckInput => parsed;
void _parsedIsInput;

/** POST /api/calc/boil-correction: the `boilCorrection` input as JSON. */
export const boilCorrectionRequestSchema = z.object({
  volumeL: fromRule(boilCheckRules.volumeL),
  sg: fromRule(boilCheckRules.currentSg),
  minutesLeft: minutesLeftSchema,
  boilOffLPerHour: boilOffSchema,
  targetSg: targetSgSchema,
  targetVolumeL: fromRule(boilCheckRules.targetVolumeL).optional(),
  targetFg: fromRule(boilCheckRules.targetFg).optional(),
  extract: potentialsSchema.optional(),
  kettleCapacityL: fromRule(boilCheckRules.kettleCapacityL).optional(),
  coolingShrinkage: shrinkageSchema.optional(),
  kettleLossL: kettleLossSchema.optional(),
});
export type BoilCorrectionRequest = z.input<typeof boilCorrectionRequestSchema>;
