import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  EXTRACT_KINDS,
  EXTRACT_POTENTIALS_POINTS_L_PER_KG,
  EXTRACT_VOLUME_L_PER_KG,
  afterAddingExtract,
  afterAddingWater,
  estimateOg,
  extractToAddKg,
  waterToDiluteL,
} from './extract';
import { platoToSg, sgToPlato } from './gravity';
import { brewError } from './testing';
import { kgToLb, usGallonsToLitres } from './units';

const PPG_TO_POINTS_L_PER_KG = 3.785411784 / 0.45359237;

describe('worked examples from a homebrewing handbook (recalled from memory)', () => {
  it('5 US gal of 1.040 wort needs about 1.14 lb of 44-ppg dry extract to reach 1.050', () => {
    // 5 gal × 10 points = 50 point-gallons; 50 / 44 ppg = 1.14 lb.
    const kg = extractToAddKg(usGallonsToLitres(5), 1.04, 1.05, 44 * PPG_TO_POINTS_L_PER_KG);
    expect(kgToLb(kg)).toBeCloseTo(50 / 44, 6);
  });

  it('5 US gal of 1.060 wort needs 1 gal of water to come down to 1.050', () => {
    // 5 gal × 60 points = 300 point-gallons; 300 / 50 points = 6 gal in all.
    expect(waterToDiluteL(usGallonsToLitres(5), 1.06, 1.05)).toBeCloseTo(usGallonsToLitres(1), 9);
  });
});

describe('default extract figures', () => {
  // One litre of 10 °P sucrose solution, worked by hand from outside figures only: SG 1.04003 (ASBC
  // extract table at 10 °P, recalled from memory) times water at 20 °C, 998.2071 kg/m³ (Tanaka et
  // al. 2001), is 1.038165 kg, 10 % of it (0.1038165 kg) sucrose and 0.934349 kg water, which is
  // 0.934349 / 0.9982071 = 0.936027 L of water.
  // Potential: 40.03 points × 1 L / 0.1038165 kg = 385.6 points·L/kg.
  // Volume: (1 − 0.936027) L / 0.1038165 kg = 0.6162 L/kg.
  it('sucrose potential matches the ASBC table within 1 % (385.6 by hand)', () => {
    expect(Math.abs(EXTRACT_POTENTIALS_POINTS_L_PER_KG.sucrose / 385.6 - 1)).toBeLessThan(0.01);
  });

  it('sucrose volume per kg matches the ASBC table within 3 % (0.6162 L/kg by hand)', () => {
    expect(Math.abs(EXTRACT_VOLUME_L_PER_KG.sucrose / 0.6162 - 1)).toBeLessThan(0.03);
  });

  it('extracts are weaker than sucrose, liquid extract weakest (common practice: about 44, 36, 46, 42 ppg)', () => {
    const p = EXTRACT_POTENTIALS_POINTS_L_PER_KG;
    expect(p.lme).toBeLessThan(p.dextrose);
    expect(p.dextrose).toBeLessThan(p.dme);
    expect(p.dme).toBeLessThan(p.sucrose);
    expect(p.dme / PPG_TO_POINTS_L_PER_KG).toBeCloseTo(44, 0);
    expect(p.lme / PPG_TO_POINTS_L_PER_KG).toBeCloseTo(36, 0);
  });
});

const volume = fc.double({ min: 1, max: 200, noNaN: true });
const gravity = fc.double({ min: 1.005, max: 1.15, noNaN: true });
const kind = fc.constantFrom(...EXTRACT_KINDS);

describe('extract balance properties', () => {
  it('diluting, then adding back the extract that was diluted, returns to the start', () => {
    fc.assert(
      fc.property(volume, gravity, fc.double({ min: 0.05, max: 0.95, noNaN: true }), kind, (v, sg, share, k) => {
        const diluted = 1 + (sg - 1) * share;
        const waterL = waterToDiluteL(v, sg, diluted);
        const after = afterAddingWater(v, sg, waterL);
        expect(after.sg).toBeCloseTo(diluted, 10);
        const potential = EXTRACT_POTENTIALS_POINTS_L_PER_KG[k];
        const perKg = EXTRACT_VOLUME_L_PER_KG[k];
        const kg = extractToAddKg(after.volumeL, after.sg, sg, potential, perKg);
        const back = afterAddingExtract(after.volumeL, after.sg, kg, potential, perKg);
        expect(back.sg).toBeCloseTo(sg, 10);
      }),
    );
  });

  it('adding extract, then the water that dilutes it back, conserves points × litres', () => {
    fc.assert(
      fc.property(volume, gravity, fc.double({ min: 0, max: 5, noNaN: true }), kind, (v, sg, kg, k) => {
        const potential = EXTRACT_POTENTIALS_POINTS_L_PER_KG[k];
        let raised;
        try {
          raised = afterAddingExtract(v, sg, kg, potential);
        } catch {
          return; // beyond 1.200: rejected, which is its own check below
        }
        const waterL = waterToDiluteL(raised.volumeL, raised.sg, sg);
        const pointsL = (sg - 1) * 1000 * (raised.volumeL + waterL);
        expect(pointsL).toBeCloseTo((sg - 1) * 1000 * v + potential * kg, 6);
      }),
    );
  });

  it('more water always lowers gravity', () => {
    fc.assert(
      fc.property(volume, gravity, fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 50, noNaN: true }), (v, sg, w, more) => {
        expect(afterAddingWater(v, sg, w + more).sg).toBeLessThan(afterAddingWater(v, sg, w).sg);
      }),
    );
  });

  it('more extract always raises gravity, even counting its own volume', () => {
    fc.assert(
      fc.property(volume, gravity, fc.double({ min: 0, max: 0.04, noNaN: true }), kind, (v, sg, kgPerL, k) => {
        const p = EXTRACT_POTENTIALS_POINTS_L_PER_KG[k];
        const per = EXTRACT_VOLUME_L_PER_KG[k];
        const kg = kgPerL * v;
        expect(afterAddingExtract(v, sg, kg + 0.001 * v, p, per).sg).toBeGreaterThan(afterAddingExtract(v, sg, kg, p, per).sg);
      }),
    );
  });
});

describe('gravity points and a °Plato mass balance', () => {
  // The decision record quotes these: points × litres is what we use; a mass balance in °Plato is
  // the physically stricter one. Both use the ASBC table.
  const platoDilution = (og: number, waterShare: number) => platoToSg((og * sgToPlato(og)) / (og + waterShare));
  const pointsDilution = (og: number, waterShare: number) => 1 + (og - 1) / (1 + waterShare);

  it('differ by less than 0.05 points when 1.050 wort is diluted by 10 %', () => {
    const difference = (platoDilution(1.05, 0.1) - pointsDilution(1.05, 0.1)) * 1000;
    expect(difference).toBeGreaterThan(0);
    expect(difference).toBeLessThan(0.05);
  });

  it('differ by less than 0.15 points up to 1.120', () => {
    for (const og of [1.03, 1.06, 1.09, 1.12]) {
      expect(Math.abs(platoDilution(og, 0.1) - pointsDilution(og, 0.1)) * 1000).toBeLessThan(0.15);
    }
  });
});

describe('recipe OG estimate', () => {
  it('efficiency applies to grain only', () => {
    const extractOnly = { fermentables: [{ kg: 3, kind: 'dme' as const }], volumeL: 20 };
    expect(estimateOg({ ...extractOnly, efficiency: 0.5 })).toBe(estimateOg({ ...extractOnly, efficiency: 1 }));
    const grain = { fermentables: [{ kg: 5, kind: 'grain' as const, potentialPointsLPerKg: 300 }], volumeL: 20 };
    const full = estimateOg({ ...grain, efficiency: 1 }) - 1;
    expect(estimateOg({ ...grain, efficiency: 0.5 }) - 1).toBeCloseTo(full / 2, 12);
  });

  it('adds fermentables by points × litres', () => {
    const og = estimateOg({
      fermentables: [
        { kg: 4, kind: 'grain', potentialPointsLPerKg: 300 },
        { kg: 0.5, kind: 'sucrose' },
      ],
      efficiency: 0.75,
      volumeL: 20,
    });
    expect(og).toBeCloseTo(1 + (4 * 300 * 0.75 + 0.5 * EXTRACT_POTENTIALS_POINTS_L_PER_KG.sucrose) / 20 / 1000, 12);
  });

  it('rejects grain without a potential, an efficiency above 1, and no fermentables', () => {
    expect(brewError(() => estimateOg({ fermentables: [{ kg: 4, kind: 'grain' }], efficiency: 0.7, volumeL: 20 })).field).toBe('fermentables');
    expect(brewError(() => estimateOg({ fermentables: [{ kg: 1, kind: 'dme' }], efficiency: 72, volumeL: 20 })).field).toBe('efficiency');
    expect(brewError(() => estimateOg({ fermentables: [], efficiency: 0.7, volumeL: 20 })).field).toBe('fermentables');
    expect(brewError(() => estimateOg({ fermentables: [{ kg: 50, kind: 'dme' }], efficiency: 0.7, volumeL: 20 })).message).toMatch(/beyond 1.200/);
  });
});

describe('extract and water input checks', () => {
  it('rejects a target below the current gravity when asking for extract', () => {
    const error = brewError(() => extractToAddKg(20, 1.05, 1.04, 367));
    expect(error.code).toBe('target-below-current');
    expect(error.field).toBe('targetSg');
    expect(error.message).toMatch(/Add water instead/);
  });

  it('rejects a target above the current gravity when asking for water', () => {
    expect(brewError(() => waterToDiluteL(20, 1.04, 1.05)).code).toBe('target-above-current');
  });

  it('rejects zero or negative volume', () => {
    expect(brewError(() => waterToDiluteL(0, 1.05, 1.04)).field).toBe('volumeL');
    expect(brewError(() => extractToAddKg(-5, 1.04, 1.05, 367)).message).toMatch(/more than 0 L/);
  });

  it('rejects a target of 1.000 for dilution and an implausible potential', () => {
    expect(brewError(() => waterToDiluteL(20, 1.05, 1)).field).toBe('targetSg');
    expect(brewError(() => extractToAddKg(20, 1.04, 1.05, 1000)).field).toBe('potentialPointsLPerKg');
  });
});
