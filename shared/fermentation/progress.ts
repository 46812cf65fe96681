/**
 * Apparent attenuation and ABV of the beer so far, against the recipe's targets. Both ABV
 * formulas come from shared/brewmath/abv.ts and are labelled where they are shown.
 */
import { abvPercent, abvPercentExact, apparentAttenuation, BrewMathError, formatGravity } from '../brewmath';
import type { AbvFigures, FermentationProgress } from '../schemas/fermentation';

export const ABV_SIMPLE_LABEL = 'ABV, simple: (OG − FG) × 131.25';
export const ABV_EXACT_LABEL = 'ABV, from the Balling extract balance (ASBC °Plato)';

export interface ProgressInput {
  /** The brew day's measured OG, or null when none was logged. */
  og: number | null;
  targetOg: number | null;
  targetFg: number | null;
  /** The latest gravity reading, corrected. */
  current: { sg: number; estimate: boolean; takenAt: string } | null;
}

function figures(og: number, fg: number): AbvFigures {
  return { apparentAttenuation: apparentAttenuation(og, fg), abvSimple: abvPercent(og, fg), abvExact: abvPercentExact(og, fg) };
}

export function fermentationProgress({ og, targetOg, targetFg, current }: ProgressInput): FermentationProgress {
  const ogUsed = og ?? targetOg;
  let note: string | null = og === null ? "No OG was logged on the brew day, so these figures use the recipe's target OG." : null;
  let target: FermentationProgress['target'] = null;
  if (targetOg !== null && targetFg !== null && targetOg > 1 && targetFg <= targetOg) {
    target = { og: targetOg, fg: targetFg, ...figures(targetOg, targetFg) };
  }
  let currentFigures: FermentationProgress['current'] = null;
  if (current && ogUsed !== null) {
    try {
      currentFigures = { sg: current.sg, estimate: current.estimate, takenAt: current.takenAt, ...figures(ogUsed, current.sg) };
    } catch (error) {
      if (!(error instanceof BrewMathError)) throw error;
      note = `The latest gravity ${formatGravity(current.sg)} is above the OG ${formatGravity(ogUsed)}: check the readings.`;
    }
  } else if (!current) {
    note = note ?? 'No gravity reading yet.';
  }
  return { og: ogUsed, ogSource: og === null ? 'target' : 'measured', current: currentFigures, target, note };
}
