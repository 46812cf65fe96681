import { describe, expect, it } from 'vitest';
import { brewError } from '../brewmath/testing';
import { thermometerCheck, wcfCalibration } from './calibration';

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
    // About 12.03 °P, so the factor is about 12.6 / 12.03 = 1.047; uncorrected it would be 12.6 / 11.86 = 1.062.
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

  it('boiling at sea level: water boils at 99.974 °C at 101.325 kPa (ITS-90 / IAPWS), so 100.4 °C is 0.426 °C high; with the ice bath the mean is 0.413', () => {
    const r = thermometerCheck({ iceReadingC: 0.4, boilingReadingC: 100.4, elevationM: 0 });
    expect(Math.abs(r.expectedBoilingC! - 99.974)).toBeLessThan(0.002);
    expect(Math.abs(r.boilingOffsetC! - 0.426)).toBeLessThan(0.002);
    expect(Math.abs(r.offsetC - 0.413)).toBeLessThan(0.002);
  });

  it('at 1000 m water boils near 96.7 °C (about 1 °C lower per 300 m: common practice, no source)', () => {
    const r = thermometerCheck({ boilingReadingC: 97.6, elevationM: 1000 });
    expect(Math.abs(r.expectedBoilingC! - (100 - 1000 / 300))).toBeLessThan(0.2);
    expect(r.offsetC).toBeCloseTo(97.6 - r.expectedBoilingC!, 10);
  });

  it('flags more than 1 °C off, and an error that changes between cold and hot', () => {
    const r = thermometerCheck({ iceReadingC: 1.5, boilingReadingC: 102.5, elevationM: 0 });
    expect(r.flagged).toBe(true);
    expect(r.warnings.join(' ')).toMatch(/reads 2\.0 °C high, more than 1 °C off/);
    expect(r.warnings.join(' ')).toMatch(/off by 1\.5 °C in ice but 2\.5 °C at the boil/);
  });

  it('refuses an offset over 10 °C and a boiling check without an elevation', () => {
    expect(brewError(() => thermometerCheck({ boilingReadingC: 110.5, elevationM: 0 })).field).toBe('boilingReadingC');
    expect(brewError(() => thermometerCheck({ iceReadingC: -10.5 })).field).toBe('iceReadingC');
    expect(brewError(() => thermometerCheck({ boilingReadingC: 99 })).field).toBe('elevationM');
    expect(brewError(() => thermometerCheck({})).field).toBe('iceReadingC');
  });
});
