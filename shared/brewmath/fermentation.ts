import { BrewMathError } from './errors';
import { requireRange, requireSg, show, showSg } from './validate';
import { DAY_MS } from '../dates';

/**
 * When is fermentation finished? Common practice, no source: time alone proves nothing; start
 * checking around day 12, and call FG stable only when the last two hydrometer readings, at least
 * two days apart, are the same figure at the hydrometer's resolution (readings closer than half a
 * scale step are the same), and the readings before them show no steady fall of more than about a
 * quarter point a day. A gravity that is steady but well above where the recipe should finish is a
 * stuck fermentation, not a finished one: each further point fermented in a capped bottle adds
 * roughly half a volume of CO2.
 */
export interface GravityReading {
  at: Date | string;
  sg: number;
  /** The smallest scale step of the hydrometer that gave this reading; defaults to options.resolutionSg. */
  resolutionSg?: number | null;
}

export interface FgStabilityOptions {
  /** Readings before this many days after pitching are not used to judge FG. Default 12. */
  firstCheckDay?: number;
  /** The two compared readings must be at least this many days apart. Default 2. */
  minSpanDays?: number;
  /** The hydrometer's scale step when a reading does not name its own. Default 0.001. */
  resolutionSg?: number;
  /** A fall faster than this over three or more readings is still fermenting. Default 0.00025 per day. */
  trendLimitSgPerDay?: number;
  /** Where the recipe should finish; null or absent skips the stuck check. */
  expectedFgSg?: number | null;
  /** Steady this far above the expected FG counts as stuck. Default 0.004. */
  stuckMarginSg?: number;
  /** The moment of judging, for the "days since pitching" wording; defaults to the latest reading. */
  now?: Date | string;
}

export type FgState = 'no-reading' | 'too-early' | 'moving' | 'stuck' | 'stable';
export const fgStates = ['no-reading', 'too-early', 'moving', 'stuck', 'stable'] as const satisfies readonly FgState[];

export interface ComparedReading {
  sg: number;
  /** Days after pitching. */
  day: number;
}

export interface FgStability {
  state: FgState;
  reason: string;
  /** Days from pitching to `now` (or to the latest reading). */
  daysSincePitch: number;
  /** The latest reading's gravity, when there is one. */
  latestSg: number | null;
  /** The two readings the verdict compared, earlier first; null when there was no pair. */
  compared: [ComparedReading, ComparedReading] | null;
}

export const FG_FIRST_CHECK_DAY = 12;
export const FG_MIN_SPAN_DAYS = 2;
export const FG_RESOLUTION_SG = 0.001;
/** A quarter of a gravity point (0.001) per day: common practice, no source. */
export const FG_TREND_LIMIT_SG_PER_DAY = 0.00025;
/** Four points above the recipe's FG: common practice, no source. */
export const FG_STUCK_MARGIN_SG = 0.004;

const EPS = 1e-9;

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

/** Where a recipe should finish: its FG when set, else its OG and the yeast's apparent attenuation (a fraction). */
export function expectedFinalGravity(input: { fgSg?: number | null; ogSg?: number | null; attenuation?: number | null }): number | null {
  if (typeof input.fgSg === 'number' && Number.isFinite(input.fgSg)) return input.fgSg;
  const { ogSg, attenuation } = input;
  if (typeof ogSg === 'number' && Number.isFinite(ogSg) && typeof attenuation === 'number' && attenuation > 0 && attenuation < 1) {
    // Apparent attenuation = (OG − FG) / (OG − 1), so FG = 1 + (OG − 1)(1 − attenuation).
    return 1 + (ogSg - 1) * (1 - attenuation);
  }
  return null;
}

/** Least-squares slope, SG per day. */
function slopePerDay(points: readonly { ms: number; sg: number }[]): number {
  const n = points.length;
  let mx = 0;
  let my = 0;
  for (const p of points) {
    mx += p.ms / DAY_MS / n;
    my += p.sg / n;
  }
  let sxy = 0;
  let sxx = 0;
  for (const p of points) {
    const dx = p.ms / DAY_MS - mx;
    sxy += dx * (p.sg - my);
    sxx += dx * dx;
  }
  return sxx === 0 ? 0 : sxy / sxx;
}

export function fgStability(readings: readonly GravityReading[], pitchedAt: Date | string, options: FgStabilityOptions = {}): FgStability {
  const pitchMs = timeOf(pitchedAt, 'pitchedAt', 'The pitching time');
  const firstCheckDay = requireRange(options.firstCheckDay ?? FG_FIRST_CHECK_DAY, 0, 60, 'firstCheckDay', 'First check day', 'days');
  const minSpanDays = requireRange(options.minSpanDays ?? FG_MIN_SPAN_DAYS, 0.5, 14, 'minSpanDays', 'Days between readings', 'days');
  const defaultResolution = requireRange(options.resolutionSg ?? FG_RESOLUTION_SG, 0.0001, 0.01, 'resolutionSg', 'Hydrometer resolution', '');
  const trendLimit = requireRange(options.trendLimitSgPerDay ?? FG_TREND_LIMIT_SG_PER_DAY, 0, 0.01, 'trendLimitSgPerDay', 'Trend limit', '');
  const stuckMargin = requireRange(options.stuckMarginSg ?? FG_STUCK_MARGIN_SG, 0, 0.05, 'stuckMarginSg', 'Stuck margin', '');
  const expectedFg = options.expectedFgSg ?? null;
  if (expectedFg !== null) requireSg(expectedFg, 'expectedFgSg', 'Expected final gravity');
  if (!Array.isArray(readings)) {
    throw new BrewMathError('Readings must be a list.', 'inconsistent', 'readings');
  }

  const parsed: { ms: number; sg: number; resolution: number }[] = [];
  let latestMs = Number.NEGATIVE_INFINITY;
  let latestSg: number | null = null;
  for (let i = 0; i < readings.length; i++) {
    const r = readings[i];
    const ms = timeOf(r?.at, 'readings', `Reading ${i + 1}`);
    requireSg(r.sg, 'readings', `Reading ${i + 1}`);
    const resolution =
      r.resolutionSg === undefined || r.resolutionSg === null
        ? defaultResolution
        : requireRange(r.resolutionSg, 0.0001, 0.01, 'resolutionSg', `Reading ${i + 1}'s hydrometer resolution`, '');
    if (ms >= latestMs) {
      latestMs = ms;
      latestSg = r.sg;
    }
    if (ms >= pitchMs + firstCheckDay * DAY_MS) parsed.push({ ms, sg: r.sg, resolution });
  }
  const nowMs = options.now !== undefined ? timeOf(options.now, 'now', 'The current time') : Math.max(latestMs, pitchMs);
  const daysSincePitch = (nowMs - pitchMs) / DAY_MS;
  const dayOf = (ms: number) => (ms - pitchMs) / DAY_MS;
  const dayWord = (ms: number) => `day ${Math.floor(dayOf(ms) + EPS)}`;
  const at = (p: { ms: number; sg: number }) => `${showSg(p.sg)} on ${dayWord(p.ms)}`;
  const result = (state: FgState, reason: string, pair: [{ ms: number; sg: number }, { ms: number; sg: number }] | null = null): FgStability => ({
    state,
    reason,
    daysSincePitch,
    latestSg,
    compared: pair ? [{ sg: pair[0].sg, day: dayOf(pair[0].ms) }, { sg: pair[1].sg, day: dayOf(pair[1].ms) }] : null,
  });

  if (parsed.length === 0) {
    if (daysSincePitch < firstCheckDay) {
      return result(
        'too-early',
        `Day ${Math.floor(Math.max(daysSincePitch, 0))} since pitching. Start checking gravity around day ${show(firstCheckDay)}.`,
      );
    }
    return result('no-reading', `No hydrometer reading since day ${show(firstCheckDay)} yet. Take one now and another in ${days(minSpanDays)}.`);
  }

  parsed.sort((a, b) => a.ms - b.ms);
  const last = parsed[parsed.length - 1];
  // The most recent reading that is far enough before the last one to count as a pair.
  let ref = -1;
  for (let i = parsed.length - 2; i >= 0; i--) {
    if (last.ms - parsed[i].ms >= minSpanDays * DAY_MS - EPS) {
      ref = i;
      break;
    }
  }
  if (ref < 0) {
    const readAgainDay = Math.ceil(dayOf(parsed[0].ms + minSpanDays * DAY_MS) - EPS);
    const what = parsed.length === 1 ? `One reading since day ${show(firstCheckDay)} so far (${at(last)})` : `No two readings ${days(minSpanDays)} apart yet (latest ${at(last)})`;
    return result('too-early', `${what}. Read again on day ${readAgainDay} or later: the final gravity needs two readings at least ${days(minSpanDays)} apart.`);
  }

  const first = parsed[ref];
  const pair: [typeof first, typeof last] = [first, last];
  const spanDays = (last.ms - first.ms) / DAY_MS;
  const compared = `${at(first)} and ${at(last)}, ${days(spanDays)} apart`;
  const resolution = Math.max(first.resolution, last.resolution);
  const same = (a: number, b: number) => Math.abs(a - b) < resolution / 2 - EPS;
  const again = `Do not package yet; read again in ${days(minSpanDays)}.`;

  if (!same(first.sg, last.sg)) {
    const change = last.sg - first.sg;
    const direction = change < 0 ? `fell by ${showSg(-change)}` : `rose by ${showSg(change)}`;
    return result(
      'moving',
      `${compared}: the gravity ${direction}, more than half this hydrometer's ${showSg(resolution)} scale step, so fermentation is still going. ${again}`,
      pair,
    );
  }

  // A steady fall: the trailing readings each lower than the one before, three or more of them.
  let runStart = parsed.length - 1;
  while (runStart > 0 && parsed[runStart].sg < parsed[runStart - 1].sg - EPS) runStart--;
  const run = parsed.slice(runStart);
  if (run.length >= 3) {
    const slope = slopePerDay(run);
    if (-slope > trendLimit + EPS) {
      return result(
        'moving',
        `${compared}, look the same at this hydrometer's ${showSg(resolution)} scale step, but the gravity fell steadily from ${at(run[0])} to ${at(last)} over ${run.length} readings, about ${show(-slope * 1000, 2)} points a day: fermentation is still going. ${again}`,
        pair,
      );
    }
  }

  // Every reading from the compared pair to the last must agree, so one lucky pair around a dip does not count.
  for (let i = ref + 1; i < parsed.length - 1; i++) {
    if (!same(parsed[i].sg, last.sg)) {
      return result('moving', `${compared}, agree, but ${at(parsed[i])} between them does not: the gravity is not settled. ${again}`, pair);
    }
  }

  if (expectedFg !== null && last.sg - expectedFg > stuckMargin + EPS) {
    return result(
      'stuck',
      `${compared}: steady, but ${showSg(last.sg - expectedFg)} above the ${showSg(expectedFg)} this recipe should finish at. Fermentation looks stuck, not finished: sugar left in the beer can still ferment in the bottle. Rouse or warm the yeast, or pitch fresh yeast, and read again.`,
      pair,
    );
  }

  const equalWords = first.sg === last.sg ? 'the same reading' : `the same at this hydrometer's ${showSg(resolution)} scale step`;
  return result('stable', `${compared}: ${equalWords}. Final gravity is stable.`, pair);
}
