import { BrewMathError } from './errors';
import { brixToSg, requireWcf, sgToPlato } from './gravity';
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

/**
 * What Terrill's cubic was fitted to, as described with the fit (S. Terrill 2011): finished beers
 * of OG about 1.036–1.106 at 73–91 % apparent attenuation. Outside it the cubic extrapolates; at
 * zero fermentation it even gives more than the wort itself (20.8 °Bx against 20.8 °Bx → 1.195).
 */
export const TERRILL_FIT_RANGE = { ogMin: 1.036, ogMax: 1.106, attenuationMin: 0.73, attenuationMax: 0.91 } as const;
/** A drop smaller than a brewing refractometer's 0.1 °Bx scale step is no drop (common practice, no source). */
export const NO_DROP_BRIX = 0.1;

export interface FermentingRefractometerEstimate {
  sg: number;
  /** 'unfermented': no drop yet, so the plain Brix-to-gravity conversion; else Terrill's cubic. */
  method: 'unfermented' | 'terrill-2011-cubic';
  /** (OG − SG) / (OG − 1), with OG from the original reading. */
  apparentAttenuation: number;
  /** Outside the range the cubic was fitted to: a rough estimate only. */
  rough: boolean;
  /** Why it is rough, in words; null when it is not. */
  roughReason: string | null;
}

/**
 * A refractometer reading once fermentation may have started. With no drop from the original
 * reading nothing has fermented, so it is the plain Brix-to-gravity conversion; with a drop it is
 * Terrill's cubic, flagged rough outside the range it was fitted to, and refused where the cubic
 * would put the beer above the wort it came from.
 */
export function fermentingRefractometerSg(originalBrix: number, currentBrix: number, wcf = 1): FermentingRefractometerEstimate {
  requireBrix(originalBrix, 'originalBrix', 'Original Brix reading');
  requireBrix(currentBrix, 'currentBrix', 'Current Brix reading');
  requireWcf(wcf);
  if (currentBrix > originalBrix + NO_DROP_BRIX / 2) {
    // Let refractometerWithAlcoholSg word the error.
    refractometerWithAlcoholSg(originalBrix, currentBrix, wcf);
  }
  const og = brixToSg(originalBrix, wcf);
  if (originalBrix - currentBrix < NO_DROP_BRIX - 1e-9) {
    return { sg: brixToSg(Math.min(currentBrix, originalBrix), wcf), method: 'unfermented', apparentAttenuation: 0, rough: false, roughReason: null };
  }
  const { ogMin, ogMax, attenuationMin, attenuationMax } = TERRILL_FIT_RANGE;
  const range = `Terrill's (2011) correction was fitted to finished beers of OG ${showSg(ogMin)}–${showSg(ogMax)} at ${show(attenuationMin * 100, 0)}–${show(attenuationMax * 100, 0)} % apparent attenuation`;
  const sg = refractometerWithAlcoholSg(originalBrix, currentBrix, wcf);
  const attenuation = (og - sg) / (og - 1);
  if (attenuation <= 0) {
    throw new BrewMathError(
      `${show(currentBrix, 2)} °Bx now against ${show(originalBrix, 2)} °Bx at the start is too early in fermentation for the alcohol correction: it would give ${showSg(sg)}, above the wort's own ${showSg(og)}. ${range}. Use a hydrometer, or read again once fermentation is further along.`,
      'out-of-range',
      'currentBrix',
    );
  }
  let roughReason: string | null = null;
  if (og < ogMin - 1e-9 || og > ogMax + 1e-9) {
    roughReason = `The original reading is OG ${showSg(og)}, outside the ${showSg(ogMin)}–${showSg(ogMax)} the correction was fitted to: a rough estimate only.`;
  } else if (attenuation < attenuationMin) {
    roughReason = `Early in fermentation (about ${show(attenuation * 100, 0)} % attenuated): ${range}, so this is a rough estimate only.`;
  } else if (attenuation > attenuationMax) {
    roughReason = `About ${show(attenuation * 100, 0)} % attenuated, beyond the ${show(attenuationMax * 100, 0)} % the correction was fitted to: a rough estimate only.`;
  }
  return { sg, method: 'terrill-2011-cubic', apparentAttenuation: attenuation, rough: roughReason !== null, roughReason };
}
