import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  boilCorrection,
  boilOffRateLPerHour,
  projectBoil,
  type BoilCorrection,
  type BoilCorrectionInput,
  type BoilOption,
} from './boil';
import { BrewMathError } from './errors';
import { EXTRACT_POTENTIALS_POINTS_L_PER_KG, EXTRACT_VOLUME_L_PER_KG } from './extract';
import { allFinite, brewError } from './testing';

function option(result: BoilCorrection, kind: BoilOption['kind'], extract?: string): BoilOption {
  const found = result.options.find((o) => o.kind === kind && (extract === undefined || ('extract' in o && o.extract === extract)));
  if (!found) throw new Error(`no ${kind} option`);
  return found;
}

describe('end-of-boil projection', () => {
  it('conserves gravity points × litres (handbook rule, worked by hand)', () => {
    // 25 L at 1.044 with 15 minutes left at 4 L/h: 1 L boils off, 44 × 25 / 24 = 45.83 points.
    const end = projectBoil({ volumeL: 25, sg: 1.044, minutesLeft: 15, boilOffLPerHour: 4 });
    expect(end.volumeL).toBeCloseTo(24, 12);
    expect(end.sg).toBeCloseTo(1 + (44 * 25) / 24 / 1000, 12);
  });

  it('with nothing left to boil, nothing changes', () => {
    expect(projectBoil({ volumeL: 25, sg: 1.044, minutesLeft: 0, boilOffLPerHour: 4 })).toEqual({ volumeL: 25, sg: 1.044 });
  });

  it('a longer boil always raises gravity (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 100, noNaN: true }),
        fc.double({ min: 1.01, max: 1.1, noNaN: true }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        fc.double({ min: 0.5, max: 8, noNaN: true }),
        (volumeL, sg, minutes, extra, ratePerHourPerTenL) => {
          const boilOffLPerHour = (ratePerHourPerTenL * volumeL) / 100;
          const shorter = projectBoil({ volumeL, sg, minutesLeft: minutes, boilOffLPerHour });
          const longer = projectBoil({ volumeL, sg, minutesLeft: minutes + extra, boilOffLPerHour });
          expect(longer.sg).toBeGreaterThan(shorter.sg);
          expect(longer.volumeL).toBeLessThan(shorter.volumeL);
        },
      ),
    );
  });

  it('rejects a boil-off that would empty the kettle, and negative minutes', () => {
    const empty = brewError(() => projectBoil({ volumeL: 5, sg: 1.05, minutesLeft: 90, boilOffLPerHour: 4 }));
    expect(empty.code).toBe('empties-kettle');
    expect(empty.field).toBe('boilOffLPerHour');
    expect(empty.message).toMatch(/more than the 5 L in the kettle/);
    expect(brewError(() => projectBoil({ volumeL: 5, sg: 1.05, minutesLeft: 70, boilOffLPerHour: 4 })).message).toMatch(/beyond 1.200/);
    expect(brewError(() => projectBoil({ volumeL: 25, sg: 1.05, minutesLeft: -1, boilOffLPerHour: 4 })).field).toBe('minutesLeft');
    expect(brewError(() => projectBoil({ volumeL: 0, sg: 1.05, minutesLeft: 10, boilOffLPerHour: 4 })).field).toBe('volumeL');
    expect(brewError(() => projectBoil({ volumeL: 25, sg: 0.995, minutesLeft: 10, boilOffLPerHour: 4 })).field).toBe('sg');
  });
});

describe('boil-off rate', () => {
  it('is litres lost per hour', () => {
    expect(boilOffRateLPerHour({ startL: 28, endL: 24, minutes: 60 })).toBe(4);
    expect(boilOffRateLPerHour({ startL: 28, endL: 27, minutes: 15 })).toBe(4);
  });

  it('rejects a volume that grew and a zero-length boil', () => {
    expect(brewError(() => boilOffRateLPerHour({ startL: 20, endL: 22, minutes: 60 })).field).toBe('endL');
    expect(brewError(() => boilOffRateLPerHour({ startL: 20, endL: 18, minutes: 0 })).field).toBe('minutes');
  });
});

const shortOfTarget: BoilCorrectionInput = {
  volumeL: 25,
  sg: 1.044,
  minutesLeft: 10,
  boilOffLPerHour: 4,
  targetSg: 1.05,
  targetVolumeL: 21,
  targetFg: 1.012,
};

describe('late-boil correction when the wort is short of target', () => {
  const result = boilCorrection(shortOfTarget);

  it('projects the end state with no action, as projectBoil does, and cools it by 4 %', () => {
    const end = projectBoil(shortOfTarget);
    expect(result.status).toBe('low');
    expect(result.projected.endSg).toBeCloseTo(end.sg, 12);
    expect(result.projected.endVolumeL).toBeCloseTo(end.volumeL, 12);
    expect(result.projected.cooledVolumeL).toBeCloseTo(end.volumeL * 0.96, 12);
    // No kettle losses given: all of it reaches the fermenter.
    expect(result.projected.fermenterVolumeL).toBeCloseTo(end.volumeL * 0.96, 12);
    // The recipe's apparent attenuation, (1.050 − 1.012) / 0.050 = 76 % (worked by hand), is kept:
    // FG = 1 + (endSg − 1) × 0.24, so ABV = (endSg − 1) × 0.76 × 131.25.
    expect(result.projected.abvPercent).toBeCloseTo((end.sg - 1) * 0.76 * 131.25, 12);
    expect(option(result, 'as-is')).toMatchObject({ feasible: true, endSg: result.projected.endSg });
  });

  it('offers each extract, reaching the target, with the extract\'s own volume counted', () => {
    for (const kind of ['dme', 'lme', 'sucrose', 'dextrose'] as const) {
      const o = option(result, 'extract', kind);
      if (o.kind !== 'extract' || !o.feasible) throw new Error(`${kind} should be feasible`);
      expect(o.endSg).toBeCloseTo(1.05, 12);
      expect(o.kg).toBeGreaterThan(0);
      expect(o.fermenterVolumeL).toBeCloseTo(result.projected.fermenterVolumeL + o.kg * EXTRACT_VOLUME_L_PER_KG[kind], 12);
      // At the target OG the recipe's own attenuation gives its own FG back: (1.050 − 1.012) × 131.25.
      expect(o.abvPercent).toBeCloseTo((1.05 - 1.012) * 131.25, 10);
    }
  });

  it("dry extract needed is the handbook rule corrected for the extract's own volume (9.2 % more here, worked by hand)", () => {
    const o = option(result, 'extract', 'dme');
    if (o.kind !== 'extract' || !o.feasible) throw new Error('dme should be feasible');
    // Worked by hand: 25 L − 4 L/h × 10 min = 24.333 L hot, × 0.96 = 23.36 L cold, at 44 × 25 / 24.333
    // = 45.205 points. Handbook rule (points short × litres ÷ potential, ignoring the extract's own
    // volume): 23.36 × (50 − 45.205) / 367 = 0.3052 kg. Counting the 0.62 L/kg the extract adds,
    // which must also reach 50 points: 23.36 × (50 − 45.205) / (367 − 50 × 0.62) = 112.0 / 336 = 0.3333 kg.
    expect(EXTRACT_POTENTIALS_POINTS_L_PER_KG.dme).toBe(367);
    expect(EXTRACT_VOLUME_L_PER_KG.dme).toBe(0.62);
    expect(o.kg).toBeCloseTo(0.3333, 3);
    expect(o.kg / 0.3052 - 1).toBeCloseTo(0.092, 2);
  });

  it('offers boiling longer, leaving at least the recipe volume', () => {
    const o = option(result, 'boil-longer');
    if (o.kind !== 'boil-longer' || !o.feasible) throw new Error('boil-longer should be feasible');
    expect(o.endSg).toBeCloseTo(1.05, 12);
    expect(o.fermenterVolumeL).toBeGreaterThanOrEqual(21);
    // Check by projection: boiling minutesLeft + extraMinutes lands on target.
    const end = projectBoil({ ...shortOfTarget, minutesLeft: shortOfTarget.minutesLeft + o.extraMinutes });
    expect(end.sg).toBeCloseTo(1.05, 10);
  });

  it('says why water cannot help', () => {
    expect(option(result, 'water')).toMatchObject({ feasible: false, code: 'below-target' });
  });

  it('says why boiling on cannot help when it would leave less than the recipe volume', () => {
    const r = boilCorrection({ ...shortOfTarget, targetVolumeL: 23 });
    const o = option(r, 'boil-longer');
    expect(o).toMatchObject({ feasible: false, code: 'below-recipe-volume' });
    if (!o.feasible) expect(o.reason).toMatch(/less than the recipe's 23 L/);
  });

  it('says why boiling on cannot help with no boil-off', () => {
    expect(option(boilCorrection({ ...shortOfTarget, boilOffLPerHour: 0 }), 'boil-longer')).toMatchObject({ feasible: false, code: 'no-boil-off' });
  });

  it('says why boiling on is not offered when it would take more than 90 extra minutes', () => {
    const o = option(boilCorrection({ ...shortOfTarget, boilOffLPerHour: 0.5 }), 'boil-longer');
    expect(o).toMatchObject({ feasible: false, code: 'too-long' });
    if (!o.feasible) expect(o.reason).toMatch(/more than 90 extra minutes/);
  });

  it('uses an overridden potential', () => {
    const weak = boilCorrection({ ...shortOfTarget, extract: { dme: 300 } });
    const a = option(result, 'extract', 'dme');
    const b = option(weak, 'extract', 'dme');
    if (a.kind !== 'extract' || !a.feasible || b.kind !== 'extract' || !b.feasible) throw new Error('feasible');
    expect(b.kg).toBeGreaterThan(a.kg);
    expect(b.endSg).toBeCloseTo(1.05, 12);
  });
});

describe('late-boil correction when the wort is over target', () => {
  const over: BoilCorrectionInput = { ...shortOfTarget, sg: 1.056 };
  const result = boilCorrection(over);

  it('offers water, reaching the target', () => {
    expect(result.status).toBe('high');
    const o = option(result, 'water');
    if (o.kind !== 'water' || !o.feasible) throw new Error('water should be feasible');
    expect(o.endSg).toBeCloseTo(1.05, 12);
    expect(o.fermenterVolumeL).toBeCloseTo(result.projected.fermenterVolumeL + o.litres, 12);
  });

  it('says why extract and a longer boil cannot help', () => {
    for (const o of result.options.filter((x) => x.kind === 'extract' || x.kind === 'boil-longer')) {
      expect(o).toMatchObject({ feasible: false, code: 'above-target' });
    }
  });

  it('sends water to the fermenter when the kettle is too small', () => {
    const o = option(boilCorrection({ ...over, kettleCapacityL: 26 }), 'water');
    expect(o).toMatchObject({ feasible: false, code: 'overfills-kettle' });
    if (!o.feasible) expect(o.reason).toMatch(/fermenter/);
  });
});

describe('kettle losses and boiling headroom', () => {
  it('subtracts trub loss and dead space from what reaches the fermenter (issue case: 20.8 L cooled, 18.8 L in)', () => {
    // Worked by hand: 22.5 L − 5 L/h × 10 min = 21.667 L hot, × 0.96 = 20.8 L cooled; 1.5 L trub
    // and 0.5 L dead space stay in the kettle, so 18.8 L reaches the fermenter.
    const result = boilCorrection({ volumeL: 22.5, sg: 1.05, minutesLeft: 10, boilOffLPerHour: 5, targetSg: 1.052, kettleLossL: 2 });
    expect(result.projected.cooledVolumeL).toBeCloseTo(20.8, 9);
    expect(result.projected.fermenterVolumeL).toBeCloseTo(18.8, 9);
    expect(result.kettleLossL).toBe(2);
    for (const o of result.options) if (o.feasible) expect(o.fermenterVolumeL).toBeCloseTo(o.cooledVolumeL - 2, 9);
  });

  it('refuses boiling longer when, after kettle losses, less than the recipe volume would reach the fermenter', () => {
    // Worked by hand: the extract is 44 × 25 × 0.96 = 1056 point-litres; at 50 points that is
    // 21.12 L cooled, less 2 L of losses = 19.12 L, short of the recipe's 21 L. Without losses it fits.
    expect(option(boilCorrection(shortOfTarget), 'boil-longer')).toMatchObject({ feasible: true });
    const o = option(boilCorrection({ ...shortOfTarget, kettleLossL: 2 }), 'boil-longer');
    expect(o).toMatchObject({ feasible: false, code: 'below-recipe-volume' });
    if (!o.feasible) expect(o.reason).toMatch(/19\.1 L into the fermenter after 2 L of kettle losses, less than the recipe's 21 L/);
  });

  // Common practice, no source: keep about 10 % of the kettle free for a rolling boil.
  it('refuses water that leaves less than 10 % of the kettle free, pointing to the fermenter instead', () => {
    // Worked by hand: 25 L at 1.056 → 1344 point-litres cold; 50 points needs 26.88 L, so
    // 26.88 − 23.36 = 3.52 L of water, which is 3.67 L hot: 28.67 L in the kettle.
    const over: BoilCorrectionInput = { ...shortOfTarget, sg: 1.056 };
    // A 32 L kettle may hold 28.8 L while boiling: it fits.
    expect(option(boilCorrection({ ...over, kettleCapacityL: 32 }), 'water')).toMatchObject({ feasible: true });
    // A 31 L kettle would hold it, but only 27.9 L leaves room to boil.
    const o = option(boilCorrection({ ...over, kettleCapacityL: 31 }), 'water');
    expect(o).toMatchObject({ feasible: false, code: 'overfills-kettle' });
    if (!o.feasible) {
      expect(o.reason).toMatch(/28\.7 L, leaving less than 10 % of the 31 L kettle free/);
      expect(o.reason).toMatch(/Add the water to the fermenter after chilling instead/);
    }
  });

  it('refuses losses larger than the wort', () => {
    expect(brewError(() => boilCorrection({ ...shortOfTarget, kettleLossL: 30 })).field).toBe('kettleLossL');
    expect(brewError(() => boilCorrection({ ...shortOfTarget, kettleLossL: -1 })).field).toBe('kettleLossL');
  });
});

describe('late-boil correction on target', () => {
  it('within 0.001 of target, no correction is offered', () => {
    // 25 L at 1.0485 boiled down to 24.333 L finishes at 1.0498.
    const result = boilCorrection({ ...shortOfTarget, sg: 1.0485 });
    expect(result.status).toBe('on-target');
    for (const o of result.options.slice(1)) expect(o).toMatchObject({ feasible: false, code: 'on-target' });
  });

  it('assumes 75 % apparent attenuation when the recipe gives no FG (common practice)', () => {
    const result = boilCorrection({ ...shortOfTarget, targetFg: undefined });
    expect(result.fgAssumed).toBe(true);
    expect(result.fgSg).toBeCloseTo(1.0125, 12);
  });
});

describe('late-boil correction input checks', () => {
  it('rejects a boil-off that would empty the kettle', () => {
    expect(brewError(() => boilCorrection({ ...shortOfTarget, minutesLeft: 400 })).code).toBe('empties-kettle');
  });

  it('rejects inconsistent recipe figures', () => {
    expect(brewError(() => boilCorrection({ ...shortOfTarget, targetFg: 1.06 })).field).toBe('targetFg');
    expect(brewError(() => boilCorrection({ ...shortOfTarget, kettleCapacityL: 20 })).field).toBe('kettleCapacityL');
    expect(brewError(() => boilCorrection({ ...shortOfTarget, extract: { lme: 5 } })).field).toBe('extract');
    expect(brewError(() => boilCorrection({ ...shortOfTarget, targetSg: 1 })).field).toBe('targetSg');
    expect(brewError(() => boilCorrection({ ...shortOfTarget, coolingShrinkage: 4 })).field).toBe('coolingShrinkage');
  });
});

describe('late-boil correction properties', () => {
  const inputs = fc.record({
    volumeL: fc.double({ min: 3, max: 120, noNaN: true }),
    sg: fc.double({ min: 1.02, max: 1.11, noNaN: true }),
    minutesLeft: fc.double({ min: 0, max: 30, noNaN: true }),
    boilOffShare: fc.double({ min: 0, max: 0.3, noNaN: true }),
    targetSg: fc.double({ min: 1.025, max: 1.12, noNaN: true }),
    targetVolumeShare: fc.option(fc.double({ min: 0.7, max: 1.1, noNaN: true }), { nil: undefined }),
    kettleExtra: fc.option(fc.double({ min: 0, max: 30, noNaN: true }), { nil: undefined }),
  });

  it('every feasible option reaches the target; every number is finite; amounts are positive', () => {
    fc.assert(
      fc.property(inputs, (x) => {
        const result = boilCorrection({
          volumeL: x.volumeL,
          sg: x.sg,
          minutesLeft: x.minutesLeft,
          boilOffLPerHour: x.boilOffShare * x.volumeL,
          targetSg: x.targetSg,
          targetVolumeL: x.targetVolumeShare === undefined ? undefined : x.targetVolumeShare * x.volumeL,
          kettleCapacityL: x.kettleExtra === undefined ? undefined : x.volumeL + x.kettleExtra,
        });
        expect(allFinite(result)).toBe(true);
        expect(result.options).toHaveLength(7);
        for (const o of result.options) {
          if (!o.feasible) {
            expect(o.reason.length).toBeGreaterThan(10);
            continue;
          }
          if (o.kind === 'as-is') continue;
          expect(Math.abs(o.endSg - x.targetSg)).toBeLessThan(1e-9);
          if (o.kind === 'extract') expect(o.kg).toBeGreaterThan(0);
          if (o.kind === 'water') expect(o.litres).toBeGreaterThan(0);
          if (o.kind === 'boil-longer') expect(o.extraMinutes).toBeGreaterThan(0);
        }
      }),
    );
  });

  it('any numbers at all give either a finite answer or a BrewMathError', () => {
    const anyNumber = fc.oneof(fc.double(), fc.double({ min: -10, max: 200 }), fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, -0));
    fc.assert(
      fc.property(anyNumber, anyNumber, anyNumber, anyNumber, anyNumber, (volumeL, sg, minutesLeft, boilOffLPerHour, targetSg) => {
        try {
          expect(allFinite(boilCorrection({ volumeL, sg, minutesLeft, boilOffLPerHour, targetSg }))).toBe(true);
        } catch (error) {
          expect(error).toBeInstanceOf(BrewMathError);
        }
      }),
    );
  });
});
