import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brewError } from '../brewmath/testing';
import type { HydrometerSnapshot, PhMeterSnapshot, RefractometerSnapshot, ThermometerSnapshot } from '../schemas/instruments';
import { instrumentSnapshotSchema } from '../schemas/instruments';
import { correctReading, defaultSnapshot, phCalibrationStatus } from './correct-reading';

const hydrometer20: HydrometerSnapshot = { kind: 'hydrometer', instrumentId: 1, name: 'Trial-jar hydrometer', calibrationId: 1, calibrationTempC: 20 };
const hydrometer60F: HydrometerSnapshot = { ...hydrometer20, calibrationTempC: 15.56 };
const refractometer: RefractometerSnapshot = { kind: 'refractometer', instrumentId: 2, name: 'Refractometer', calibrationId: 2, wcf: 1.04, wcfSource: 'measured' };
const thermometer: ThermometerSnapshot = { kind: 'thermometer', instrumentId: 3, name: 'Probe', calibrationId: 3, offsetC: 0.4, checkedOn: '2025-03-01' };
const phMeter: PhMeterSnapshot = {
  kind: 'ph_meter',
  instrumentId: 4,
  name: 'Pen meter',
  calibrationId: 4,
  resolutionPh: 0.01,
  calibratedOn: '2025-01-01',
  reminderDays: 30,
  bufferLowPh: 4.01,
  bufferHighPh: 7,
};

// Density of water, kg/m³, CRC Handbook of Chemistry and Physics (Kell 1975), recalled from memory.
const rho = { 15: 999.1026, 16: 998.946, 20: 998.2071, 30: 995.6502 };

describe('hydrometer: temperature correction with the calibration it was taken with', () => {
  it('1.050 read at 30 °C on a 20 °C hydrometer is 1.050 × ρ(20)/ρ(30) ≈ 1.0527 (CRC water densities)', () => {
    const r = correctReading(hydrometer20, { sg: 1.05, sampleTempC: 30 });
    expect(Math.abs(r.corrected - (1.05 * rho[20]) / rho[30])).toBeLessThan(2e-6);
    expect(r.correction).toEqual({ kind: 'temperature', calibrationTempC: 20, sampleTempC: 30 });
    // 10 °C from calibration is still within the band where the correction is trusted.
    expect(r.warnings).toEqual([]);
  });

  it('1.050 read at 20 °C on a 60 °F (15.56 °C) hydrometer is 1.050 × ρ(15.56)/ρ(20) ≈ 1.0509 (CRC densities, 15.56 °C interpolated)', () => {
    const rho1556 = rho[15] + 0.56 * (rho[16] - rho[15]);
    const r = correctReading(hydrometer60F, { sg: 1.05, sampleTempC: 20 });
    expect(Math.abs(r.corrected - (1.05 * rho1556) / rho[20])).toBeLessThan(5e-6);
    expect(r.corrected).toBeGreaterThan(1.05);
  });

  it('warns to cool a hot sample and never to read boiling wort; refuses above 100 °C', () => {
    const hot = correctReading(hydrometer20, { sg: 1.03, sampleTempC: 70 });
    expect(hot.warnings.join(' ')).toMatch(/outside 0–60 °C/);
    expect(hot.warnings.join(' ')).toMatch(/never put a hydrometer in boiling wort/);
    const far = correctReading(hydrometer20, { sg: 1.05, sampleTempC: 35 });
    expect(far.warnings.join(' ')).toMatch(/more than 10 °C from the hydrometer's 20 °C calibration/);
    expect(brewError(() => correctReading(hydrometer20, { sg: 1.05, sampleTempC: 101 })).field).toBe('sampleTempC');
    expect(brewError(() => correctReading(hydrometer20, { sg: 1.5, sampleTempC: 20 })).field).toBe('sg');
  });
});

describe('refractometer: the wort correction factor of the snapshot', () => {
  it('12.48 °Bx with factor 1.04 is 12.00 °P, which the ASBC extract table gives as SG 1.04838 (recalled from memory)', () => {
    const r = correctReading(refractometer, { brix: 12.48 });
    expect(Math.abs(r.corrected - 1.04838)).toBeLessThan(0.0001);
    expect(r.correction).toEqual({ kind: 'wcf', wcf: 1.04 });
    expect(r.warnings).toEqual([]);
  });

  it('says when the factor is the common-practice default rather than measured', () => {
    const r = correctReading(defaultSnapshot('refractometer'), { brix: 12.48 });
    expect(r.correction).toEqual({ kind: 'wcf', wcf: 1.04 });
    expect(r.warnings[0]).toMatch(/common-practice default/);
  });

  it('after fermentation starts, uses the alcohol correction with the original Brix (Terrill 2011 cubic, worked by hand)', () => {
    // Terrill (2011) cubic with wort-corrected OB = 12.48/1.04 = 12 and FB = 6.24/1.04 = 6:
    // SG = 1 − 0.0044993·12 + 0.011774·6 + 0.00027581·144 − 0.0012717·36 − 0.00000728·1728 + 0.000063293·216
    //    = 1 − 0.0539916 + 0.070644 + 0.03971664 − 0.0457812 − 0.01257984 + 0.013671288 = 1.011679
    const r = correctReading(refractometer, { brix: 6.24, originalBrix: 12.48, fermentationStarted: true });
    expect(Math.abs(r.corrected - 1.011679)).toBeLessThan(1e-6);
    // OG of 12 °P is about 1.0484 (ASBC Plato table, recalled from memory), so about 76 % attenuated:
    // inside the 73–91 % the correction was fitted to, not rough.
    expect(r.correction).toEqual({ kind: 'wcf-alcohol', wcf: 1.04, originalBrix: 12.48, formula: 'terrill-2011-cubic', rough: false });
    expect(r.warnings.join(' ')).toMatch(/Alcohol skews a refractometer/);
  });

  it('with no drop from the original reading it is plain wort, not 1.195 (issue case 20.8 °Bx against 20.8 °Bx)', () => {
    // 20.8 / 1.04 = 20.0 °P, which the ASBC Plato table gives as SG 1.0829 (recalled from memory).
    const r = correctReading(refractometer, { brix: 20.8, originalBrix: 20.8, fermentationStarted: true });
    expect(r.corrected).toBeCloseTo(1.0829, 3);
    expect(r.correction).toMatchObject({ formula: 'unfermented' });
    expect(r.warnings.join(' ')).toMatch(/nothing has fermented/);
  });

  it('refuses, under the Brix field, a small drop where the correction would exceed the wort itself', () => {
    // Terrill cubic at OB 20, FB 17 (worked by hand): 1 − 0.089986 + 0.200158 + 0.110324 − 0.3675213
    // − 0.05824 + 0.310958 = 1.1057, above the wort's 1.0829.
    const e = brewError(() => correctReading(refractometer, { brix: 17 * 1.04, originalBrix: 20.8, fermentationStarted: true }));
    expect(e.field).toBe('brix');
    expect(e.message).toMatch(/too early in fermentation/);
    expect(e.message).toMatch(/Terrill's \(2011\) correction was fitted to finished beers of OG 1\.036–1\.106 at 73–91 % apparent attenuation/);
  });

  it('flags an early-fermentation estimate as rough', () => {
    // Terrill cubic at OB 20, FB 14 (worked by hand): 1 − 0.089986 + 0.164836 + 0.110324 − 0.2492532
    // − 0.05824 + 0.17367599 = 1.05136: (1.0829 − 1.0514) / 0.0829 ≈ 38 % attenuated, below 73 %.
    const r = correctReading(refractometer, { brix: 14 * 1.04, originalBrix: 20.8, fermentationStarted: true });
    expect(Math.abs(r.corrected - 1.05136)).toBeLessThan(1e-5);
    expect(r.correction).toMatchObject({ rough: true });
    expect(r.warnings.join(' ')).toMatch(/Early in fermentation \(about 38 % attenuated\).*rough estimate/);
  });

  it('refuses a fermenting reading without the original Brix instead of giving a wrong gravity', () => {
    const e = brewError(() => correctReading(refractometer, { brix: 6.2, fermentationStarted: true }));
    expect(e.field).toBe('originalBrix');
    expect(e.message).toMatch(/alcohol skews a refractometer/);
  });

  it('rejects a Brix beyond the refractometer scale', () => {
    expect(brewError(() => correctReading(refractometer, { brix: 45 })).field).toBe('brix');
  });
});

describe('thermometer: the offset found in its check', () => {
  it('reads 0.4 °C high, so 66.4 °C on the dial is 66.0 °C', () => {
    const r = correctReading(thermometer, { tempC: 66.4 });
    expect(r.corrected).toBeCloseTo(66.0, 10);
    expect(r.correction).toEqual({ kind: 'offset', offsetC: 0.4 });
    expect(r.warnings).toEqual([]);
  });

  it('flags an offset over 1 °C and an unchecked thermometer', () => {
    expect(correctReading({ ...thermometer, offsetC: -2.5 }, { tempC: 20 }).warnings[0]).toMatch(/reads 2\.5 °C low, more than 1 °C off/);
    expect(correctReading(defaultSnapshot('thermometer'), { tempC: 20 }).warnings[0]).toMatch(/stick-on strips can be several degrees off/);
  });

  it('true temperature plus offset is always what the dial showed (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 130, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true }), (tempC, offsetC) => {
        const r = correctReading({ ...thermometer, offsetC }, { tempC });
        return Math.abs(r.corrected + offsetC - tempC) < 1e-9;
      }),
    );
  });
});

describe('pH meter: a reminder when the two-point calibration is older than the interval', () => {
  it('45 days after a calibration with a 30-day interval: overdue', () => {
    const r = correctReading(phMeter, { ph: 5.32 }, new Date('2025-02-15T09:00:00Z'));
    expect(r.corrected).toBe(5.32);
    expect(r.correction).toEqual({ kind: 'ph-calibration', calibratedOn: '2025-01-01', daysSinceCalibration: 45, reminderDays: 30 });
    expect(r.warnings[0]).toMatch(/45 days ago, beyond your 30-day interval/);
  });

  it('19 days after: no reminder; due on the 31st (1 January + 30 days)', () => {
    const now = new Date('2025-01-20T18:00:00Z');
    expect(correctReading(phMeter, { ph: 5.3 }, now).warnings).toEqual([]);
    expect(phCalibrationStatus(phMeter, now)).toMatchObject({ daysSince: 19, dueOn: '2025-01-31', overdue: false });
  });

  it('warns when never calibrated, and when the meter is too coarse for mash pH', () => {
    expect(correctReading(defaultSnapshot('ph_meter'), { ph: 5.3 }).warnings[0]).toMatch(/No two-point calibration/);
    const coarse = correctReading({ ...phMeter, resolutionPh: 0.1 }, { ph: 5.3 }, new Date('2025-01-05T00:00:00Z'));
    expect(coarse.warnings.join(' ')).toMatch(/Paper strips and pool meters are not good enough/);
    expect(brewError(() => correctReading(phMeter, { ph: 15 })).field).toBe('ph');
  });
});

describe('snapshots', () => {
  it('every default snapshot is a valid stored snapshot', () => {
    for (const kind of ['hydrometer', 'refractometer', 'thermometer', 'ph_meter'] as const) {
      expect(instrumentSnapshotSchema.safeParse(defaultSnapshot(kind)).success).toBe(true);
    }
  });
});
