import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as math from './index';
import { allFinite } from './testing';

// Every public function, fed any numbers at all (NaN, ±Infinity, huge, tiny, negative), either
// answers with finite numbers or throws a BrewMathError. NaN and Infinity never come out.
const anyNumber = fc.oneof(
  fc.double(),
  fc.double({ min: -10, max: 100 }),
  fc.double({ min: 0.97, max: 1.21 }),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -0, 0, 5e-324, Number.MAX_VALUE),
);

function finiteOrBrewError(fn: () => unknown): void {
  let result: unknown;
  try {
    result = fn();
  } catch (error) {
    expect(error).toBeInstanceOf(math.BrewMathError);
    return;
  }
  expect(allFinite(result)).toBe(true);
}

const calls: Record<string, (n: number[]) => unknown> = {
  platoToSg: ([a]) => math.platoToSg(a),
  sgToPlato: ([a]) => math.sgToPlato(a),
  brixToSg: ([a, b]) => math.brixToSg(a, b),
  sgToBrix: ([a, b]) => math.sgToBrix(a, b),
  correctHydrometer: ([a, b, c]) => math.correctHydrometer(a, b, c),
  hydrometerTempWarning: ([a, b]) => math.hydrometerTempWarning(a, b),
  waterDensityKgM3: ([a]) => math.waterDensityKgM3(a),
  wcfFromPairs: ([a, b, c, d]) => math.wcfFromPairs([{ brix: a, sg: b }, { brix: c, sg: d }]),
  refractometerWithAlcoholSg: ([a, b, c]) => math.refractometerWithAlcoholSg(a, b, c),
  abvPercent: ([a, b]) => math.abvPercent(a, b),
  abvPercentExact: ([a, b]) => math.abvPercentExact(a, b),
  apparentAttenuation: ([a, b]) => math.apparentAttenuation(a, b),
  fgFromAttenuation: ([a, b]) => math.fgFromAttenuation(a, b),
  waterToDiluteL: ([a, b, c]) => math.waterToDiluteL(a, b, c),
  extractToAddKg: ([a, b, c, d, e]) => math.extractToAddKg(a, b, c, d, e),
  afterAddingWater: ([a, b, c]) => math.afterAddingWater(a, b, c),
  afterAddingExtract: ([a, b, c, d, e]) => math.afterAddingExtract(a, b, c, d, e),
  estimateOg: ([a, b, c, d]) =>
    math.estimateOg({ fermentables: [{ kg: a, kind: 'grain', potentialPointsLPerKg: b }, { kg: c, kind: 'lme' }], efficiency: d, volumeL: c }),
  projectBoil: ([a, b, c, d]) => math.projectBoil({ volumeL: a, sg: b, minutesLeft: c, boilOffLPerHour: d }),
  boilCorrection: ([a, b, c, d, e, f]) =>
    math.boilCorrection({ volumeL: a, sg: b, minutesLeft: c, boilOffLPerHour: d, targetSg: e, targetVolumeL: f, kettleCapacityL: a + f }),
  boilOffRateLPerHour: ([a, b, c]) => math.boilOffRateLPerHour({ startL: a, endL: b, minutes: c }),
  fgStability: ([a, b, c, d]) =>
    math.fgStability(
      [
        { at: new Date(a * 86_400_000), sg: b },
        { at: new Date(c * 86_400_000), sg: d },
      ],
      new Date(0),
      { resolutionSg: Math.abs(d - b), expectedFgSg: b },
    ),
  fermentingRefractometerSg: ([a, b, c]) => math.fermentingRefractometerSg(a, b, c),
  boilingPointC: ([a]) => math.boilingPointC(a),
  waterBoilingPointAtPressureC: ([a]) => math.waterBoilingPointAtPressureC(a * 1000),
  thermometerBoilOffsetC: ([a, b]) => math.thermometerBoilOffsetC(a, b),
  residualCo2Volumes: ([a]) => math.residualCo2Volumes(a),
  primingSugarG: ([a, b, c]) => math.primingSugarG({ volumeL: a, warmestTempC: b, targetCo2Volumes: c, sugar: 'dme' }),
  mashPhStatus: ([a]) => math.mashPhStatus(a),
  litresToUsGallons: ([a]) => math.litresToUsGallons(a),
  usGallonsToLitres: ([a]) => math.usGallonsToLitres(a),
  kgToLb: ([a]) => math.kgToLb(a),
  lbToKg: ([a]) => math.lbToKg(a),
  gToOz: ([a]) => math.gToOz(a),
  ozToG: ([a]) => math.ozToG(a),
  cToF: ([a]) => math.cToF(a),
  fToC: ([a]) => math.fToC(a),
  deltaCToF: ([a]) => math.deltaCToF(a),
  deltaFToC: ([a]) => math.deltaFToC(a),
  formatGravity: ([a]) => math.formatGravity(a, 'plato'),
  formatVolume: ([a]) => math.formatVolume(a, 'us'),
  tinsethUtilisation: ([a, b]) => math.tinsethUtilisation(a, b),
  ibuTinseth: ([a, b, c, d, e, f]) => math.ibuTinseth({ hops: [{ alphaAcidPercent: a, massG: b, boilMinutes: c }], boilSg: d, volumeL: e, whirlpoolEquivalentMinutes: f }),
  buToGu: ([a, b]) => math.buToGu(a, b),
  moreyColour: ([a, b, c, d, e]) => math.moreyColour([{ massKg: a, colourLovibond: b }, { massKg: c, colourLovibond: d }], e),
  srmToEbc: ([a]) => math.srmToEbc(a),
  ebcToSrm: ([a]) => math.ebcToSrm(a),
  maltEbcToLovibond: ([a]) => math.maltEbcToLovibond(a),
};

describe('no NaN or Infinity ever comes out', () => {
  it.each(Object.keys(calls))('%s', (name) => {
    fc.assert(
      fc.property(fc.array(anyNumber, { minLength: 6, maxLength: 6 }), (n) => finiteOrBrewError(() => calls[name](n))),
      { numRuns: 300 },
    );
  });
});
