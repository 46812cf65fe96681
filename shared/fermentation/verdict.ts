/**
 * Is the beer finished? The verdict wraps `fgStability` (shared/brewmath/fermentation.ts) with
 * one more rule: an alcohol-corrected refractometer reading is an estimate, so it may show that
 * fermentation is still moving but never that it has stopped. Only hydrometer readings can make
 * the verdict "stable" (or "stuck": steady, but well above where the recipe should finish).
 * Common practice, no source.
 */
import { FG_FIRST_CHECK_DAY, FG_MIN_SPAN_DAYS, fgStability, type FgStability } from '../brewmath';
import type { FermentationVerdict } from '../schemas/fermentation';
import { DAY_MS } from '../dates';

export interface VerdictReading {
  takenAt: Date | string;
  /** Corrected SG. */
  sg: number;
  /** An alcohol-corrected refractometer estimate. */
  estimate: boolean;
  /** The hydrometer's scale step (from its profile); default 0.001. */
  resolutionSg?: number | null;
}

export interface VerdictOptions {
  /** Where the recipe should finish (see expectedFinalGravity); null skips the stuck check. */
  expectedFgSg?: number | null;
}

const ms = (at: Date | string) => (at instanceof Date ? at.getTime() : Date.parse(at));

export function fermentationVerdict(
  readings: readonly VerdictReading[],
  pitchedAt: Date | string,
  now: Date | string,
  options: VerdictOptions = {},
): FermentationVerdict {
  const pitchMs = ms(pitchedAt);
  const nowMs = ms(now);
  const measured = readings.filter((r) => !r.estimate).map((r) => ({ at: r.takenAt, sg: r.sg, resolutionSg: r.resolutionSg ?? null }));
  const estimates = readings.filter((r) => r.estimate).map((r) => ({ at: r.takenAt, sg: r.sg }));
  const expectedFgSg = options.expectedFgSg ?? null;
  const hydrometer = fgStability(measured, pitchedAt, { now, expectedFgSg });
  const latestSg = latestOf(readings);
  const firstCheckMs = pitchMs + FG_FIRST_CHECK_DAY * DAY_MS;
  const after = (list: { at: Date | string }[]) => list.map((r) => ms(r.at)).filter((t) => t >= firstCheckMs).sort((a, b) => a - b);

  const verdict = (state: FgStability['state'], reason: string, needsHydrometer: boolean, nextCheckMs: number | null): FermentationVerdict => ({
    state,
    reason,
    needsHydrometer,
    daysSincePitch: (nowMs - pitchMs) / DAY_MS,
    latestSg,
    nextCheckAt: nextCheckMs === null ? null : new Date(nextCheckMs).toISOString(),
  });

  if (hydrometer.state === 'stable') return verdict('stable', hydrometer.reason, false, null);
  if (hydrometer.state === 'stuck') {
    const stuckAfter = after(measured);
    return verdict('stuck', hydrometer.reason, false, stuckAfter[stuckAfter.length - 1] + FG_MIN_SPAN_DAYS * DAY_MS);
  }

  const measuredAfter = after(measured);
  const lastMeasured = measuredAfter.length ? measuredAfter[measuredAfter.length - 1] : null;
  if (hydrometer.state === 'moving') {
    return verdict('moving', hydrometer.reason, false, (lastMeasured ?? nowMs) + FG_MIN_SPAN_DAYS * DAY_MS);
  }

  // The hydrometer alone cannot tell yet. Estimates can still show the beer is moving.
  if (estimates.length > 0) {
    // Estimates are too rough to call stuck or stable; only "still moving" is taken from them.
    const estimated = fgStability(estimates, pitchedAt, { now });
    const estimatesAfter = after(estimates);
    const lastEstimate = estimatesAfter.length ? estimatesAfter[estimatesAfter.length - 1] : null;
    if (estimated.state === 'moving') {
      return verdict('moving', `Refractometer estimates: ${lowerFirst(estimated.reason)}`, false, (lastEstimate ?? nowMs) + FG_MIN_SPAN_DAYS * DAY_MS);
    }
    if (estimated.state === 'stable') {
      const nextMs = lastMeasured === null ? nowMs : Math.max(nowMs, lastMeasured + FG_MIN_SPAN_DAYS * DAY_MS);
      return verdict(
        lastMeasured === null ? 'no-reading' : 'too-early',
        `Refractometer estimates have stopped moving, but an alcohol-corrected estimate cannot prove final gravity. Take a hydrometer reading${
          lastMeasured === null ? ' now and another in 2 days' : ''
        } before you package.`,
        true,
        nextMs,
      );
    }
  }

  let nextMs: number;
  if (nowMs < firstCheckMs) nextMs = firstCheckMs;
  else if (lastMeasured === null) nextMs = nowMs;
  else nextMs = lastMeasured + FG_MIN_SPAN_DAYS * DAY_MS;
  // Estimates after the first check day were taken as FG checks: say why they were not counted.
  const estimatesIgnored = after(estimates).length > 0;
  return verdict(
    hydrometer.state,
    estimatesIgnored ? `${hydrometer.reason} Refractometer estimates do not count towards a stable final gravity: use a hydrometer.` : hydrometer.reason,
    estimatesIgnored,
    nextMs,
  );
}

function latestOf(readings: readonly VerdictReading[]): number | null {
  let best: VerdictReading | null = null;
  for (const r of readings) if (!best || ms(r.takenAt) >= ms(best.takenAt)) best = r;
  return best ? best.sg : null;
}

function lowerFirst(text: string) {
  return text.charAt(0).toLowerCase() + text.slice(1);
}
