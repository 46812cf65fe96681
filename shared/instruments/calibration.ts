/**
 * The arithmetic of the calibration flows. The page previews with these functions and the API
 * saves what they return, so the factor a brewer accepts is the factor stored.
 */
import { BrewMathError, boilingPointC, correctHydrometer, hydrometerTempWarning, wcfFromPairs } from '../brewmath';
import { DEFAULT_HYDROMETER_CALIBRATION_C, THERMOMETER_OFFSET_FLAG_C, THERMOMETER_OFFSET_MAX_C } from '../schemas/instruments';

export interface WcfPairReading {
  brix: number;
  /** Hydrometer as read. */
  sg: number;
  /** Sample temperature; when given the reading is corrected to the hydrometer's calibration temperature. */
  sampleTempC?: number | null;
}

export interface WcfPairResult {
  brix: number;
  sg: number;
  sampleTempC: number | null;
  /** The hydrometer reading at its calibration temperature. */
  correctedSg: number;
  /** Brix ÷ °Plato of the corrected SG. */
  factor: number;
}

export interface WcfCalibrationResult {
  pairs: WcfPairResult[];
  /** The mean: what would be saved. */
  wcf: number;
  min: number;
  max: number;
  spread: number;
  count: number;
  hydrometerCalibrationTempC: number;
  warnings: string[];
}

/** Above this spread the pairs disagree more than careful readings do (common practice, no source). */
export const WCF_SPREAD_WARNING = 0.03;

function renumber(error: unknown, index: number, field: string): never {
  if (error instanceof BrewMathError) {
    throw new BrewMathError(error.message.replace(/^Pair 1\b/, `Pair ${index + 1}`), error.code, field);
  }
  throw error;
}

/**
 * A wort correction factor from paired readings of the same unfermented wort. Each pair's
 * factor is Brix ÷ °Plato(SG), with the SG first corrected to the hydrometer's calibration
 * temperature; the factor to save is their mean.
 */
export function wcfCalibration(input: { pairs: readonly WcfPairReading[]; hydrometerCalibrationTempC?: number | null }): WcfCalibrationResult {
  const calibrationTempC = input.hydrometerCalibrationTempC ?? DEFAULT_HYDROMETER_CALIBRATION_C;
  if (!Array.isArray(input.pairs) || input.pairs.length === 0) {
    throw new BrewMathError('Add at least one pair: refractometer Brix and hydrometer SG of the same unfermented wort.', 'inconsistent', 'pairs');
  }
  const warnings: string[] = [];
  const pairs: WcfPairResult[] = input.pairs.map((pair, i) => {
    const sampleTempC = pair.sampleTempC ?? null;
    let correctedSg = pair.sg;
    if (sampleTempC !== null) {
      try {
        correctedSg = correctHydrometer(pair.sg, sampleTempC, calibrationTempC);
      } catch (error) {
        renumber(error, i, error instanceof BrewMathError && error.field === 'sampleTempC' ? `pairs.${i}.sampleTempC` : `pairs.${i}.sg`);
      }
      const tempWarning = hydrometerTempWarning(sampleTempC, calibrationTempC);
      if (tempWarning) warnings.push(`Pair ${i + 1}: ${tempWarning}`);
    }
    let factor: number;
    try {
      factor = wcfFromPairs([{ brix: pair.brix, sg: correctedSg }]).wcf;
    } catch (error) {
      renumber(error, i, /Brix/.test((error as Error).message) ? `pairs.${i}.brix` : `pairs.${i}.sg`);
    }
    return { brix: pair.brix, sg: pair.sg, sampleTempC, correctedSg, factor };
  });
  const summary = wcfFromPairs(pairs.map((p) => ({ brix: p.brix, sg: p.correctedSg })));
  if (summary.count < 3) {
    warnings.push('With fewer than three pairs a misread cannot show up in the spread. Add pairs from your next brew days when you can.');
  }
  if (summary.spread > WCF_SPREAD_WARNING) {
    warnings.push(
      `The pairs disagree by ${summary.spread.toFixed(3)}. Were all readings of unfermented wort, the hydrometer ones at or corrected to its calibration temperature? Check before accepting.`,
    );
  }
  return { pairs, ...summary, hydrometerCalibrationTempC: calibrationTempC, warnings };
}

export interface ThermometerCheckInput {
  iceReadingC?: number | null;
  boilingReadingC?: number | null;
  elevationM?: number | null;
}

export interface ThermometerCheckResult {
  /** Reading in ice water minus 0 °C. */
  iceOffsetC: number | null;
  /** Where pure water boils at the brewer's elevation on a standard day. */
  expectedBoilingC: number | null;
  boilingOffsetC: number | null;
  /**
   * How far the thermometer reads above (+) or below (−) true at 0 °C (or at the one point
   * checked): subtracted from every reading before `scale` applies.
   */
  offsetC: number;
  /**
   * Two-point correction: true = (reading − offsetC) × scale, the straight line through the ice
   * point and the boiling point. 1 with only one check.
   */
  scale: number;
  /** More than 1 °C off. */
  flagged: boolean;
  warnings: string[];
}

/**
 * A thermometer's correction from a check in a stirred ice bath (0 °C) and/or in water at a
 * rolling boil (boiling point from the elevation: ISA pressure and IAPWS-IF97, in
 * shared/brewmath). With one check it is a plain offset; with both it is the straight line through
 * the two fixed points (a two-point calibration, as for any linear sensor), so the correction
 * changes with temperature as the error does.
 */
export function thermometerCheck(input: ThermometerCheckInput): ThermometerCheckResult {
  const ice = input.iceReadingC ?? null;
  const boiling = input.boilingReadingC ?? null;
  if (ice === null && boiling === null) {
    throw new BrewMathError('Enter the ice-bath reading, the boiling-water reading, or both.', 'inconsistent', 'iceReadingC');
  }
  const warnings: string[] = [];
  let iceOffsetC: number | null = null;
  let expectedBoilingC: number | null = null;
  let boilingOffsetC: number | null = null;
  if (ice !== null) {
    if (!Number.isFinite(ice)) throw new BrewMathError('The ice-bath reading is not a number.', 'not-a-number', 'iceReadingC');
    iceOffsetC = ice;
    if (Math.abs(iceOffsetC) > THERMOMETER_OFFSET_MAX_C) {
      throw new BrewMathError(
        `Reading ${ice} °C in ice water is more than ${THERMOMETER_OFFSET_MAX_C} °C off: the thermometer is broken or the bath was not ice and water. Replace it rather than correct it.`,
        'out-of-range',
        'iceReadingC',
      );
    }
  }
  if (boiling !== null) {
    if (!Number.isFinite(boiling)) throw new BrewMathError('The boiling-water reading is not a number.', 'not-a-number', 'boilingReadingC');
    if (input.elevationM === null || input.elevationM === undefined) {
      throw new BrewMathError('Enter your elevation: water boils cooler the higher you are.', 'inconsistent', 'elevationM');
    }
    expectedBoilingC = boilingPointC(input.elevationM);
    boilingOffsetC = boiling - expectedBoilingC;
    if (Math.abs(boilingOffsetC) > THERMOMETER_OFFSET_MAX_C) {
      throw new BrewMathError(
        `Reading ${boiling} °C in boiling water is more than ${THERMOMETER_OFFSET_MAX_C} °C from the expected ${expectedBoilingC.toFixed(1)} °C: the thermometer is broken or the elevation is wrong. Replace it rather than correct it.`,
        'out-of-range',
        'boilingReadingC',
      );
    }
  }
  let offsetC: number;
  let scale = 1;
  if (iceOffsetC !== null && boilingOffsetC !== null && expectedBoilingC !== null) {
    offsetC = iceOffsetC;
    const span = boiling! - ice!;
    if (!(span > 0)) {
      throw new BrewMathError('The boiling-water reading must be above the ice-bath reading.', 'inconsistent', 'boilingReadingC');
    }
    scale = expectedBoilingC / span;
  } else {
    offsetC = (iceOffsetC ?? boilingOffsetC)!;
  }
  const worst = Math.max(Math.abs(iceOffsetC ?? 0), Math.abs(boilingOffsetC ?? 0));
  const flagged = worst > THERMOMETER_OFFSET_FLAG_C;
  if (flagged) {
    const off = Math.abs(iceOffsetC ?? 0) >= Math.abs(boilingOffsetC ?? 0) ? iceOffsetC! : boilingOffsetC!;
    warnings.push(
      `This thermometer reads ${Math.abs(off).toFixed(1)} °C ${off > 0 ? 'high' : 'low'}, more than 1 °C off. Wortwise will correct for it, but a thermometer this far out may drift further: check it often, or replace it.`,
    );
  }
  if (iceOffsetC !== null && boilingOffsetC !== null && Math.abs(iceOffsetC - boilingOffsetC) > 0.05) {
    warnings.push(
      `It is off by ${iceOffsetC.toFixed(1)} °C in ice but ${boilingOffsetC.toFixed(1)} °C at the boil, so its error changes with temperature: readings are corrected along the straight line between the two checks.`,
    );
  }
  if (boilingOffsetC !== null) {
    warnings.push('Weather moves the boiling point by up to about 1 °C; the ice bath is the more exact check.');
  }
  return { iceOffsetC, expectedBoilingC, boilingOffsetC, offsetC, scale, flagged, warnings };
}
