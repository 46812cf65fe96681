import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fixedDigits, show, showSg } from './validate';

describe('number formatting for messages', () => {
  it('matches toFixed (the reference) for ordinary brewing numbers', () => {
    fc.assert(
      fc.property(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 0, max: 4 }), (n, digits) => {
        // Values with an exact decimal representation at one more digit, so both round the same way.
        const value = n / 1000 + 0.0001;
        // We drop toFixed's negative zero ("-0.00"), which nobody wants to read.
        const reference = value.toFixed(digits).replace(/^-(0(\.0+)?)$/, '$1');
        expect(fixedDigits(value, digits)).toBe(reference);
      }),
    );
  });

  it('drops trailing zeros for show, keeps three decimals for gravities', () => {
    expect(show(21)).toBe('21');
    expect(show(17.25, 1)).toBe('17.3');
    expect(show(-0.04, 1)).toBe('0');
    expect(showSg(1.05)).toBe('1.050');
    expect(showSg(1.0484)).toBe('1.0484');
    expect(showSg(1.3)).toBe('1.300');
  });
});
