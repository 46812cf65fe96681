import { describe, expect, it } from 'vitest';
import { fermentationVerdict } from './verdict';

// The rule checked here is common practice, no source: time alone proves nothing; start checking
// final gravity around day 12; package only when two hydrometer readings at least two days apart
// are the same at the hydrometer's resolution; steady far above the recipe's FG is stuck. An
// alcohol-corrected refractometer reading is only an estimate.
const pitched = new Date('2026-03-01T18:00:00Z');
const day = (n: number) => new Date(pitched.getTime() + n * 86_400_000);
const hyd = (d: number, sg: number, resolutionSg?: number) => ({ takenAt: day(d), sg, estimate: false, resolutionSg });
const refr = (d: number, sg: number) => ({ takenAt: day(d), sg, estimate: true });

describe('the fermentation verdict (common practice, no source)', () => {
  it('is never stable on elapsed days alone', () => {
    const v = fermentationVerdict([], pitched, day(40));
    expect(v.state).toBe('no-reading');
    expect(v.reason).toMatch(/Take one now/);
    expect(v.nextCheckAt).toBe(day(40).toISOString());
  });

  it('before day 12 it is too early, however steady the readings, and the next check is day 12', () => {
    const v = fermentationVerdict([hyd(5, 1.012), hyd(8, 1.012)], pitched, day(9));
    expect(v.state).toBe('too-early');
    expect(v.reason).toMatch(/day 12/);
    expect(v.nextCheckAt).toBe(day(12).toISOString());
  });

  it('two equal hydrometer readings two days apart after day 12 are stable', () => {
    const v = fermentationVerdict([hyd(3, 1.02), hyd(12, 1.012), hyd(14, 1.012)], pitched, day(14.1));
    expect(v.state).toBe('stable');
    expect(v.needsHydrometer).toBe(false);
    expect(v.nextCheckAt).toBeNull();
    expect(v.latestSg).toBe(1.012);
  });

  it('a drop of more than 0.001 over two days is still moving, with the next check two days on', () => {
    const v = fermentationVerdict([hyd(12, 1.016), hyd(14, 1.012)], pitched, day(14));
    expect(v.state).toBe('moving');
    expect(v.reason).toMatch(/still going/);
    expect(v.nextCheckAt).toBe(day(16).toISOString());
  });

  it('refractometer estimates alone never make it stable: it asks for a hydrometer reading', () => {
    const v = fermentationVerdict([refr(12, 1.011), refr(14, 1.011), refr(17, 1.011)], pitched, day(17));
    expect(v.state).toBe('no-reading');
    expect(v.needsHydrometer).toBe(true);
    expect(v.reason).toMatch(/hydrometer/);
  });

  it('one hydrometer reading and one agreeing estimate are still not a stable pair', () => {
    const v = fermentationVerdict([refr(12, 1.011), hyd(14, 1.011)], pitched, day(14));
    expect(v.state).toBe('too-early');
    expect(v.reason).toMatch(/hydrometer/);
  });

  it('falling estimates do show that fermentation is still moving', () => {
    const v = fermentationVerdict([refr(12, 1.02), refr(14, 1.014)], pitched, day(14));
    expect(v.state).toBe('moving');
    expect(v.reason).toMatch(/^Refractometer estimates/);
  });

  it('stable hydrometer readings win over estimates taken in between', () => {
    const v = fermentationVerdict([hyd(12, 1.01), refr(13, 1.012), hyd(15, 1.01)], pitched, day(15));
    expect(v.state).toBe('stable');
  });

  it('a hydrometer reading that moved again after an agreeing pair keeps it moving', () => {
    const v = fermentationVerdict([hyd(12, 1.012), hyd(14, 1.012), hyd(16, 1.008)], pitched, day(16));
    expect(v.state).toBe('moving');
  });

  it('steady far above the recipe FG is stuck, with its own words and a next check', () => {
    const v = fermentationVerdict([hyd(14, 1.03), hyd(17, 1.03)], pitched, day(17), { expectedFgSg: 1.012 });
    expect(v.state).toBe('stuck');
    expect(v.reason).toMatch(/steady, but 0\.018 above the 1\.012 this recipe should finish at/);
    expect(v.nextCheckAt).toBe(day(19).toISOString());
  });

  it("uses each reading's hydrometer resolution", () => {
    expect(fermentationVerdict([hyd(14, 1.013), hyd(16, 1.012)], pitched, day(16)).state).toBe('moving');
    expect(fermentationVerdict([hyd(14, 1.0129, 0.002), hyd(16, 1.012, 0.002)], pitched, day(16)).state).toBe('stable');
  });
});
