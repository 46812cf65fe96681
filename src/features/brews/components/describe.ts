/**
 * Readings, decisions and targets in the brewer's units. Rounding is for reading only: every
 * value stored stays SI and unrounded.
 */
import { optionAction, EXTRACT_NAMES, type FeasibleOption } from '@shared/boil-check';
import { formatAbv } from '@shared/brewmath';
import { instrumentKindLabels } from '@shared/schemas/instruments';
import type { BrewDecision, BrewReading } from '@shared/schemas/brews';
import type { Units } from '@/lib/units';

const num = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? value : null);

/** What the brewer read, as they read it. */
export function rawText(reading: Pick<BrewReading, 'raw' | 'quantity'>, units: Units): string {
  const { raw } = reading;
  if (reading.quantity === 'temperature') return units.format('temperature', num(raw.tempC));
  if (reading.quantity === 'ph') return `pH\u00a0${num(raw.ph)?.toFixed(2) ?? '—'}`;
  if (num(raw.brix) !== null) return `${(raw.brix as number).toFixed(1)}\u00a0°Bx`;
  return `${units.format('gravity', num(raw.sg))} at ${units.format('temperature', num(raw.sampleTempC))}`;
}

/** The value after the instrument's correction. */
export function correctedText(reading: Pick<BrewReading, 'corrected' | 'quantity'>, units: Units): string {
  if (reading.quantity === 'temperature') return units.format('temperature', reading.corrected);
  if (reading.quantity === 'ph') return `pH\u00a0${reading.corrected.toFixed(2)}`;
  return units.format('gravity', reading.corrected);
}

/** How the correction was made, in a few words. */
export function correctionText(reading: Pick<BrewReading, 'instrument' | 'correction'>, units: Units): string {
  const snap = reading.instrument;
  if (!snap) return '';
  switch (snap.kind) {
    case 'thermometer':
      return snap.offsetC === 0 ? 'No offset' : `Offset ${snap.offsetC > 0 ? '−' : '+'}${units.format('temperatureDelta', Math.abs(snap.offsetC))}`;
    case 'refractometer':
      return `Wort correction factor ${snap.wcf.toFixed(3)}`;
    case 'hydrometer':
      return `Corrected to ${units.format('temperature', snap.calibrationTempC)}`;
    case 'ph_meter':
      return snap.calibratedOn ? `Calibrated ${snap.calibratedOn}` : 'Not calibrated';
  }
}

export function instrumentText(reading: Pick<BrewReading, 'instrument'>): string {
  const snap = reading.instrument;
  if (!snap) return '';
  return snap.instrumentId === null ? `${instrumentKindLabels[snap.kind]}: common-practice defaults` : snap.name;
}

export function timeText(iso: string | null): string {
  if (!iso) return '';
  return new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
}

export function dateTimeText(iso: string): string {
  return new Date(iso).toLocaleString([], { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

/** "Add 168 g dry malt extract", "Leave it", or the brewer's own words. */
export function decisionAction(decision: Pick<BrewDecision, 'choice' | 'chosen'>, units: Units): string {
  if (decision.choice.kind === 'own') return decision.choice.description;
  if (decision.chosen) return optionAction(decision.chosen as unknown as FeasibleOption, units.unitSystem);
  return decision.choice.kind === 'extract' ? `Add ${EXTRACT_NAMES[decision.choice.extract]}` : decision.choice.kind;
}

interface StoredCheck {
  currentSg?: number;
  reading?: { kind: 'refractometer'; brix: number; wcf: number } | { kind: 'hydrometer'; sg: number; sampleTempC: number; calibrationTempC: number };
  result?: { status: 'low' | 'on-target' | 'high'; targetSg: number; projected: { endSg: number; fermenterVolumeL: number } };
}

/** The reading a decision followed, e.g. "12.0 °Bx (factor 1.040) → 1.046; 25.8 L hot, 10 min left". */
export function decisionReadingText(decision: Pick<BrewDecision, 'input' | 'result'>, units: Units): string {
  const check = decision.result as StoredCheck;
  const input = decision.input as { volumeL?: number; minutesLeft?: number };
  const r = check.reading;
  const read = !r
    ? ''
    : r.kind === 'refractometer'
      ? `${r.brix.toFixed(1)}\u00a0°Bx (factor ${r.wcf.toFixed(3)})`
      : `${units.format('gravity', r.sg)} at ${units.format('temperature', r.sampleTempC)}`;
  const parts = [`${read} → ${units.format('gravity', check.currentSg ?? null)}`];
  if (typeof input.volumeL === 'number') parts.push(`${units.format('volume', input.volumeL)} hot`);
  if (typeof input.minutesLeft === 'number') parts.push(`${input.minutesLeft}\u00a0min left`);
  return parts.join('; ');
}

/** Where the chosen option leads: OG, volume into the fermenter, ABV. */
export function decisionOutcomeText(decision: Pick<BrewDecision, 'chosen' | 'result'>, units: Units): string | null {
  const chosen = decision.chosen as { endSg?: number; fermenterVolumeL?: number; abvPercent?: number } | null;
  const check = decision.result as StoredCheck;
  const end = chosen ?? check.result?.projected;
  if (!end || typeof end.endSg !== 'number') return null;
  const abv = chosen && typeof chosen.abvPercent === 'number' ? `, ABV ${formatAbv(chosen.abvPercent)}` : '';
  const where = `OG ${units.format('gravity', end.endSg)}, ${units.format('volume', end.fermenterVolumeL ?? null)} into the fermenter`;
  return chosen ? `Predicted ${where}${abv}` : `Left as is, it was heading for ${where}`;
}

/** A short heading for a deviation: an instrument worth checking is not the beer being off target. */
export function deviationTitle(deviation: { code: string }): string {
  return deviation.code.startsWith('instrument-') ? 'Instrument' : 'Off target';
}
