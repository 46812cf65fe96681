/**
 * Our own CSV column format for fermentation readings (docs/fermentation-csv.md): the mapping
 * from a file's columns to our fields, and each row read into a reading or a row error. Pure, so
 * the preview and the import give the same answer for the same file.
 */
import { fToC, platoToSg, PLATO_MAX, PLATO_MIN } from '../brewmath';
import {
  csvFields,
  FERMENTATION_LIMITS,
  FUTURE_SLACK_MS,
  type CsvField,
  type CsvMapping,
  type CsvRowError,
  type CsvUnit,
  type FermentationMethod,
  type FermentationReadingKind,
} from '../schemas/fermentation';

/** Our column names, in the order we write them. */
export const CSV_COLUMNS: readonly CsvField[] = csvFields;
/** Written on export for people to read; ignored on import unless mapped. */
export const CSV_EXPORT_EXTRA_COLUMNS = ['corrected', 'estimate', 'source'] as const;

const synonyms: Record<CsvField, string[]> = {
  taken_at: ['taken_at', 'takenat', 'taken', 'date', 'time', 'datetime', 'date_time', 'timestamp', 'when', 'date_and_time'],
  kind: ['kind', 'type', 'reading_type', 'what'],
  value: ['value', 'reading', 'measurement', 'val'],
  unit: ['unit', 'units', 'scale'],
  sample_temp_c: ['sample_temp_c', 'sample_temp', 'sample_temperature', 'sample_temperature_c', 'sample_c'],
  original_brix: ['original_brix', 'orig_brix', 'og_brix', 'start_brix', 'brix_before'],
  instrument: ['instrument', 'device', 'meter', 'tool'],
  note: ['note', 'notes', 'comment', 'comments', 'remark'],
};

const normalise = (s: string) =>
  s
    .trim()
    .toLowerCase()
    .replace(/[°()]/g, '')
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_|_$/g, '');

export function emptyMapping(): CsvMapping {
  return {
    columns: { taken_at: null, kind: null, value: null, unit: null, sample_temp_c: null, original_brix: null, instrument: null, note: null },
    defaults: { kind: null, unit: null },
    hasHeader: true,
  };
}

/** Guesses which column feeds which field from the header's names. */
export function suggestMapping(firstRow: readonly string[]): { mapping: CsvMapping; hasHeader: boolean } {
  const mapping = emptyMapping();
  const names = firstRow.map(normalise);
  let matched = 0;
  for (const field of csvFields) {
    const index = names.findIndex((name, i) => synonyms[field].includes(name) && !Object.values(mapping.columns).includes(i));
    if (index >= 0) {
      mapping.columns[field] = index;
      matched++;
    }
  }
  // No recognisable names and a first cell that reads as a time: the file has no header.
  const hasHeader = matched > 0 || parseTakenAt(firstRow[0] ?? '') === null;
  mapping.hasHeader = hasHeader;
  if (!hasHeader) {
    // Our own order, as far as the file has columns.
    csvFields.forEach((field, i) => {
      mapping.columns[field] = i < firstRow.length ? i : null;
    });
  }
  return { mapping, hasHeader };
}

// ---------------------------------------------------------------------------------------------
// Cells

const isoPattern = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,6}))?)?)?\s*(Z|[+-]\d{2}:?\d{2})?$/i;

/**
 * ISO 8601: `2026-03-14T18:30:00Z`, `2026-03-14 18:30+01:00`. Without an offset the time is UTC;
 * a date alone is noon UTC. Returns null for anything else, or a date that does not exist.
 */
export function parseTakenAt(text: string): Date | null {
  const m = isoPattern.exec(text.trim());
  if (!m) return null;
  const [, y, mo, d, h = '12', mi = '00', s = '00', frac = '0', offset] = m;
  const year = Number(y);
  const month = Number(mo);
  const day = Number(d);
  const hour = Number(h);
  const minute = Number(mi);
  const second = Number(s);
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 59) return null;
  const ms = Math.round(Number(`0.${frac}`) * 1000);
  let t = Date.UTC(year, month - 1, day, hour, minute, second, ms);
  const check = new Date(Date.UTC(year, month - 1, day));
  if (check.getUTCMonth() !== month - 1 || check.getUTCDate() !== day) return null;
  if (offset && offset.toUpperCase() !== 'Z') {
    const sign = offset[0] === '-' ? -1 : 1;
    const digits = offset.slice(1).replace(':', '');
    const oh = Number(digits.slice(0, 2));
    const om = Number(digits.slice(2, 4));
    if (oh > 14 || om > 59) return null;
    t -= sign * (oh * 60 + om) * 60_000;
  }
  return new Date(t);
}

/** A number as typed in a spreadsheet: a decimal point or a lone decimal comma. */
export function parseNumber(text: string): number | null {
  let s = text.trim();
  if (s === '') return null;
  if (/^[+-]?\d+,\d+$/.test(s)) s = s.replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(s)) return null;
  const n = Number(s);
  return Number.isFinite(n) ? n : null;
}

const unitWords: Record<string, CsvUnit> = {
  sg: 'sg',
  plato: 'plato',
  p: 'plato',
  '°p': 'plato',
  brix: 'brix',
  bx: 'brix',
  '°bx': 'brix',
  c: 'c',
  '°c': 'c',
  celsius: 'c',
  f: 'f',
  '°f': 'f',
  fahrenheit: 'f',
};

export function parseUnit(text: string): CsvUnit | null {
  return unitWords[text.trim().toLowerCase()] ?? null;
}

export function parseKind(text: string): FermentationReadingKind | null {
  const k = text.trim().toLowerCase();
  if (k === 'gravity') return 'gravity';
  if (k === 'temperature' || k === 'temp') return 'temperature';
  return null;
}

const unitKind: Record<CsvUnit, FermentationReadingKind> = { sg: 'gravity', plato: 'gravity', brix: 'gravity', c: 'temperature', f: 'temperature' };
const unitMethod: Record<CsvUnit, FermentationMethod> = { sg: 'hydrometer', plato: 'hydrometer', brix: 'refractometer', c: 'thermometer', f: 'thermometer' };

// ---------------------------------------------------------------------------------------------
// Rows

export interface RowContext {
  pitchedAt: Date;
  now: Date;
}

/** A row read from the file, in SI and SG; not yet corrected by its instrument. */
export interface ImportedRow {
  row: number;
  takenAt: Date;
  kind: FermentationReadingKind;
  method: FermentationMethod;
  /** The value and unit as in the file, for the preview. */
  value: number;
  unit: CsvUnit;
  raw:
    | { method: 'hydrometer'; sg: number; sampleTempC: number | null }
    | { method: 'refractometer'; brix: number; originalBrix: number | null }
    | { method: 'thermometer'; tempC: number };
  instrumentName: string | null;
  note: string;
}

export type RowResult = { ok: true; reading: ImportedRow } | { ok: false; error: CsvRowError };

const L = FERMENTATION_LIMITS;
const when = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

export function readRow(row: number, cells: readonly string[], mapping: CsvMapping, ctx: RowContext): RowResult {
  const cell = (field: CsvField) => {
    const col = mapping.columns[field];
    return col === null ? '' : (cells[col] ?? '').trim();
  };
  const fail = (field: CsvField | null, message: string): RowResult => ({ ok: false, error: { row, field, message: `Row ${row}: ${message}` } });

  const takenText = cell('taken_at');
  if (takenText === '') return fail('taken_at', 'the date and time are missing.');
  const takenAt = parseTakenAt(takenText);
  if (!takenAt) return fail('taken_at', `"${clip(takenText)}" is not a date and time. Write it as 2026-03-14T18:30:00Z (ISO 8601).`);
  if (takenAt.getTime() < ctx.pitchedAt.getTime()) {
    return fail('taken_at', `${when(takenAt)} is before the yeast was pitched (${when(ctx.pitchedAt)}).`);
  }
  if (takenAt.getTime() > ctx.now.getTime() + FUTURE_SLACK_MS) return fail('taken_at', `${when(takenAt)} is in the future.`);

  const unitText = cell('unit');
  const unit = unitText === '' ? mapping.defaults.unit : parseUnit(unitText);
  if (!unit) {
    return fail('unit', unitText === '' ? 'the unit is missing (sg, plato, brix, c or f).' : `unknown unit "${clip(unitText)}": use sg, plato, brix, c or f.`);
  }
  const kindText = cell('kind');
  const kind = kindText === '' ? (mapping.defaults.kind ?? unitKind[unit]) : parseKind(kindText);
  if (!kind) return fail('kind', `unknown kind "${clip(kindText)}": use gravity or temperature.`);
  if (kind !== unitKind[unit]) {
    return fail('unit', `a ${kind} reading cannot be in "${unit}". Gravity is in sg, plato or brix; temperature in c or f.`);
  }

  const valueText = cell('value');
  const value = parseNumber(valueText);
  if (value === null) return fail('value', valueText === '' ? 'the value is missing.' : `"${clip(valueText)}" is not a number.`);

  const method = unitMethod[unit];
  let raw: ImportedRow['raw'];
  switch (unit) {
    case 'sg':
    case 'plato': {
      if (unit === 'plato' && (value < PLATO_MIN || value > PLATO_MAX)) {
        return fail('value', `${value} °P is beyond what wort or beer can read.`);
      }
      const sg = unit === 'plato' ? platoToSg(value) : value;
      if (sg < L.sg.min || sg > L.sg.max) return fail('value', `gravity ${value} is outside 0.980 to 1.200. Is the unit right?`);
      const sampleText = cell('sample_temp_c');
      const sampleTempC = parseNumber(sampleText);
      if (sampleText !== '' && sampleTempC === null) return fail('sample_temp_c', `sample temperature "${clip(sampleText)}" is not a number.`);
      if (sampleTempC !== null && (sampleTempC < L.sampleTempC.min || sampleTempC > L.sampleTempC.max)) {
        return fail('sample_temp_c', `a sample at ${sampleTempC} °C is outside 0 to 60 °C, where a hydrometer can be corrected.`);
      }
      raw = { method: 'hydrometer', sg, sampleTempC };
      break;
    }
    case 'brix': {
      if (value < L.brix.min || value > L.brix.max) return fail('value', `${value} °Bx is outside 0 to 40 °Bx.`);
      const origText = cell('original_brix');
      const originalBrix = parseNumber(origText);
      if (origText !== '' && originalBrix === null) return fail('original_brix', `original Brix "${clip(origText)}" is not a number.`);
      if (originalBrix !== null && (originalBrix < L.brix.min || originalBrix > L.brix.max)) return fail('original_brix', `original Brix ${originalBrix} is outside 0 to 40 °Bx.`);
      if (originalBrix !== null && value > originalBrix) {
        return fail('value', `${value} °Bx is above the original ${originalBrix} °Bx; fermentation only lowers it.`);
      }
      raw = { method: 'refractometer', brix: value, originalBrix };
      break;
    }
    case 'c':
    case 'f': {
      const tempC = unit === 'f' ? fToC(value) : value;
      if (tempC < L.fermenterTempC.min || tempC > L.fermenterTempC.max) {
        return fail('value', `${value} °${unit.toUpperCase()} is outside what a fermenter reads (−5 to 50 °C, 23 to 122 °F).`);
      }
      raw = { method: 'thermometer', tempC };
      break;
    }
  }
  const instrumentName = cell('instrument') || null;
  const note = cell('note');
  if (note.length > 500) return fail('note', 'the note is longer than 500 characters.');
  if (instrumentName && instrumentName.length > 80) return fail('instrument', 'the instrument name is longer than 80 characters.');
  return { ok: true, reading: { row, takenAt, kind, method, value, unit, raw, instrumentName, note } };
}

function clip(text: string) {
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

/**
 * What makes two readings the same, for "re-importing adds nothing twice": the brew, the time
 * to the millisecond, the kind and the instrument's own reading, rounded to what the export writes.
 * The server hashes this with SHA-256.
 */
export function dedupeMaterial(brewId: number, takenAt: Date, method: FermentationMethod, value: number): string {
  const unit = method === 'hydrometer' ? 'sg' : method === 'refractometer' ? 'brix' : 'c';
  return `${brewId}|${methodKindOf[method]}|${takenAt.getTime()}|${unit}:${roundFor(unit, value)}`;
}

const methodKindOf: Record<FermentationMethod, FermentationReadingKind> = { hydrometer: 'gravity', refractometer: 'gravity', thermometer: 'temperature' };

/** The instrument's own number of a raw reading: SG as read, Brix, or °C before the offset. */
export function primaryValue(raw: ImportedRow['raw']): number {
  return raw.method === 'hydrometer' ? raw.sg : raw.method === 'refractometer' ? raw.brix : raw.tempC;
}

/** The precision of each unit in our CSV, shared by export and the duplicate check. */
export function roundFor(unit: 'sg' | 'brix' | 'c', value: number): string {
  const digits = unit === 'sg' ? 5 : 2;
  const text = value.toFixed(digits);
  return Number(text) === 0 ? (0).toFixed(digits) : text;
}
