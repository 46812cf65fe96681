import { BrewMathError } from './errors';
import { requireBrix, requireFinite, requireRange, requireSg, requireWortSg, show } from './validate';

/**
 * Specific gravity (20 °C / 20 °C) and °Plato (% extract by mass).
 *
 * Source: ASBC Methods of Analysis, the cubic fit to the extract table,
 * °P = −616.868 + 1111.14·SG − 630.272·SG² + 135.997·SG³ (good to about ±0.02 °P over 0–40 °P).
 * °Brix is the same sucrose scale read by refraction, so a Brix reading divided by the wort
 * correction factor is treated as °Plato.
 */
const C0 = -616.868;
const C1 = 1111.14;
const C2 = -630.272;
const C3 = 135.997;

function platoPolynomial(sg: number): number {
  return C0 + sg * (C1 + sg * (C2 + sg * C3));
}

/** The °Plato range that maps onto the SG range we accept, so the two validations agree. */
export const PLATO_MIN = platoPolynomial(0.98);
export const PLATO_MAX = platoPolynomial(1.2);

/** Wort correction factors seen in practice are about 1.00–1.10; outside 0.9–1.2 is a typo. */
export const WCF_MIN = 0.9;
export const WCF_MAX = 1.2;

export function sgToPlato(sg: number): number {
  requireSg(sg, 'sg');
  return platoPolynomial(sg);
}

/**
 * Inverse of the ASBC cubic by Newton's method, so SG → °P → SG round-trips to 1e-12 instead of
 * carrying the extra error of a separate inverse fit. The seed is the usual rational
 * approximation; three steps are enough from there.
 */
function platoToSgUnchecked(plato: number): number {
  let sg = 1 + plato / (258.6 - (plato / 258.2) * 227.1);
  for (let i = 0; i < 3; i++) {
    const f = platoPolynomial(sg) - plato;
    const slope = C1 + sg * (2 * C2 + sg * 3 * C3);
    sg -= f / slope;
  }
  return sg;
}

export function platoToSg(plato: number): number {
  requireRange(plato, PLATO_MIN, PLATO_MAX, 'plato', 'Gravity', '°P', 'That is beyond what wort can read.');
  return platoToSgUnchecked(plato);
}

export function requireWcf(wcf: number, field = 'wcf'): number {
  requireFinite(wcf, field, 'Wort correction factor');
  if (wcf < WCF_MIN || wcf > WCF_MAX) {
    throw new BrewMathError(
      `Wort correction factor ${show(wcf)} is outside ${WCF_MIN} to ${WCF_MAX}; most refractometers need about 1.00 to 1.10.`,
      'out-of-range',
      field,
    );
  }
  return wcf;
}

/** A refractometer reading of unfermented wort → SG: divide by the wort correction factor, then the ASBC table. */
export function brixToSg(brix: number, wcf = 1): number {
  requireBrix(brix, 'brix');
  requireWcf(wcf);
  return platoToSgUnchecked(brix / wcf);
}

/** SG → what a refractometer with this wort correction factor should read on unfermented wort. */
export function sgToBrix(sg: number, wcf = 1): number {
  requireWortSg(sg, 'sg');
  requireWcf(wcf);
  return platoPolynomial(sg) * wcf;
}

/** Gravity points: (SG − 1) × 1000, the unit of our extract balance. */
export function sgToPoints(sg: number): number {
  return (sg - 1) * 1000;
}

export function pointsToSg(points: number): number {
  return 1 + points / 1000;
}
