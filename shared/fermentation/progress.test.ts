import { describe, expect, it } from 'vitest';
import { fermentationProgress } from './progress';

describe('attenuation and ABV against the targets', () => {
  it('uses the measured OG and the latest gravity', () => {
    const p = fermentationProgress({ og: 1.05, targetOg: 1.052, targetFg: 1.012, current: { sg: 1.01, estimate: false, takenAt: '2026-03-15T00:00:00Z' } });
    expect(p.ogSource).toBe('measured');
    // Worked example, arithmetic of the definitions: (1.050 − 1.010) / 0.050 = 80 %;
    // (1.050 − 1.010) × 131.25 = 5.25 % ABV.
    expect(p.current?.apparentAttenuation).toBeCloseTo(0.8, 9);
    expect(p.current?.abvSimple).toBeCloseTo(5.25, 9);
    // The more exact formula is within about 0.1 % ABV of the simple one for an ordinary beer
    // (shared/brewmath/abv.ts, recalled from memory).
    expect(Math.abs(p.current!.abvExact - 5.25)).toBeLessThan(0.2);
    expect(p.target?.apparentAttenuation).toBeCloseTo(40 / 52, 9);
    expect(p.note).toBeNull();
  });

  it("falls back to the recipe's target OG and says so", () => {
    const p = fermentationProgress({ og: null, targetOg: 1.06, targetFg: 1.015, current: { sg: 1.02, estimate: true, takenAt: '2026-03-15T00:00:00Z' } });
    expect(p.ogSource).toBe('target');
    expect(p.current?.estimate).toBe(true);
    expect(p.note).toMatch(/target OG/);
  });

  it('reports a gravity above the OG in words instead of a number', () => {
    const p = fermentationProgress({ og: 1.04, targetOg: 1.05, targetFg: 1.01, current: { sg: 1.045, estimate: false, takenAt: '2026-03-15T00:00:00Z' } });
    expect(p.current).toBeNull();
    expect(p.note).toMatch(/above the OG/);
  });
});
