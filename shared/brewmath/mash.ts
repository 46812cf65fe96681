import { requireRange, show } from './validate';

/**
 * Mash pH, read on a cooled sample (common practice, no source): aim about 5.2; roughly 5.2 to
 * 5.6 is the usual acceptable band. A reading is judged against the recipe's own target with a
 * tolerance the brewer can see; the band is advice beside it, never the verdict, so a reading at
 * the target is never "low" just because the target sits on the band's edge.
 */
export const MASH_PH_TARGET = 5.2;
export const MASH_PH_BAND: Readonly<{ min: number; max: number }> = { min: 5.2, max: 5.6 };
/** About ±0.1 pH either side of the target counts as on target (common practice, no source). */
export const MASH_PH_TOLERANCE = 0.1;

export type MashPhStatus = 'low' | 'in-band' | 'high';

/** Where a reading sits against the usual 5.2–5.6 band: advice only. */
export function mashPhStatus(ph: number): MashPhStatus {
  requireRange(ph, 0, 14, 'ph', 'pH', '');
  // Meters show two decimals; compare at that resolution so 5.2 from the meter is in band.
  const hundredths = Math.round(ph * 100);
  if (hundredths < Math.round(MASH_PH_BAND.min * 100)) return 'low';
  if (hundredths > Math.round(MASH_PH_BAND.max * 100)) return 'high';
  return 'in-band';
}

export interface MashPhVerdict {
  verdict: 'low' | 'on-target' | 'high';
  targetPh: number;
  tolerancePh: number;
  /** Signed, reading − target, at the meter's two decimals. */
  offPh: number;
  /** Advice beside the verdict: where the usual band puts it. */
  band: MashPhStatus;
  message: string;
}

/** A mash pH reading against the recipe's target ± tolerance, with the usual band as advice. */
export function mashPhVerdict(ph: number, targetPh: number = MASH_PH_TARGET, tolerancePh: number = MASH_PH_TOLERANCE): MashPhVerdict {
  requireRange(ph, 0, 14, 'ph', 'pH', '');
  requireRange(targetPh, 4, 7, 'targetPh', 'Target mash pH', '');
  requireRange(tolerancePh, 0, 1, 'tolerancePh', 'Tolerance', 'pH');
  // Compare in hundredths, as the meter shows them, so 5.30 against 5.20 ± 0.10 is on target.
  const off = (Math.round(ph * 100) - Math.round(targetPh * 100)) / 100;
  const tol = Math.round(tolerancePh * 100) / 100;
  const verdict = off < -tol - 1e-9 ? 'low' : off > tol + 1e-9 ? 'high' : 'on-target';
  const band = mashPhStatus(ph);
  const against = `the recipe's ${targetPh.toFixed(2)} target (± ${tolerancePh.toFixed(2)})`;
  const head =
    verdict === 'on-target'
      ? `Mash pH ${ph.toFixed(2)} is on ${against}.`
      : `Mash pH ${ph.toFixed(2)} is ${show(Math.abs(off), 2)} ${verdict === 'low' ? 'below' : 'above'} ${against}.`;
  const advice = band === 'in-band' ? '' : ` It is also ${band === 'low' ? 'below' : 'above'} the usual ${MASH_PH_BAND.min.toFixed(1)}–${MASH_PH_BAND.max.toFixed(1)} band.`;
  return { verdict, targetPh, tolerancePh, offPh: off, band, message: head + advice };
}
