import { BrewMathError } from './errors';
import { cToF, deltaCToF } from './units';
import { SG_MAX, SG_MIN, requireRange, requireSg, show, showSg } from './validate';

/**
 * Density of air-free water, kg/m³, at temperature t (°C, ITS-90).
 * Source: Tanaka, Girard, Davis, Peuto & Bignell (2001), Metrologia 38, 301, eq. 1;
 * stated for 0–40 °C, and within 0.03 kg/m³ of the usual tables up to 60 °C.
 */
export function waterDensityKgM3(tempC: number): number {
  requireRange(tempC, 0, 100, 'tempC', 'Water temperature', '°C');
  return waterDensityUnchecked(tempC);
}

function waterDensityUnchecked(t: number): number {
  const a1 = -3.983035;
  const a2 = 301.797;
  const a3 = 522528.9;
  const a4 = 69.34881;
  const a5 = 999.97495;
  return a5 * (1 - ((t + a1) * (t + a1) * (t + a2)) / (a3 * (t + a4)));
}

/** Beyond this band the correction is an extrapolation and the reading not worth trusting. */
const TRUSTED_MIN_C = 0;
const TRUSTED_MAX_C = 60;
/** Wort expands a little more than water, so far from calibration the correction drifts (common practice). */
const FAR_FROM_CALIBRATION_C = 10;

/**
 * A hydrometer reads true only at its calibration temperature. A warmer sample is less dense
 * and reads low. Wort is assumed to expand like water, so
 * SG at calibration = reading × ρwater(calibration) / ρwater(sample); glass expansion
 * (about 0.1 point over 10 °C) is ignored.
 */
export function correctHydrometer(readingSg: number, sampleTempC: number, calibrationTempC = 20): number {
  requireSg(readingSg, 'readingSg', 'Hydrometer reading');
  requireRange(
    sampleTempC,
    0,
    100,
    'sampleTempC',
    'Sample temperature',
    '°C',
    'A hydrometer cannot be read in frozen or boiling wort.',
  );
  requireRange(calibrationTempC, 0, 40, 'calibrationTempC', 'Calibration temperature', '°C', 'Hydrometers are calibrated at about 15–20 °C.');
  const corrected = (readingSg * waterDensityUnchecked(calibrationTempC)) / waterDensityUnchecked(sampleTempC);
  if (corrected < SG_MIN || corrected > SG_MAX) {
    throw new BrewMathError(
      `Corrected for temperature, ${showSg(readingSg)} at ${show(sampleTempC, 1)} °C would be ${showSg(corrected)}, outside 0.980 to 1.200. Check the reading and the temperature.`,
      'out-of-range',
      'readingSg',
    );
  }
  return corrected;
}

/**
 * A short caution for the reading form, or null when the sample temperature is fine. Temperatures
 * are said in the brewer's units: °C for metric, °F for US (the limits themselves stay in °C).
 */
export function hydrometerTempWarning(sampleTempC: number, calibrationTempC = 20, unitSystem: 'metric' | 'us' = 'metric'): string | null {
  requireRange(sampleTempC, -50, 150, 'sampleTempC', 'Sample temperature', '°C');
  requireRange(calibrationTempC, 0, 40, 'calibrationTempC', 'Calibration temperature', '°C');
  const us = unitSystem === 'us';
  const temp = (c: number, digits: number) => `${show(us ? cToF(c) : c, digits)} ${us ? '°F' : '°C'}`;
  // 15.56 °C is the 60 °F of US hydrometers: one decimal in °F says it as printed on them.
  const cal = temp(calibrationTempC, us ? 1 : 2);
  if (sampleTempC < TRUSTED_MIN_C || sampleTempC > TRUSTED_MAX_C) {
    const span = us ? `${show(cToF(TRUSTED_MIN_C), 1)}–${show(cToF(TRUSTED_MAX_C), 1)} °F` : `${TRUSTED_MIN_C}–${TRUSTED_MAX_C} °C`;
    return `A sample at ${temp(sampleTempC, 1)} is outside ${span}, where no temperature correction can be trusted. Cool or warm it to near ${cal} and read again.`;
  }
  if (Math.abs(sampleTempC - calibrationTempC) > FAR_FROM_CALIBRATION_C) {
    const far = us ? `${show(deltaCToF(FAR_FROM_CALIBRATION_C), 1)} °F` : `${FAR_FROM_CALIBRATION_C} °C`;
    return `The sample is more than ${far} from the hydrometer's ${cal} calibration, so the corrected value is an estimate. For an exact reading, bring it nearer ${cal}.`;
  }
  return null;
}
