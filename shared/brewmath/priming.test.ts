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
  // Sources: CO2 density 1.977 g/L at 0 °C and 101.325 kPa (CRC Handbook, recalled from memory);
  // about 96 % of theory reaches CO2, the rest going to glycerol, acids and yeast (Pasteur's
  // balance, recalled from memory); molar masses from IUPAC atomic weights.
  it('sucrose is 4.00 g per litre per volume of CO2 (worked by hand: 1.977 × 342.30 / (4 × 44.01) / 0.96)', () => {
    // 1.977 × 342.30 = 676.73; / 176.04 = 3.8442; / 0.96 = 4.0044. The common rule of thumb is "about 4 g/L".
    expect(PRIMING_G_PER_L_PER_CO2_VOLUME.sucrose).toBeCloseTo(4.0044, 3);
  });

  it('corn sugar (the monohydrate) takes 15.8 % more than sucrose; DME is sucrose ÷ 0.68', () => {
    // Stoichiometry, worked by hand: per mole of CO2, (198.17 / 2) / (342.30 / 4) = 99.085 / 85.575 = 1.1579.
    const { sucrose, dextrose, dme } = PRIMING_G_PER_L_PER_CO2_VOLUME;
    expect(dextrose / sucrose).toBeCloseTo(1.1579, 3);
    // 68 % fermentable DME: common practice, no source.
    expect(dme / sucrose).toBeCloseTo(1 / 0.68, 9);
  });

  it('20 L at 20 °C to 2.4 volumes takes about 122 g of sucrose (worked by hand)', () => {
    // Residual CO2 at 20 °C = 68 °F from the published quadratic (recalled from memory):
    // 3.0378 − 0.050062 × 68 + 0.00026555 × 68² = 0.8615 volumes; (2.4 − 0.8615) × 4.0044 × 20 L = 123.2 g.
    // With the 0.878 volumes of the Bunsen coefficient instead, 121.9 g: "about 122 g".
    const g = primingSugarG({ volumeL: 20, warmestTempC: 20, targetCo2Volumes: 2.4, sugar: 'sucrose' });
    expect(g).toBeCloseTo(123.2, 0);
    expect(Math.abs(g / 122 - 1)).toBeLessThan(0.015);
  });

  it('5 US gal at 20 °C to 2.5 volumes takes 5.07 oz of corn sugar, a little above the "3/4 cup, 4 to 5 oz" handbook rule (recalled from memory)', () => {
    // Worked by hand: 5 × 3.785411784 = 18.927 L; dextrose 1.977 × 198.17 / 88.02 / 0.96 = 4.6366 g/L per volume;
    // (2.5 − 0.8615) × 4.6366 × 18.927 = 143.8 g = 5.07 oz (28.3495 g/oz). The handbook rule is for
    // about 2.3–2.4 volumes from a cooler cellar, so a warmer, fizzier target lands just above it.
    const g = primingSugarG({ volumeL: usGallonsToLitres(5), warmestTempC: 20, targetCo2Volumes: 2.5, sugar: 'dextrose' });
    expect(gToOz(g)).toBeCloseTo(5.07, 1);
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
