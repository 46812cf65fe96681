import { describe, expect, it } from 'vitest';
import { souringProgress, souringTargetReached } from './souring';

// "Reached" is at or below the recipe's target pH (common practice, no source: kettle sours stop
// at about pH 3.2 to 3.6 before the boil). Hours are worked by hand from the clock times below.
describe('souring progress', () => {
  it('counts hours from the first reading and marks the target reached at or below it', () => {
    const steps = souringProgress(
      [
        { id: 3, ph: 3.38, takenAt: '2026-06-02T08:00:00Z' }, // 24 h after 08:00 the day before
        { id: 1, ph: 4.5, takenAt: '2026-06-01T08:00:00Z' }, // first: 0 h
        { id: 2, ph: 3.62, takenAt: '2026-06-01T20:30:00Z' }, // 12.5 h
      ],
      3.4,
    );
    expect(steps.map((s) => s.id)).toEqual([1, 2, 3]);
    expect(steps.map((s) => s.hoursSinceFirst)).toEqual([0, 12.5, 24]);
    expect(steps.map((s) => s.reached)).toEqual([false, false, true]);
  });

  it('a reading exactly at the target counts as reached; 0.01 above does not', () => {
    expect(souringTargetReached(3.4, 3.4)).toBe(true);
    expect(souringTargetReached(3.41, 3.4)).toBe(false);
    expect(souringTargetReached(3.2, 3.6)).toBe(true);
  });

  it('no readings, no steps', () => {
    expect(souringProgress([], 3.4)).toEqual([]);
  });
});
