import convert from 'convert-units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brewError } from './testing';
import { cToF, deltaCToF, fToC, gToOz, kgToLb, lbToKg, litresToUsGallons, ozToG, usGallonsToLitres } from './units';

// Reference: the convert-units package (2.3.4). It rounds some factors to 6 significant figures
// (1 lb = 0.453592 kg, 1 oz = 28.3495 g), so we compare to a relative 2e-6.
const amount = fc.double({ min: 0.001, max: 10_000, noNaN: true });
const close = (ours: number, theirs: number) => expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(Math.abs(theirs) * 2e-6 + 1e-12);

describe('unit conversions against convert-units', () => {
  it('litres and US gallons', () => {
    fc.assert(
      fc.property(amount, (x) => {
        close(litresToUsGallons(x), convert(x).from('l').to('gal'));
        close(usGallonsToLitres(x), convert(x).from('gal').to('l'));
      }),
    );
  });

  it('kilograms and pounds', () => {
    fc.assert(
      fc.property(amount, (x) => {
        close(kgToLb(x), convert(x).from('kg').to('lb'));
        close(lbToKg(x), convert(x).from('lb').to('kg'));
      }),
    );
  });

  it('grams and ounces', () => {
    fc.assert(
      fc.property(amount, (x) => {
        close(gToOz(x), convert(x).from('g').to('oz'));
        close(ozToG(x), convert(x).from('oz').to('g'));
      }),
    );
  });

  it('°C and °F', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 250, noNaN: true }), (t) => {
        close(cToF(t), convert(t).from('C').to('F'));
        close(fToC(t), convert(t).from('F').to('C'));
      }),
    );
  });

  it('a temperature difference has no 32 °F offset', () => {
    expect(deltaCToF(5)).toBeCloseTo(9, 12);
  });

  it('round-trips (property)', () => {
    fc.assert(
      fc.property(amount, (x) => {
        expect(usGallonsToLitres(litresToUsGallons(x))).toBeCloseTo(x, 9);
        expect(lbToKg(kgToLb(x))).toBeCloseTo(x, 9);
        expect(fToC(cToF(x))).toBeCloseTo(x, 9);
      }),
    );
  });

  it('rejects negative amounts and temperatures below absolute zero', () => {
    expect(brewError(() => litresToUsGallons(-1)).field).toBe('volumeL');
    expect(brewError(() => cToF(-300)).message).toMatch(/absolute zero/);
  });
});
