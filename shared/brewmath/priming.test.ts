import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PRIMING_G_PER_L_PER_CO2_VOLUME, primingSugarG, residualCo2Volumes } from './priming';
import { brewError } from './testing';
import { gToOz, usGallonsToLitres } from './units';

describe('residual CO2', () => {
  // Bunsen solubility coefficient of CO2 in water at 1 atm (CRC Handbook, recalled from memory):
  // beer after fermentation holds about what water would at the same temperature.
  it.each([
    [0, 1.713],
    [10, 1.194],
    [20, 0.878],
    [30, 0.665],
  ])('at %s °C is within 0.04 of %s volumes (CO2 solubility in water, recalled from memory)', (t, volumes) => {
    expect(Math.abs(residualCo2Volumes(t) - volumes)).toBeLessThan(0.04);
  });

  it('warmer beer holds less CO2 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 29, noNaN: true }), (t) => {
        expect(residualCo2Volumes(t + 1)).toBeLessThan(residualCo2Volumes(t));
      }),
    );
  });
});

describe('priming sugar', () => {
  it('sucrose is about 4 g per litre per volume of CO2 (common practice, 3.8 to 4.0)', () => {
    expect(PRIMING_G_PER_L_PER_CO2_VOLUME.sucrose).toBeGreaterThan(3.8);
    expect(PRIMING_G_PER_L_PER_CO2_VOLUME.sucrose).toBeLessThan(4.0);
  });

  it('corn sugar takes about 10 % more than sucrose, DME about half as much again (common practice)', () => {
    const { sucrose, dextrose, dme } = PRIMING_G_PER_L_PER_CO2_VOLUME;
    expect(sucrose / dextrose).toBeGreaterThan(0.85);
    expect(sucrose / dextrose).toBeLessThan(0.92);
    expect(dme / sucrose).toBeGreaterThan(1.4);
    expect(dme / sucrose).toBeLessThan(1.6);
  });

  it('5 US gal at 20 °C to 2.5 volumes takes about 3/4 cup, 4 to 5 oz, of corn sugar (a homebrewing handbook, recalled from memory)', () => {
    const g = primingSugarG({ volumeL: usGallonsToLitres(5), warmestTempC: 20, targetCo2Volumes: 2.5, sugar: 'dextrose' });
    expect(gToOz(g)).toBeGreaterThan(4);
    expect(gToOz(g)).toBeLessThan(5.1);
  });

  it('beer that was warmer needs more sugar for the same carbonation (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 25, noNaN: true }), fc.constantFrom('sucrose', 'dextrose', 'dme' as const), (t, sugar) => {
        const cool = primingSugarG({ volumeL: 20, warmestTempC: t, targetCo2Volumes: 2.6, sugar });
        const warm = primingSugarG({ volumeL: 20, warmestTempC: t + 5, targetCo2Volumes: 2.6, sugar });
        expect(warm).toBeGreaterThan(cool);
      }),
    );
  });

  it('needs none when the beer already holds the wanted CO2', () => {
    expect(primingSugarG({ volumeL: 20, warmestTempC: 2, targetCo2Volumes: 1.5, sugar: 'sucrose' })).toBe(0);
  });

  it('rejects an unknown sugar, a temperature outside the fit, and bottle-bursting carbonation', () => {
    expect(brewError(() => primingSugarG({ volumeL: 20, warmestTempC: 20, targetCo2Volumes: 2.5, sugar: 'honey' as 'sucrose' })).field).toBe('sugar');
    expect(brewError(() => primingSugarG({ volumeL: 20, warmestTempC: 35, targetCo2Volumes: 2.5, sugar: 'sucrose' })).field).toBe('warmestTempC');
    expect(brewError(() => primingSugarG({ volumeL: 20, warmestTempC: 20, targetCo2Volumes: 6, sugar: 'sucrose' })).field).toBe('targetCo2Volumes');
    expect(brewError(() => primingSugarG({ volumeL: -1, warmestTempC: 20, targetCo2Volumes: 2.5, sugar: 'sucrose' })).field).toBe('volumeL');
  });
});
