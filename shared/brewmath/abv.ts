import { BrewMathError } from './errors';
import { requireRange, requireSg, requireWortSg, show, showSg } from './validate';

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

/**
 * A more exact estimate that accounts for the alcohol's lower density and the wort's extract:
 * ABV = 76.08 × (OG − FG) / (1.775 − OG) × FG / 0.794. A commonly published formula (recalled
 * from memory; its original paper is not to hand). It agrees with the simple rule to about
 * 0.1 % ABV for ordinary beers and reads higher for strong ones.
 */
export function abvPercentExact(og: number, fg: number): number {
  requireOgFg(og, fg);
  return ((76.08 * (og - fg)) / (1.775 - og)) * (fg / 0.794);
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
