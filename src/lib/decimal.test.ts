import { describe, expect, it } from 'vitest';
import { parseDecimal } from './decimal';

describe('parseDecimal', () => {
  it('reads a decimal point or a decimal comma alike', () => {
    expect(parseDecimal('1.048')).toBe(1.048);
    expect(parseDecimal('1,048')).toBe(1.048);
    expect(parseDecimal(' 11,4 ')).toBe(11.4);
    expect(parseDecimal('-0,5')).toBe(-0.5);
  });

  it('tells empty text from text that is not a number', () => {
    expect(parseDecimal('')).toBeUndefined();
    expect(parseDecimal('   ')).toBeUndefined();
    expect(parseDecimal('abc')).toBeNaN();
    expect(parseDecimal('-')).toBeNaN();
    expect(parseDecimal('1,2,3')).toBeNaN();
    expect(parseDecimal('Infinity')).toBeNaN();
  });
});
