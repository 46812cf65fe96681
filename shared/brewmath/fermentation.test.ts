import { describe, expect, it } from 'vitest';
import { expectedFinalGravity, fgStability } from './fermentation';
import { brewError } from './testing';

// The rule is common practice, no source: start checking FG around day 12; package only when the
// last two hydrometer readings two or three days apart are the same figure at the hydrometer's
// resolution (0.001 on the usual brewing hydrometer; readings closer than half a step are the
// same), with no steady fall of more than about a quarter point (0.00025) a day over three or more
// readings, and not well above where the recipe should finish (a stuck fermentation).
const pitched = new Date('2026-03-01T18:00:00Z');
const day = (n: number) => new Date(pitched.getTime() + n * 86_400_000);
const r = (d: number, sg: number, resolutionSg?: number) => ({ at: day(d), sg, resolutionSg });

describe('final-gravity stability (common practice, no source)', () => {
  it('before day 12 it is too early to tell, whatever the readings say', () => {
    const result = fgStability([r(5, 1.02), r(8, 1.02)], pitched);
    expect(result.state).toBe('too-early');
    expect(result.reason).toMatch(/day 12/);
  });

  it('after day 12 with no reading it says so, not "too early"', () => {
    const result = fgStability([], pitched, { now: day(40) });
    expect(result.state).toBe('no-reading');
    expect(result.daysSincePitch).toBeCloseTo(40, 9);
    expect(result.reason).toMatch(/No hydrometer reading since day 12 yet\. Take one now/);
  });

  it('one reading after day 12 is not enough, and the message names it', () => {
    const result = fgStability([r(12, 1.012)], pitched);
    expect(result.state).toBe('too-early');
    expect(result.reason).toMatch(/1\.012 on day 12/);
    expect(result.reason).toMatch(/day 14 or later/);
  });

  it('two equal readings one day apart are not enough', () => {
    const result = fgStability([r(12, 1.012), r(13, 1.012)], pitched);
    expect(result.state).toBe('too-early');
    expect(result.compared).toBeNull();
  });

  it('two equal readings two or three days apart after day 12 are stable, and the message says what was compared', () => {
    const result = fgStability([r(14, 1.012), r(17, 1.012)], pitched);
    expect(result.state).toBe('stable');
    expect(result.reason).toBe('1.012 on day 14 and 1.012 on day 17, 3 days apart: the same reading. Final gravity is stable.');
    expect(fgStability([r(12, 1.012), r(14, 1.012)], pitched).state).toBe('stable');
  });

  // Found case: a change of one scale step (0.001) over three days is a change, not "the same".
  it('1.012 then 1.011 three days apart is still moving', () => {
    const result = fgStability([r(14, 1.012), r(17, 1.011)], pitched);
    expect(result.state).toBe('moving');
    expect(result.reason).toMatch(/^1\.012 on day 14 and 1\.011 on day 17, 3 days apart: the gravity fell by 0\.001/);
    expect(result.reason).not.toMatch(/same|equal|agree/);
  });

  // Found case: 1.0128 / 1.0119 / 1.0110 on days 12 / 14 / 16 falls 0.45 points a day.
  it('1.0128, 1.0119, 1.0110 on days 12, 14, 16 is not stable', () => {
    const result = fgStability([r(12, 1.0128), r(14, 1.0119), r(16, 1.011)], pitched);
    expect(result.state).toBe('moving');
    // Even on a coarse 0.002 hydrometer, where the last pair is within half a step, the steady
    // fall over three readings (0.45 points a day, worked by hand: 1.8 points in 4 days) keeps it moving.
    const coarse = fgStability([r(12, 1.0128, 0.002), r(14, 1.0119, 0.002), r(16, 1.011, 0.002)], pitched);
    expect(coarse.state).toBe('moving');
    expect(coarse.reason).toMatch(/fell steadily from 1\.0128 on day 12 to 1\.011 on day 16 over 3 readings, about 0\.45 points a day/);
  });

  it('readings closer than half the scale step are the same; half a step or more is a change', () => {
    // 0.0004 apart on a 0.001 hydrometer: below half a step.
    expect(fgStability([r(12, 1.0124), r(14, 1.012)], pitched).state).toBe('stable');
    // 0.0005 apart: exactly half a step is not "closer than half".
    expect(fgStability([r(12, 1.0125), r(14, 1.012)], pitched).state).toBe('moving');
    // A 0.002 hydrometer cannot tell 1.013 from 1.012.5; one whole 0.001 step is half of its step.
    expect(fgStability([r(12, 1.013, 0.002), r(14, 1.012, 0.002)], pitched).state).toBe('moving');
    expect(fgStability([r(12, 1.0129, 0.002), r(14, 1.012, 0.002)], pitched).state).toBe('stable');
  });

  it('a fall that has stopped is stable: the last two readings decide, not the earlier drop', () => {
    expect(fgStability([r(12, 1.016), r(14, 1.012), r(17, 1.012)], pitched).state).toBe('stable');
  });

  it('a slow fall under a quarter point a day does not count as moving', () => {
    // 1.0122, 1.0120, 1.0118 over days 12, 14, 16: 0.1 point a day (worked by hand), each pair
    // within half a 0.001 step of the next two days later.
    const result = fgStability([r(12, 1.0122), r(14, 1.012), r(16, 1.0118)], pitched);
    expect(result.state).toBe('stable');
    expect(result.reason).toMatch(/the same at this hydrometer's 0\.001 scale step/);
  });

  it('a reading that disagrees between the pair keeps it "moving"', () => {
    const result = fgStability([r(12, 1.012), r(13, 1.009), r(14, 1.012)], pitched);
    expect(result.state).toBe('moving');
    expect(result.reason).toMatch(/1\.009 on day 13 between them does not/);
  });

  // Found case: steady at 1.030 when the recipe expects 1.012.
  it('steady far above the expected FG is stuck, not stable', () => {
    const result = fgStability([r(14, 1.03), r(17, 1.03)], pitched, { expectedFgSg: 1.012 });
    expect(result.state).toBe('stuck');
    expect(result.reason).toMatch(/^1\.030 on day 14 and 1\.030 on day 17, 3 days apart: steady, but 0\.018 above the 1\.012 this recipe should finish at/);
    // Within four points of the expected FG is a normal finish.
    expect(fgStability([r(14, 1.015), r(17, 1.015)], pitched, { expectedFgSg: 1.012 }).state).toBe('stable');
    // Without an expected FG there is nothing to compare with.
    expect(fgStability([r(14, 1.03), r(17, 1.03)], pitched).state).toBe('stable');
  });

  it('accepts ISO strings and ignores input order', () => {
    const result = fgStability(
      [
        { at: day(15).toISOString(), sg: 1.011 },
        { at: day(12).toISOString(), sg: 1.011 },
      ],
      pitched.toISOString(),
    );
    expect(result.state).toBe('stable');
    expect(result.latestSg).toBe(1.011);
    expect(result.compared?.map((c) => c.sg)).toEqual([1.011, 1.011]);
  });

  it('a custom first-check day and resolution are honoured', () => {
    const readings = [r(7, 1.01), r(9, 1.0115)];
    expect(fgStability(readings, pitched).state).toBe('too-early');
    expect(fgStability(readings, pitched, { firstCheckDay: 7 }).state).toBe('moving');
    expect(fgStability(readings, pitched, { firstCheckDay: 7, resolutionSg: 0.005 }).state).toBe('stable');
  });

  it('rejects a bad date, an impossible reading or resolution', () => {
    expect(brewError(() => fgStability([{ at: 'yesterday', sg: 1.01 }], pitched)).field).toBe('readings');
    expect(brewError(() => fgStability([{ at: day(13), sg: 1.5 }], pitched)).message).toMatch(/Reading 1/);
    expect(brewError(() => fgStability([], 'not a date')).field).toBe('pitchedAt');
    expect(brewError(() => fgStability([r(13, 1.01, 0.5)], pitched)).field).toBe('resolutionSg');
  });
});

describe('expected final gravity', () => {
  it('is the recipe FG when there is one', () => {
    expect(expectedFinalGravity({ fgSg: 1.012, ogSg: 1.05, attenuation: 0.75 })).toBe(1.012);
  });
  it('else OG and apparent attenuation: 1.050 at 75 % finishes at 1.0125 (worked by hand: 50 × 0.25 = 12.5 points)', () => {
    expect(expectedFinalGravity({ ogSg: 1.05, attenuation: 0.75 })).toBeCloseTo(1.0125, 9);
  });
  it('is unknown without either', () => {
    expect(expectedFinalGravity({ ogSg: 1.05 })).toBeNull();
  });
});
