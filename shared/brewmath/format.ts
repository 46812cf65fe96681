import { sgToPlato } from './gravity';
import { cToF, gToOz, kgToLb, litresToUsGallons } from './units';
import { requireFinite } from './validate';

/**
 * Display strings. The number and its unit are joined by a no-break space so a narrow phone
 * screen never splits them. Rounding is for reading, never for storing.
 */
export type GravityUnit = 'sg' | 'plato';
export type UnitSystem = 'metric' | 'us';

const NBSP = '\u00a0';

function fixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  // toFixed(-0.04, 1) gives "-0.0"; nobody wants to read a negative zero.
  return Number(text) === 0 ? (0).toFixed(digits) : text;
}

export function formatGravity(sg: number, unit: GravityUnit = 'sg'): string {
  return unit === 'plato' ? `${fixed(sgToPlato(sg), 1)}${NBSP}°P` : fixed(requireFinite(sg, 'sg', 'Gravity'), 3);
}

export function formatVolume(volumeL: number, system: UnitSystem = 'metric'): string {
  return system === 'us' ? `${fixed(litresToUsGallons(volumeL), 2)}${NBSP}gal` : `${fixed(requireFinite(volumeL, 'volumeL', 'Volume'), 1)}${NBSP}L`;
}

/** Malt and extract amounts. */
export function formatKg(kg: number, system: UnitSystem = 'metric'): string {
  return system === 'us' ? `${fixed(kgToLb(kg), 2)}${NBSP}lb` : `${fixed(requireFinite(kg, 'kg', 'Mass'), 2)}${NBSP}kg`;
}

/** Hops and priming sugar. */
export function formatGrams(g: number, system: UnitSystem = 'metric'): string {
  return system === 'us' ? `${fixed(gToOz(g), 2)}${NBSP}oz` : `${fixed(requireFinite(g, 'g', 'Mass'), 0)}${NBSP}g`;
}

export function formatTemperature(tempC: number, system: UnitSystem = 'metric'): string {
  return system === 'us' ? `${fixed(cToF(tempC), 1)}${NBSP}°F` : `${fixed(requireFinite(tempC, 'tempC', 'Temperature'), 1)}${NBSP}°C`;
}

export function formatAbv(percent: number): string {
  return `${fixed(requireFinite(percent, 'abvPercent', 'ABV'), 1)}${NBSP}%`;
}

/** A fraction such as apparent attenuation, as a whole percentage. */
export function formatFraction(fraction: number): string {
  return `${fixed(requireFinite(fraction, 'fraction', 'Fraction') * 100, 0)}${NBSP}%`;
}

export function formatMinutes(minutes: number): string {
  return `${fixed(requireFinite(minutes, 'minutes', 'Minutes'), 0)}${NBSP}min`;
}
