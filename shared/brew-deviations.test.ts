import { describe, expect, it } from 'vitest';
import { describeDeviation, findDeviations, type DeviationReading, type DeviationTargets } from './brew-deviations';
import type { InstrumentSnapshot } from './schemas/instruments';

// An invented recipe's targets: 23 L into the fermenter at OG 1.050, a single 66 °C rest and a
// step at 72 °C, fermenting at 18–20 °C.
const targets: DeviationTargets = {
  targetOg: 1.05,
  batchVolumeL: 23,
  mashSteps: [
    { tempC: 66, minutes: 60 },
    { tempC: 72, minutes: 10 },
  ],
  fermentationTempMinC: 18,
  fermentationTempMaxC: 20,
};

const thermometer: InstrumentSnapshot = { instrumentId: 1, name: 'Probe', calibrationId: 1, kind: 'thermometer', offsetC: 0.4, checkedOn: '2025-03-01' };
const phMeter: InstrumentSnapshot = {
  instrumentId: 2,
  name: 'Pocket pH meter',
  calibrationId: 2,
  kind: 'ph_meter',
  resolutionPh: 0.01,
  calibratedOn: '2025-03-01',
  reminderDays: 30,
  bufferLowPh: 4.01,
  bufferHighPh: 7,
};
const hydrometer: InstrumentSnapshot = { instrumentId: 3, name: 'Trial-jar hydrometer', calibrationId: null, kind: 'hydrometer', calibrationTempC: 20 };

let nextId = 1;
function reading(kind: DeviationReading['kind'], corrected: number, extra: Partial<DeviationReading> = {}): DeviationReading {
  const instrument = kind === 'mash_ph' ? phMeter : kind === 'og' ? hydrometer : thermometer;
  return { id: nextId++, kind, corrected, volumeL: null, instrument, takenAt: '2025-03-10T10:00:00Z', ...extra };
}

const codes = (rs: DeviationReading[]) => findDeviations({ targets, readings: rs }).map((d) => d.code);

describe('findDeviations: mash', () => {
  it("calls out a mash pH more than 0.1 from the recipe's target, never one at it (common practice, no source)", () => {
    // No target in these test targets: 5.2 by default. 5.194 reads 5.19 on the meter: on target.
    expect(codes([reading('mash_ph', 5.2), reading('mash_ph', 5.194), reading('mash_ph', 5.3), reading('mash_ph', 5.1)])).toEqual([]);
    expect(codes([reading('mash_ph', 5.09)])).toEqual(['mash-ph-low']);
    expect(codes([reading('mash_ph', 5.31)])).toEqual(['mash-ph-high']);
    // A recipe that aims at 5.4: 5.55 is in the usual band but 0.15 off its target.
    const [d] = findDeviations({ targets: { ...targets, mashPhTarget: 5.4 }, readings: [reading('mash_ph', 5.55)] });
    expect(d).toMatchObject({ code: 'mash-ph-high', expected: 5.4 });
    expect(d.message).toBe("Mash pH 5.55 is 0.15 above the recipe's 5.40 target (± 0.10).");
  });

  it('compares a mash temperature with the nearest step, 1 °C either way allowed (common practice, no source)', () => {
    // 67.0 is exactly 1 °C above the 66 °C rest: allowed. 71.2 is 0.8 °C below the 72 °C step.
    expect(codes([reading('mash_temp', 67.0), reading('mash_temp', 65.0), reading('mash_temp', 71.2)])).toEqual([]);
    const [d] = findDeviations({ targets, readings: [reading('mash_temp', 64.4)] });
    expect(d).toMatchObject({ code: 'mash-temp', expected: 66, actual: 64.4, quantity: 'temperature' });
    expect(d.message).toBe('Mash at 64.4 °C is 1.6 °C below the 66 °C step.');
  });

  it('has nothing to compare a mash temperature with when the recipe has no steps', () => {
    expect(findDeviations({ targets: { ...targets, mashSteps: [] }, readings: [reading('mash_temp', 80)] })).toEqual([]);
  });
});

describe('findDeviations: OG and volume', () => {
  it('allows two gravity points either side of the target OG (common practice, no source)', () => {
    // Points are (SG − 1) × 1000, the brewer's usual unit: 1.048 is 2 points short of 1.050.
    expect(codes([reading('og', 1.048), reading('og', 1.052)])).toEqual([]);
    expect(codes([reading('og', 1.0475)])).toEqual(['og-low']);
    expect(codes([reading('og', 1.053)])).toEqual(['og-high']);
  });

  it('calls out a volume into the fermenter more than 5 % from the recipe (common practice, no source)', () => {
    // 5 % of 23 L is 1.15 L: 21.85 L and 24.15 L are the edges.
    expect(codes([reading('og', 1.05, { volumeL: 21.85 }), reading('og', 1.05, { volumeL: 24.15 })])).toEqual([]);
    const [d] = findDeviations({ targets, readings: [reading('og', 1.05, { volumeL: 21 })] });
    expect(d).toMatchObject({ code: 'volume-low', expected: 23, actual: 21 });
    expect(d.message).toBe("21.0 L went into the fermenter, 9 % short of the recipe's 23.0 L.");
  });
});

describe('findDeviations: pitch and instruments', () => {
  it('calls out pitching above the fermentation range', () => {
    expect(codes([reading('pitch_temp', 20)])).toEqual([]);
    expect(codes([reading('pitch_temp', 24.5)])).toEqual(['pitch-too-warm']);
  });

  it('calls out a pH meter past its reminder, and one never calibrated, once per instrument', () => {
    // Calibrated 1 March with a 30-day reminder: due on 31 March.
    const late = { ...reading('mash_ph', 5.25), takenAt: '2025-04-02T09:00:00Z' };
    const [d] = findDeviations({ targets, readings: [late] });
    expect(d).toMatchObject({ code: 'instrument-overdue', instrumentName: 'Pocket pH meter' });
    expect(d.message).toBe('Pocket pH meter was last calibrated 32 days before this reading, past its 30-day reminder.');

    const never = { ...phMeter, calibratedOn: null };
    expect(codes([reading('mash_ph', 5.25, { instrument: never }), reading('mash_ph', 5.3, { instrument: never })])).toEqual(['instrument-uncalibrated']);
  });

  it('calls out a refractometer on the default factor and a reading with no instrument of the brewer’s own', () => {
    const refrac: InstrumentSnapshot = { instrumentId: 9, name: 'Refractometer', calibrationId: null, kind: 'refractometer', wcf: 1.04, wcfSource: 'default' };
    expect(codes([reading('late_boil_gravity', 1.046, { instrument: refrac })])).toEqual(['instrument-uncalibrated']);
    expect(codes([reading('mash_temp', 66, { instrument: null })])).toEqual(['instrument-uncalibrated']);
  });
});

describe('findDeviations: decisions', () => {
  it('calls out a late-boil decision to leave the wort well off target', () => {
    const decisions = [
      { id: 1, choiceKind: 'as-is', predictedSg: 1.0455, decidedAt: '2025-03-10T12:00:00Z' },
      { id: 2, choiceKind: 'as-is', predictedSg: 1.049, decidedAt: '2025-03-10T12:00:00Z' },
      { id: 3, choiceKind: 'extract', predictedSg: 1.05, decidedAt: '2025-03-10T12:00:00Z' },
    ];
    const found = findDeviations({ targets, readings: [], decisions });
    expect(found.map((d) => [d.code, d.decisionId])).toEqual([['accepted-off-target', 1]]);
  });
});

describe('describeDeviation', () => {
  it('words a deviation in US units and °Plato', () => {
    const [d] = findDeviations({ targets, readings: [reading('mash_temp', 64.4)] });
    // 64.4 °C = 147.92 °F, 66 °C = 150.8 °F, 1.6 °C = 2.88 °F (°F = °C × 9/5 + 32).
    expect(describeDeviation(d, { unitSystem: 'us', gravityUnit: 'sg' })).toBe('Mash at 147.9\u00a0°F is 2.9\u00a0°F below the 150.8\u00a0°F step.');
    const [og] = findDeviations({ targets, readings: [reading('og', 1.045)] });
    // 1.050 is 12.4 °P and 1.045 is 11.2 °P by the ASBC cubic (ASBC Methods of Analysis, extract table).
    expect(describeDeviation(og, { unitSystem: 'metric', gravityUnit: 'plato' })).toBe('OG 11.2\u00a0°P is 1.2\u00a0°P short of the target 12.4\u00a0°P.');
    expect(describeDeviation(og, { unitSystem: 'metric', gravityUnit: 'sg' })).toBe('OG 1.045 is 5 points short of the target 1.050.');
  });
});

describe('findDeviations: bitterness and colour of the late-boil choice', () => {
  const withTargets: DeviationTargets = { ...targets, targetIbu: 35, targetColourSrm: 8 };
  const decision = (predictedIbu: number | null, predictedColourSrm: number | null) => ({
    id: 7,
    choiceKind: 'water',
    predictedSg: 1.05,
    predictedIbu,
    predictedColourSrm,
    decidedAt: '2025-03-10T11:00:00Z',
  });

  it('calls out bitterness more than 3 IBU and colour more than 1 SRM off the targets (common practice, no source)', () => {
    const found = findDeviations({ targets: withTargets, readings: [], decisions: [decision(30.5, 6.8)] });
    expect(found.map((d) => d.code)).toEqual(['bitterness-low', 'colour-lighter']);
    expect(found[0]).toMatchObject({ stage: 'boil', decisionId: 7, expected: 35, actual: 30.5, quantity: 'ibu' });
    expect(found[0].message).toBe("The late-boil choice leaves about 31 IBU, 5 IBU below the recipe's 35 IBU.");
    expect(found[1].message).toBe("The late-boil choice leaves a colour of about 6.8 SRM, paler than the recipe's 8.0 SRM.");
    expect(findDeviations({ targets: withTargets, readings: [], decisions: [decision(40, 9.5)] }).map((d) => d.code)).toEqual(['bitterness-high', 'colour-darker']);
  });

  it('stays quiet within the tolerances, without targets, or without predictions', () => {
    expect(findDeviations({ targets: withTargets, readings: [], decisions: [decision(32, 7)] })).toEqual([]);
    expect(findDeviations({ targets, readings: [], decisions: [decision(10, 20)] })).toEqual([]);
    expect(findDeviations({ targets: withTargets, readings: [], decisions: [decision(null, null)] })).toEqual([]);
  });
});
