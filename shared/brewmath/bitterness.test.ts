import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buToGu, ibuTinseth, tinsethUtilisation, WHIRLPOOL_EQUIVALENT_BOIL_MINUTES } from './bitterness';
import { brewError } from './testing';

describe('Tinseth utilisation', () => {
  // Tinseth's published table of utilisation against boil gravity and time ("Glenn's Hop
  // Utilization Numbers", 1997), 60-minute row, recalled from memory to three decimals.
  it.each([
    [1.03, 0.276],
    [1.05, 0.231],
    [1.07, 0.193],
    [1.09, 0.161],
  ])('at SG %s for 60 minutes is %s (Tinseth 1997 table, recalled from memory)', (sg, expected) => {
    expect(Math.abs(tinsethUtilisation(sg, 60) - expected)).toBeLessThan(0.0006);
  });

  it('is zero for no boil and tends to Tinseth\'s 1/4.15 time limit for a very long boil (published formula)', () => {
    expect(tinsethUtilisation(1.05, 0)).toBe(0);
    // Bigness factor at 1.000 is 1.65; 1.65 / 4.15 = 0.39759.
    expect(tinsethUtilisation(1.0, 360)).toBeCloseTo(0.39759, 4);
  });
});

describe('IBU by Tinseth', () => {
  it('one 60-minute addition, worked by hand from the published formula', () => {
    // 28.35 g (1 oz) of 6 % hops, 60 minutes, 18.93 L (5 gal), boil SG 1.050.
    // alpha acid mg/L = 0.06 × 28.35 × 1000 / 18.93 = 1701 / 18.93 = 89.857
    // bigness = 1.65 × 0.000125^0.050 = 1.65 × e^(0.05 × ln 0.000125) = 1.65 × e^(−0.44936) = 1.65 × 0.63804 = 1.05276
    // time    = (1 − e^(−2.4)) / 4.15 = (1 − 0.090718) / 4.15 = 0.219104
    // IBU     = 1.05276 × 0.219104 × 89.857 = 0.230664 × 89.857 = 20.73
    const result = ibuTinseth({ hops: [{ alphaAcidPercent: 6, massG: 28.35, boilMinutes: 60 }], boilSg: 1.05, volumeL: 18.93 });
    expect(result.ibu).toBeCloseTo(20.73, 1);
    expect(result.perAddition[0].utilisation).toBeCloseTo(0.2307, 3);
    expect(result.assumptions).toEqual([]);
  });

  it('three additions with a flame-out hop, worked by hand (flame-out counted as 5 minutes: our labelled assumption)', () => {
    // 23 L at boil SG 1.060; bigness = 1.65 × 0.000125^0.06 = 1.65 × 0.583196 = 0.962274
    // 60 min: time (1 − e^−2.4)/4.15 = 0.219104; U = 0.210838; 30 g × 12 %: 0.12 × 30000 / 23 = 156.522 mg/L → 33.001
    // 15 min: time (1 − e^−0.6)/4.15 = (1 − 0.548812)/4.15 = 0.108720; U = 0.104618; 20 g × 5 %: 43.478 mg/L → 4.549
    // 0 min as 5: time (1 − e^−0.2)/4.15 = (1 − 0.818731)/4.15 = 0.043679; U = 0.042031; 25 g × 4 %: 43.478 mg/L → 1.827
    // total 33.001 + 4.549 + 1.827 = 39.38
    const result = ibuTinseth({
      hops: [
        { alphaAcidPercent: 12, massG: 30, boilMinutes: 60 },
        { alphaAcidPercent: 5, massG: 20, boilMinutes: 15 },
        { alphaAcidPercent: 4, massG: 25, boilMinutes: 0 },
      ],
      boilSg: 1.06,
      volumeL: 23,
    });
    expect(WHIRLPOOL_EQUIVALENT_BOIL_MINUTES).toBe(5);
    expect(result.perAddition.map((a) => a.ibu)).toEqual([expect.closeTo(33.0, 1), expect.closeTo(4.549, 2), expect.closeTo(1.827, 2)]);
    expect(result.ibu).toBeCloseTo(39.38, 1);
    expect(result.perAddition[2].whirlpool).toBe(true);
    expect(result.assumptions[0]).toMatch(/assumption/);
  });

  it('with the flame-out assumption switched off, a 0-minute hop adds nothing (Tinseth alone)', () => {
    const result = ibuTinseth({ hops: [{ alphaAcidPercent: 10, massG: 50, boilMinutes: 0 }], boilSg: 1.05, volumeL: 20, whirlpoolEquivalentMinutes: 0 });
    expect(result.ibu).toBe(0);
  });

  it('no hops: 0 IBU', () => {
    expect(ibuTinseth({ hops: [], boilSg: 1.05, volumeL: 20 }).ibu).toBe(0);
  });

  const hop = fc.record({
    alphaAcidPercent: fc.double({ min: 0, max: 25, noNaN: true }),
    massG: fc.double({ min: 0, max: 500, noNaN: true }),
    boilMinutes: fc.double({ min: 0, max: 120, noNaN: true }),
  });

  it('more hops are never less bitter (property: adding an addition, or more of one)', () => {
    fc.assert(
      fc.property(fc.array(hop, { maxLength: 6 }), hop, fc.double({ min: 1.0, max: 1.12, noNaN: true }), fc.double({ min: 1, max: 200, noNaN: true }), fc.double({ min: 0, max: 200, noNaN: true }), (hops, extra, boilSg, volumeL, moreG) => {
        const before = ibuTinseth({ hops, boilSg, volumeL }).ibu;
        expect(ibuTinseth({ hops: [...hops, extra], boilSg, volumeL }).ibu).toBeGreaterThanOrEqual(before);
        if (hops.length > 0) {
          const more = hops.map((h, i) => (i === 0 ? { ...h, massG: h.massG + moreG } : h));
          expect(ibuTinseth({ hops: more, boilSg, volumeL }).ibu).toBeGreaterThanOrEqual(before);
        }
      }),
    );
  });

  it('a longer boil is never less bitter, a bigger volume never more (property)', () => {
    fc.assert(
      fc.property(hop, fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: 1.0, max: 1.12, noNaN: true }), fc.double({ min: 1, max: 200, noNaN: true }), (h, extraMin, boilSg, volumeL) => {
        const before = ibuTinseth({ hops: [h], boilSg, volumeL, whirlpoolEquivalentMinutes: 0 }).ibu;
        expect(ibuTinseth({ hops: [{ ...h, boilMinutes: h.boilMinutes + extraMin }], boilSg, volumeL, whirlpoolEquivalentMinutes: 0 }).ibu).toBeGreaterThanOrEqual(before);
        expect(ibuTinseth({ hops: [h], boilSg, volumeL: volumeL * 1.1 }).ibu).toBeLessThanOrEqual(ibuTinseth({ hops: [h], boilSg, volumeL }).ibu);
      }),
    );
  });

  it('rejects alpha acid outside 0–25 %, negative minutes and a bad volume, naming the field', () => {
    const base = { boilSg: 1.05, volumeL: 20 };
    const tooMuch = brewError(() => ibuTinseth({ ...base, hops: [{ alphaAcidPercent: 26, massG: 10, boilMinutes: 60 }] }));
    expect(tooMuch.field).toBe('hops.0.alphaAcidPercent');
    expect(tooMuch.message).toContain('25');
    expect(brewError(() => ibuTinseth({ ...base, hops: [{ alphaAcidPercent: -1, massG: 10, boilMinutes: 60 }] })).field).toBe('hops.0.alphaAcidPercent');
    const negative = brewError(() => ibuTinseth({ ...base, hops: [{ alphaAcidPercent: 5, massG: 10, boilMinutes: 60 }, { alphaAcidPercent: 5, massG: 10, boilMinutes: -5 }] }));
    expect(negative.field).toBe('hops.1.boilMinutes');
    expect(negative.message).toMatch(/negative/);
    expect(brewError(() => ibuTinseth({ ...base, volumeL: 0, hops: [] })).field).toBe('volumeL');
    expect(brewError(() => ibuTinseth({ ...base, boilSg: Number.NaN, hops: [] })).field).toBe('boilSg');
  });
});

describe('BU:GU', () => {
  it('is IBU over gravity points (definition): 40 IBU at 1.050 is 0.8', () => {
    expect(buToGu(40, 1.05)).toBeCloseTo(0.8, 10);
  });
  it('rejects an OG of 1.000', () => {
    expect(brewError(() => buToGu(20, 1)).field).toBe('og');
  });
});
