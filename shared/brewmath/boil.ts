import { DEFAULT_APPARENT_ATTENUATION } from './abv';
import { BrewMathError } from './errors';
import {
  EXTRACT_KINDS,
  EXTRACT_POTENTIALS_POINTS_L_PER_KG,
  EXTRACT_VOLUME_L_PER_KG,
  requirePotential,
  type ExtractKind,
  type WortState,
} from './extract';
import { SG_MAX, VOLUME_MAX_L, requireRange, requireSg, requireVolume, requireWortSg, show, showSg } from './validate';

/**
 * The boil model (docs/decisions/0002-brewing-math-model.md):
 * - volumes the brewer enters for the kettle are hot, as measured in the kettle during the boil;
 * - gravities are as read on a cooled sample (a refractometer drop cools in seconds);
 * - wort shrinks by `coolingShrinkage` (default 4 %, common practice) from boiling to pitching
 *   temperature, so cooledVolumeL = hot volume × (1 − shrinkage), and fermenterVolumeL is that less
 *   the kettle's trub loss and dead space (`kettleLossL`), the figure the recipe's volume means;
 * - extract is conserved in gravity points × litres; boil-off removes water only, at a steady
 *   rate in hot litres per hour.
 */
export const DEFAULT_COOLING_SHRINKAGE = 0.04;
/** Within 0.001 (one gravity point) of target, no correction is worth making. */
export const DEFAULT_TOLERANCE_SG = 0.001;
/** Longer than any boil; a bound so that no product of inputs overflows. */
const MAX_MINUTES = 24 * 60;
/** Boiling on beyond this changes colour and bitterness too much to count as a gravity fix (common practice). */
export const MAX_EXTRA_BOIL_MINUTES = 90;
/** Keep about a tenth of the kettle free so a rolling boil does not boil over (common practice, no source). */
export const KETTLE_HEADROOM_FRACTION = 0.1;

export interface BoilProjectionInput {
  /** Hot wort in the kettle now, litres. */
  volumeL: number;
  /** Current gravity, read cold. */
  sg: number;
  minutesLeft: number;
  /** Hot litres lost per hour of boiling. */
  boilOffLPerHour: number;
}

function requireBoil(volumeL: number, sg: number, minutesLeft: number, boilOffLPerHour: number): void {
  requireVolume(volumeL, 'volumeL', 'Kettle volume');
  requireWortSg(sg, 'sg', 'Current gravity');
  requireRange(minutesLeft, 0, MAX_MINUTES, 'minutesLeft', 'Minutes left', 'min', 'It cannot be negative.');
  requireRange(boilOffLPerHour, 0, VOLUME_MAX_L, 'boilOffLPerHour', 'Boil-off rate', 'L/h');
}

/** Hot volume at flame-out; throws when the boil would empty the kettle or over-concentrate it. */
function endHotVolumeL(volumeL: number, sg: number, minutesLeft: number, boilOffLPerHour: number): number {
  const lostL = (boilOffLPerHour * minutesLeft) / 60;
  const endL = volumeL - lostL;
  if (endL <= 0) {
    throw new BrewMathError(
      `Boiling off ${show(boilOffLPerHour, 2)} L/h for ${show(minutesLeft, 1)} more minutes would boil away ${show(lostL, 1)} L, more than the ${show(volumeL, 1)} L in the kettle. Check the volume, minutes left and boil-off rate.`,
      'empties-kettle',
      'boilOffLPerHour',
    );
  }
  const endSg = 1 + ((sg - 1) * volumeL) / endL;
  if (endSg > SG_MAX) {
    throw new BrewMathError(
      `Boiling ${show(volumeL, 1)} L down to ${show(endL, 1)} L would take the wort to ${showSg(endSg)}, beyond 1.200. Check the volume, minutes left and boil-off rate.`,
      'empties-kettle',
      'boilOffLPerHour',
    );
  }
  return endL;
}

/** Volume and gravity at the end of the boil if nothing is done. Volumes hot in, hot out. */
export function projectBoil({ volumeL, sg, minutesLeft, boilOffLPerHour }: BoilProjectionInput): WortState {
  requireBoil(volumeL, sg, minutesLeft, boilOffLPerHour);
  const endL = endHotVolumeL(volumeL, sg, minutesLeft, boilOffLPerHour);
  return { volumeL: endL, sg: 1 + ((sg - 1) * volumeL) / endL };
}

/** The boil-off rate measured over a stretch of the boil, both volumes read the same way (hot). */
export function boilOffRateLPerHour({ startL, endL, minutes }: { startL: number; endL: number; minutes: number }): number {
  requireVolume(startL, 'startL', 'Starting volume');
  requireVolume(endL, 'endL', 'Ending volume');
  requireRange(minutes, 1, MAX_MINUTES, 'minutes', 'Boil time measured over', 'min', 'Measure over at least a minute.');
  if (endL > startL) {
    throw new BrewMathError(
      `The ending volume ${show(endL, 1)} L is above the starting ${show(startL, 1)} L; a boil only loses volume. Were both read hot, in the kettle?`,
      'inconsistent',
      'endL',
    );
  }
  return ((startL - endL) * 60) / minutes;
}

export interface BoilCorrectionInput extends BoilProjectionInput {
  /** The recipe's OG. */
  targetSg: number;
  /** The recipe's volume at the end of the boil, measured cold. Boiling longer may not go below it. */
  targetVolumeL?: number;
  /** The recipe's FG for ABV predictions; if absent, 75 % apparent attenuation of targetSg is assumed. */
  targetFg?: number;
  /** Potential overrides in points·L/kg, per extract kind; defaults are EXTRACT_POTENTIALS_POINTS_L_PER_KG. */
  extract?: Partial<Record<ExtractKind, number>>;
  /** If given, an addition that would overfill the kettle is not offered. */
  kettleCapacityL?: number;
  /** Fraction the wort shrinks by from boiling to pitching; default 0.04. */
  coolingShrinkage?: number;
  /** Cold litres left behind in the kettle (trub loss plus dead space) when it is drained; default 0. */
  kettleLossL?: number;
  /** How close to target counts as on target; default 0.001. */
  toleranceSg?: number;
}

export interface EndState {
  /** Gravity at the end of the boil, as a cooled sample reads. */
  endSg: number;
  /** Hot volume in the kettle at flame-out. */
  endVolumeL: number;
  /** The same wort cooled, still in the kettle (before kettle losses). */
  cooledVolumeL: number;
  /** What reaches the fermenter: cooled, less the kettle's trub loss and dead space. Compare this with the recipe's volume. */
  fermenterVolumeL: number;
  /**
   * Simple ABV, (endSg − FG) × 131.25, with FG at the recipe's apparent attenuation (from its OG
   * and FG, or 75 % when it gives no FG) applied to this option's own gravity.
   */
  abvPercent: number;
}

export interface AsIsOption extends EndState {
  kind: 'as-is';
  feasible: true;
}
export interface ExtractOption extends EndState {
  kind: 'extract';
  feasible: true;
  extract: ExtractKind;
  /** Kilograms to dissolve now. */
  kg: number;
}
export interface WaterOption extends EndState {
  kind: 'water';
  feasible: true;
  /** Litres of cold water to add now (or into the fermenter after chilling: same result). */
  litres: number;
}
export interface BoilLongerOption extends EndState {
  kind: 'boil-longer';
  feasible: true;
  /** Minutes of boiling beyond the minutes left. */
  extraMinutes: number;
}

export type InfeasibleCode =
  | 'on-target'
  | 'above-target'
  | 'below-target'
  | 'too-weak'
  | 'overfills-kettle'
  | 'no-boil-off'
  | 'no-extract'
  | 'below-recipe-volume'
  | 'too-long';

export interface InfeasibleExtractOption {
  kind: 'extract';
  feasible: false;
  extract: ExtractKind;
  code: InfeasibleCode;
  reason: string;
}
export interface InfeasibleOption {
  kind: 'water' | 'boil-longer';
  feasible: false;
  code: InfeasibleCode;
  reason: string;
}

export type BoilOption =
  | AsIsOption
  | ExtractOption
  | WaterOption
  | BoilLongerOption
  | InfeasibleExtractOption
  | InfeasibleOption;

export type BoilStatus = 'low' | 'on-target' | 'high';

export interface BoilCorrection {
  /** Where the wort will finish with no action, against the target. */
  status: BoilStatus;
  targetSg: number;
  /** The FG used for the ABV figures. */
  fgSg: number;
  /** True when the recipe gave no FG and 75 % apparent attenuation was assumed. */
  fgAssumed: boolean;
  /** The recipe's apparent attenuation, (OG − FG) / (OG − 1), used for every option's ABV. */
  attenuation: number;
  /** Cold litres subtracted from every fermenter volume for trub loss and dead space. */
  kettleLossL: number;
  /** The most the kettle may hold while boiling, keeping KETTLE_HEADROOM_FRACTION free; null without a kettle size. */
  maxBoilVolumeL: number | null;
  /** The end state with no action. */
  projected: EndState;
  /** Always in this order: as-is, extract (dme, lme, sucrose, dextrose), water, boil-longer. */
  options: BoilOption[];
}

const REASON_ON_TARGET = 'The wort will finish on target; no correction is needed.';
const REASON_EXTRACT_ABOVE = 'The wort will already finish above target; extract would only raise it further.';
const REASON_WATER_BELOW = 'The wort will finish below target; water would only lower it further.';
const REASON_BOIL_ABOVE = 'The wort will already finish above target; boiling longer would only raise it further.';
const REASON_NO_BOIL_OFF = 'With no boil-off, boiling longer does not concentrate the wort.';
const REASON_NO_EXTRACT = 'The wort has no extract to concentrate.';
const REASON_TOO_WEAK = 'This extract is too weak to reach the target gravity.';

// Gravity comparisons in points carry float noise; this keeps 1.051 vs 1.050 at tolerance 0.001 "on target".
const POINTS_EPSILON = 1e-9;

/**
 * What to do about a late-boil reading: the projected end with no action, and each correction
 * that can reach targetSg. Everything happens "now", with minutesLeft of boil still to run.
 */
export function boilCorrection(input: BoilCorrectionInput): BoilCorrection {
  const { volumeL, sg, minutesLeft, boilOffLPerHour, targetSg, targetVolumeL, kettleCapacityL } = input;
  requireBoil(volumeL, sg, minutesLeft, boilOffLPerHour);
  requireWortSg(targetSg, 'targetSg', 'Target gravity');
  if (targetSg <= 1) {
    throw new BrewMathError('The target gravity must be above 1.000.', 'out-of-range', 'targetSg');
  }
  if (targetVolumeL !== undefined) requireVolume(targetVolumeL, 'targetVolumeL', "The recipe's volume");
  if (kettleCapacityL !== undefined) {
    requireVolume(kettleCapacityL, 'kettleCapacityL', 'Kettle capacity');
    if (kettleCapacityL < volumeL) {
      throw new BrewMathError(
        `The kettle holds ${show(kettleCapacityL, 1)} L but ${show(volumeL, 1)} L is in it. Check the volume or the kettle size.`,
        'inconsistent',
        'kettleCapacityL',
      );
    }
  }
  const shrinkage = input.coolingShrinkage ?? DEFAULT_COOLING_SHRINKAGE;
  requireRange(shrinkage, 0, 0.1, 'coolingShrinkage', 'Cooling shrinkage', '', 'It is a fraction; about 0.04 is usual.');
  const tolerancePoints = (input.toleranceSg ?? DEFAULT_TOLERANCE_SG) * 1000;
  requireRange(tolerancePoints, 0, 10, 'toleranceSg', 'Tolerance', 'points');
  const kettleLossL = requireRange(input.kettleLossL ?? 0, 0, 50, 'kettleLossL', 'Kettle losses (trub and dead space)', 'L');

  let fgSg: number;
  const fgAssumed = input.targetFg === undefined;
  if (input.targetFg === undefined) {
    fgSg = 1 + (targetSg - 1) * (1 - DEFAULT_APPARENT_ATTENUATION);
  } else {
    fgSg = requireSg(input.targetFg, 'targetFg', 'Target FG');
    if (fgSg >= targetSg) {
      throw new BrewMathError(
        `The recipe's FG ${showSg(fgSg)} must be below its OG ${showSg(targetSg)}.`,
        'inconsistent',
        'targetFg',
      );
    }
  }
  const overrides = input.extract;
  if (overrides !== undefined) {
    for (let i = 0; i < EXTRACT_KINDS.length; i++) {
      const p = overrides[EXTRACT_KINDS[i]];
      if (p !== undefined) requirePotential(p, 'extract');
    }
  }

  const endHotL = endHotVolumeL(volumeL, sg, minutesLeft, boilOffLPerHour);
  // Work in cold litres: additions are measured cold, the recipe's volume is cold.
  const cold = 1 - shrinkage;
  const pointsL = (sg - 1) * 1000 * volumeL * cold;
  const endColdL = endHotL * cold;
  if (endColdL - kettleLossL <= 0) {
    throw new BrewMathError(
      `The kettle losses (${show(kettleLossL, 1)} L of trub and dead space) are more than the ${show(endColdL, 1)} L the boil will end with. Check the losses in the kettle profile.`,
      'inconsistent',
      'kettleLossL',
    );
  }
  const projectedPoints = pointsL / endColdL;
  const targetPoints = (targetSg - 1) * 1000;
  const gap = projectedPoints - targetPoints;
  const status: BoilStatus =
    gap < -tolerancePoints - POINTS_EPSILON ? 'low' : gap > tolerancePoints + POINTS_EPSILON ? 'high' : 'on-target';

  const maxBoilVolumeL = kettleCapacityL === undefined ? null : kettleCapacityL * (1 - KETTLE_HEADROOM_FRACTION);
  const ctx: Context = {
    status,
    volumeL,
    boilOffLPerHour,
    kettleCapacityL,
    maxBoilVolumeL,
    kettleLossL,
    targetVolumeL,
    targetSg,
    cold,
    pointsL,
    endColdL,
    targetPoints,
    attenuation: (targetSg - fgSg) / (targetSg - 1),
  };
  const options: BoilOption[] = [
    { kind: 'as-is', feasible: true, ...endState(ctx, projectedPoints, endColdL) },
    extractOption(ctx, 'dme', overrides?.dme ?? EXTRACT_POTENTIALS_POINTS_L_PER_KG.dme, EXTRACT_VOLUME_L_PER_KG.dme),
    extractOption(ctx, 'lme', overrides?.lme ?? EXTRACT_POTENTIALS_POINTS_L_PER_KG.lme, EXTRACT_VOLUME_L_PER_KG.lme),
    extractOption(ctx, 'sucrose', overrides?.sucrose ?? EXTRACT_POTENTIALS_POINTS_L_PER_KG.sucrose, EXTRACT_VOLUME_L_PER_KG.sucrose),
    extractOption(ctx, 'dextrose', overrides?.dextrose ?? EXTRACT_POTENTIALS_POINTS_L_PER_KG.dextrose, EXTRACT_VOLUME_L_PER_KG.dextrose),
    waterOption(ctx),
    boilLongerOption(ctx),
  ];

  return {
    status,
    targetSg,
    fgSg,
    fgAssumed,
    attenuation: ctx.attenuation,
    kettleLossL,
    maxBoilVolumeL,
    projected: endState(ctx, projectedPoints, endColdL),
    options,
  };
}

/** What every option needs, computed once per call. Volumes here are cold litres. */
interface Context {
  status: BoilStatus;
  volumeL: number;
  boilOffLPerHour: number;
  kettleCapacityL: number | undefined;
  maxBoilVolumeL: number | null;
  kettleLossL: number;
  targetVolumeL: number | undefined;
  targetSg: number;
  cold: number;
  pointsL: number;
  endColdL: number;
  targetPoints: number;
  attenuation: number;
}

/** Simple ABV, (OG − FG) × 131.25, with FG = OG less the recipe's apparent attenuation of it. */
function abvAt(ctx: Context, points: number): number {
  return points > 0 ? points * ctx.attenuation * 0.13125 : 0;
}

function endState(ctx: Context, points: number, coldL: number): EndState {
  return {
    endSg: 1 + points / 1000,
    endVolumeL: coldL / ctx.cold,
    cooledVolumeL: coldL,
    fermenterVolumeL: coldL - ctx.kettleLossL,
    abvPercent: abvAt(ctx, points),
  };
}

/** Why an addition is refused when it leaves too little room to boil. */
function headroomReason(ctx: Context, what: string, kettleL: number): string {
  return `${what} would bring the kettle to ${show(kettleL, 1)} L, leaving less than ${show(KETTLE_HEADROOM_FRACTION * 100, 0)} % of the ${show(ctx.kettleCapacityL!, 1)} L kettle free for a rolling boil (at most ${show(ctx.maxBoilVolumeL!, 1)} L).`;
}

function extractOption(ctx: Context, extract: ExtractKind, potential: number, litresPerKg: number): BoilOption {
  if (ctx.status !== 'low') {
    return ctx.status === 'on-target'
      ? { kind: 'extract', feasible: false, extract, code: 'on-target', reason: REASON_ON_TARGET }
      : { kind: 'extract', feasible: false, extract, code: 'above-target', reason: REASON_EXTRACT_ABOVE };
  }
  const denominator = potential - ctx.targetPoints * litresPerKg;
  if (denominator <= 0) {
    return { kind: 'extract', feasible: false, extract, code: 'too-weak', reason: REASON_TOO_WEAK };
  }
  const kg = (ctx.targetPoints * ctx.endColdL - ctx.pointsL) / denominator;
  const addedL = kg * litresPerKg;
  const kettleL = ctx.volumeL + addedL / ctx.cold;
  if (ctx.maxBoilVolumeL !== null && kettleL > ctx.maxBoilVolumeL) {
    return {
      kind: 'extract',
      feasible: false,
      extract,
      code: 'overfills-kettle',
      reason: headroomReason(ctx, `${show(kg, 2)} kg`, kettleL),
    };
  }
  const coldL = ctx.endColdL + addedL;
  const points = (ctx.pointsL + potential * kg) / coldL;
  return { kind: 'extract', feasible: true, extract, kg, ...endState(ctx, points, coldL) };
}

function waterOption(ctx: Context): BoilOption {
  if (ctx.status !== 'high') {
    return ctx.status === 'on-target'
      ? { kind: 'water', feasible: false, code: 'on-target', reason: REASON_ON_TARGET }
      : { kind: 'water', feasible: false, code: 'below-target', reason: REASON_WATER_BELOW };
  }
  const litres = ctx.pointsL / ctx.targetPoints - ctx.endColdL;
  const kettleL = ctx.volumeL + litres / ctx.cold;
  if (ctx.maxBoilVolumeL !== null && kettleL > ctx.maxBoilVolumeL) {
    return {
      kind: 'water',
      feasible: false,
      code: 'overfills-kettle',
      reason: `${headroomReason(ctx, `${show(litres, 1)} L of water`, kettleL)} Add the water to the fermenter after chilling instead (boiled and cooled, or clean drinking water): the gravity comes out the same.`,
    };
  }
  const coldL = ctx.endColdL + litres;
  const points = ctx.pointsL / coldL;
  return { kind: 'water', feasible: true, litres, ...endState(ctx, points, coldL) };
}

function boilLongerOption(ctx: Context): BoilOption {
  if (ctx.status !== 'low') {
    return ctx.status === 'on-target'
      ? { kind: 'boil-longer', feasible: false, code: 'on-target', reason: REASON_ON_TARGET }
      : { kind: 'boil-longer', feasible: false, code: 'above-target', reason: REASON_BOIL_ABOVE };
  }
  if (ctx.boilOffLPerHour === 0) {
    return { kind: 'boil-longer', feasible: false, code: 'no-boil-off', reason: REASON_NO_BOIL_OFF };
  }
  if (ctx.pointsL <= 0) {
    return { kind: 'boil-longer', feasible: false, code: 'no-extract', reason: REASON_NO_EXTRACT };
  }
  const coldL = ctx.pointsL / ctx.targetPoints;
  const intoFermenterL = coldL - ctx.kettleLossL;
  if (ctx.targetVolumeL !== undefined && intoFermenterL < ctx.targetVolumeL) {
    const losses = ctx.kettleLossL > 0 ? ` after ${show(ctx.kettleLossL, 1)} L of kettle losses` : ' once cooled';
    return {
      kind: 'boil-longer',
      feasible: false,
      code: 'below-recipe-volume',
      reason: `Boiling on to ${showSg(ctx.targetSg)} would put ${show(Math.max(intoFermenterL, 0), 1)} L into the fermenter${losses}, less than the recipe's ${show(ctx.targetVolumeL, 1)} L.`,
    };
  }
  const boilOffColdLPerHour = ctx.boilOffLPerHour * ctx.cold;
  // Compared as volumes so that a tiny boil-off rate cannot produce Infinity minutes.
  if (!(ctx.endColdL - coldL <= (boilOffColdLPerHour * MAX_EXTRA_BOIL_MINUTES) / 60)) {
    return {
      kind: 'boil-longer',
      feasible: false,
      code: 'too-long',
      reason: `At ${show(ctx.boilOffLPerHour, 1)} L/h it would take more than ${MAX_EXTRA_BOIL_MINUTES} extra minutes, long enough to change colour and bitterness.`,
    };
  }
  const points = ctx.pointsL / coldL;
  return { kind: 'boil-longer', feasible: true, extraMinutes: ((ctx.endColdL - coldL) / boilOffColdLPerHour) * 60, ...endState(ctx, points, coldL) };
}
