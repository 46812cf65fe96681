import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { abvPercent, abvPercentExact, apparentAttenuation, fgFromAttenuation } from './abv';
import { brewError } from './testing';

describe('ABV', () => {
  it('simple rule: (OG − FG) × 131.25 (homebrewing convention)', () => {
    expect(abvPercent(1.05, 1.01)).toBeCloseTo(5.25, 10);
    expect(abvPercent(1.04, 1.04)).toBe(0);
  });

  // A commonly published formula, recalled from memory: 76.08 × (OG − FG) / (1.775 − OG) × FG / 0.794.
  const published = (og: number, fg: number) => ((76.08 * (og - fg)) / (1.775 - og)) * (fg / 0.794);

  it.each([
    [1.04, 1.008],
    [1.05, 1.01],
    [1.06, 1.012],
  ])('exact (Balling) agrees within 0.15 %% ABV with a second published formula for OG %s, FG %s', (og, fg) => {
    expect(Math.abs(abvPercentExact(og, fg) - published(og, fg))).toBeLessThan(0.15);
  });

  it('exact and simple agree within 0.15 % ABV for ordinary beers (OG up to 1.060)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1.03, max: 1.06, noNaN: true }), fc.double({ min: 0.6, max: 0.85, noNaN: true }), (og, aa) => {
        const fg = 1 + (og - 1) * (1 - aa);
        expect(Math.abs(abvPercentExact(og, fg) - abvPercent(og, fg))).toBeLessThan(0.15);
      }),
    );
  });

  it('exact reads higher than the simple rule for strong beer (the rule under-reads above about 7 %)', () => {
    expect(abvPercentExact(1.09, 1.02)).toBeGreaterThan(abvPercent(1.09, 1.02) + 0.1);
  });

  it('rejects an FG above the OG', () => {
    const error = brewError(() => abvPercent(1.01, 1.05));
    expect(error.field).toBe('fg');
    expect(error.message).toContain('1.050');
    expect(brewError(() => abvPercentExact(1.3, 1.01)).field).toBe('og');
  });
});

describe('apparent attenuation', () => {
  it('is the share of gravity points fermented (definition)', () => {
    expect(apparentAttenuation(1.05, 1.0125)).toBeCloseTo(0.75, 12);
    expect(apparentAttenuation(1.04, 1.0)).toBeCloseTo(1, 12);
  });

  it('fgFromAttenuation is its inverse (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1.02, max: 1.15, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (og, aa) => {
        expect(apparentAttenuation(og, fgFromAttenuation(og, aa))).toBeCloseTo(aa, 9);
      }),
    );
  });

  it('rejects an OG of 1.000, where attenuation is undefined', () => {
    expect(brewError(() => apparentAttenuation(1, 1)).field).toBe('og');
  });
});
