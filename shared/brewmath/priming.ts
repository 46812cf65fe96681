import { BrewMathError } from './errors';
import { requireRange, requireVolume } from './validate';

export type PrimingSugar = 'sucrose' | 'dextrose' | 'dme';
export const PRIMING_SUGARS: readonly PrimingSugar[] = ['sucrose', 'dextrose', 'dme'];

/**
 * CO2 still dissolved in beer after fermentation, in volumes, from the warmest temperature the
 * beer reached (it held no more than it could at that temperature, at about 1 atm).
 * Source: a commonly published quadratic fit to CO2 solubility in beer, in °F:
 * v = 3.0378 − 0.050062·T + 0.00026555·T² (recalled from memory; within 0.03 of the Bunsen
 * coefficient of CO2 in water from 0 to 30 °C).
 */
export function residualCo2Volumes(warmestTempC: number): number {
  requireRange(warmestTempC, 0, 30, 'warmestTempC', 'Warmest fermentation temperature', '°C', 'The carbonation estimate covers 0 to 30 °C.');
  const f = warmestTempC * 1.8 + 32;
  return 3.0378 - 0.050062 * f + 0.00026555 * f * f;
}

/**
 * One "volume" is a litre of CO2 at 0 °C and 101.325 kPa per litre of beer. CO2 is not an ideal
 * gas: its real density there is 1.977 g/L (CRC Handbook of Chemistry and Physics, physical
 * constants of inorganic compounds; recalled from memory), not the ideal 44.01 / 22.414 = 1.9635.
 */
export const CO2_G_PER_L_PER_VOLUME = 1.977;
/**
 * Yeast turns only about 95–96 % of the sugar it ferments into ethanol and CO2; the rest goes to
 * glycerol, acids and new yeast (Pasteur's balance, as quoted in brewing and wine-making texts;
 * recalled from memory). 96 % is used.
 */
export const CO2_YIELD_OF_THEORY = 0.96;

/**
 * Grams of sugar per litre of beer per volume of CO2 wanted.
 * - sucrose: C12H22O11 + H2O → 4 C2H5OH + 4 CO2, so 342.30 g gives 176.04 g CO2 in theory;
 *   with 1.977 g/L and a 96 % yield: 1.977 × 342.30 / 176.04 / 0.96 = 4.00 g/L;
 * - dextrose: brewing "corn sugar" is the monohydrate, C6H12O6·H2O (198.17 g/mol) → 2 CO2: 4.64 g/L;
 * - dme: about 68 % of dry malt extract ferments like sucrose (common practice, no source): sucrose ÷ 0.68.
 */
const SUCROSE_G_PER_L_PER_VOLUME = (CO2_G_PER_L_PER_VOLUME * 342.2965) / (4 * 44.0095) / CO2_YIELD_OF_THEORY;
export const PRIMING_G_PER_L_PER_CO2_VOLUME: Readonly<Record<PrimingSugar, number>> = {
  sucrose: SUCROSE_G_PER_L_PER_VOLUME,
  dextrose: (CO2_G_PER_L_PER_VOLUME * 198.1712) / (2 * 44.0095) / CO2_YIELD_OF_THEORY,
  dme: SUCROSE_G_PER_L_PER_VOLUME / 0.68,
};

export interface PrimingInput {
  /** Beer to be bottled, litres. */
  volumeL: number;
  /** The warmest the beer has been since fermentation finished (or during it). */
  warmestTempC: number;
  /** Wanted carbonation, volumes of CO2 (about 2.0–2.7 for most beers). */
  targetCo2Volumes: number;
  sugar: PrimingSugar;
}

/** Grams of priming sugar; 0 when the beer already holds the wanted CO2. */
export function primingSugarG({ volumeL, warmestTempC, targetCo2Volumes, sugar }: PrimingInput): number {
  requireVolume(volumeL, 'volumeL', 'Beer volume');
  requireRange(targetCo2Volumes, 1, 4.5, 'targetCo2Volumes', 'Carbonation', 'volumes', 'Most beers want about 2.0 to 2.7.');
  if (!Object.hasOwn(PRIMING_G_PER_L_PER_CO2_VOLUME, sugar)) {
    throw new BrewMathError(`Unknown priming sugar "${String(sugar)}": use sucrose, dextrose or dme.`, 'inconsistent', 'sugar');
  }
  const needed = targetCo2Volumes - residualCo2Volumes(warmestTempC);
  return needed > 0 ? needed * PRIMING_G_PER_L_PER_CO2_VOLUME[sugar] * volumeL : 0;
}
