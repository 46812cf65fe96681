import { describe, expect, it } from 'vitest';
import { fgStability } from './fermentation';
import { brewError } from './testing';

// All checks here are common practice, no source: start checking FG around day 12; package
// only when two readings two or three days apart are the same (within 0.001).
const pitched = new Date('2026-03-01T18:00:00Z');
const day = (n: number) => new Date(pitched.getTime() + n * 86_400_000);

describe('final-gravity stability (common practice)', () => {
  it('before day 12 it is too early to tell, whatever the readings say', () => {
    const result = fgStability(
      [
        { at: day(5), sg: 1.02 },
        { at: day(8), sg: 1.02 },
      ],
      pitched,
    );
    expect(result.state).toBe('too-early');
    expect(result.reason).toMatch(/day 12/);
  });

  it('is never stable on elapsed days alone', () => {
    const result = fgStability([], pitched, { now: day(40) });
    expect(result.state).toBe('too-early');
    expect(result.daysSincePitch).toBeCloseTo(40, 9);
    expect(result.reason).toMatch(/Take one now/);
  });

  it('one reading after day 12 is not enough', () => {
    expect(fgStability([{ at: day(12), sg: 1.012 }], pitched).state).toBe('too-early');
  });

  it('two equal readings one day apart are not enough', () => {
    const result = fgStability(
      [
        { at: day(12), sg: 1.012 },
        { at: day(13), sg: 1.012 },
      ],
      pitched,
    );
    expect(result.state).toBe('too-early');
    expect(result.reason).toMatch(/Read again in 1 day/);
  });

  it('two equal readings two or three days apart after day 12 are stable', () => {
    for (const gap of [2, 3]) {
      const result = fgStability(
        [
          { at: day(12), sg: 1.012 },
          { at: day(12 + gap), sg: 1.012 },
        ],
        pitched,
      );
      expect(result.state).toBe('stable');
      expect(result.reason).toMatch(/1.012/);
    }
  });

  it('readings within 0.001 count as equal; further apart is still moving', () => {
    const within = [
      { at: day(12), sg: 1.013 },
      { at: day(14), sg: 1.012 },
    ];
    expect(fgStability(within, pitched).state).toBe('stable');
    const moving = [
      { at: day(12), sg: 1.0135 },
      { at: day(14), sg: 1.012 },
    ];
    const result = fgStability(moving, pitched);
    expect(result.state).toBe('moving');
    expect(result.reason).toMatch(/dropped 0.0015 over 2 days/);
  });

  it('a reading that disagrees between the pair keeps it "moving"', () => {
    const result = fgStability(
      [
        { at: day(12), sg: 1.012 },
        { at: day(13), sg: 1.009 },
        { at: day(14), sg: 1.012 },
      ],
      pitched,
    );
    expect(result.state).toBe('moving');
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
  });

  it('a custom first-check day and tolerance are honoured', () => {
    const readings = [
      { at: day(7), sg: 1.01 },
      { at: day(9), sg: 1.0115 },
    ];
    expect(fgStability(readings, pitched).state).toBe('too-early');
    expect(fgStability(readings, pitched, { firstCheckDay: 7 }).state).toBe('moving');
    expect(fgStability(readings, pitched, { firstCheckDay: 7, toleranceSg: 0.002 }).state).toBe('stable');
  });

  it('rejects a bad date or an impossible reading', () => {
    expect(brewError(() => fgStability([{ at: 'yesterday', sg: 1.01 }], pitched)).field).toBe('readings');
    expect(brewError(() => fgStability([{ at: day(13), sg: 1.5 }], pitched)).message).toMatch(/Reading 1/);
    expect(brewError(() => fgStability([], 'not a date')).field).toBe('pitchedAt');
  });
});
