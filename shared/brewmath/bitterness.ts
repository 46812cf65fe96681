import { BrewMathError } from './errors';
import { requireFinite, requireRange, requireVolume, requireWortSg, show } from './validate';

/**
 * Bitterness in IBU (mg/L of iso-alpha acids) by Tinseth's utilisation formula (Glenn Tinseth,
 * "Glenn's Hop Utilization Numbers", 1997):
 *   utilisation = 1.65 × 0.000125^(boil SG − 1) × (1 − e^(−0.04 × minutes)) / 4.15
 *   IBU = utilisation × alpha-acid fraction × grams × 1000 / litres of finished wort.
 * Tinseth fitted it to boiled additions; it gives nothing for a hop added at flame-out, which
 * still bitters while the wort stands hot. See WHIRLPOOL_EQUIVALENT_BOIL_MINUTES.
 */

/** Alpha acid as sold: a few per cent for aroma hops, up to about 20 % for the strongest. */
export const ALPHA_ACID_MIN_PERCENT = 0;
export const ALPHA_ACID_MAX_PERCENT = 25;
/** A boil or a hop stand longer than this is not a brew (6 hours). */
export const HOP_MINUTES_MAX = 360;
export const HOP_MASS_MAX_G = 100_000;

/**
 * ASSUMPTION (common practice, no source): a hop added at flame-out or in the whirlpool
 * (0 boil minutes) bitters about as much as one boiled for 5 minutes, because the wort stays near
 * boiling while it stands. Tinseth's formula alone would give it 0 IBU. Every estimate that uses
 * this says so (`assumptions`), and callers may pass their own figure, 0 to switch it off.
 */
export const WHIRLPOOL_EQUIVALENT_BOIL_MINUTES = 5;

export interface HopAddition {
  alphaAcidPercent: number;
  massG: number;
  /** Minutes the hop boils before the end of the boil; 0 = flame-out or whirlpool. */
  boilMinutes: number;
}

export interface IbuInput {
  hops: readonly HopAddition[];
  /** Gravity of the wort the hops boil in (Tinseth: the average over the boil). */
  boilSg: number;
  /** Volume of finished wort the iso-alpha acids end up in. */
  volumeL: number;
  /** Boil minutes credited to a 0-minute (flame-out / whirlpool) addition; default WHIRLPOOL_EQUIVALENT_BOIL_MINUTES. */
  whirlpoolEquivalentMinutes?: number;
}

export interface IbuEstimate {
  ibu: number;
  /** One per addition, in order. */
  perAddition: { ibu: number; utilisation: number; whirlpool: boolean }[];
  /** Plain words for what the estimate assumed beyond Tinseth's formula; empty when nothing. */
  assumptions: string[];
}

/** Tinseth's utilisation: the fraction of the added alpha acid that ends up as iso-alpha acid. */
export function tinsethUtilisation(boilSg: number, boilMinutes: number): number {
  requireWortSg(boilSg, 'boilSg', 'Boil gravity');
  requireHopMinutes(boilMinutes, 'boilMinutes');
  const bigness = 1.65 * Math.pow(0.000125, boilSg - 1);
  const time = (1 - Math.exp(-0.04 * boilMinutes)) / 4.15;
  return bigness * time;
}

export function requireAlphaAcid(alphaAcidPercent: number, field: string): number {
  return requireRange(alphaAcidPercent, ALPHA_ACID_MIN_PERCENT, ALPHA_ACID_MAX_PERCENT, field, 'Alpha acid', '%', 'Hops are sold at about 2 to 20 %.');
}

export function requireHopMinutes(minutes: number, field: string): number {
  requireFinite(minutes, field, 'Boil minutes');
  if (minutes < 0) {
    throw new BrewMathError(`Boil minutes cannot be negative; got ${show(minutes)}. Use 0 for a flame-out or whirlpool addition.`, 'out-of-range', field);
  }
  return requireRange(minutes, 0, HOP_MINUTES_MAX, field, 'Boil minutes', 'min');
}

/** Total IBU of a set of hop additions by Tinseth. No additions: 0 IBU (callers show "no estimate"). */
export function ibuTinseth({ hops, boilSg, volumeL, whirlpoolEquivalentMinutes = WHIRLPOOL_EQUIVALENT_BOIL_MINUTES }: IbuInput): IbuEstimate {
  requireWortSg(boilSg, 'boilSg', 'Boil gravity');
  requireVolume(volumeL, 'volumeL');
  requireHopMinutes(whirlpoolEquivalentMinutes, 'whirlpoolEquivalentMinutes');
  if (!Array.isArray(hops)) throw new BrewMathError('Hop additions must be a list.', 'inconsistent', 'hops');
  const perAddition: IbuEstimate['perAddition'] = [];
  let ibu = 0;
  let anyWhirlpool = false;
  for (let i = 0; i < hops.length; i++) {
    const hop = hops[i];
    requireAlphaAcid(hop.alphaAcidPercent, `hops.${i}.alphaAcidPercent`);
    requireRange(hop.massG, 0, HOP_MASS_MAX_G, `hops.${i}.massG`, `Hop ${i + 1}: the amount`, 'g');
    requireHopMinutes(hop.boilMinutes, `hops.${i}.boilMinutes`);
    const whirlpool = hop.boilMinutes === 0;
    anyWhirlpool ||= whirlpool && hop.massG > 0;
    const utilisation = tinsethUtilisation(boilSg, whirlpool ? whirlpoolEquivalentMinutes : hop.boilMinutes);
    const alphaMgPerL = ((hop.alphaAcidPercent / 100) * hop.massG * 1000) / volumeL;
    const additionIbu = utilisation * alphaMgPerL;
    perAddition.push({ ibu: additionIbu, utilisation, whirlpool });
    ibu += additionIbu;
  }
  if (!Number.isFinite(ibu)) {
    throw new BrewMathError(`${show(volumeL)} L is too small a volume for these hops; check the units.`, 'out-of-range', 'volumeL');
  }
  const assumptions = anyWhirlpool
    ? [`Flame-out and whirlpool hops are counted as if boiled ${show(whirlpoolEquivalentMinutes)} minutes (an assumption: Tinseth's formula gives them nothing).`]
    : [];
  return { ibu, perAddition, assumptions };
}

/**
 * Bitterness-to-gravity ratio (BU:GU): IBU over the OG's gravity points. A trade figure for
 * balance (common practice, no source): about 0.5 is even, lower tastes malty, higher bitter.
 */
export function buToGu(ibu: number, og: number): number {
  requireRange(ibu, 0, 1000, 'ibu', 'Bitterness', 'IBU');
  requireWortSg(og, 'og', 'OG');
  if (og <= 1) throw new BrewMathError('BU:GU needs an OG above 1.000.', 'out-of-range', 'og');
  return ibu / ((og - 1) * 1000);
}
