/**
 * Importing readings from our CSV format (docs/fermentation-csv.md). Stateless: the preview reads
 * the uploaded file and answers with the mapping it suggests and what each row would become; the
 * import receives the file again with the mapping the brewer confirmed. Every row is checked
 * before anything is written; one bad row and nothing is imported; rows already in the log (or
 * twice in the file) are skipped, so importing the same file again adds nothing.
 */
import { BrewMathError, sgToBrix } from '@shared/brewmath';
import { readRow, suggestMapping, type ImportedRow } from '@shared/fermentation';
import { defaultSnapshot } from '@shared/instruments';
import {
  CSV_MAX_ROW_ERRORS,
  CSV_MAX_ROWS,
  csvMappingSchema,
  methodKind,
  type CsvImportResult,
  type CsvMapping,
  type CsvPreview,
  type CsvPreviewRow,
  type CsvRowError,
  type FermentationRaw,
} from '@shared/schemas/fermentation';
import type { InstrumentSnapshot } from '@shared/schemas/instruments';
import type { Actor } from '../auth/permissions';
import { loadBrewForActor, type StoredBrew } from '../brews/service';
import type { Db } from '../db/client';
import { lockBrewRow } from '../db/locks';
import { isDuplicateKey } from '../lib/db-errors';
import { fermentationReadings } from '../db/schema';
import { listInstruments } from '../instruments/service';
import { fieldErrors } from '../lib/handle';
import { BadRequest, Conflict, HttpError } from '../lib/errors';
import { CsvParseError, CsvTooManyRowsError, detectDelimiter, readCsv, stripBom, unguardFormula, type CsvRecord } from '../lib/csv';
import { scheduleAfterReadings } from './reminders';
import { correctRaw, dedupeKey, existingKeys, primaryOf, requirePitched } from './readings';
import { assembleLog, measuredOg } from './service';
import { derivedRows, expectedFgOf, verdictFor } from './verdict';
import { lockAndCheckReadingLimit } from '../lib/reading-limit';

export class UnsupportedFile extends HttpError {
  constructor(message: string) {
    super(415, 'unsupported_file', message, { file: message });
  }
}

export class TooManyRows extends HttpError {
  constructor(message: string) {
    super(413, 'too_many_rows', message, { file: message });
  }
}

/** The bytes as text, or a 415 when they are not a text file. */
export function decodeCsv(buffer: Buffer): string {
  if (buffer.length === 0) throw new BadRequest('The file is empty.', { file: 'The file is empty.' });
  const head = buffer.subarray(0, 8);
  if (head[0] === 0x50 && head[1] === 0x4b && head[2] === 0x03 && head[3] === 0x04) {
    throw new UnsupportedFile('This looks like a spreadsheet workbook, not a CSV file. Save it as "CSV (comma delimited)" and upload that.');
  }
  if (head.subarray(0, 4).toString('latin1') === '%PDF') throw new UnsupportedFile('This is a PDF, not a CSV file.');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    // Older spreadsheet programs save CSV in Windows-1252.
    text = new TextDecoder('windows-1252').decode(buffer);
  }
  // Text files hold no control characters beyond tab and line ends.
  const sample = text.slice(0, 65_536);
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(sample)) {
    throw new UnsupportedFile('This file is not CSV text (it holds binary data). Export your readings as CSV and upload that.');
  }
  return stripBom(text);
}

function readRecords(text: string): CsvRecord[] {
  try {
    // One more than the limit, for the header.
    return readCsv(text, { delimiter: detectDelimiter(text), maxRecords: CSV_MAX_ROWS + 1 });
  } catch (error) {
    if (error instanceof CsvTooManyRowsError) throw new TooManyRows(`The file has more than ${CSV_MAX_ROWS.toLocaleString('en-GB')} rows. Split it into smaller files and import them one after the other.`);
    if (error instanceof CsvParseError) throw new BadRequest(`The file could not be read as CSV. ${error.message}`, { file: error.message });
    throw error;
  }
}

export function parseMapping(json: string | undefined): CsvMapping | null {
  if (json === undefined || json === '') return null;
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch {
    throw new BadRequest('The column mapping is not valid JSON.', { mapping: 'The column mapping is not valid JSON.' });
  }
  const parsed = csvMappingSchema.safeParse(value);
  if (!parsed.success) {
    const fields = Object.fromEntries(Object.entries(fieldErrors(parsed.error)).map(([k, v]) => [`mapping.${k}`, v]));
    throw new BadRequest('Check the column mapping.', fields);
  }
  return parsed.data;
}

interface PreparedRow {
  source: ImportedRow;
  raw: FermentationRaw;
  snapshot: InstrumentSnapshot;
  corrected: number;
  correction: Record<string, unknown>;
  warnings: string[];
  estimate: boolean;
  key: string;
}

/** Reads every data row: a prepared reading, or the row's error. */
async function prepareRows(db: Db, actor: Actor, stored: StoredBrew, records: CsvRecord[], mapping: CsvMapping, now: Date) {
  const pitchedAt = requirePitched(stored);
  const dataRecords = mapping.hasHeader ? records.slice(1) : records;
  const instruments = await listInstruments(db, actor, { archived: 'include' });
  const byName = new Map<string, InstrumentSnapshot[]>();
  for (const i of instruments) {
    const key = i.name.trim().toLowerCase();
    byName.set(key, [...(byName.get(key) ?? []), i.snapshot]);
  }
  const og = await measuredOg(db, stored.row.id);
  const results: ({ ok: true; row: number; prepared: PreparedRow } | { ok: false; row: number; error: CsvRowError })[] = [];
  for (const record of dataRecords) {
    const read = readRow(record.row, record.cells, mapping, { pitchedAt, now });
    if (!read.ok) {
      results.push({ ok: false, row: record.row, error: read.error });
      continue;
    }
    const r = read.reading;
    const fail = (field: CsvRowError['field'], message: string) => results.push({ ok: false, row: r.row, error: { row: r.row, field, message: `Row ${r.row}: ${message}` } });
    let snapshot: InstrumentSnapshot = defaultSnapshot(r.method);
    if (r.instrumentName) {
      // Our export guards text against spreadsheet formulas with a leading apostrophe.
      const name = unguardFormula(r.instrumentName);
      const all = byName.get(name.toLowerCase()) ?? [];
      const matches = all.filter((s) => s.kind === r.method);
      if (matches.length === 0) {
        fail(
          'instrument',
          all.length
            ? `"${name}" is a ${all[0].kind}, not a ${r.method}.`
            : `you have no ${r.method} called "${name}". Add it on the instruments page, or leave the cell empty for common-practice defaults.`,
        );
        continue;
      }
      snapshot = matches[0];
    }
    let raw: FermentationRaw;
    if (r.raw.method === 'refractometer') {
      if (r.raw.originalBrix === null) {
        if (og === null) {
          fail('original_brix', 'a refractometer reading after pitching needs the original Brix (alcohol skews the reading). Add an original_brix column, or log the OG on the brew day.');
          continue;
        }
        const wcf = snapshot.kind === 'refractometer' ? snapshot.wcf : 1;
        raw = { method: 'refractometer', brix: r.raw.brix, originalBrix: Number(sgToBrix(og, wcf).toFixed(2)), originalBrixSource: 'from-og' };
      } else {
        raw = { method: 'refractometer', brix: r.raw.brix, originalBrix: r.raw.originalBrix, originalBrixSource: 'entered' };
      }
    } else {
      raw = r.raw;
    }
    let corrected;
    try {
      corrected = correctRaw(snapshot, raw);
    } catch (error) {
      // A row's impossible value is that row's error, not the request's.
      if (error instanceof HttpError || error instanceof BrewMathError) {
        fail('value', error.message.charAt(0).toLowerCase() + error.message.slice(1));
        continue;
      }
      throw error;
    }
    results.push({
      ok: true,
      row: r.row,
      prepared: {
        source: r,
        raw,
        snapshot,
        corrected: corrected.corrected,
        correction: corrected.correction,
        warnings: corrected.warnings,
        estimate: corrected.correction.kind === 'wcf-alcohol',
        key: dedupeKey(stored.row.id, r.takenAt, r.method, primaryOf(raw)),
      },
    });
  }
  return results;
}

async function loadAndRead(db: Db, actor: Actor, brewId: number, buffer: Buffer) {
  const stored = await loadBrewForActor(db, actor, brewId, 'update');
  requirePitched(stored);
  const text = decodeCsv(buffer);
  const records = readRecords(text);
  if (records.length === 0) throw new BadRequest('The file has no rows.', { file: 'The file has no rows.' });
  return { stored, text, records };
}

const PREVIEW_ROWS = 20;

export async function previewImport(db: Db, actor: Actor, brewId: number, buffer: Buffer, given: CsvMapping | null, now = new Date()): Promise<CsvPreview> {
  const { stored, text, records } = await loadAndRead(db, actor, brewId, buffer);
  const suggested = given === null;
  const mapping = given ?? suggestMapping(records[0].cells).mapping;
  const header = mapping.hasHeader ? records[0].cells : null;
  const columnCount = Math.max(...records.slice(0, 50).map((r) => r.cells.length));
  const base = {
    delimiter: detectDelimiter(text),
    header,
    columnCount,
    rowCount: records.length - (mapping.hasHeader ? 1 : 0),
    mapping,
    suggested,
  };
  const check = csvMappingSchema.safeParse(mapping);
  if (!check.success) {
    // Show the file so the brewer can say which column is which.
    const rows = records.slice(mapping.hasHeader ? 1 : 0, PREVIEW_ROWS + 1).map((r) => ({ row: r.row, cells: r.cells, reading: null, error: null }));
    return { ...base, rows, errors: [], errorCount: 0, duplicateCount: 0, newCount: 0, mappingErrors: fieldErrors(check.error) };
  }
  const results = await prepareRows(db, actor, stored, records, mapping, now);
  const existing = await existingKeys(
    db,
    brewId,
    results.flatMap((r) => (r.ok ? [r.prepared.key] : [])),
  );
  const seen = new Set<string>();
  let duplicateCount = 0;
  const duplicates = new Set<number>();
  for (const r of results) {
    if (!r.ok) continue;
    if (existing.has(r.prepared.key) || seen.has(r.prepared.key)) {
      duplicateCount++;
      duplicates.add(r.row);
    }
    seen.add(r.prepared.key);
  }
  const errors = results.flatMap((r) => (r.ok ? [] : [r.error]));
  const cellsByRow = new Map(records.map((r) => [r.row, r.cells]));
  const rows: CsvPreviewRow[] = results.slice(0, PREVIEW_ROWS).map((r) =>
    r.ok
      ? {
          row: r.row,
          cells: cellsByRow.get(r.row) ?? [],
          reading: {
            takenAt: r.prepared.source.takenAt.toISOString(),
            kind: r.prepared.source.kind,
            method: r.prepared.source.method,
            value: r.prepared.source.value,
            unit: r.prepared.source.unit,
            instrument: r.prepared.snapshot.name,
            corrected: r.prepared.corrected,
            duplicate: duplicates.has(r.row),
          },
          error: null,
        }
      : { row: r.row, cells: cellsByRow.get(r.row) ?? [], reading: null, error: r.error.message },
  );
  return {
    ...base,
    rows,
    errors: errors.slice(0, CSV_MAX_ROW_ERRORS),
    errorCount: errors.length,
    duplicateCount,
    newCount: results.length - errors.length - duplicateCount,
    mappingErrors: null,
  };
}

export class RowErrors extends HttpError {
  constructor(
    readonly rows: CsvRowError[],
    readonly errorCount: number,
  ) {
    const message = `${errorCount} ${errorCount === 1 ? 'row needs' : 'rows need'} attention, so nothing was imported. ${rows[0].message}`;
    // Each row's message under `rows.<row>`, so the page can list them (the error middleware sends `fields` as is).
    super(400, 'bad_rows', message, { file: message, ...Object.fromEntries(rows.map((r) => [`rows.${r.row}`, r.message])) });
  }
}

/** All or nothing: every row checked first, then one transaction. */
export async function importReadings(db: Db, actor: Actor, brewId: number, buffer: Buffer, mapping: CsvMapping, now = new Date()): Promise<CsvImportResult> {
  const { stored, records } = await loadAndRead(db, actor, brewId, buffer);
  const results = await prepareRows(db, actor, stored, records, mapping, now);
  const errors = results.flatMap((r) => (r.ok ? [] : [r.error]));
  if (errors.length > 0) throw new RowErrors(errors.slice(0, CSV_MAX_ROW_ERRORS), errors.length);
  const prepared = results.flatMap((r) => (r.ok ? [r.prepared] : []));
  if (prepared.length === 0) throw new BadRequest('The file has no readings to import.', { file: 'The file has no readings to import.' });

  let added = 0;
  try {
    await db.transaction(async (tx) => {
      // Two imports into one brew at once queue on the brew row instead of deadlocking.
      await lockBrewRow(tx, brewId);
      const existing = await existingKeys(
        tx,
        brewId,
        prepared.map((p) => p.key),
      );
      const fresh: PreparedRow[] = [];
      for (const p of prepared) {
        if (existing.has(p.key)) continue;
        existing.add(p.key);
        fresh.push(p);
      }
      if (fresh.length > 0) await lockAndCheckReadingLimit(tx, brewId, 'fermentation', fresh.length);
      for (let i = 0; i < fresh.length; i += 500) {
        await tx.insert(fermentationReadings).values(
          fresh.slice(i, i + 500).map((p) => ({
            brewId,
            kind: methodKind[p.source.method],
            method: p.source.method,
            instrumentId: p.snapshot.instrumentId,
            instrumentSnapshot: p.snapshot,
            raw: p.raw,
            correctedValue: p.corrected,
            correction: p.correction,
            warnings: p.warnings,
            estimate: p.estimate,
            takenAt: p.source.takenAt,
            note: unguardFormula(p.source.note),
            source: 'csv' as const,
            dedupeKey: p.key,
            createdBy: actor.id,
          })),
        );
      }
      added = fresh.length;
    });
  } catch (error) {
    // Another import of the same rows committed first: ours rolled back whole.
    if (isDuplicateKey(error)) throw new Conflict('Some of these readings were saved by another import just now. Nothing was imported; try again and the rest will be added.');
    throw error;
  }
  if (added > 0) await scheduleAfterReadings(db, stored, verdictFor(await derivedRows(db, brewId), stored.row.pitchedAt, now, expectedFgOf(stored)), now);
  const log = await assembleLog(db, actor, stored, now);
  return { added, skipped: prepared.length - added, log };
}
