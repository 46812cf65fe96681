import { BrewMathError } from './errors';

/** The gravities a hydrometer or refractometer can plausibly give for wort or beer. */
export const SG_MIN = 0.98;
export const SG_MAX = 1.2;
/** A brewing refractometer's scale. */
export const BRIX_MIN = 0;
export const BRIX_MAX = 40;

// Messages are built only on the error path, so the happy path stays allocation-free.

/** Rounds for a message: enough digits to recognise the number, no float noise. */
export function show(value: number, digits = 3): string {
  return Number.isFinite(value) ? String(Number(value.toFixed(digits))) : String(value);
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

export function requireVolume(value: number, field: string, label = 'Volume'): number {
  return requirePositive(value, field, label, 'L');
}

/** A gravity as brewers write it (1.050), with a fourth decimal only when it carries information. */
export function showSg(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const three = value.toFixed(3);
  return Math.abs(Number(three) - value) < 1e-9 ? three : value.toFixed(4);
}
