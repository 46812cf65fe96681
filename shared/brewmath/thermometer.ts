import { BrewMathError } from './errors';
import { requireFinite, requireRange, show } from './validate';

/** Lowest and highest places anyone brews: the Dead Sea shore and a little above the highest towns. */
export const ELEVATION_MIN_M = -500;
export const ELEVATION_MAX_M = 6000;

/**
 * Air pressure at an elevation, Pa. Source: International Standard Atmosphere (ISO 2533), troposphere:
 * p = 101325 × (1 − 2.25577e-5 × h)^5.25588. Real weather moves this by about ±3 %, i.e. ±1 °C at the boil.
 */
export function isaPressurePa(elevationM: number): number {
  requireRange(elevationM, ELEVATION_MIN_M, ELEVATION_MAX_M, 'elevationM', 'Elevation', 'm');
  return 101325 * Math.pow(1 - 2.25577e-5 * elevationM, 5.25588);
}

/**
 * Saturation (boiling) temperature of water at a pressure, °C. Source: IAPWS-IF97, region 4,
 * the explicit backward equation Ts(p) (eq. 31), valid from the triple point to the critical point.
 */
export function waterBoilingPointAtPressureC(pressurePa: number): number {
  requireFinite(pressurePa, 'pressurePa', 'Pressure');
  if (pressurePa < 611.213 || pressurePa > 22.064e6) {
    throw new BrewMathError(`Water does not boil as a liquid at ${show(pressurePa, 0)} Pa.`, 'out-of-range', 'pressurePa');
  }
  const n1 = 0.11670521452767e4;
  const n2 = -0.72421316703206e6;
  const n3 = -0.17073846940092e2;
  const n4 = 0.1202082470247e5;
  const n5 = -0.32325550322333e7;
  const n6 = 0.1491510861353e2;
  const n7 = -0.48232657361591e4;
  const n8 = 0.40511340542057e6;
  const n9 = -0.23855557567849;
  const n10 = 0.65017534844798e3;
  const beta = Math.pow(pressurePa / 1e6, 0.25);
  const e = beta * beta + n3 * beta + n6;
  const f = n1 * beta * beta + n4 * beta + n7;
  const g = n2 * beta * beta + n5 * beta + n8;
  const d = (2 * g) / (-f - Math.sqrt(f * f - 4 * e * g));
  const kelvin = (n10 + d - Math.sqrt((n10 + d) * (n10 + d) - 4 * (n9 + n10 * d))) / 2;
  return kelvin - 273.15;
}

/** Where pure water boils at this elevation on a standard day: the reference for a thermometer check. */
export function boilingPointC(elevationM: number): number {
  return waterBoilingPointAtPressureC(isaPressurePa(elevationM));
}

/** How far a thermometer reads above (+) or below (−) true, from a reading in rolling-boiling water. */
export function thermometerBoilOffsetC(readingC: number, elevationM: number): number {
  requireRange(readingC, 50, 120, 'readingC', 'Boiling-water reading', '°C', 'Read it in water at a rolling boil.');
  return readingC - boilingPointC(elevationM);
}
