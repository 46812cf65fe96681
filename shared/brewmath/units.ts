import { BrewMathError } from './errors';
import { requireFinite, requireNonNegative } from './validate';

/**
 * Conversions at the edges; everything inside is SI. Exact definitions:
 * US gallon = 231 in³ = 3.785411784 L; pound = 0.45359237 kg (international yard and pound
 * agreement, 1959); ounce = pound / 16; °F = °C × 9/5 + 32.
 */
export const LITRES_PER_US_GALLON = 3.785411784;
/** Imperial gallon = 4.54609 L exactly (UK Weights and Measures Act 1985). */
export const LITRES_PER_IMPERIAL_GALLON = 4.54609;
export const KG_PER_LB = 0.45359237;
export const G_PER_OZ = (KG_PER_LB * 1000) / 16;

/** Far beyond any brew; it keeps a conversion from overflowing to Infinity. */
const CONVERTIBLE_MAX = 1e12;

function amount(value: number, field: string, label: string, unit: string): number {
  requireNonNegative(value, field, label, unit);
  if (value > CONVERTIBLE_MAX) {
    throw new BrewMathError(`${label} ${value} ${unit} is too large to be a brewing quantity.`, 'out-of-range', field);
  }
  return value;
}

export function litresToUsGallons(volumeL: number): number {
  return amount(volumeL, 'volumeL', 'Volume', 'L') / LITRES_PER_US_GALLON;
}
export function usGallonsToLitres(gallons: number): number {
  return amount(gallons, 'gallons', 'Volume', 'gal') * LITRES_PER_US_GALLON;
}
export function kgToLb(kg: number): number {
  return amount(kg, 'kg', 'Mass', 'kg') / KG_PER_LB;
}
export function lbToKg(lb: number): number {
  return amount(lb, 'lb', 'Mass', 'lb') * KG_PER_LB;
}
export function gToOz(g: number): number {
  return amount(g, 'g', 'Mass', 'g') / G_PER_OZ;
}
export function ozToG(oz: number): number {
  return amount(oz, 'oz', 'Mass', 'oz') * G_PER_OZ;
}

function requireAboveAbsoluteZero(value: number, field: string, absoluteZero: number, unit: string): number {
  requireFinite(value, field, 'Temperature');
  if (value < absoluteZero) {
    throw new BrewMathError(`${value} ${unit} is below absolute zero.`, 'out-of-range', field);
  }
  if (value > CONVERTIBLE_MAX) {
    throw new BrewMathError(`${value} ${unit} is too hot to be a brewing temperature.`, 'out-of-range', field);
  }
  return value;
}
export function cToF(tempC: number): number {
  return requireAboveAbsoluteZero(tempC, 'tempC', -273.15, '°C') * 1.8 + 32;
}
export function fToC(tempF: number): number {
  return (requireAboveAbsoluteZero(tempF, 'tempF', -459.67, '°F') - 32) / 1.8;
}
/** A temperature difference (a thermometer offset, a rise): no 32 °F shift. */
export function deltaCToF(deltaC: number): number {
  requireFinite(deltaC, 'deltaC', 'Temperature difference');
  if (Math.abs(deltaC) > CONVERTIBLE_MAX) {
    throw new BrewMathError(`A difference of ${deltaC} °C is too large to be a brewing temperature.`, 'out-of-range', 'deltaC');
  }
  return deltaC * 1.8;
}
export function deltaFToC(deltaF: number): number {
  return requireFinite(deltaF, 'deltaF', 'Temperature difference') / 1.8;
}
