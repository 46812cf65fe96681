/** Shared wording and date formatting for the fermentation pages. */
import type { FgState } from '@shared/brewmath';
import type { FermentationMethod } from '@shared/schemas/fermentation';
import { DAY_MS, localDateTimeInput } from '@shared/dates';

export const verdictTitles: Record<FgState, string> = {
  'no-reading': 'No reading yet',
  'too-early': 'Too early to tell',
  moving: 'Still moving',
  stuck: 'Steady, but well above where this recipe should finish',
  stable: 'Stable: safe to package',
};

export const methodLabels: Record<FermentationMethod, string> = {
  hydrometer: 'Hydrometer',
  refractometer: 'Refractometer',
  thermometer: 'Thermometer',
};

/** "Day 12" from pitching; fractions are floored, as brewers count days. */
export function dayLabel(takenAt: string, pitchedAt: string | null) {
  if (!pitchedAt) return '';
  const days = (Date.parse(takenAt) - Date.parse(pitchedAt)) / DAY_MS;
  return `Day ${Math.max(0, Math.floor(days))}`;
}

export function shortDateTime(iso: string) {
  return new Date(iso).toLocaleString(undefined, { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

export function shortDate(iso: string) {
  return new Date(iso).toLocaleDateString(undefined, { weekday: 'short', day: 'numeric', month: 'short' });
}

/** A local date-time for <input type="datetime-local">, from a Date. */
export function toLocalInput(date: Date) {
  return localDateTimeInput(date);
}

/** The ISO instant of a datetime-local value, or undefined when it is empty or not a date. */
export function fromLocalInput(value: string): string | undefined {
  if (!value) return undefined;
  const ms = new Date(value).getTime();
  return Number.isFinite(ms) ? new Date(ms).toISOString() : value;
}
