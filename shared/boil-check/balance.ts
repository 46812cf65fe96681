/**
 * Bitterness and colour at the end of the boil for each late-boil option, from the recipe's hop
 * schedule and grist (the brew day's snapshot). Pure and shared: the options panel shows these
 * figures and the server recomputes them with a decision. Model
 * (docs/decisions/0017-bitterness-colour-and-recipe-history.md):
 * - Bitterness: Tinseth (shared/brewmath/bitterness.ts) over the hop schedule, in the option's
 *   volume into the fermenter, at the average of the gravity now and the option's end gravity.
 *   Water is added at the end of the boil or in the fermenter, after the hops have done their
 *   work, so it only dilutes: bitterness × (volume as is / volume with water). Extract dissolved
 *   now raises the gravity (lower utilisation) and the volume. Boiling longer gives every hop
 *   already in the kettle (scheduled earlier than the minutes left) that many more minutes; later
 *   additions keep their minutes before the new end of the boil.
 * - Colour: Morey (shared/brewmath/colour.ts) on the grist's malt colour units in the option's
 *   volume, plus the extract's own colour rating. Boiling longer concentrates the colour; the
 *   extra darkening of a longer boil itself is not modelled.
 */
import { BrewMathError, ibuTinseth, moreySrmFromMcu, type ExtractKind } from '../brewmath';
import { maltColourUnits } from '../brewmath/colour';
import type { BoilCheckInput, BoilCheckOutcome } from './check';

/**
 * Colour of light extracts and sugars in °L (common practice, no source: light dry and liquid malt
 * extracts are sold at about 3 to 8 °L; white sugar and dextrose add no colour).
 */
export const EXTRACT_COLOUR_LOVIBOND: Readonly<Record<ExtractKind, number>> = { dme: 4, lme: 5, sucrose: 0, dextrose: 0 };

export interface BalanceRecipe {
  hops?: readonly { amountG: number; minutes: number; alphaAcidPercent: number }[];
  grist?: readonly { amountKg: number; colourLovibond: number | null }[];
  targetIbu?: number | null;
  targetColourSrm?: number | null;
}

export interface OptionBalance {
  /** Null with no hops. */
  ibu: number | null;
  /** Null while any malt's colour is unknown. */
  colourSrm: number | null;
  /** Predicted minus target; null without a target or a prediction. */
  ibuDeviation: number | null;
  colourDeviationSrm: number | null;
}

export interface BoilBalance {
  asIs: OptionBalance;
  /** Same order as outcome.result.options; null for an option that cannot be done. */
  options: (OptionBalance | null)[];
  /** What the figures assume beyond the formulas (e.g. flame-out hops). */
  assumptions: string[];
}

interface EndOf {
  endSg: number;
  /**
   * The cooled wort the bitterness and colour are dissolved in, before kettle losses: trub and
   * dead space take wort away at the same concentration, so they change the volume into the
   * fermenter, not its IBU or SRM.
   */
  wortVolumeL: number;
  extraMinutes: number;
  extract?: { kind: ExtractKind; kg: number };
  /** For water: the as-is end gravity the hops boiled at. */
  boilEndSg: number;
}

function deviation(value: number | null, target: number | null | undefined): number | null {
  return value === null || target === null || target === undefined ? null : value - target;
}

/**
 * Bitterness and colour for the as-is state and every option of a late-boil check. Returns null
 * when the recipe gives neither hops nor grist (a brew day started before these were kept).
 */
export function predictBoilBalance(input: Pick<BoilCheckInput, 'minutesLeft'>, outcome: BoilCheckOutcome, recipe: BalanceRecipe | undefined | null): BoilBalance | null {
  const hops = recipe?.hops ?? [];
  const grist = recipe?.grist ?? [];
  if (hops.length === 0 && grist.length === 0) return null;
  const colourKnown = grist.length > 0 && grist.every((g) => g.colourLovibond !== null);
  const assumptions = new Set<string>();

  const predict = (end: EndOf): OptionBalance => {
    let ibu: number | null = null;
    if (hops.length > 0) {
      const estimate = ibuTinseth({
        hops: hops.map((h) => ({
          alphaAcidPercent: h.alphaAcidPercent,
          massG: h.amountG,
          boilMinutes: h.minutes > input.minutesLeft ? h.minutes + end.extraMinutes : h.minutes,
        })),
        boilSg: (outcome.currentSg + end.boilEndSg) / 2,
        volumeL: end.wortVolumeL,
      });
      estimate.assumptions.forEach((a) => assumptions.add(a));
      ibu = estimate.ibu;
    }
    let colourSrm: number | null = null;
    if (colourKnown) {
      let mcu = maltColourUnits(
        grist.map((g) => ({ massKg: g.amountKg, colourLovibond: g.colourLovibond! })),
        end.wortVolumeL,
      );
      if (end.extract) mcu += maltColourUnits([{ massKg: end.extract.kg, colourLovibond: EXTRACT_COLOUR_LOVIBOND[end.extract.kind] }], end.wortVolumeL);
      colourSrm = moreySrmFromMcu(mcu);
    }
    return { ibu, colourSrm, ibuDeviation: deviation(ibu, recipe?.targetIbu), colourDeviationSrm: deviation(colourSrm, recipe?.targetColourSrm) };
  };

  try {
    const { projected } = outcome.result;
    const asIs = predict({ endSg: projected.endSg, boilEndSg: projected.endSg, wortVolumeL: projected.cooledVolumeL, extraMinutes: 0 });
    const options = outcome.result.options.map((o) => {
      if (!o.feasible) return null;
      if (o.kind === 'extract') return predict({ endSg: o.endSg, boilEndSg: o.endSg, wortVolumeL: o.cooledVolumeL, extraMinutes: 0, extract: { kind: o.extract, kg: o.kg } });
      if (o.kind === 'water') return predict({ endSg: o.endSg, boilEndSg: projected.endSg, wortVolumeL: o.cooledVolumeL, extraMinutes: 0 });
      if (o.kind === 'boil-longer') return predict({ endSg: o.endSg, boilEndSg: o.endSg, wortVolumeL: o.cooledVolumeL, extraMinutes: o.extraMinutes });
      return asIs;
    });
    return { asIs, options, assumptions: [...assumptions] };
  } catch (error) {
    // A recipe snapshot the math refuses (it was validated when saved) gives no figures rather than no check.
    if (error instanceof BrewMathError) return null;
    throw error;
  }
}
