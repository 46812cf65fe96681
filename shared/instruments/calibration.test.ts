import { describe, expect, it } from 'vitest';
import { brewError } from '../brewmath/testing';
import { thermometerCheck, wcfCalibration } from './calibration';
import { correctReading } from './correct-reading';

// ASBC extract table (°Plato ↔ SG 20/20 °C), recalled from memory: 10 °P = 1.04003, 12 °P = 1.04838, 20 °P = 1.08297.
// The cubic we use matches the table to about ±0.02 °P, i.e. ±0.002 in a factor near 1.04.
describe('wort correction factor from paired readings', () => {
  it('worked example: 10.4 °Bx at 10 °P, 12.6 °Bx at 12 °P, 20.9 °Bx at 20 °P give 1.040, 1.050, 1.045; mean 1.045, spread 0.010', () => {
    const r = wcfCalibration({
      pairs: [
        { brix: 10.4, sg: 1.04003 },
        { brix: 12.6, sg: 1.04838 },
        { brix: 20.9, sg: 1.08297 },
      ],
    });
    const expected = [10.4 / 10, 12.6 / 12, 20.9 / 20];
    r.pairs.forEach((p, i) => expect(Math.abs(p.factor - expected[i])).toBeLessThan(0.002));
    expect(Math.abs(r.wcf - 1.045)).toBeLessThan(0.002);
    expect(Math.abs(r.spread - 0.01)).toBeLessThan(0.002);
    expect(r.count).toBe(3);
    expect(r.warnings).toEqual([]);
  });

  it('corrects each hydrometer reading to its calibration temperature first: 1.0458 at 30 °C on a 20 °C hydrometer is 1.0458 × ρ(20)/ρ(30) (CRC water densities, recalled from memory)', () => {
    const r = wcfCalibration({ pairs: [{ brix: 12.6, sg: 1.0458, sampleTempC: 30 }], hydrometerCalibrationTempC: 20 });
    const correctedSg = (1.0458 * 998.2071) / 995.6502; // 1.048486, a hair above the table's 12 °P (1.04838)
    expect(Math.abs(r.pairs[0].correctedSg - correctedSg)).toBeLessThan(2e-6);
    // About 12.03 °P, so the factor is about 12.6 / 12.03 = 1.047. Uncorrected, 1.0458 is about 11.38 °P
    // (linear between the table's 10 °P = 1.04003 and 12 °P = 1.04838, worked by hand), so it would be 12.6 / 11.38 = 1.107.
    expect(Math.abs(r.pairs[0].factor - 1.047)).toBeLessThan(0.002);
    expect(r.warnings.join(' ')).toMatch(/fewer than three pairs/);
  });

  it('warns when the pairs disagree by more than 0.03 (common practice, no source)', () => {
    const r = wcfCalibration({
      pairs: [
        { brix: 10.4, sg: 1.04003 },
        { brix: 12.0, sg: 1.04838 },
        { brix: 21.2, sg: 1.08297 },
      ],
    });
    expect(r.spread).toBeGreaterThan(0.03);
    expect(r.warnings.join(' ')).toMatch(/disagree by 0\.06/);
  });

  it('names the pair and field that cannot be right', () => {
    const e = brewError(() => wcfCalibration({ pairs: [{ brix: 10.4, sg: 1.04003 }, { brix: 16, sg: 1.04838 }] }));
    expect(e.field).toBe('pairs.1.sg');
    expect(e.message).toMatch(/^Pair 2 gives a factor of 1\.33/);
    expect(brewError(() => wcfCalibration({ pairs: [] })).field).toBe('pairs');
  });
});

describe('thermometer check', () => {
  it('ice bath: reading 0.4 °C in crushed ice and water (truly 0 °C) means it reads 0.4 °C high', () => {
    const r = thermometerCheck({ iceReadingC: 0.4 });
    expect(r.offsetC).toBeCloseTo(0.4, 10);
    expect(r.flagged).toBe(false);
  });

  it('boiling at sea level: water boils at 99.974 °C at 101.325 kPa (ITS-90 / IAPWS), so 100.4 °C is 0.426 °C high', () => {
    const r = thermometerCheck({ iceReadingC: 0.4, boilingReadingC: 100.4, elevationM: 0 });
    expect(Math.abs(r.expectedBoilingC! - 99.974)).toBeLessThan(0.002);
    expect(Math.abs(r.boilingOffsetC! - 0.426)).toBeLessThan(0.002);
  });

  it('with both checks it corrects along the straight line through the two fixed points (two-point calibration)', () => {
    // Reads 1.0 °C in ice and 101.0 °C at a sea-level boil (true 99.974 °C, IAPWS, as above).
    // Line through (1.0 → 0) and (101.0 → 99.974), worked by hand: true = (reading − 1.0) × 99.974 / 100.0.
    // A mash at 67.0 °C on this thermometer is (67.0 − 1.0) × 0.99974 = 65.98 °C; the mean offset
    // (1.013 °C) would have said 65.99, and at the boil the mean would be 0.013 °C out.
    const r = thermometerCheck({ iceReadingC: 1.0, boilingReadingC: 101.0, elevationM: 0 });
    expect(r.offsetC).toBeCloseTo(1.0, 9);
    expect(r.scale).toBeCloseTo(0.99974, 5);
    const snapshot = { kind: 'thermometer', instrumentId: 1, name: 'Probe', calibrationId: 1, offsetC: r.offsetC, scale: r.scale, checkedOn: '2026-01-01' } as const;
    expect(correctReading(snapshot, { tempC: 67 }).corrected).toBeCloseTo(65.983, 2);
    expect(correctReading(snapshot, { tempC: 1.0 }).corrected).toBeCloseTo(0, 9);
    expect(correctReading(snapshot, { tempC: 101.0 }).corrected).toBeCloseTo(99.974, 2);
  });

  it('a thermometer whose error grows with temperature: 0.0 °C in ice, 102.0 °C at the boil', () => {
    // Worked by hand: scale = 99.974 / 102.0 = 0.98014; 66.0 read is 64.69 °C true. The old mean
    // offset ((0 + 2.026) / 2 = 1.013) would have given 64.99 °C, 0.3 °C off.
    const r = thermometerCheck({ iceReadingC: 0, boilingReadingC: 102, elevationM: 0 });
    const snapshot = { kind: 'thermometer', instrumentId: 1, name: 'Probe', calibrationId: 1, offsetC: r.offsetC, scale: r.scale, checkedOn: '2026-01-01' } as const;
    expect(correctReading(snapshot, { tempC: 66 }).corrected).toBeCloseTo(64.69, 2);
    expect(r.warnings.join(' ')).toMatch(/straight line between the two checks/);
  });

  it('at 1000 m water boils near 96.7 °C (about 1 °C lower per 300 m: common practice, no source)', () => {
    const r = thermometerCheck({ boilingReadingC: 97.6, elevationM: 1000 });
    expect(Math.abs(r.expectedBoilingC! - (100 - 1000 / 300))).toBeLessThan(0.2);
    expect(r.offsetC).toBeCloseTo(97.6 - r.expectedBoilingC!, 10);
  });

  it('flags more than 1 °C off, and an error that changes between cold and hot', () => {
    const r = thermometerCheck({ iceReadingC: 1.5, boilingReadingC: 102.5, elevationM: 0 });
    expect(r.flagged).toBe(true);
    // The larger of the two errors: 102.5 − 99.974 = 2.526 °C at the boil.
    expect(r.warnings.join(' ')).toMatch(/reads 2\.5 °C high, more than 1 °C off/);
    expect(r.warnings.join(' ')).toMatch(/off by 1\.5 °C in ice but 2\.5 °C at the boil/);
  });

  it('refuses an offset over 10 °C and a boiling check without an elevation', () => {
    expect(brewError(() => thermometerCheck({ boilingReadingC: 110.5, elevationM: 0 })).field).toBe('boilingReadingC');
    expect(brewError(() => thermometerCheck({ iceReadingC: -10.5 })).field).toBe('iceReadingC');
    expect(brewError(() => thermometerCheck({ boilingReadingC: 99 })).field).toBe('elevationM');
    expect(brewError(() => thermometerCheck({})).field).toBe('iceReadingC');
  });
});
