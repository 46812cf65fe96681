import { BrewMathError } from './errors';
import { requireRange, requireSg, show, showSg } from './validate';
import { DAY_MS } from '../dates';

/**
 * When is fermentation finished? Common practice, no source: time alone proves nothing; start
 * checking around day 12, and call FG stable only when two readings at least two days apart
 * agree within 0.001.
 */
export interface GravityReading {
  at: Date | string;
  sg: number;
}

export interface FgStabilityOptions {
  /** Readings before this many days after pitching are not used to judge FG. Default 12. */
  firstCheckDay?: number;
  /** The two agreeing readings must be at least this many days apart. Default 2. */
  minSpanDays?: number;
  /** How close the readings must be. Default 0.001. */
  toleranceSg?: number;
  /** The moment of judging, for the "days since pitching" wording; defaults to the latest reading. */
  now?: Date | string;
}

export type FgState = 'too-early' | 'moving' | 'stable';

export interface FgStability {
  state: FgState;
  reason: string;
  /** Days from pitching to `now` (or to the latest reading). */
  daysSincePitch: number;
  /** The latest reading's gravity, when there is one. */
  latestSg: number | null;
}

export const FG_FIRST_CHECK_DAY = 12;
export const FG_MIN_SPAN_DAYS = 2;
export const FG_TOLERANCE_SG = 0.001;

function timeOf(at: Date | string, field: string, label: string): number {
  const ms = at instanceof Date ? at.getTime() : typeof at === 'string' ? Date.parse(at) : Number.NaN;
  if (!Number.isFinite(ms)) {
    throw new BrewMathError(`${label} has no valid date and time.`, 'not-a-number', field);
  }
  return ms;
}

function days(value: number): string {
  return `${show(value, 1)} ${value === 1 ? 'day' : 'days'}`;
}

export function fgStability(
  readings: readonly GravityReading[],
  pitchedAt: Date | string,
  options: FgStabilityOptions = {},
): FgStability {
  const pitchMs = timeOf(pitchedAt, 'pitchedAt', 'The pitching time');
  const firstCheckDay = requireRange(options.firstCheckDay ?? FG_FIRST_CHECK_DAY, 0, 60, 'firstCheckDay', 'First check day', 'days');
  const minSpanDays = requireRange(options.minSpanDays ?? FG_MIN_SPAN_DAYS, 0.5, 14, 'minSpanDays', 'Days between readings', 'days');
  const tolerance = requireRange(options.toleranceSg ?? FG_TOLERANCE_SG, 0, 0.01, 'toleranceSg', 'Tolerance', '');
  if (!Array.isArray(readings)) {
    throw new BrewMathError('Readings must be a list.', 'inconsistent', 'readings');
  }

  const parsed: { ms: number; sg: number }[] = [];
  let latestMs = Number.NEGATIVE_INFINITY;
  let latestSg: number | null = null;
  for (let i = 0; i < readings.length; i++) {
    const r = readings[i];
    const ms = timeOf(r?.at, 'readings', `Reading ${i + 1}`);
    requireSg(r.sg, 'readings', `Reading ${i + 1}`);
    if (ms >= latestMs) {
      latestMs = ms;
      latestSg = r.sg;
    }
    if (ms >= pitchMs + firstCheckDay * DAY_MS) parsed.push({ ms, sg: r.sg });
  }
  const nowMs = options.now !== undefined ? timeOf(options.now, 'now', 'The current time') : Math.max(latestMs, pitchMs);
  const daysSincePitch = (nowMs - pitchMs) / DAY_MS;
  const result = (state: FgState, reason: string): FgStability => ({ state, reason, daysSincePitch, latestSg });

  if (parsed.length === 0) {
    if (daysSincePitch < firstCheckDay) {
      return result(
        'too-early',
        `Day ${Math.floor(Math.max(daysSincePitch, 0))} since pitching. Start checking gravity around day ${show(firstCheckDay)}.`,
      );
    }
    return result('too-early', `No reading since day ${show(firstCheckDay)}. Take one now and another in ${days(minSpanDays)}.`);
  }

  parsed.sort((a, b) => a.ms - b.ms);
  const last = parsed[parsed.length - 1];
  // The most recent reading that is far enough before the last one to count as a pair.
  let ref = -1;
  for (let i = parsed.length - 2; i >= 0; i--) {
    if (last.ms - parsed[i].ms >= minSpanDays * DAY_MS) {
      ref = i;
      break;
    }
  }
  if (ref < 0) {
    const waitDays = minSpanDays - (last.ms - parsed[0].ms) / DAY_MS;
    return result(
      'too-early',
      `Only one reading since day ${show(firstCheckDay)} (or none ${days(minSpanDays)} apart). Read again in ${days(Math.max(waitDays, 0))}.`,
    );
  }
  // Every reading from the reference to the last must agree, so one lucky pair around a dip does not count.
  let worst = 0;
  for (let i = ref; i < parsed.length - 1; i++) {
    const d = Math.abs(parsed[i].sg - last.sg);
    if (d > worst) worst = d;
  }
  const spanDays = (last.ms - parsed[ref].ms) / DAY_MS;
  if (worst > tolerance + 1e-9) {
    const change = last.sg - parsed[ref].sg;
    const direction = change < 0 ? `dropped ${showSg(-change)}` : change > 0 ? `rose ${showSg(change)}` : `varied by ${showSg(worst)}`;
    return result(
      'moving',
      `Gravity ${direction} over ${days(spanDays)}: fermentation is still going. Do not package yet; read again in ${days(minSpanDays)}.`,
    );
  }
  return result(
    'stable',
    `Readings ${days(spanDays)} apart agree at ${showSg(last.sg)} (within ${showSg(tolerance)}): final gravity is stable.`,
  );
}
