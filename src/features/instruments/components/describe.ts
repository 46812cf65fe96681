/** Words and numbers for instruments, in the brewer's units. */
import type { Correction } from '@shared/instruments';
import type { CalibrationMethod, Instrument, InstrumentSnapshot } from '@shared/schemas/instruments';
import type { Units } from '@/lib/units';

/** A value the forms hold: a number, '' while empty, NaN while the text is not a number. */
export type FormNumber = number | '' | null;

/** '' and null → null; a number (even NaN, which the schema then refuses) stays. */
export const formNumber = (v: FormNumber | undefined): number | null => (typeof v === 'number' ? v : null);

/** Offsets carry their sign: +0.4 °C reads high. */
export function signedDelta(units: Units, deltaC: number): string {
  const text = units.format('temperatureDelta', Math.abs(deltaC));
  return `${deltaC > 0 ? '+' : deltaC < 0 ? '−' : '±'}${text}`;
}

export const methodLabels: Record<CalibrationMethod, string> = {
  created: 'Added',
  'wcf-pairs': 'Factor from paired readings',
  'thermometer-check': 'Ice and boiling check',
  'ph-two-point': 'Two-point calibration',
  set: 'Value typed in',
};

/** The one number that matters on each instrument, with what it means. */
export function headline(instrument: Instrument, units: Units): { value: string; label: string } {
  const s = instrument.snapshot;
  switch (s.kind) {
    case 'hydrometer':
      return { value: units.format('temperature', s.calibrationTempC), label: 'reads true at' };
    case 'refractometer':
      return {
        value: s.wcf.toFixed(3),
        label: s.wcfSource === 'measured' ? 'measured factor' : s.wcfSource === 'entered' ? 'typed-in factor' : 'default factor',
      };
    case 'thermometer':
      return {
        value: signedDelta(units, s.offsetC),
        label: s.checkedOn === null ? 'offset, not checked yet' : s.offsetC === 0 ? 'offset: reads true' : `offset: reads ${s.offsetC > 0 ? 'high' : 'low'}`,
      };
    case 'ph_meter':
      return { value: `${s.resolutionPh} pH`, label: 'resolution' };
  }
}

/** One snapshot's calibration in a few words, for the history. */
export function snapshotSummary(s: InstrumentSnapshot, units: Units): string {
  switch (s.kind) {
    case 'hydrometer':
      return `calibrated at ${units.format('temperature', s.calibrationTempC)}, scale step ${s.resolutionSg ?? 0.001}`;
    case 'refractometer':
      return `factor ${s.wcf.toFixed(3)}${s.wcfSource === 'default' ? ' (default)' : ''}`;
    case 'thermometer':
      return `offset ${signedDelta(units, s.offsetC)}`;
    case 'ph_meter':
      return s.calibratedOn
        ? `calibrated ${s.calibratedOn}${s.bufferLowPh && s.bufferHighPh ? ` in pH ${s.bufferLowPh.toFixed(2)} and ${s.bufferHighPh.toFixed(2)}` : ''}, every ${s.reminderDays} days`
        : `not calibrated yet, every ${s.reminderDays} days`;
  }
}

/** How a reading was corrected, in words. */
export function correctionInWords(c: Correction, units: Units): string {
  switch (c.kind) {
    case 'temperature':
      return `Corrected from a sample at ${units.format('temperature', c.sampleTempC)} to the ${units.format('temperature', c.calibrationTempC)} calibration, for wort, assuming it expands like water.`;
    case 'wcf':
      return `Brix ÷ ${c.wcf.toFixed(3)} (the wort correction factor), then the extract table.`;
    case 'wcf-alcohol':
      return c.formula === 'unfermented'
        ? `No drop from ${c.originalBrix} °Bx before fermentation yet: Brix ÷ ${c.wcf.toFixed(3)}, then the extract table.`
        : `Alcohol-corrected estimate (Terrill 2011) from ${c.originalBrix} °Bx before fermentation, factor ${c.wcf.toFixed(3)}${c.rough ? ': rough, outside the range the correction was fitted to' : ''}.`;
    case 'offset':
      if (c.scale !== undefined && c.scale !== 1) {
        return `Two-point correction from the ice and boiling checks: (reading − ${signedDelta(units, c.offsetC)}) × ${c.scale.toFixed(4)}.`;
      }
      return c.offsetC === 0 ? 'No offset to take off.' : `${signedDelta(units, c.offsetC)} taken off: this thermometer reads ${c.offsetC > 0 ? 'high' : 'low'}.`;
    case 'ph-calibration':
      return c.calibratedOn
        ? `No arithmetic: the meter corrects itself through its two-point calibration, ${c.daysSinceCalibration} days ago.`
        : 'No arithmetic: the meter corrects itself through its two-point calibration, which is not on record.';
  }
}
