import { describe, expect, it } from 'vitest';
import { predictBoilBalance, runBoilCheck, type BoilCheckInput } from './index';

/**
 * Worked example, by hand from the published formulas (Tinseth 1997 for bitterness, Morey for
 * colour) and the gravity points × litres balance.
 *
 * 26 L of hot wort reading 1.060 (hydrometer at its 20 °C calibration temperature), 10 minutes
 * left, boil-off 4 L/h, cooling shrinkage 4 %, recipe OG 1.050.
 * - End of boil: 26 − 4 × 10/60 = 25.333 L hot, × 0.96 = 24.32 L cold.
 * - Extract: 60 points × 26 L × 0.96 = 1497.6 points·L; as is 1497.6 / 24.32 = 61.579 points (1.0616).
 * - Water to reach 1.050: 1497.6 / 50 = 29.952 L, i.e. 5.632 L of water.
 * Hops: 30 g of 10 % boiled 60 minutes (already in), 20 g of 5 % at 5 minutes (still to go in).
 * - Boil gravity (Tinseth's average): (1.060 + 1.061579) / 2 = 1.060789.
 *   bigness 1.65 × 0.000125^0.060789 = 1.65 × 0.579073 = 0.955470 (hand: e^(0.060789 × ln 0.000125) = e^(−0.546327))
 *   60 min: × 0.219104 → U 0.209347; 0.10 × 30 000 / 24.32 = 123.355 mg/L → 25.824 IBU
 *   5 min:  × 0.043679 → U 0.041734; 0.05 × 20 000 / 24.32 = 41.118 mg/L  → 1.716 IBU
 *   as is: 27.54 IBU.
 * - Water goes in after the hops have worked, so it only dilutes: × 24.32 / 29.952 = × 0.811966
 *   (the same proportion as the gravity points, 50 / 61.579): 27.54 × 0.811966 = 22.36 IBU.
 * Grist: 5 kg of 3 °L and 0.3 kg of 80 °L: 11.0231 × 3 + 0.661387 × 80 = 33.0693 + 52.9110 = 85.980 lb·°L.
 * - As is: 24.32 L = 6.42464 gal; MCU 13.3828; 13.3828^0.6859 = 5.92512; × 1.4922 = 8.842 SRM.
 * - With water: 29.952 L = 7.91248 gal; MCU 10.8664; 10.8664^0.6859 = 5.13632; × 1.4922 = 7.664 SRM.
 */
const strong: BoilCheckInput = {
  reading: { kind: 'hydrometer', sg: 1.06, sampleTempC: 20, calibrationTempC: 20 },
  volumeL: 26,
  minutesLeft: 10,
  boilOffLPerHour: 4,
  targetSg: 1.05,
  coolingShrinkage: 0.04,
};
const recipe = {
  hops: [
    { amountG: 30, minutes: 60, alphaAcidPercent: 10 },
    { amountG: 20, minutes: 5, alphaAcidPercent: 5 },
  ],
  grist: [
    { amountKg: 5, colourLovibond: 3 },
    { amountKg: 0.3, colourLovibond: 80 },
  ],
  targetIbu: 25,
  targetColourSrm: 8,
};

describe('predictBoilBalance: bitterness and colour of each late-boil option (worked by hand)', () => {
  const outcome = runBoilCheck(strong);
  const balance = predictBoilBalance(strong, outcome, recipe)!;
  const water = outcome.result.options.findIndex((o) => o.kind === 'water' && o.feasible);

  it('as is: 27.54 IBU and 8.84 SRM, with deviations from the targets', () => {
    expect(outcome.currentSg).toBeCloseTo(1.06, 6);
    expect(balance.asIs.ibu).toBeCloseTo(27.54, 1);
    expect(balance.asIs.colourSrm).toBeCloseTo(8.842, 2);
    expect(balance.asIs.ibuDeviation).toBeCloseTo(2.54, 1);
    expect(balance.asIs.colourDeviationSrm).toBeCloseTo(0.842, 2);
  });

  it('adding water dilutes bitterness by 24.32 / 29.952 and lightens the colour', () => {
    expect(water).toBeGreaterThan(-1);
    const w = balance.options[water]!;
    expect(w.ibu).toBeCloseTo(22.36, 1);
    expect(w.ibu! / balance.asIs.ibu!).toBeCloseTo(0.811966, 6);
    expect(w.colourSrm).toBeCloseTo(7.664, 2);
  });

  it('boiling longer raises the bitterness of hops already in and darkens; extract lowers bitterness and adds colour', () => {
    // The low worked example of index.test.ts: 11.4 °Bx (1.0440) in 26 L, short of 1.050; no recipe volume, so boiling on is allowed.
    const low: BoilCheckInput = { ...strong, reading: { kind: 'refractometer', brix: 11.4, wcf: 1.04 } };
    const lowOutcome = runBoilCheck(low);
    const lowBalance = predictBoilBalance(low, lowOutcome, recipe)!;
    const longer = lowOutcome.result.options.findIndex((o) => o.kind === 'boil-longer' && o.feasible);
    const dme = lowOutcome.result.options.findIndex((o) => o.kind === 'extract' && o.extract === 'dme' && o.feasible);
    const sugar = lowOutcome.result.options.findIndex((o) => o.kind === 'extract' && o.extract === 'sucrose' && o.feasible);
    expect(lowBalance.options[longer]!.ibu!).toBeGreaterThan(lowBalance.asIs.ibu!);
    expect(lowBalance.options[longer]!.colourSrm!).toBeGreaterThan(lowBalance.asIs.colourSrm!);
    expect(lowBalance.options[dme]!.ibu!).toBeLessThan(lowBalance.asIs.ibu!);
    expect(lowBalance.options[dme]!.colourSrm!).toBeGreaterThan(lowBalance.options[sugar]!.colourSrm!);
  });

  it('no hops: no bitterness, and unknown malt colour: no colour; no recipe data at all: nothing', () => {
    const none = predictBoilBalance(strong, outcome, { hops: [], grist: [{ amountKg: 5, colourLovibond: null }], targetIbu: 20 })!;
    expect(none.asIs).toEqual({ ibu: null, colourSrm: null, ibuDeviation: null, colourDeviationSrm: null });
    expect(predictBoilBalance(strong, outcome, {})).toBeNull();
    expect(predictBoilBalance(strong, outcome, undefined)).toBeNull();
  });

  it('infeasible options have no figures', () => {
    outcome.result.options.forEach((o, i) => {
      if (!o.feasible) expect(balance.options[i]).toBeNull();
    });
  });
});

describe('predictBoilBalance with kettle losses', () => {
  // Trub and dead space hold back wort at the same concentration as the rest (common practice,
  // no source): 2 L left in the kettle changes the volume into the fermenter, not the IBU or SRM.
  // The figures are the hand-worked ones above (27.54 IBU and 8.842 SRM as is, 22.36 IBU with water).
  const withLosses: BoilCheckInput = { ...strong, kettleLossL: 2 };
  const outcome = runBoilCheck(withLosses);
  const balance = predictBoilBalance(withLosses, outcome, recipe)!;

  it('keeps the as-is bitterness and colour of the same wort without losses', () => {
    expect(outcome.result.projected.fermenterVolumeL).toBeCloseTo(24.32 - 2, 2);
    expect(balance.asIs.ibu).toBeCloseTo(27.54, 1);
    expect(balance.asIs.colourSrm).toBeCloseTo(8.842, 2);
  });

  it('dilutes by the same proportion when water is added', () => {
    const water = outcome.result.options.findIndex((o) => o.kind === 'water' && o.feasible);
    expect(water).toBeGreaterThan(-1);
    expect(balance.options[water]!.ibu).toBeCloseTo(22.36, 1);
  });
});
