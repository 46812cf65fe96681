import { describe, expect, it } from 'vitest';
import { countOf } from './plural';

// English plural categories (Unicode CLDR plural rules, "en": one for exactly 1, other otherwise).
describe('countOf', () => {
  it('uses the singular only for exactly one', () => {
    expect(countOf(1, 'reading')).toBe('1 reading');
    expect(countOf(0, 'reading')).toBe('0 readings');
    expect(countOf(2, 'row')).toBe('2 rows');
    expect(countOf(1.5, 'day')).toBe('1.5 days');
  });
  it('takes an irregular plural', () => {
    expect(countOf(3, 'batch', 'batches')).toBe('3 batches');
  });
});
