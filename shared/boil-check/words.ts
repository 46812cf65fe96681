/**
 * The late-boil check in words, in the brewer's units: the form, the brew-day log and the brew
 * sheet all say the same thing about the same numbers. Rounding here is for reading only.
 */
import {
  gToOz,
  kgToLb,
  litresToUsGallons,
  sgToPlato,
  type BoilCorrection,
  type BoilOption,
  type ExtractKind,
  type GravityUnit,
  type UnitSystem,
} from '../brewmath';

const NBSP = '\u00a0';

export const EXTRACT_NAMES: Readonly<Record<ExtractKind, string>> = {
  dme: 'dry malt extract',
  lme: 'liquid malt extract',
  sucrose: 'table sugar',
  dextrose: 'dextrose',
};

/**
 * An extract amount as a brewer weighs it: whole grams under a kilogram, else kilograms to
 * 10 g; in US units ounces to a tenth under a pound, else pounds to a hundredth.
 */
export function formatAddition(kg: number, system: UnitSystem = 'metric'): string {
  if (system === 'us') {
    const oz = gToOz(kg * 1000);
    if (Number(oz.toFixed(1)) < 16) return `${oz.toFixed(1)}${NBSP}oz`;
    return `${kgToLb(kg).toFixed(2)}${NBSP}lb`;
  }
  const g = Math.round(kg * 1000);
  return g < 1000 ? `${g}${NBSP}g` : `${kg.toFixed(2)}${NBSP}kg`;
}

/** Water to add: litres to a tenth; in US units quarts to a tenth under a gallon, else gallons. */
export function formatWaterAddition(litres: number, system: UnitSystem = 'metric'): string {
  if (system === 'us') {
    const gal = litresToUsGallons(litres);
    if (Number(gal.toFixed(2)) < 1) return `${(gal * 4).toFixed(1)}${NBSP}qt`;
    return `${gal.toFixed(2)}${NBSP}gal`;
  }
  return `${litres.toFixed(1)}${NBSP}L`;
}

/** Whole minutes, rounded up: stopping early would leave the wort short of its target. */
export function wholeMinutes(minutes: number): number {
  // A hair of float noise above a whole number must not add a minute.
  return Math.max(1, Math.ceil(minutes - 1e-9));
}

/** Where the wort is heading against its target, e.g. "About 5 points short", "On target". */
export function gapInWords(result: Pick<BoilCorrection, 'status' | 'projected' | 'targetSg'>, gravityUnit: GravityUnit = 'sg'): string {
  if (result.status === 'on-target') return 'On target';
  const side = result.status === 'low' ? 'short' : 'over';
  if (gravityUnit === 'plato') {
    const diff = Math.max(0.1, Math.abs(sgToPlato(result.projected.endSg) - sgToPlato(result.targetSg)));
    return `About ${diff.toFixed(1)}${NBSP}°P ${side}`;
  }
  const points = Math.max(1, Math.round(Math.abs(result.projected.endSg - result.targetSg) * 1000));
  return `About ${points} ${points === 1 ? 'point' : 'points'} ${side}`;
}

export type FeasibleOption = Extract<BoilOption, { feasible: true }>;
export type InfeasibleOption = Extract<BoilOption, { feasible: false }>;
type Feasible = FeasibleOption;

export interface ActionParts {
  /** "Add", "Boil", or '' for "Leave it". */
  before: string;
  /** The figure to show biggest: "349 g", "2.1 L", "12", or "Leave it". */
  amount: string;
  /** "dry malt extract", "water", "more minutes", or ''. */
  after: string;
}

/** The action of a feasible option in three parts, so a screen can show the figure biggest. */
export function optionActionParts(option: Feasible, system: UnitSystem = 'metric'): ActionParts {
  switch (option.kind) {
    case 'as-is':
      return { before: '', amount: 'Leave it', after: '' };
    case 'extract':
      return { before: 'Add', amount: formatAddition(option.kg, system), after: EXTRACT_NAMES[option.extract] };
    case 'water':
      return { before: 'Add', amount: formatWaterAddition(option.litres, system), after: 'water' };
    case 'boil-longer': {
      const minutes = wholeMinutes(option.extraMinutes);
      return { before: 'Boil', amount: String(minutes), after: minutes === 1 ? 'more minute' : 'more minutes' };
    }
  }
}

/** The action of a feasible option, e.g. "Add 349 g dry malt extract", "Boil 12 more minutes", "Leave it". */
export function optionAction(option: Feasible, system: UnitSystem = 'metric'): string {
  const { before, amount, after } = optionActionParts(option, system);
  return [before, amount, after].filter(Boolean).join(' ');
}

/** What the option is about, for an infeasible one too: "Dry malt extract", "Water", "Boil longer", "No correction". */
export function optionTitle(option: BoilOption): string {
  if (option.kind === 'extract') {
    const name = EXTRACT_NAMES[option.extract];
    return name.charAt(0).toUpperCase() + name.slice(1);
  }
  return { 'as-is': 'No correction', water: 'Water', 'boil-longer': 'Boil longer' }[option.kind];
}

function volume(litres: number, system: UnitSystem): string {
  return system === 'us' ? `${litresToUsGallons(litres).toFixed(2)}${NBSP}gal` : `${litres.toFixed(1)}${NBSP}L`;
}

/**
 * Why an option cannot be taken, in the brewer's units. The brewing math words its reasons in
 * litres; the ones that quote a volume are re-worded here for US units.
 */
export function reasonInWords(
  option: InfeasibleOption,
  context: {
    result: Pick<BoilCorrection, 'projected' | 'targetSg'> & Partial<Pick<BoilCorrection, 'kettleLossL' | 'maxBoilVolumeL'>>;
    targetVolumeL?: number;
    kettleCapacityL?: number;
    boilOffLPerHour?: number;
  },
  system: UnitSystem = 'metric',
): string {
  if (system === 'metric') return option.reason;
  const code: string = option.code;
  const { result } = context;
  if (code === 'below-recipe-volume' && context.targetVolumeL !== undefined) {
    // Extract is conserved: the volume at which the wort reaches the target is pointsL / targetPoints.
    const loss = result.kettleLossL ?? 0;
    const cooledL = result.projected.cooledVolumeL ?? result.projected.fermenterVolumeL + loss;
    const coldL = (cooledL * (result.projected.endSg - 1)) / (result.targetSg - 1) - loss;
    const after = loss > 0 ? ` after ${volume(loss, system)} of kettle losses` : ' once cooled';
    return `Boiling on to the target would put ${volume(Math.max(coldL, 0), system)} into the fermenter${after}, less than the recipe's ${volume(context.targetVolumeL, system)}.`;
  }
  if (code === 'overfills-kettle' && context.kettleCapacityL !== undefined) {
    const where = option.kind === 'water' ? ' Add the water to the fermenter after chilling instead (boiled and cooled, or clean drinking water): the gravity comes out the same.' : '';
    const most = result.maxBoilVolumeL != null ? ` (at most ${volume(result.maxBoilVolumeL, system)})` : '';
    return `That would leave less than 10 % of the ${volume(context.kettleCapacityL, system)} kettle free for a rolling boil${most}.${where}`;
  }
  if (code === 'too-long' && context.boilOffLPerHour !== undefined) {
    return `At ${litresToUsGallons(context.boilOffLPerHour).toFixed(2)}${NBSP}gal/h it would take too long: boiling that much longer changes colour and bitterness.`;
  }
  return option.reason;
}
