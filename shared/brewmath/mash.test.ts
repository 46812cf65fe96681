import { describe, expect, it } from 'vitest';
import { MASH_PH_BAND, MASH_PH_TARGET, mashPhStatus } from './mash';
import { brewError } from './testing';

describe('mash pH (common practice: aim about 5.2, roughly 5.2 to 5.6 acceptable)', () => {
  it('the target sits inside the band', () => {
    expect(MASH_PH_TARGET).toBeCloseTo(5.2, 9);
    expect(mashPhStatus(MASH_PH_TARGET)).toBe('in-band');
    expect(MASH_PH_BAND.max).toBeGreaterThan(MASH_PH_BAND.min);
  });

  it('classifies readings at a meter\'s 0.01 resolution', () => {
    expect(mashPhStatus(5.19)).toBe('low');
    expect(mashPhStatus(5.2)).toBe('in-band');
    expect(mashPhStatus(5.6)).toBe('in-band');
    expect(mashPhStatus(5.61)).toBe('high');
  });

  it('rejects a reading off the pH scale', () => {
    expect(brewError(() => mashPhStatus(15)).field).toBe('ph');
  });
});
