import { BrewMathError } from './errors';
import { requireWcf, sgToPlato } from './gravity';
import { SG_MAX, SG_MIN, requireBrix, requireWortSg, show, showSg } from './validate';

/** About 1.04 is the usual factor when a brewer has not measured their own (common practice). */
export const DEFAULT_WCF = 1.04;

export interface BrixSgPair {
  brix: number;
  sg: number;
}

export interface WcfEstimate {
  /** Mean of the per-pair factors: the value to store in the brewer's refractometer profile. */
  wcf: number;
  min: number;
  max: number;
  /** max − min: more than about 0.03 suggests a misread or a sample that was not the same wort. */
  spread: number;
  count: number;
}

/** Below about 2 °P the ratio Brix/°P is dominated by reading error. */
const MIN_PAIR_PLATO = 2;

/**
 * Wort correction factor from paired readings of the same unfermented wort: each pair gives
 * Brix ÷ °Plato(hydrometer SG), since the refractometer scale is sucrose and wort is not.
 */
export function wcfFromPairs(pairs: readonly BrixSgPair[]): WcfEstimate {
  if (!Array.isArray(pairs) || pairs.length === 0) {
    throw new BrewMathError(
      'Give at least one pair of readings: refractometer Brix and hydrometer SG of the same unfermented wort.',
      'inconsistent',
      'pairs',
    );
  }
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < pairs.length; i++) {
    const { brix, sg } = pairs[i];
    requireBrix(brix, 'pairs', `Pair ${i + 1}: the Brix reading`);
    requireWortSg(sg, 'pairs', `Pair ${i + 1}: the hydrometer reading`);
    const plato = sgToPlato(sg);
    if (plato < MIN_PAIR_PLATO) {
      throw new BrewMathError(
        `Pair ${i + 1}: gravity ${showSg(sg)} is too close to water for a useful factor; use wort of at least 1.008.`,
        'out-of-range',
        'pairs',
      );
    }
    const factor = brix / plato;
    try {
      requireWcf(factor, 'pairs');
    } catch {
      throw new BrewMathError(
        `Pair ${i + 1} gives a factor of ${show(factor)}, far from the usual 1.00 to 1.10. Were both readings of the same unfermented wort, the hydrometer one corrected for temperature?`,
        'inconsistent',
        'pairs',
      );
    }
    sum += factor;
    if (factor < min) min = factor;
    if (factor > max) max = factor;
  }
  return { wcf: sum / pairs.length, min, max, spread: max - min, count: pairs.length };
}

/**
 * Once fermentation starts, alcohol raises the refractive index while lowering density, so a
 * Brix reading alone no longer gives SG. Source: S. Terrill (2011), "Refractometer FG Results",
 * the simplified cubic in wort-corrected Brix (OB original, FB current), fitted to beers of
 * OG 1.036–1.106 at 73–91 % apparent attenuation; he reports it averages about 0.0007 high.
 */
export function refractometerWithAlcoholSg(originalBrix: number, currentBrix: number, wcf = 1): number {
  requireBrix(originalBrix, 'originalBrix', 'Original Brix reading');
  requireBrix(currentBrix, 'currentBrix', 'Current Brix reading');
  requireWcf(wcf);
  if (currentBrix > originalBrix) {
    throw new BrewMathError(
      `The current reading ${show(currentBrix, 2)} °Bx is above the original ${show(originalBrix, 2)} °Bx; fermentation only lowers it. Check which reading is which.`,
      'inconsistent',
      'currentBrix',
    );
  }
  const ob = originalBrix / wcf;
  const fb = currentBrix / wcf;
  const sg =
    1 -
    0.0044993 * ob +
    0.011774 * fb +
    0.00027581 * ob * ob -
    0.0012717 * fb * fb -
    0.00000728 * ob * ob * ob +
    0.000063293 * fb * fb * fb;
  if (sg < SG_MIN || sg > SG_MAX) {
    throw new BrewMathError(
      `These readings (${show(originalBrix, 2)} °Bx at the start, ${show(currentBrix, 2)} °Bx now) fall outside what the alcohol correction covers. Take a hydrometer reading instead.`,
      'out-of-range',
      'currentBrix',
    );
  }
  return sg;
}
