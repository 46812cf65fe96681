import { describe, expect, it } from 'vitest';
import { BrewMathError } from '../brewmath';
import { boilCheckInputSchema, boilCorrectionRequestSchema } from '../schemas/boil-check';
import {
  formatAddition,
  formatWaterAddition,
  gapInWords,
  optionAction,
  runBoilCheck,
  wholeMinutes,
  type BoilCheckInput,
} from './index';

function brewError(fn: () => unknown): BrewMathError {
  try {
    fn();
  } catch (error) {
    if (error instanceof BrewMathError) return error;
    throw error;
  }
  throw new Error('Expected a BrewMathError');
}

/**
 * Worked example, gravity points × litres mass balance, hand calculation.
 *
 * 26 L of hot wort, refractometer 11.4 °Brix with a wort correction factor of 1.04, 10 minutes
 * left, boil-off 4 L/h, recipe OG 1.050 and 23 L, cooling shrinkage 4 %.
 * - 11.4 / 1.04 = 10.9615 °P. The usual rational approximation SG = 1 + P / (258.6 − P/258.2 × 227.1)
 *   gives 1 + 10.9615 / 248.959 = 1.04403, so 44.03 points. (The module inverts the ASBC cubic
 *   instead; the two fits differ by about 0.00001 here, which is why the checks below allow a little.)
 * - End of boil, hot: 26 − 4 × 10/60 = 25.333 L; cooled by 4 %: 24.32 L.
 * - Extract in points × litres (cold): 44.03 × 26 × 0.96 = 1098.99.
 * - With no action: 1098.99 / 24.32 = 45.19 points, so 1.045, about 5 points short of 1.050.
 * - Dry malt extract, 367 points·L/kg, adding 0.62 L per kg dissolved (shared/brewmath/extract.ts):
 *   kg = (50 × 24.32 − 1098.99) / (367 − 50 × 0.62) = 117.01 / 336 = 0.3482 kg → about 348 g.
 *   In the fermenter: 24.32 + 0.3482 × 0.62 = 24.536 L at 1.050; ABV at the assumed 75 %
 *   attenuation (FG 1.0125): (50 − 12.5) × 0.13125 = 4.92 %.
 */
const workedExample: BoilCheckInput = {
  reading: { kind: 'refractometer', brix: 11.4, wcf: 1.04 },
  volumeL: 26,
  minutesLeft: 10,
  boilOffLPerHour: 4,
  targetSg: 1.05,
  targetVolumeL: 23,
  coolingShrinkage: 0.04,
};

describe('runBoilCheck: worked example, gravity points × litres mass balance, hand calculation', () => {
  const out = runBoilCheck(workedExample);

  it('turns the Brix reading into the current gravity', () => {
    expect(out.currentSg).toBeCloseTo(1.04403, 4);
    expect(out.reading).toEqual({ kind: 'refractometer', brix: 11.4, wcf: 1.04 });
  });

  it('projects the end of the boil with no action', () => {
    expect(out.result.status).toBe('low');
    expect(out.result.projected.endVolumeL).toBeCloseTo(25.3333, 4);
    expect(out.result.projected.fermenterVolumeL).toBeCloseTo(24.32, 6);
    expect((out.result.projected.endSg - 1) * 1000).toBeCloseTo(45.19, 1);
    expect(gapInWords(out.result)).toBe('About 5 points short');
  });

  it('offers about 348 g of dry malt extract, reaching 1.050 in 24.54 L at 4.9 % ABV', () => {
    const dme = out.result.options.find((o) => o.kind === 'extract' && o.extract === 'dme');
    if (!dme || dme.kind !== 'extract' || !dme.feasible) throw new Error('no DME option');
    expect(dme.kg).toBeCloseTo(0.3482, 2);
    // The hand figure is 348 g; the ASBC cubic's 0.00001 lower gravity adds under 1 g.
    expect(optionAction(dme)).toMatch(/^Add 34[89]\u00a0g dry malt extract$/);
    // 348 g / 28.3495 g per oz (avoirdupois ounce, exact by definition) = 12.28 oz.
    expect(optionAction(dme, 'us')).toBe('Add 12.3\u00a0oz dry malt extract');
    expect(dme.endSg).toBeCloseTo(1.05, 9);
    expect(dme.fermenterVolumeL).toBeCloseTo(24.536, 3);
    expect(dme.abvPercent).toBeCloseTo(4.92, 2);
  });

  it('offers no water (the wort is short) and no longer boil (it would finish below the recipe volume)', () => {
    // Boiling on to 1.050 would leave 1098.99 / 50 = 21.98 L cold, under the recipe's 23 L.
    const water = out.result.options.find((o) => o.kind === 'water');
    const boil = out.result.options.find((o) => o.kind === 'boil-longer');
    expect(water).toMatchObject({ feasible: false, code: 'below-target' });
    expect(boil).toMatchObject({ feasible: false, code: 'below-recipe-volume' });
  });
});

describe('runBoilCheck: the rest of its contract', () => {
  it('offers only the extracts on hand', () => {
    const out = runBoilCheck({ ...workedExample, extractsOnHand: ['sucrose'] });
    const extracts = out.result.options.filter((o) => o.kind === 'extract');
    expect(extracts.map((o) => o.kind === 'extract' && o.extract)).toEqual(['sucrose']);
    expect(out.result.options.map((o) => o.kind)).toEqual(['as-is', 'extract', 'water', 'boil-longer']);
    expect(runBoilCheck({ ...workedExample, extractsOnHand: [] }).result.options.some((o) => o.kind === 'extract')).toBe(false);
  });

  it('uses a potential the brewer gives instead of the default', () => {
    // Same balance with a weaker 330 points·L/kg extract: 117.01 / (330 − 31) = 0.3913 kg (hand calculation).
    const out = runBoilCheck({ ...workedExample, potentials: { dme: 330 } });
    const dme = out.result.options.find((o) => o.kind === 'extract' && o.extract === 'dme');
    expect(dme && dme.kind === 'extract' && dme.feasible && dme.kg).toBeCloseTo(0.3913, 2);
  });

  it('corrects a cooled hydrometer sample to its calibration temperature', () => {
    // Water density 998.21 kg/m³ at 20 °C and 995.65 at 30 °C (CRC Handbook table, recalled from
    // memory): a 1.040 reading at 30 °C is 1.040 × 998.21 / 995.65 = 1.04267 at 20 °C.
    const out = runBoilCheck({ ...workedExample, reading: { kind: 'hydrometer', sg: 1.04, sampleTempC: 30 } });
    expect(out.currentSg).toBeCloseTo((1.04 * 998.21) / 995.65, 4);
    expect(out.reading).toEqual({ kind: 'hydrometer', sg: 1.04, sampleTempC: 30, calibrationTempC: 20 });
    expect(out.warnings).toEqual([]);
  });

  it('warns when the hydrometer sample is far from its calibration temperature', () => {
    const out = runBoilCheck({ ...workedExample, reading: { kind: 'hydrometer', sg: 1.04, sampleTempC: 45, calibrationTempC: 20 } });
    expect(out.warnings).toHaveLength(1);
    expect(out.warnings[0]).toMatch(/more than 10 °C from the hydrometer's 20 °C calibration/);
  });

  it('says which input is impossible, by its place in the input', () => {
    expect(brewError(() => runBoilCheck({ ...workedExample, reading: { kind: 'refractometer', brix: 60 } })).field).toBe('reading.brix');
    expect(brewError(() => runBoilCheck({ ...workedExample, reading: { kind: 'refractometer', brix: 11, wcf: 2 } })).field).toBe('reading.wcf');
    expect(brewError(() => runBoilCheck({ ...workedExample, reading: { kind: 'hydrometer', sg: 1.3, sampleTempC: 20 } })).field).toBe('reading.sg');
    expect(brewError(() => runBoilCheck({ ...workedExample, volumeL: 0 })).field).toBe('volumeL');
    expect(brewError(() => runBoilCheck({ ...workedExample, minutesLeft: -1 })).field).toBe('minutesLeft');
    const empties = brewError(() => runBoilCheck({ ...workedExample, volumeL: 3, minutesLeft: 60 }));
    expect(empties.field).toBe('boilOffLPerHour');
    expect(empties.code).toBe('empties-kettle');
    expect(brewError(() => runBoilCheck({ ...workedExample, potentials: { lme: 900 } })).field).toBe('potentials.lme');
    expect(brewError(() => runBoilCheck({ ...workedExample, targetFg: 1.06 })).field).toBe('targetFg');
  });
});

describe('boilCheckInputSchema', () => {
  const fieldsOf = (value: unknown) => {
    const parsed = boilCheckInputSchema.safeParse(value);
    if (parsed.success) return {};
    return Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message]));
  };

  it('accepts the worked example and fills in the extracts on hand', () => {
    const parsed = boilCheckInputSchema.parse(workedExample);
    expect(parsed.extractsOnHand).toEqual(['dme', 'lme', 'sucrose', 'dextrose']);
  });

  it('refuses impossible readings with a brewer’s message under the field', () => {
    expect(fieldsOf({ ...workedExample, reading: { kind: 'refractometer', brix: 60 } })).toEqual({
      'reading.brix': 'Brix 60 is outside 0 to 40 °Bx, the scale of a brewing refractometer. Check the reading.',
    });
    expect(fieldsOf({ ...workedExample, volumeL: 0 })).toEqual({ volumeL: 'Kettle volume must be more than 0.' });
    expect(fieldsOf({ ...workedExample, minutesLeft: -1 })).toEqual({ minutesLeft: 'Minutes left cannot be below 0.' });
    expect(fieldsOf({ ...workedExample, volumeL: '' })).toEqual({ volumeL: 'Enter the volume in the kettle.' });
    expect(fieldsOf({ ...workedExample, reading: { kind: 'thermometer' } })).toEqual({
      'reading.kind': 'Choose a refractometer or a hydrometer reading.',
    });
  });

  it('refuses a hydrometer sample above 40 °C for a boil decision, asking for a cooled sample', () => {
    // Common practice, no source: the correction assumes wort expands like water, near room temperature.
    const fields = fieldsOf({ ...workedExample, reading: { kind: 'hydrometer', sg: 1.04, sampleTempC: 45 } });
    expect(Object.keys(fields)).toEqual(['reading.sampleTempC']);
    expect(fields['reading.sampleTempC']).toMatch(/^A sample at 45 °C \(113 °F\) is too hot to decide the boil on.*Cool the sample below 40 °C \(104 °F\)/);
    expect(fieldsOf({ ...workedExample, reading: { kind: 'hydrometer', sg: 1.04, sampleTempC: 40 } })).toEqual({});
  });

  it('takes the kettle losses and refuses impossible ones under their field', () => {
    expect(fieldsOf({ ...workedExample, kettleLossL: 2 })).toEqual({});
    expect(Object.keys(fieldsOf({ ...workedExample, kettleLossL: -1 }))).toEqual(['kettleLossL']);
    expect(fieldsOf({ ...workedExample, kettleLossL: 30 }).kettleLossL).toMatch(/more than the 24\.3 L the boil will end with/);
  });

  it('runs the check once the fields are valid, so a kettle boiled dry is refused under the boil-off rate', () => {
    const fields = fieldsOf({ ...workedExample, volumeL: 3, minutesLeft: 60 });
    expect(Object.keys(fields)).toEqual(['boilOffLPerHour']);
    expect(fields.boilOffLPerHour).toMatch(/more than the 3 L in the kettle/);
  });
});

describe('boilCorrectionRequestSchema', () => {
  it('refuses a gravity of 1.300 under `sg`', () => {
    const parsed = boilCorrectionRequestSchema.safeParse({ volumeL: 26, sg: 1.3, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05 });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['sg', 'Current gravity 1.300 is outside 0.980 to 1.200, the range wort can read. Check the reading.'],
    ]);
  });
});

describe('amounts in words', () => {
  it('weighs extract in grams under a kilogram, ounces under a pound', () => {
    expect(formatAddition(0.3488)).toBe('349\u00a0g');
    expect(formatAddition(1.2345)).toBe('1.23\u00a0kg');
    // 1 lb = 453.59237 g exactly (1959 international pound).
    expect(formatAddition(0.45359237 * 0.5, 'us')).toBe('8.0\u00a0oz');
    expect(formatAddition(0.45359237 * 1.5, 'us')).toBe('1.50\u00a0lb');
  });

  it('measures water in litres, quarts under a gallon', () => {
    expect(formatWaterAddition(2.14)).toBe('2.1\u00a0L');
    // 1 US quart = 0.946352946 L exactly, a quarter of the 231 in³ gallon.
    expect(formatWaterAddition(0.946352946 * 2, 'us')).toBe('2.0\u00a0qt');
    expect(formatWaterAddition(3.785411784 * 1.5, 'us')).toBe('1.50\u00a0gal');
  });

  it('rounds minutes up, ignoring float noise', () => {
    expect(wholeMinutes(11.2)).toBe(12);
    expect(wholeMinutes(12.0000000001)).toBe(12);
    expect(wholeMinutes(0.2)).toBe(1);
  });
});
