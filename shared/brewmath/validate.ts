import { BrewMathError } from './errors';

/** The gravities a hydrometer or refractometer can plausibly give for wort or beer. */
export const SG_MIN = 0.98;
export const SG_MAX = 1.2;
/** A brewing refractometer's scale. */
export const BRIX_MIN = 0;
export const BRIX_MAX = 40;

// Messages are built only on the error path, so the happy path stays allocation-free.

const POW10 = [1, 10, 100, 1000, 10000, 100000, 1000000];

/**
 * toFixed without toFixed: integer-to-string is several times cheaper, and boilCorrection puts
 * numbers into its reasons on a path that must run millions of times a second.
 */
export function fixedDigits(value: number, digits: number, trimZeros = false): string {
  if (!Number.isFinite(value) || Math.abs(value) >= 1e12) return String(value);
  const scale = POW10[digits];
  const scaled = Math.round(Math.abs(value) * scale);
  const sign = value < 0 && scaled !== 0 ? '-' : '';
  const whole = Math.floor(scaled / scale);
  if (digits === 0) return sign + whole;
  let fraction = String(scaled - whole * scale);
  while (fraction.length < digits) fraction = '0' + fraction;
  if (trimZeros) {
    let end = fraction.length;
    while (end > 0 && fraction.charCodeAt(end - 1) === 48) end--;
    fraction = fraction.slice(0, end);
    if (end === 0) return sign + whole;
  }
  return sign + whole + '.' + fraction;
}

/** A number for a message: rounded, trailing zeros dropped. */
export function show(value: number, digits = 3): string {
  return fixedDigits(value, digits, true);
}

export function requireFinite(value: number, field: string, label: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new BrewMathError(`${label} is missing or not a number.`, 'not-a-number', field);
  }
  return value;
}

export function requireRange(
  value: number,
  min: number,
  max: number,
  field: string,
  label: string,
  unit: string,
  hint = '',
): number {
  requireFinite(value, field, label);
  if (value < min || value > max) {
    const u = unit ? ` ${unit}` : '';
    throw new BrewMathError(
      `${label} ${show(value)}${u} is outside ${show(min)} to ${show(max)}${u}.${hint ? ' ' + hint : ''}`,
      'out-of-range',
      field,
    );
  }
  return value;
}

export function requireSg(value: number, field: string, label = 'Gravity'): number {
  requireFinite(value, field, label);
  if (value < SG_MIN || value > SG_MAX) {
    throw new BrewMathError(
      `${label} ${showSg(value)} is outside 0.980 to 1.200, the range wort and beer can read. Check the reading.`,
      'out-of-range',
      field,
    );
  }
  return value;
}

/** Unfermented wort holds dissolved extract, so it cannot read below water. */
export function requireWortSg(value: number, field: string, label = 'Gravity'): number {
  requireSg(value, field, label);
  if (value < 1) {
    throw new BrewMathError(
      `${label} ${showSg(value)} is below 1.000: unfermented wort is always denser than water. Check the reading.`,
      'out-of-range',
      field,
    );
  }
  return value;
}

export function requireBrix(value: number, field: string, label = 'Brix reading'): number {
  requireFinite(value, field, label);
  if (value < BRIX_MIN || value > BRIX_MAX) {
    throw new BrewMathError(
      `${label} ${show(value, 2)} °Bx is outside 0 to 40 °Bx, the scale of a brewing refractometer.`,
      'out-of-range',
      field,
    );
  }
  return value;
}

export function requirePositive(value: number, field: string, label: string, unit: string): number {
  requireFinite(value, field, label);
  if (value <= 0) {
    throw new BrewMathError(`${label} must be more than 0 ${unit}; got ${show(value)} ${unit}.`, 'out-of-range', field);
  }
  return value;
}

export function requireNonNegative(value: number, field: string, label: string, unit: string): number {
  requireFinite(value, field, label);
  if (value < 0) {
    throw new BrewMathError(`${label} cannot be below 0 ${unit}; got ${show(value)} ${unit}.`, 'out-of-range', field);
  }
  return value;
}

/**
 * Upper bounds far beyond any homebrew or club batch. They exist so that no product of two
 * inputs can overflow to Infinity.
 */
export const VOLUME_MAX_L = 10_000;
export const MASS_MAX_KG = 10_000;

export function requireVolume(value: number, field: string, label = 'Volume'): number {
  requirePositive(value, field, label, 'L');
  if (value > VOLUME_MAX_L) {
    throw new BrewMathError(`${label} ${show(value)} L is more than ${VOLUME_MAX_L} L; check the units.`, 'out-of-range', field);
  }
  return value;
}

/** Zero allowed: "add no water", "no sugar". */
export function requireAmount(value: number, field: string, label: string, unit: 'L' | 'kg'): number {
  requireNonNegative(value, field, label, unit);
  const max = unit === 'L' ? VOLUME_MAX_L : MASS_MAX_KG;
  if (value > max) {
    throw new BrewMathError(`${label} ${show(value)} ${unit} is more than ${max} ${unit}; check the units.`, 'out-of-range', field);
  }
  return value;
}

/** A gravity as brewers write it (1.050), with a fourth decimal only when it carries information. */
export function showSg(value: number): string {
  return fixedDigits(value, Math.abs(Math.round(value * 1000) - value * 1000) < 1e-6 ? 3 : 4);
}
