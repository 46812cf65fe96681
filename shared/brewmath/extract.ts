import { BrewMathError } from './errors';
import { sgToPoints } from './gravity';
import { SG_MAX, requireAmount, requireFinite, requireRange, requireVolume, requireWortSg, show, showSg } from './validate';

/**
 * What counts as extract: everything dissolved in wort that raises its gravity (sugars,
 * dextrins, proteins), counted in gravity points × litres (points·L). One kilogram of an
 * extract with potential p points·L/kg, made up to V litres, adds p / V gravity points.
 */
export type ExtractKind = 'dme' | 'lme' | 'sucrose' | 'dextrose';
export const EXTRACT_KINDS: readonly ExtractKind[] = ['dme', 'lme', 'sucrose', 'dextrose'];

/**
 * Default potentials in gravity points × litres per kilogram. Common practice, converted from
 * the usual points per pound per US gallon (1 ppg = 8.3454 points·L/kg): dry malt extract 44,
 * liquid malt extract (about 80 % solids) 36, table sugar 46, brewing dextrose (monohydrate) 42.
 * Sucrose cross-checks against the ASBC table (see extract.test.ts).
 */
export const EXTRACT_POTENTIALS_POINTS_L_PER_KG: Readonly<Record<ExtractKind, number>> = {
  dme: 367,
  lme: 300,
  sucrose: 384,
  dextrose: 350,
};

/**
 * Litres of wort volume gained per kilogram dissolved. Sucrose's 0.62 L/kg follows from the
 * ASBC table and the density of water; dry extracts are taken as the same, LME and dextrose
 * monohydrate add the water they carry (about 20 % and 9 %). Small (a 0.5 kg addition to 20 L
 * adds 0.3 L) but it keeps predicted volumes honest.
 */
export const EXTRACT_VOLUME_L_PER_KG: Readonly<Record<ExtractKind, number>> = {
  dme: 0.62,
  lme: 0.7,
  sucrose: 0.62,
  dextrose: 0.65,
};

/** Potentials outside this band are not a brewing fermentable (pure sucrose is about 384). */
export const POTENTIAL_MIN_POINTS_L_PER_KG = 50;
export const POTENTIAL_MAX_POINTS_L_PER_KG = 450;

export function requirePotential(potential: number, field: string): number {
  return requireRange(
    potential,
    POTENTIAL_MIN_POINTS_L_PER_KG,
    POTENTIAL_MAX_POINTS_L_PER_KG,
    field,
    'Extract potential',
    'points·L/kg',
    'Pure table sugar is about 384.',
  );
}

export function requireVolumePerKg(volumeLPerKg: number, field: string): number {
  return requireRange(volumeLPerKg, 0, 1, field, 'Volume added per kg', 'L/kg');
}

export interface WortState {
  volumeL: number;
  sg: number;
}

/**
 * Litres of water that bring volumeL of wort from sg down to targetSg. Extract is conserved:
 * (sg − 1) × volumeL = (targetSg − 1) × (volumeL + water).
 */
export function waterToDiluteL(volumeL: number, sg: number, targetSg: number): number {
  requireVolume(volumeL, 'volumeL');
  requireWortSg(sg, 'sg');
  requireWortSg(targetSg, 'targetSg', 'Target gravity');
  if (targetSg > sg) {
    throw new BrewMathError(
      `Water only lowers gravity: the target ${showSg(targetSg)} is above the current ${showSg(sg)}. Add extract or boil longer instead.`,
      'target-above-current',
      'targetSg',
    );
  }
  if (targetSg <= 1) {
    throw new BrewMathError('No amount of water brings wort down to 1.000; give a target above 1.000.', 'out-of-range', 'targetSg');
  }
  return (volumeL * (sg - 1)) / (targetSg - 1) - volumeL;
}

/**
 * Kilograms of an extract that bring volumeL of wort from sg up to targetSg. With
 * volumeLPerKg = 0 this is the handbook rule, kg = V × (target − current points) / potential;
 * otherwise the extract's own volume is counted too.
 */
export function extractToAddKg(
  volumeL: number,
  sg: number,
  targetSg: number,
  potentialPointsLPerKg: number,
  volumeLPerKg = 0,
): number {
  requireVolume(volumeL, 'volumeL');
  requireWortSg(sg, 'sg');
  requireWortSg(targetSg, 'targetSg', 'Target gravity');
  requirePotential(potentialPointsLPerKg, 'potentialPointsLPerKg');
  requireVolumePerKg(volumeLPerKg, 'volumeLPerKg');
  if (targetSg < sg) {
    throw new BrewMathError(
      `Extract only raises gravity: the target ${showSg(targetSg)} is below the current ${showSg(sg)}. Add water instead.`,
      'target-below-current',
      'targetSg',
    );
  }
  const targetPoints = sgToPoints(targetSg);
  const denominator = potentialPointsLPerKg - targetPoints * volumeLPerKg;
  if (denominator <= 0) {
    throw new BrewMathError(
      `An extract of ${show(potentialPointsLPerKg)} points·L/kg is too weak to reach ${showSg(targetSg)}.`,
      'out-of-range',
      'potentialPointsLPerKg',
    );
  }
  return (volumeL * (targetPoints - sgToPoints(sg))) / denominator;
}

/** Wort after adding water: the forward form of waterToDiluteL. */
export function afterAddingWater(volumeL: number, sg: number, waterL: number): WortState {
  requireVolume(volumeL, 'volumeL');
  requireWortSg(sg, 'sg');
  requireAmount(waterL, 'waterL', 'Water to add', 'L');
  const end = volumeL + waterL;
  return { volumeL: end, sg: 1 + ((sg - 1) * volumeL) / end };
}

/** Wort after dissolving kg of an extract: the forward form of extractToAddKg. */
export function afterAddingExtract(
  volumeL: number,
  sg: number,
  kg: number,
  potentialPointsLPerKg: number,
  volumeLPerKg = 0,
): WortState {
  requireVolume(volumeL, 'volumeL');
  requireWortSg(sg, 'sg');
  requireAmount(kg, 'kg', 'Extract to add', 'kg');
  requirePotential(potentialPointsLPerKg, 'potentialPointsLPerKg');
  requireVolumePerKg(volumeLPerKg, 'volumeLPerKg');
  const end = volumeL + kg * volumeLPerKg;
  const endSg = 1 + (sgToPoints(sg) * volumeL + potentialPointsLPerKg * kg) / end / 1000;
  if (endSg > SG_MAX) {
    throw new BrewMathError(
      `That much extract would take the wort to ${showSg(endSg)}, beyond 1.200.`,
      'out-of-range',
      'kg',
    );
  }
  return { volumeL: end, sg: endSg };
}

export type FermentableKind = 'grain' | ExtractKind;

export interface Fermentable {
  kg: number;
  kind: FermentableKind;
  /** Points·L/kg. Required for grain (its laboratory extract); defaults by kind for extracts and sugars. */
  potentialPointsLPerKg?: number;
}

export interface EstimateOgInput {
  fermentables: readonly Fermentable[];
  /** Brewhouse efficiency as a fraction; it applies to grain only, since extracts and sugars dissolve whole. */
  efficiency: number;
  /** The recipe's volume at the end of the boil, measured cold. */
  volumeL: number;
}

/** A recipe's expected OG from its fermentables, by the same points·L balance. */
export function estimateOg({ fermentables, efficiency, volumeL }: EstimateOgInput): number {
  requireVolume(volumeL, 'volumeL');
  requireFinite(efficiency, 'efficiency', 'Efficiency');
  if (efficiency <= 0 || efficiency > 1) {
    throw new BrewMathError(
      `Efficiency ${show(efficiency)} must be a fraction above 0 and at most 1 (e.g. 0.72 for 72 %).`,
      'out-of-range',
      'efficiency',
    );
  }
  if (!Array.isArray(fermentables) || fermentables.length === 0) {
    throw new BrewMathError('A recipe needs at least one fermentable.', 'inconsistent', 'fermentables');
  }
  let pointsL = 0;
  for (let i = 0; i < fermentables.length; i++) {
    const f = fermentables[i];
    const label = `Fermentable ${i + 1}`;
    requireAmount(f.kg, 'fermentables', `${label}: the amount`, 'kg');
    let potential: number;
    if (f.kind === 'grain') {
      if (f.potentialPointsLPerKg === undefined) {
        throw new BrewMathError(`${label}: grain needs its extract potential.`, 'inconsistent', 'fermentables');
      }
      potential = f.potentialPointsLPerKg * efficiency;
    } else if (Object.hasOwn(EXTRACT_POTENTIALS_POINTS_L_PER_KG, f.kind)) {
      potential = f.potentialPointsLPerKg ?? EXTRACT_POTENTIALS_POINTS_L_PER_KG[f.kind as ExtractKind];
    } else {
      throw new BrewMathError(`${label}: unknown kind "${String(f.kind)}".`, 'inconsistent', 'fermentables');
    }
    if (f.potentialPointsLPerKg !== undefined) requirePotential(f.potentialPointsLPerKg, 'fermentables');
    pointsL += f.kg * potential;
  }
  const og = 1 + pointsL / volumeL / 1000;
  if (og > SG_MAX) {
    throw new BrewMathError(
      `These fermentables in ${show(volumeL, 1)} L would give ${showSg(og)}, beyond 1.200. Check amounts and volume.`,
      'out-of-range',
      'fermentables',
    );
  }
  return og;
}
