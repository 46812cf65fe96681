import { BrewMathError } from './errors';
import { KG_PER_LB, LITRES_PER_US_GALLON } from './units';
import { requireRange, requireVolume, show } from './validate';

/**
 * Beer colour from the grist by Morey's equation (Daniel Morey, "Approximating Beer Color from
 * Malt Color", 1990s, widely reprinted; recalled from memory):
 *   MCU = Σ (pounds × malt colour in °L) / US gallons,   SRM = 1.4922 × MCU^0.6859.
 * SI inside: kilograms and litres are converted to Morey's units only within the formula.
 * Beer colour: EBC = 1.97 × SRM (the ASBC and EBC methods read absorbance at 430 nm on 1/2-inch
 * and 1 cm cells, 25/12.7 = 1.97; recalled from memory). Malt colour in EBC is converted to °L by
 * the same factor, as maltsters' sheets do (common practice, no source).
 */

export const SRM_TO_EBC = 1.97;
/** Malt colour: base malts 1.5 to 4 °L, crystal 10 to 150, roasted barley and black malt up to about 600. */
export const MALT_COLOUR_MAX_LOVIBOND = 700;
/** Beer colour we accept as a target: the palest lager is about 2 SRM, black beers 40 and beyond. */
export const BEER_COLOUR_MIN_SRM = 1;
export const BEER_COLOUR_MAX_SRM = 100;
/** Morey fitted beers up to about 50 SRM; beyond that an estimate is only a rough figure. */
export const MOREY_FIT_MAX_SRM = 50;
export const COLOUR_MASS_MAX_KG = 10_000;

export type ColourScale = 'srm' | 'ebc';
export const COLOUR_SCALES: readonly ColourScale[] = ['srm', 'ebc'];

export interface GristColour {
  massKg: number;
  colourLovibond: number;
}

export function srmToEbc(srm: number): number {
  requireRange(srm, 0, BEER_COLOUR_MAX_SRM * 10, 'srm', 'Colour', 'SRM');
  return srm * SRM_TO_EBC;
}

export function ebcToSrm(ebc: number): number {
  requireRange(ebc, 0, BEER_COLOUR_MAX_SRM * 10 * SRM_TO_EBC, 'ebc', 'Colour', 'EBC');
  return ebc / SRM_TO_EBC;
}

export function maltEbcToLovibond(colourEbc: number): number {
  requireRange(colourEbc, 0, MALT_COLOUR_MAX_LOVIBOND * SRM_TO_EBC, 'colourEbc', 'Malt colour', 'EBC');
  return colourEbc / SRM_TO_EBC;
}

export function maltLovibondToEbc(colourLovibond: number): number {
  requireMaltColour(colourLovibond, 'colourLovibond');
  return colourLovibond * SRM_TO_EBC;
}

export function requireMaltColour(colourLovibond: number, field: string): number {
  return requireRange(colourLovibond, 0, MALT_COLOUR_MAX_LOVIBOND, field, 'Malt colour', '°L', 'Black malt is about 500 °L (1000 EBC).');
}

/** Malt colour units: Σ (lb × °L) / US gal, from kilograms and litres. */
export function maltColourUnits(grist: readonly GristColour[], volumeL: number): number {
  requireVolume(volumeL, 'volumeL');
  if (!Array.isArray(grist)) throw new BrewMathError('The grist must be a list.', 'inconsistent', 'grist');
  let lbLovibond = 0;
  for (let i = 0; i < grist.length; i++) {
    const g = grist[i];
    requireRange(g.massKg, 0, COLOUR_MASS_MAX_KG, `grist.${i}.massKg`, `Fermentable ${i + 1}: the amount`, 'kg');
    requireMaltColour(g.colourLovibond, `grist.${i}.colourLovibond`);
    lbLovibond += (g.massKg / KG_PER_LB) * g.colourLovibond;
  }
  const mcu = lbLovibond / (volumeL / LITRES_PER_US_GALLON);
  if (!Number.isFinite(mcu)) {
    throw new BrewMathError(`${show(volumeL)} L is too small a volume for this grist; check the units.`, 'out-of-range', 'volumeL');
  }
  return mcu;
}

/** Morey's equation on malt colour units. */
export function moreySrmFromMcu(mcu: number): number {
  requireRange(mcu, 0, 1e6, 'mcu', 'Malt colour units', 'MCU');
  return 1.4922 * Math.pow(mcu, 0.6859);
}

export interface ColourEstimate {
  srm: number;
  ebc: number;
  mcu: number;
  /** True above MOREY_FIT_MAX_SRM, where Morey's fit is a rough figure only. */
  beyondFit: boolean;
}

/** Beer colour of a grist dissolved in volumeL of finished wort. */
export function moreyColour(grist: readonly GristColour[], volumeL: number): ColourEstimate {
  const mcu = maltColourUnits(grist, volumeL);
  const srm = moreySrmFromMcu(mcu);
  return { srm, ebc: srm * SRM_TO_EBC, mcu, beyondFit: srm > MOREY_FIT_MAX_SRM };
}

/** A colour for a message in the chosen scale: "12 EBC", "6.1 SRM". */
export function showColour(srm: number, scale: ColourScale): string {
  return scale === 'ebc' ? `${show(srm * SRM_TO_EBC, 0)} EBC` : `${show(srm, 1)} SRM`;
}
