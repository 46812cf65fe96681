/**
 * Kettle souring: the wort is held before the boil until its pH falls to the recipe's souring
 * target. Common practice, no source: about pH 3.2 to 3.6 before the boil; "reached" means at or
 * below the target, read to a pH meter's 0.01 resolution.
 */

/** Common practice, no source: where kettle sours usually stop before the boil. */
export const SOURING_PH_BAND = { min: 3.2, max: 3.6 } as const;

export interface SouringReadingIn {
  id: number;
  /** Corrected pH. */
  ph: number;
  /** ISO date-time. */
  takenAt: string;
}

export interface SouringStep {
  id: number;
  ph: number;
  takenAt: string;
  /** Hours since the first souring reading (by time taken, not by order given). */
  hoursSinceFirst: number;
  /** At or below the target pH. */
  reached: boolean;
}

/** Whether a pH reading has reached the target: at or below it, compared at 0.01 pH so 3.40 meets 3.4. */
export function souringTargetReached(ph: number, targetPh: number): boolean {
  return Math.round(ph * 100) <= Math.round(targetPh * 100);
}

/** Each souring reading in time order, with the hours since the first one and whether it reached the target. */
export function souringProgress(readings: readonly SouringReadingIn[], targetPh: number): SouringStep[] {
  const sorted = [...readings].sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt) || a.id - b.id);
  const first = sorted.length > 0 ? Date.parse(sorted[0].takenAt) : 0;
  return sorted.map((r) => ({
    id: r.id,
    ph: r.ph,
    takenAt: r.takenAt,
    hoursSinceFirst: (Date.parse(r.takenAt) - first) / 3_600_000,
    reached: souringTargetReached(r.ph, targetPh),
  }));
}
