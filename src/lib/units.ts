/**
 * The edge where SI meets the brewer's own units. Forms and pages hold SI values (litres,
 * kilograms, grams, °C, SG) and only show and read numbers in the signed-in user's units.
 * Every factor and formula comes from shared/brewmath, the same module the server uses.
 */
import {
  cToF,
  deltaCToF,
  deltaFToC,
  fToC,
  G_PER_OZ,
  KG_PER_LB,
  LITRES_PER_IMPERIAL_GALLON,
  LITRES_PER_US_GALLON,
  platoToSg,
  sgToPlato,
  type GravityUnit,
  type UnitSystem,
} from '@shared/brewmath';
import { useMe } from './auth';

export type QuantityKind = 'volume' | 'mass' | 'smallMass' | 'temperature' | 'temperatureDelta' | 'gravity' | 'rate';

export interface UnitPrefs {
  unitSystem: UnitSystem;
  gravityUnit: GravityUnit;
  /** With US units, volumes in US gallons (default) or imperial gallons. */
  gallonUnit?: 'us' | 'imperial';
}

export const defaultUnitPrefs: UnitPrefs = { unitSystem: 'metric', gravityUnit: 'sg' };

interface KindSpec {
  metric: { unit: string; decimals: number };
  us: { unit: string; decimals: number };
  /** SI → US; linear kinds give a factor, the rest a function pair. */
  toUs: (si: number) => number;
  fromUs: (us: number) => number;
}

const linear = (factor: number) => ({ toUs: (si: number) => si / factor, fromUs: (us: number) => us * factor });

const imperialVolume: Pick<KindSpec, 'toUs' | 'fromUs'> = linear(LITRES_PER_IMPERIAL_GALLON);
const imperialUnits: Partial<Record<QuantityKind, string>> = { volume: 'imp gal', rate: 'imp gal/h' };
const isImperial = (kind: QuantityKind, prefs: UnitPrefs) => prefs.unitSystem === 'us' && prefs.gallonUnit === 'imperial' && kind in imperialUnits;

const specs: Record<Exclude<QuantityKind, 'gravity'>, KindSpec> = {
  volume: { metric: { unit: 'L', decimals: 1 }, us: { unit: 'gal', decimals: 2 }, ...linear(LITRES_PER_US_GALLON) },
  rate: { metric: { unit: 'L/h', decimals: 1 }, us: { unit: 'gal/h', decimals: 2 }, ...linear(LITRES_PER_US_GALLON) },
  mass: { metric: { unit: 'kg', decimals: 2 }, us: { unit: 'lb', decimals: 2 }, ...linear(KG_PER_LB) },
  smallMass: { metric: { unit: 'g', decimals: 0 }, us: { unit: 'oz', decimals: 2 }, ...linear(G_PER_OZ) },
  temperature: { metric: { unit: '°C', decimals: 1 }, us: { unit: '°F', decimals: 1 }, toUs: cToF, fromUs: fToC },
  temperatureDelta: { metric: { unit: '°C', decimals: 1 }, us: { unit: '°F', decimals: 1 }, toUs: deltaCToF, fromUs: deltaFToC },
};

export function quantityUnit(kind: QuantityKind, prefs: UnitPrefs): string {
  if (kind === 'gravity') return prefs.gravityUnit === 'plato' ? '°P' : 'SG';
  if (isImperial(kind, prefs)) return imperialUnits[kind]!;
  return specs[kind][prefs.unitSystem].unit;
}

export function displayDecimals(kind: QuantityKind, prefs: UnitPrefs): number {
  if (kind === 'gravity') return prefs.gravityUnit === 'plato' ? 1 : 3;
  return specs[kind][prefs.unitSystem].decimals;
}

/** SI value → number in the user's unit. */
export function toDisplay(kind: QuantityKind, prefs: UnitPrefs, si: number): number {
  if (kind === 'gravity') return prefs.gravityUnit === 'plato' ? sgToPlato(si) : si;
  if (isImperial(kind, prefs)) return imperialVolume.toUs(si);
  return prefs.unitSystem === 'us' ? specs[kind].toUs(si) : si;
}

/** A number the user typed in their unit → SI. Throws BrewMathError when it cannot be converted. */
export function fromDisplay(kind: QuantityKind, prefs: UnitPrefs, shown: number): number {
  if (kind === 'gravity') return prefs.gravityUnit === 'plato' ? platoToSg(shown) : shown;
  if (isImperial(kind, prefs)) return imperialVolume.fromUs(shown);
  return prefs.unitSystem === 'us' ? specs[kind].fromUs(shown) : shown;
}

/** Rounded for reading (never for storing), with a no-break space before the unit. */
export function formatQuantity(kind: QuantityKind, prefs: UnitPrefs, si: number | null | undefined): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  const value = toDisplay(kind, prefs, si);
  const text = value.toFixed(displayDecimals(kind, prefs));
  const clean = Number(text) === 0 ? (0).toFixed(displayDecimals(kind, prefs)) : text;
  const unit = quantityUnit(kind, prefs);
  return kind === 'gravity' && prefs.gravityUnit === 'sg' ? clean : `${clean}\u00a0${unit}`;
}

export interface Units extends UnitPrefs {
  unit: (kind: QuantityKind) => string;
  format: (kind: QuantityKind, si: number | null | undefined) => string;
  toDisplay: (kind: QuantityKind, si: number) => number;
  fromDisplay: (kind: QuantityKind, shown: number) => number;
}

const unitsCache = new Map<string, Units>();

/** One object per combination of preferences, so memoised components see the same units between renders. */
export function unitsFor(prefs: UnitPrefs): Units {
  const key = `${prefs.unitSystem}:${prefs.gravityUnit}`;
  const cached = unitsCache.get(key);
  if (cached) return cached;
  const p = { unitSystem: prefs.unitSystem, gravityUnit: prefs.gravityUnit };
  const units: Units = {
    ...p,
    unit: (kind) => quantityUnit(kind, p),
    format: (kind, si) => formatQuantity(kind, p, si),
    toDisplay: (kind, si) => toDisplay(kind, p, si),
    fromDisplay: (kind, shown) => fromDisplay(kind, p, shown),
  };
  unitsCache.set(key, units);
  return units;
}

/** The signed-in user's units (metric and SG for visitors). */
export function useUnits(): Units {
  const { data: me } = useMe();
  return unitsFor(me ? { unitSystem: me.unitSystem, gravityUnit: me.gravityUnit, gallonUnit: me.gallonUnit } : defaultUnitPrefs);
}
