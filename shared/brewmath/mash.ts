import { requireRange } from './validate';

/** Mash pH target and the usual acceptable band, read on a cooled sample (common practice, no source). */
export const MASH_PH_TARGET = 5.2;
export const MASH_PH_BAND: Readonly<{ min: number; max: number }> = { min: 5.2, max: 5.6 };

export type MashPhStatus = 'low' | 'in-band' | 'high';

export function mashPhStatus(ph: number): MashPhStatus {
  requireRange(ph, 0, 14, 'ph', 'pH', '');
  // Meters show two decimals; compare at that resolution so 5.2 from the meter is in band.
  const hundredths = Math.round(ph * 100);
  if (hundredths < Math.round(MASH_PH_BAND.min * 100)) return 'low';
  if (hundredths > Math.round(MASH_PH_BAND.max * 100)) return 'high';
  return 'in-band';
}
