import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brixToSg, platoToSg, sgToBrix, sgToPlato } from './gravity';
import { brewError } from './testing';

describe('SG and °Plato', () => {
  // ASBC Methods of Analysis, extract table (Plato), SG 20/20 °C; the same values appear in the
  // sucrose table of NBS Circular 440 for °Brix. Table values recalled from memory.
  const table: [plato: number, sg: number][] = [
    [5, 1.0197],
    [10, 1.04],
    [12, 1.0484],
    [15, 1.0611],
    [20, 1.083],
  ];

  it.each(table)('%s °P reads about SG %s (ASBC extract table, recalled from memory)', (plato, sg) => {
    expect(Math.abs(platoToSg(plato) - sg)).toBeLessThan(0.0002);
    expect(Math.abs(sgToPlato(sg) - plato)).toBeLessThan(0.05);
  });

  it('water is 0 °P and SG 1.000 (definition of both scales)', () => {
    expect(Math.abs(sgToPlato(1))).toBeLessThan(0.01);
    // The ASBC cubic misses 0 °P at 1.000 by 0.003 °P, i.e. about 0.01 gravity points.
    expect(Math.abs(platoToSg(0) - 1)).toBeLessThan(0.00005);
  });

  it('SG → °P → SG round-trips across the whole accepted range (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.98, max: 1.2, noNaN: true }), (sg) => {
        expect(Math.abs(platoToSg(sgToPlato(sg)) - sg)).toBeLessThan(1e-10);
      }),
    );
  });

  it('more °Plato always means a higher SG (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 42.9, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (p, step) => {
        expect(platoToSg(p + step)).toBeGreaterThan(platoToSg(p));
      }),
    );
  });
});

describe('Brix with a wort correction factor', () => {
  it('a reading is divided by the factor, then read as °Plato (definition of the wort correction factor)', () => {
    expect(brixToSg(12 * 1.04, 1.04)).toBeCloseTo(platoToSg(12), 12);
    expect(brixToSg(10)).toBeCloseTo(platoToSg(10), 12);
  });

  it('a factor above 1 gives a lower SG for the same reading (refractometers over-read wort)', () => {
    expect(brixToSg(12, 1.04)).toBeLessThan(brixToSg(12, 1));
  });

  it('sgToBrix inverts brixToSg (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), fc.double({ min: 0.95, max: 1.1, noNaN: true }), (brix, wcf) => {
        expect(sgToBrix(brixToSg(brix, wcf), wcf)).toBeCloseTo(brix, 8);
      }),
    );
  });
});

describe('gravity input checks', () => {
  it('rejects SG outside 0.980–1.200 with a brewer-readable message', () => {
    const high = brewError(() => sgToPlato(1.3));
    expect(high.field).toBe('sg');
    expect(high.code).toBe('out-of-range');
    expect(high.message).toContain('1.300');
    expect(high.message).toContain('0.980 to 1.200');
    expect(brewError(() => sgToPlato(0.97)).field).toBe('sg');
  });

  it('rejects Brix outside 0–40', () => {
    expect(brewError(() => brixToSg(41)).field).toBe('brix');
    expect(brewError(() => brixToSg(-0.5)).message).toContain('0 to 40');
  });

  it('rejects NaN and Infinity as "not a number"', () => {
    expect(brewError(() => sgToPlato(Number.NaN)).code).toBe('not-a-number');
    expect(brewError(() => platoToSg(Number.POSITIVE_INFINITY)).code).toBe('not-a-number');
  });

  it('rejects an implausible wort correction factor', () => {
    expect(brewError(() => brixToSg(12, 1.5)).field).toBe('wcf');
  });

  it('rejects °Plato beyond what the SG range allows', () => {
    expect(brewError(() => platoToSg(50)).field).toBe('plato');
  });
});
