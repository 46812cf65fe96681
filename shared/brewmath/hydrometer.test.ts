import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { correctHydrometer, hydrometerTempWarning, waterDensityKgM3 } from './hydrometer';
import { brewError } from './testing';

describe('water density', () => {
  // Tanaka et al. (2001), Metrologia 38, 301, table of density of SMOW at 101.325 kPa (recalled from memory).
  const tanaka: [tempC: number, rho: number][] = [
    [4, 999.9749],
    [10, 999.7026],
    [15, 999.1026],
    [20, 998.2067],
    [25, 997.047],
    [30, 995.6488],
    [40, 992.2152],
  ];
  it.each(tanaka)('at %s °C is %s kg/m³ (Tanaka et al. 2001)', (t, rho) => {
    expect(Math.abs(waterDensityKgM3(t) - rho)).toBeLessThan(0.0005);
  });

  // CRC Handbook of Chemistry and Physics, density of water (from Kell 1975), recalled from memory:
  // the formula is stated for 0–40 °C and holds to 0.05 kg/m³ up to the 60 °C we still accept without warning.
  it.each([
    [50, 988.04],
    [60, 983.2],
  ])('at %s °C is within 0.05 of %s kg/m³ (CRC Handbook, recalled from memory)', (t, rho) => {
    expect(Math.abs(waterDensityKgM3(t) - rho)).toBeLessThan(0.05);
  });

  it('is densest near 4 °C (a property of water)', () => {
    expect(waterDensityKgM3(3.98)).toBeGreaterThan(waterDensityKgM3(2));
    expect(waterDensityKgM3(3.98)).toBeGreaterThan(waterDensityKgM3(6));
  });
});

describe('hydrometer temperature correction', () => {
  it('reads true at its calibration temperature (common practice: 20 °C, or 15.56 °C / 60 °F)', () => {
    expect(correctHydrometer(1.05, 20)).toBe(1.05);
    expect(correctHydrometer(1.05, 15.56, 15.56)).toBe(1.05);
  });

  it('a hotter sample reads low, so the correction raises it (common practice)', () => {
    expect(correctHydrometer(1.04, 30, 20)).toBeGreaterThan(1.04);
    expect(correctHydrometer(1.04, 10, 20)).toBeLessThan(1.04);
  });

  it('matches the ratio of tabulated water densities (Tanaka et al. 2001 table values)', () => {
    // 1.040 read at 30 °C on a 20 °C hydrometer: 1.040 × 998.2067 / 995.6488.
    expect(correctHydrometer(1.04, 30, 20)).toBeCloseTo((1.04 * 998.2067) / 995.6488, 6);
    expect(correctHydrometer(1.01, 40, 15)).toBeCloseTo((1.01 * 999.1026) / 992.2152, 6);
  });

  it('agrees within 0.0003 with the common cubic fit in °F (widely published, recalled from memory)', () => {
    const cubic = (f: number) => 1.00130346 - 0.000134722124 * f + 0.00000204052596 * f * f - 0.00000000232820948 * f * f * f;
    const toF = (c: number) => c * 1.8 + 32;
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1.12, noNaN: true }),
        fc.double({ min: 5, max: 40, noNaN: true }),
        fc.constantFrom(15.56, 20),
        (reading, sampleC, calC) => {
          const expected = (reading * cubic(toF(sampleC))) / cubic(toF(calC));
          expect(Math.abs(correctHydrometer(reading, sampleC, calC) - expected)).toBeLessThan(0.0003);
        },
      ),
    );
  });

  it('rejects frozen or boiling samples and impossible readings', () => {
    expect(brewError(() => correctHydrometer(1.05, 101)).field).toBe('sampleTempC');
    expect(brewError(() => correctHydrometer(1.05, -3)).field).toBe('sampleTempC');
    expect(brewError(() => correctHydrometer(1.25, 20)).field).toBe('readingSg');
    expect(brewError(() => correctHydrometer(1.05, 20, 80)).field).toBe('calibrationTempC');
    expect(brewError(() => correctHydrometer(1.199, 95)).code).toBe('out-of-range');
  });
});

describe('hydrometer temperature warning', () => {
  it('is silent near the calibration temperature', () => {
    expect(hydrometerTempWarning(22, 20)).toBeNull();
    expect(hydrometerTempWarning(15, 15.56)).toBeNull();
  });

  it('warns outside 0–60 °C', () => {
    expect(hydrometerTempWarning(75, 20)).toMatch(/outside 0–60 °C/);
    expect(hydrometerTempWarning(-2, 20)).toMatch(/outside 0–60 °C/);
  });

  it('warns far from the calibration temperature', () => {
    expect(hydrometerTempWarning(35, 20)).toMatch(/20 °C calibration/);
    expect(hydrometerTempWarning(35, 15.56)).toMatch(/15.56 °C/);
  });

  // °F = °C × 9/5 + 32, and a difference of 10 °C is 18 °F (NIST SP 811, appendix B.8).
  it('speaks °F to a brewer on US units, with no °C left in it', () => {
    const far = hydrometerTempWarning(35, 15.56, 'us')!;
    expect(far).toMatch(/more than 18 °F from the hydrometer's 60 °F calibration/);
    expect(far).not.toMatch(/°C/);
    const hot = hydrometerTempWarning(75, 20, 'us')!;
    expect(hot).toMatch(/A sample at 167 °F is outside 32–140 °F/);
    expect(hot).toMatch(/near 68 °F/);
    expect(hot).not.toMatch(/°C/);
  });
});
