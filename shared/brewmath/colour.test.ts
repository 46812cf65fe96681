import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ebcToSrm, maltColourUnits, maltEbcToLovibond, moreyColour, moreySrmFromMcu, srmToEbc } from './colour';
import { brewError } from './testing';

describe('Morey colour', () => {
  it('one pound of 10 °L malt in one US gallon is 10 MCU: SRM = 1.4922 × 10^0.6859 (published equation, by hand)', () => {
    // 10^0.6859 = e^(0.6859 × 2.302585) = e^1.579343 = 4.85177; × 1.4922 = 7.2398
    const result = moreyColour([{ massKg: 0.45359237, colourLovibond: 10 }], 3.785411784);
    expect(result.mcu).toBeCloseTo(10, 9);
    expect(result.srm).toBeCloseTo(7.24, 2);
  });

  it('a pale ale grist, worked by hand in SI then Morey\'s units', () => {
    // 4 kg of 3 °L pale malt and 0.25 kg of 60 °L crystal in 20 L.
    // 4 kg = 8.81849 lb × 3 = 26.4555; 0.25 kg = 0.551156 lb × 60 = 33.0693; Σ = 59.5248 lb·°L
    // 20 L = 5.28344 US gal; MCU = 59.5248 / 5.28344 = 11.2663
    // SRM = 1.4922 × 11.2663^0.6859 = 1.4922 × e^(0.6859 × 2.42180) = 1.4922 × e^1.66111 = 1.4922 × 5.26530 = 7.857
    // EBC = 1.97 × 7.857 = 15.48
    const result = moreyColour(
      [
        { massKg: 4, colourLovibond: 3 },
        { massKg: 0.25, colourLovibond: 60 },
      ],
      20,
    );
    expect(result.mcu).toBeCloseTo(11.266, 2);
    expect(result.srm).toBeCloseTo(7.857, 2);
    expect(result.ebc).toBeCloseTo(15.48, 1);
    expect(result.beyondFit).toBe(false);
  });

  it('no colour in the grist: 0 SRM', () => {
    expect(moreySrmFromMcu(0)).toBe(0);
  });

  it('more dark malt never makes the beer lighter (property)', () => {
    const grain = fc.record({ massKg: fc.double({ min: 0, max: 20, noNaN: true }), colourLovibond: fc.double({ min: 0, max: 700, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(grain, { maxLength: 6 }), fc.double({ min: 0, max: 2, noNaN: true }), fc.double({ min: 200, max: 700, noNaN: true }), fc.double({ min: 1, max: 200, noNaN: true }), (grist, darkKg, darkL, volumeL) => {
        const before = moreyColour(grist, volumeL).srm;
        expect(moreyColour([...grist, { massKg: darkKg, colourLovibond: darkL }], volumeL).srm).toBeGreaterThanOrEqual(before);
      }),
    );
  });

  it('rejects a malt colour out of range and names the field', () => {
    const error = brewError(() => maltColourUnits([{ massKg: 1, colourLovibond: 3 }, { massKg: 1, colourLovibond: 900 }], 20));
    expect(error.field).toBe('grist.1.colourLovibond');
    expect(error.message).toContain('°L');
    expect(brewError(() => maltColourUnits([{ massKg: 1, colourLovibond: -2 }], 20)).field).toBe('grist.0.colourLovibond');
    expect(brewError(() => maltColourUnits([], 0)).field).toBe('volumeL');
  });
});

describe('SRM and EBC', () => {
  it('EBC = 1.97 × SRM (ASBC/EBC method relation, recalled from memory)', () => {
    expect(srmToEbc(10)).toBeCloseTo(19.7, 10);
    expect(ebcToSrm(39.4)).toBeCloseTo(20, 10);
    expect(maltEbcToLovibond(118.2)).toBeCloseTo(60, 10);
  });
  it('rejects a negative colour', () => {
    expect(brewError(() => srmToEbc(-1)).field).toBe('srm');
    expect(brewError(() => ebcToSrm(-1)).field).toBe('ebc');
  });
});
