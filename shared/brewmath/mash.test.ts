import { describe, expect, it } from 'vitest';
import { MASH_PH_BAND, MASH_PH_TARGET, mashPhStatus, mashPhVerdict } from './mash';
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
    expect(brewError(() => mashPhVerdict(15)).field).toBe('ph');
  });
});

describe('mash pH against the recipe target ± 0.1 (common practice, no source)', () => {
  it('a reading at the 5.2 target is never "low", even below the band edge (issue case 5.194)', () => {
    const v = mashPhVerdict(5.194);
    expect(v.verdict).toBe('on-target');
    expect(v.message).toBe("Mash pH 5.19 is on the recipe's 5.20 target (± 0.10). It is also below the usual 5.2–5.6 band.");
  });

  it('the tolerance is inclusive at the meter\'s two decimals; beyond it is low or high', () => {
    expect(mashPhVerdict(5.1).verdict).toBe('on-target');
    expect(mashPhVerdict(5.3).verdict).toBe('on-target');
    expect(mashPhVerdict(5.09).verdict).toBe('low');
    const high = mashPhVerdict(5.31);
    expect(high.verdict).toBe('high');
    expect(high.message).toBe("Mash pH 5.31 is 0.11 above the recipe's 5.20 target (± 0.10).");
  });

  it("judges against the recipe's own target, the band being advice only", () => {
    // 5.55 is inside the usual band, but 0.15 above a 5.40 target: high.
    expect(mashPhVerdict(5.55, 5.4).verdict).toBe('high');
    expect(mashPhVerdict(5.55, 5.4).band).toBe('in-band');
    expect(mashPhVerdict(5.45, 5.4).verdict).toBe('on-target');
  });
});
