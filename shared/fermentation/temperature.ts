/**
 * Fermenter temperature at a glance: the range over the last 24 hours and over the whole
 * fermentation, and every reading outside the recipe's range. A steady temperature matters more
 * than almost anything else in fermentation (common practice, no source).
 */
import type { TemperatureExcursion, TemperatureRange, TemperatureSummary } from '../schemas/fermentation';
import { DAY_MS } from '../dates';

export interface TemperaturePoint {
  id?: number | null;
  takenAt: Date | string;
  /** Corrected, °C. */
  tempC: number;
}

/** A move of more than this within 24 hours is worth a look (common practice, no source). */
export const SWING_FLAG_C = 3;

const ms = (at: Date | string) => (at instanceof Date ? at.getTime() : Date.parse(at));
const iso = (t: number) => new Date(t).toISOString();

function rangeOf(points: { t: number; c: number }[]): TemperatureRange | null {
  if (points.length === 0) return null;
  let minC = Infinity;
  let maxC = -Infinity;
  for (const p of points) {
    if (p.c < minC) minC = p.c;
    if (p.c > maxC) maxC = p.c;
  }
  return { minC, maxC, count: points.length, from: iso(points[0].t), to: iso(points[points.length - 1].t) };
}

export function temperatureSummary(
  readings: readonly TemperaturePoint[],
  target: { minC: number; maxC: number } | null,
  now: Date | string,
): TemperatureSummary {
  const nowMs = ms(now);
  const points = readings.map((r) => ({ id: r.id ?? null, t: ms(r.takenAt), c: r.tempC })).sort((a, b) => a.t - b.t);
  const last24 = points.filter((p) => p.t > nowMs - DAY_MS && p.t <= nowMs);
  const excursions: TemperatureExcursion[] = [];
  if (target) {
    for (const p of points) {
      if (p.c > target.maxC) excursions.push({ readingId: p.id, takenAt: iso(p.t), tempC: p.c, direction: 'warm', byC: p.c - target.maxC });
      else if (p.c < target.minC) excursions.push({ readingId: p.id, takenAt: iso(p.t), tempC: p.c, direction: 'cold', byC: target.minC - p.c });
    }
  }
  // The largest move inside any 24-hour window: monotonic queues of the window's min and max.
  let largest: number | null = null;
  const lows: number[] = [];
  const highs: number[] = [];
  let start = 0;
  for (let end = 0; end < points.length; end++) {
    const c = points[end].c;
    while (lows.length && points[lows[lows.length - 1]].c >= c) lows.pop();
    lows.push(end);
    while (highs.length && points[highs[highs.length - 1]].c <= c) highs.pop();
    highs.push(end);
    while (points[end].t - points[start].t > DAY_MS) start++;
    while (lows[0] < start) lows.shift();
    while (highs[0] < start) highs.shift();
    if (end > start) {
      const swing = points[highs[0]].c - points[lows[0]].c;
      if (largest === null || swing > largest) largest = swing;
    }
  }
  const latest = points.length ? points[points.length - 1] : null;
  return {
    target,
    last24h: rangeOf(last24),
    overall: rangeOf(points),
    latest: latest ? { takenAt: iso(latest.t), tempC: latest.c } : null,
    excursions,
    excursionCount: excursions.length,
    largestSwing24hC: largest,
    swingFlagged: largest !== null && largest > SWING_FLAG_C,
  };
}
