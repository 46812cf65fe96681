/**
 * Where a brew day left the targets it was started with. Pure: the brew-day log, the printed
 * brew sheet and a mentor's review all call it with the same snapshot and readings, so they
 * always call out the same things.
 *
 * Tolerances are the trade's habits, not a standard (common practice, no source):
 * mash temperature within 1 °C of the nearest step, OG within 2 gravity points, the volume into
 * the fermenter within 5 %, mash pH within MASH_PH_TOLERANCE of the recipe's target (the usual
 * MASH_PH_BAND is advice in the message, not the verdict), pitch no warmer than the recipe's
 * fermentation range.
 */
import { sgToPlato } from './brewmath/gravity';
import { MASH_PH_TARGET, mashPhVerdict } from './brewmath/mash';
import { formatGravity, formatTemperature, formatVolume, type GravityUnit, type UnitSystem } from './brewmath/format';
import type { InstrumentSnapshot } from './schemas/instruments';
import { readingStage, type BrewDeviation, type ReadingKind } from './schemas/brews';
import { DAY_MS } from './dates';

export const MASH_TEMP_TOLERANCE_C = 1;
export const OG_TOLERANCE_POINTS = 2;
export const VOLUME_TOLERANCE_FRACTION = 0.05;
/** Bitterness within 3 IBU and colour within 1 SRM (2 EBC) of the recipe's targets (common practice, no source). */
export const BITTERNESS_TOLERANCE_IBU = 3;
export const COLOUR_TOLERANCE_SRM = 1;

export interface DeviationTargets {
  targetOg: number;
  batchVolumeL: number;
  mashSteps: readonly { tempC: number; minutes: number }[];
  fermentationTempMinC: number;
  fermentationTempMaxC: number;
  /** The recipe's mash pH target; 5.2 when absent (common practice, no source). */
  mashPhTarget?: number;
  /** Absent or null when the recipe set no bitterness or colour target. */
  targetIbu?: number | null;
  targetColourSrm?: number | null;
}

export interface DeviationReading {
  id: number;
  kind: ReadingKind;
  corrected: number;
  volumeL: number | null;
  instrument: InstrumentSnapshot | null;
  takenAt: string;
}

export interface DeviationDecision {
  id: number;
  choiceKind: string;
  /** The OG the chosen option predicts (the projection, for "leave as is"); null for the brewer's own action. */
  predictedSg: number | null;
  /** Bitterness and colour the chosen option predicts (shared/boil-check/balance.ts); null or absent when unknown. */
  predictedIbu?: number | null;
  predictedColourSrm?: number | null;
  decidedAt: string;
}

const points = (sg: number) => (sg - 1) * 1000;
// Readings are stored unrounded; compare at the resolution the instruments show, so a 66.0 °C
// reading against a 65 °C step is "within 1 °C", not 1.0000000001 away.
const round = (value: number, digits: number) => Number(value.toFixed(digits));

function nearestStep(steps: DeviationTargets['mashSteps'], tempC: number): number | null {
  let best: number | null = null;
  for (const step of steps) {
    if (best === null || Math.abs(step.tempC - tempC) < Math.abs(best - tempC)) best = step.tempC;
  }
  return best;
}

/** An instrument worth a note under a reading: no instrument of the brewer's own, never calibrated, or overdue. */
export function instrumentDeviation(reading: DeviationReading, stage: BrewDeviation['stage']): BrewDeviation | null {
  const snap = reading.instrument;
  const base = { stage, readingId: reading.id, decisionId: null, expected: null, actual: null, quantity: null } as const;
  if (!snap || snap.instrumentId === null) {
    const kind = snap ? { hydrometer: 'hydrometer', refractometer: 'refractometer', thermometer: 'thermometer', ph_meter: 'pH meter' }[snap.kind] : 'instrument';
    return {
      ...base,
      code: 'instrument-uncalibrated',
      instrumentName: snap?.name ?? null,
      message: `No ${kind} of your own was picked: common-practice defaults were used, not a calibration.`,
    };
  }
  switch (snap.kind) {
    case 'ph_meter': {
      if (!snap.calibratedOn) {
        return { ...base, code: 'instrument-uncalibrated', instrumentName: snap.name, message: `${snap.name} has no recorded two-point calibration.` };
      }
      const due = Date.parse(`${snap.calibratedOn}T00:00:00Z`) + snap.reminderDays * DAY_MS;
      if (Date.parse(reading.takenAt) > due) {
        const days = Math.floor((Date.parse(reading.takenAt) - Date.parse(`${snap.calibratedOn}T00:00:00Z`)) / DAY_MS);
        return {
          ...base,
          code: 'instrument-overdue',
          instrumentName: snap.name,
          message: `${snap.name} was last calibrated ${days} days before this reading, past its ${snap.reminderDays}-day reminder.`,
        };
      }
      return null;
    }
    case 'thermometer':
      if (!snap.checkedOn && snap.offsetC === 0) {
        return { ...base, code: 'instrument-uncalibrated', instrumentName: snap.name, message: `${snap.name} has never been checked in an ice bath or boiling water.` };
      }
      return null;
    case 'refractometer':
      if (snap.wcfSource === 'default') {
        return {
          ...base,
          code: 'instrument-uncalibrated',
          instrumentName: snap.name,
          message: `${snap.name} uses the common ${snap.wcf} wort correction factor, not one measured against a hydrometer.`,
        };
      }
      return null;
    case 'hydrometer':
      return null;
  }
}

/** An instrument is called out once per code: the first reading that shows it. */
const instrumentKey = (d: BrewDeviation, r: DeviationReading) => `${d.code}:${r.instrument?.instrumentId ?? `default-${r.instrument?.kind ?? r.kind}`}`;

/**
 * What the reading's instrument would be called out for ("instrument-uncalibrated:12"), or '' when
 * nothing: stored with each reading, so the first reading of each can be found by index.
 */
export function instrumentNoteKey(r: DeviationReading): string {
  const found = instrumentDeviation(r, readingStage[r.kind]);
  return found ? instrumentKey(found, r) : '';
}

/** Every place the brew day left its targets, in the order of the readings and decisions given. */
export function findDeviations(input: {
  targets: DeviationTargets;
  readings: readonly DeviationReading[];
  decisions?: readonly DeviationDecision[];
}): BrewDeviation[] {
  const { targets } = input;
  const out: BrewDeviation[] = [];
  const flaggedInstruments = new Set<string>();

  for (const r of input.readings) {
    const stage = readingStage[r.kind];
    const at = { stage, readingId: r.id, decisionId: null, instrumentName: null } as const;
    switch (r.kind) {
      case 'mash_ph': {
        const target = typeof targets.mashPhTarget === 'number' && Number.isFinite(targets.mashPhTarget) ? targets.mashPhTarget : MASH_PH_TARGET;
        const judged = mashPhVerdict(round(r.corrected, 2), target);
        if (judged.verdict !== 'on-target') {
          out.push({
            ...at,
            code: judged.verdict === 'low' ? 'mash-ph-low' : 'mash-ph-high',
            expected: target,
            actual: r.corrected,
            quantity: 'ph',
            message: judged.message,
          });
        }
        break;
      }
      case 'mash_temp': {
        const step = nearestStep(targets.mashSteps, r.corrected);
        const off = step === null ? 0 : round(r.corrected - step, 1);
        if (step !== null && Math.abs(off) > MASH_TEMP_TOLERANCE_C) {
          out.push({
            ...at,
            code: 'mash-temp',
            expected: step,
            actual: r.corrected,
            quantity: 'temperature',
            message: `Mash at ${r.corrected.toFixed(1)} °C is ${Math.abs(off).toFixed(1)} °C ${off < 0 ? 'below' : 'above'} the ${step} °C step.`,
          });
        }
        break;
      }
      case 'og': {
        const gap = round(points(r.corrected) - points(targets.targetOg), 1);
        if (Math.abs(gap) > OG_TOLERANCE_POINTS) {
          out.push({
            ...at,
            code: gap < 0 ? 'og-low' : 'og-high',
            expected: targets.targetOg,
            actual: r.corrected,
            quantity: 'gravity',
            message: `OG ${r.corrected.toFixed(3)} is ${Math.abs(gap).toFixed(0)} points ${gap < 0 ? 'short of' : 'over'} the target ${targets.targetOg.toFixed(3)}.`,
          });
        }
        if (r.volumeL !== null) {
          const fraction = (r.volumeL - targets.batchVolumeL) / targets.batchVolumeL;
          if (Math.abs(round(fraction, 4)) > VOLUME_TOLERANCE_FRACTION) {
            out.push({
              ...at,
              code: fraction < 0 ? 'volume-low' : 'volume-high',
              expected: targets.batchVolumeL,
              actual: r.volumeL,
              quantity: 'volume',
              message: `${r.volumeL.toFixed(1)} L went into the fermenter, ${Math.abs(fraction * 100).toFixed(0)} % ${fraction < 0 ? 'short of' : 'over'} the recipe's ${targets.batchVolumeL.toFixed(1)} L.`,
            });
          }
        }
        break;
      }
      case 'pitch_temp': {
        if (round(r.corrected, 1) > targets.fermentationTempMaxC) {
          out.push({
            ...at,
            code: 'pitch-too-warm',
            expected: targets.fermentationTempMaxC,
            actual: r.corrected,
            quantity: 'temperature',
            message: `Pitched at ${r.corrected.toFixed(1)} °C, above the recipe's fermentation range of ${targets.fermentationTempMinC}–${targets.fermentationTempMaxC} °C.`,
          });
        }
        break;
      }
      default:
        break;
    }
    const instrument = instrumentDeviation(r, stage);
    if (instrument) {
      const key = instrumentKey(instrument, r);
      if (!flaggedInstruments.has(key)) {
        flaggedInstruments.add(key);
        out.push(instrument);
      }
    }
  }

  for (const d of input.decisions ?? []) {
    if (d.predictedSg === null) continue;
    const gap = round(points(d.predictedSg) - points(targets.targetOg), 1);
    if ((d.choiceKind === 'as-is' || d.choiceKind === 'own') && Math.abs(gap) > OG_TOLERANCE_POINTS) {
      out.push({
        code: 'accepted-off-target',
        stage: 'boil',
        readingId: null,
        decisionId: d.id,
        expected: targets.targetOg,
        actual: d.predictedSg,
        quantity: 'gravity',
        instrumentName: null,
        message: `Left as is, the wort was projected to finish at ${d.predictedSg.toFixed(3)}, ${Math.abs(gap).toFixed(0)} points ${gap < 0 ? 'short of' : 'over'} the target ${targets.targetOg.toFixed(3)}.`,
      });
    }
  }
  for (const d of input.decisions ?? []) out.push(...balanceDeviations(targets, d));
  return out;
}

/** Bitterness and colour the chosen late-boil option leaves, against the recipe's targets. */
function balanceDeviations(targets: DeviationTargets, d: DeviationDecision): BrewDeviation[] {
  const out: BrewDeviation[] = [];
  const at = { stage: 'boil', readingId: null, decisionId: d.id, instrumentName: null } as const;
  const ibu = d.predictedIbu;
  const targetIbu = targets.targetIbu;
  if (typeof ibu === 'number' && typeof targetIbu === 'number') {
    const gapIbu = round(ibu - targetIbu, 1);
    if (Math.abs(gapIbu) > BITTERNESS_TOLERANCE_IBU) {
      out.push({
        ...at,
        code: gapIbu < 0 ? 'bitterness-low' : 'bitterness-high',
        expected: targetIbu,
        actual: ibu,
        quantity: 'ibu',
        message: `The late-boil choice leaves about ${ibu.toFixed(0)} IBU, ${Math.abs(gapIbu).toFixed(0)} IBU ${gapIbu < 0 ? 'below' : 'above'} the recipe's ${targetIbu.toFixed(0)} IBU.`,
      });
    }
  }
  const srm = d.predictedColourSrm;
  const targetSrm = targets.targetColourSrm;
  if (typeof srm === 'number' && typeof targetSrm === 'number') {
    const gapSrm = round(srm - targetSrm, 1);
    if (Math.abs(gapSrm) > COLOUR_TOLERANCE_SRM) {
      out.push({
        ...at,
        code: gapSrm < 0 ? 'colour-lighter' : 'colour-darker',
        expected: targetSrm,
        actual: srm,
        quantity: 'colour',
        message: `The late-boil choice leaves a colour of about ${srm.toFixed(1)} SRM, ${gapSrm < 0 ? 'paler' : 'darker'} than the recipe's ${targetSrm.toFixed(1)} SRM.`,
      });
    }
  }
  return out;
}

/** A gravity difference as the brewer reads gravity: points for SG, degrees for °Plato. */
function gap(a: number, e: number, unit: GravityUnit): string {
  if (unit === 'plato') return `${Math.abs(sgToPlato(a) - sgToPlato(e)).toFixed(1)}\u00a0°P`;
  return `${Math.abs(round(points(a) - points(e), 1)).toFixed(0)} points`;
}

/** The same deviation worded in the brewer's own units. */
export function describeDeviation(d: BrewDeviation, prefs: { unitSystem: UnitSystem; gravityUnit: GravityUnit }): string {
  const g = (sg: number) => formatGravity(sg, prefs.gravityUnit);
  const t = (c: number) => formatTemperature(c, prefs.unitSystem);
  const v = (l: number) => formatVolume(l, prefs.unitSystem);
  const { expected: e, actual: a } = d;
  if (e === null || a === null) return d.message;
  switch (d.code) {
    case 'mash-temp': {
      const gapC = a - e;
      const gap = prefs.unitSystem === 'us' ? `${Math.abs(gapC * 1.8).toFixed(1)}\u00a0°F` : `${Math.abs(gapC).toFixed(1)}\u00a0°C`;
      return `Mash at ${t(a)} is ${gap} ${gapC < 0 ? 'below' : 'above'} the ${t(e)} step.`;
    }
    case 'og-low':
    case 'og-high':
      return `OG ${g(a)} is ${gap(a, e, prefs.gravityUnit)} ${d.code === 'og-low' ? 'short of' : 'over'} the target ${g(e)}.`;
    case 'volume-low':
    case 'volume-high':
      return `${v(a)} went into the fermenter, ${Math.abs(((a - e) / e) * 100).toFixed(0)}\u00a0% ${d.code === 'volume-low' ? 'short of' : 'over'} the recipe's ${v(e)}.`;
    case 'pitch-too-warm':
      return `Pitched at ${t(a)}, above the top of the recipe's fermentation range, ${t(e)}.`;
    case 'accepted-off-target':
      return `Left as is, the wort was projected to finish at ${g(a)}, ${gap(a, e, prefs.gravityUnit)} ${a < e ? 'short of' : 'over'} the target ${g(e)}.`;
    default:
      return d.message;
  }
}
