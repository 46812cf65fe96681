import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boilingPointC, isaPressurePa, thermometerBoilOffsetC, waterBoilingPointAtPressureC } from './thermometer';
import { brewError } from './testing';

describe('saturation temperature of water (IAPWS-IF97)', () => {
  // IAPWS-IF97 release, verification values for the backward equation Ts(p) (recalled from memory).
  it.each([
    [0.1e6, 372.755919],
    [1e6, 453.035632],
    [10e6, 584.149488],
  ])('at %s Pa is %s K (IAPWS-IF97 verification table)', (p, kelvin) => {
    expect(waterBoilingPointAtPressureC(p) + 273.15).toBeCloseTo(kelvin, 5);
  });

  // Steam tables (saturated water, pressure entry), recalled from memory.
  it.each([
    [80_000, 93.5],
    [90_000, 96.7],
    [101_325, 99.97],
  ])('at %s Pa is about %s °C (steam tables, recalled from memory)', (p, celsius) => {
    expect(Math.abs(waterBoilingPointAtPressureC(p) - celsius)).toBeLessThan(0.05);
  });

  it('agrees within 0.1 °C with the Antoine equation for water, 1–100 °C (NIST/Yaws constants, recalled from memory)', () => {
    const antoine = (pa: number) => 1730.63 / (8.07131 - Math.log10(pa / 133.322368)) - 233.426;
    fc.assert(
      fc.property(fc.double({ min: 50_000, max: 105_000, noNaN: true }), (pa) => {
        expect(Math.abs(waterBoilingPointAtPressureC(pa) - antoine(pa))).toBeLessThan(0.1);
      }),
    );
  });
});

describe('standard atmosphere', () => {
  // ICAO / ISO 2533 standard atmosphere tables (recalled from memory).
  it.each([
    [0, 101_325],
    [1000, 89_874.6],
    [2000, 79_495.2],
    [3000, 70_108.5],
  ])('at %s m the pressure is %s Pa (ISA table)', (h, pa) => {
    expect(Math.abs(isaPressurePa(h) - pa)).toBeLessThan(5);
  });
});

describe('boiling point for a thermometer check', () => {
  it('is 100 °C at sea level, within 0.1 (ITS-90 normal boiling point 99.97 °C)', () => {
    expect(Math.abs(boilingPointC(0) - 100)).toBeLessThan(0.1);
  });

  it('is about 94.6 °C in Denver, 1609 m (standard atmosphere plus steam tables)', () => {
    // ISA gives 83.4 kPa there; steam tables put saturation between 93.5 °C (80 kPa) and 96.7 °C (90 kPa).
    expect(boilingPointC(1609)).toBeGreaterThan(94.4);
    expect(boilingPointC(1609)).toBeLessThan(94.9);
  });

  it('falls steadily with elevation (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 5900, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (h, up) => {
        expect(boilingPointC(h + up)).toBeLessThan(boilingPointC(h));
      }),
    );
  });

  it('gives a thermometer\'s offset from a boiling-water reading', () => {
    expect(thermometerBoilOffsetC(101, 0)).toBeCloseTo(101 - boilingPointC(0), 12);
    expect(thermometerBoilOffsetC(92, 1609)).toBeLessThan(-2);
  });

  it('rejects elevations nobody brews at', () => {
    expect(brewError(() => boilingPointC(9000)).field).toBe('elevationM');
    expect(brewError(() => boilingPointC(Number.NaN)).code).toBe('not-a-number');
  });
});
