/**
 * Where fermentation left the recipe: what a mentor's review adds to the brew day's deviations
 * (shared/brew-deviations.ts). The temperature excursions come from shared/fermentation's
 * temperatureSummary and the packaging verdict from the packaging record, so the review and the
 * fermentation log can never disagree.
 */
import type { FgState } from './brewmath/fermentation';
import { formatTemperature, type UnitSystem } from './brewmath/format';
import { instrumentDeviation } from './brew-deviations';
import type { InstrumentSnapshot } from './schemas/instruments';
import type { BrewDeviation } from './schemas/brews';
import { DAY_MS } from './dates';

export type FermentationDeviationCode = 'ferment-temp-high' | 'ferment-temp-low' | 'packaged-before-stable' | 'instrument-uncalibrated' | 'instrument-overdue';

export interface FermentationDeviation {
  code: FermentationDeviationCode;
  stage: 'fermentation';
  /** The warmest (or coldest) reading of a spell, or the reading an instrument note is about. */
  fermentationReadingId: number | null;
  /** SI: the edge of the recipe's range (°C) for temperatures. */
  expected: number | null;
  actual: number | null;
  quantity: 'temperature' | null;
  instrumentName: string | null;
  /** For a temperature spell: how many readings, from when to when. */
  span: { count: number; from: string; to: string } | null;
  /** A plain sentence in metric units; the client words it in the reader's units. */
  message: string;
}

export interface FermentationDeviationReading {
  id: number;
  kind: 'gravity' | 'temperature';
  instrument: InstrumentSnapshot | null;
  takenAt: string;
}

export interface FermentationDeviationExcursion {
  readingId: number | null;
  takenAt: string;
  tempC: number;
  direction: 'warm' | 'cold';
}

export interface FermentationDeviationPackaging {
  packagedAt: string;
  verdictState: FgState;
  verdictReason: string;
  overrideReason: string;
}

const verdictWords: Record<FermentationDeviationPackaging['verdictState'], string> = {
  'no-reading': 'not yet read',
  'too-early': 'too early to tell',
  moving: 'still moving',
  stuck: 'steady but well above the recipe FG (stuck)',
  stable: 'stable',
};

/** "day 2.3" after pitching, or the date when the pitch time is unknown. */
function dayText(at: string, pitchedAt: string | null): string {
  if (!pitchedAt) return at.slice(0, 10);
  const days = (Date.parse(at) - Date.parse(pitchedAt)) / DAY_MS;
  return `day ${Math.max(0, days).toFixed(1)}`;
}

function spanText(span: NonNullable<FermentationDeviation['span']>, pitchedAt: string | null): string {
  if (span.count === 1) return `on ${dayText(span.from, pitchedAt)}`;
  return `${span.count} readings, ${dayText(span.from, pitchedAt)} to ${dayText(span.to, pitchedAt)}`;
}

/**
 * Where fermentation left the recipe: every spell of fermenter temperature outside the recipe's
 * range (consecutive readings on the same side count as one spell), packaging before the final
 * gravity was proven stable, and an uncalibrated instrument not already called out on brew day.
 */
export function findFermentationDeviations(input: {
  range: { minC: number; maxC: number } | null;
  /** In time order. */
  readings: readonly FermentationDeviationReading[];
  /**
   * The readings whose instruments are checked, in time order (default: `readings`). The first
   * reading of each distinct instrument snapshot is enough: later ones with the same snapshot
   * repeat its call-out, which is given once.
   */
  instrumentReadings?: readonly FermentationDeviationReading[];
  /** temperatureSummary(...).excursions for the same readings and range. */
  excursions: readonly FermentationDeviationExcursion[];
  packaging: FermentationDeviationPackaging | null;
  pitchedAt: string | null;
  /** The brew day's own deviations: an instrument called out there is not repeated. */
  brewDay?: readonly BrewDeviation[];
}): FermentationDeviation[] {
  const out: FermentationDeviation[] = [];
  const base = { stage: 'fermentation', instrumentName: null, span: null } as const;

  // Temperature spells: walk the temperature readings in order; an in-range reading ends a spell.
  const byReading = new Map<number, FermentationDeviationExcursion>();
  const loose: FermentationDeviationExcursion[] = [];
  for (const e of input.excursions) {
    if (e.readingId === null) loose.push(e);
    else byReading.set(e.readingId, e);
  }
  const spells: FermentationDeviationExcursion[][] = [];
  let current: FermentationDeviationExcursion[] | null = null;
  for (const r of input.readings) {
    if (r.kind !== 'temperature') continue;
    const e = byReading.get(r.id);
    if (!e) {
      current = null;
      continue;
    }
    if (!current || current[0].direction !== e.direction) {
      current = [];
      spells.push(current);
    }
    current.push(e);
  }
  for (const e of loose) spells.push([e]);
  spells.sort((a, b) => Date.parse(a[0].takenAt) - Date.parse(b[0].takenAt));

  if (input.range) {
    const { minC, maxC } = input.range;
    for (const spell of spells) {
      const warm = spell[0].direction === 'warm';
      const peak = spell.reduce((p, e) => (warm ? (e.tempC > p.tempC ? e : p) : e.tempC < p.tempC ? e : p));
      const span = { count: spell.length, from: spell[0].takenAt, to: spell[spell.length - 1].takenAt };
      out.push({
        ...base,
        code: warm ? 'ferment-temp-high' : 'ferment-temp-low',
        fermentationReadingId: peak.readingId,
        expected: warm ? maxC : minC,
        actual: peak.tempC,
        quantity: 'temperature',
        span,
        message: `Fermenter ${warm ? 'up to' : 'down to'} ${peak.tempC.toFixed(1)} °C, ${warm ? 'above' : 'below'} the recipe's ${minC}–${maxC} °C range (${spanText(span, input.pitchedAt)}).`,
      });
    }
  }

  const p = input.packaging;
  if (p && p.verdictState !== 'stable') {
    out.push({
      ...base,
      code: 'packaged-before-stable',
      fermentationReadingId: null,
      expected: null,
      actual: null,
      quantity: null,
      span: { count: 1, from: p.packagedAt, to: p.packagedAt },
      message: `Packaged ${dayText(p.packagedAt, input.pitchedAt)} while the final gravity was ${verdictWords[p.verdictState]}, before two equal readings proved it stable.${p.overrideReason ? ` Reason given: ${p.overrideReason}` : ''}`,
    });
  }

  // Instruments: the same checks as on brew day, once per instrument across the whole brew.
  const seen = new Set((input.brewDay ?? []).filter((d) => d.code === 'instrument-uncalibrated' || d.code === 'instrument-overdue').map((d) => `${d.code}:${d.instrumentName}`));
  for (const r of input.instrumentReadings ?? input.readings) {
    const found = instrumentDeviation({ id: r.id, kind: 'og', corrected: 0, volumeL: null, instrument: r.instrument, takenAt: r.takenAt }, 'og');
    if (!found || (found.code !== 'instrument-uncalibrated' && found.code !== 'instrument-overdue')) continue;
    const key = `${found.code}:${found.instrumentName}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push({
      ...base,
      code: found.code,
      fermentationReadingId: r.id,
      expected: null,
      actual: null,
      quantity: null,
      instrumentName: found.instrumentName,
      message: found.message,
    });
  }
  return out;
}

/** A fermentation deviation worded in the reader's units. */
export function describeFermentationDeviation(d: FermentationDeviation, prefs: { unitSystem: UnitSystem }, pitchedAt: string | null): string {
  if ((d.code === 'ferment-temp-high' || d.code === 'ferment-temp-low') && d.actual !== null && d.expected !== null && d.span) {
    const t = (c: number) => formatTemperature(c, prefs.unitSystem);
    const warm = d.code === 'ferment-temp-high';
    const gapC = Math.abs(d.actual - d.expected);
    const gap = prefs.unitSystem === 'us' ? `${(gapC * 1.8).toFixed(1)}\u00a0°F` : `${gapC.toFixed(1)}\u00a0°C`;
    return `Fermenter ${warm ? 'up to' : 'down to'} ${t(d.actual)}, ${gap} ${warm ? 'above the top' : 'below the bottom'} of the recipe's range, ${t(d.expected)} (${spanText(d.span, pitchedAt)}).`;
  }
  return d.message;
}
