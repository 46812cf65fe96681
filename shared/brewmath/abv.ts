import { BrewMathError } from './errors';
import { sgToPlato } from './gravity';
import { requireRange, requireSg, requireWortSg, showSg } from './validate';

/** When a recipe gives no FG, assume 75 % apparent attenuation (common practice for ale yeasts; no source). */
export const DEFAULT_APPARENT_ATTENUATION = 0.75;

function requireOgFg(og: number, fg: number): void {
  requireWortSg(og, 'og', 'OG');
  requireSg(fg, 'fg', 'FG');
  if (fg > og) {
    throw new BrewMathError(
      `FG ${showSg(fg)} is above OG ${showSg(og)}: fermentation only lowers gravity. Check the readings.`,
      'inconsistent',
      'fg',
    );
  }
}

/** The homebrew rule of thumb, (OG − FG) × 131.25: our headline ABV, labelled "simple". */
export function abvPercent(og: number, fg: number): number {
  requireOgFg(og, fg);
  return (og - fg) * 131.25;
}

const ETHANOL_SG_20_20 = 789.24 / 998.21;

/**
 * The brewing-science estimate, from Balling's mass balance of fermentation (2.0665 g of extract
 * gives 1 g of ethanol), in °Plato as in ASBC practice (recalled from memory):
 * real extract RE = 0.1808·OE + 0.8192·AE; ABW = (OE − RE) / (2.0665 − 0.010665·OE);
 * ABV = ABW × FG / 0.7907 (ethanol 789.24 ÷ water 998.21 kg/m³ at 20 °C, to match SG 20/20).
 * Within about 0.1 % ABV of the simple rule for ordinary beers, higher for strong ones.
 */
export function abvPercentExact(og: number, fg: number): number {
  requireOgFg(og, fg);
  const originalExtract = sgToPlato(og);
  const realExtract = 0.1808 * originalExtract + 0.8192 * sgToPlato(fg);
  const abw = (originalExtract - realExtract) / (2.0665 - 0.010665 * originalExtract);
  return (abw * fg) / ETHANOL_SG_20_20;
}

/** Apparent attenuation as a fraction: the share of gravity points the yeast took, read through the alcohol. */
export function apparentAttenuation(og: number, fg: number): number {
  requireOgFg(og, fg);
  if (og <= 1) {
    throw new BrewMathError('OG must be above 1.000 to work out attenuation.', 'out-of-range', 'og');
  }
  return (og - fg) / (og - 1);
}

/** The FG a wort would reach at a given apparent attenuation (fraction). */
export function fgFromAttenuation(og: number, attenuation = DEFAULT_APPARENT_ATTENUATION): number {
  requireWortSg(og, 'og', 'OG');
  requireRange(attenuation, 0, 1, 'attenuation', 'Apparent attenuation', '', 'Give it as a fraction, e.g. 0.75.');
  return 1 + (og - 1) * (1 - attenuation);
}
