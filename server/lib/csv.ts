/**
 * The one place that reads and writes CSV (RFC 4180), on csv-parse and csv-stringify: fields in
 * double quotes may hold the delimiter, line breaks and doubled quotes. Reading is lenient where
 * spreadsheets are (LF, CRLF or CR line ends, a byte-order mark, semicolons or tabs instead of
 * commas, blank lines skipped) and stops as soon as a file has more records than allowed, so an
 * oversized upload is refused without being read to the end. Writing quotes what RFC 4180
 * requires, and every text a person typed goes through `formulaSafe`. Server only: the sync
 * builds of both libraries use Node's Buffer.
 */
import { CsvError, parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';

export interface CsvRecord {
  /** Spreadsheet row number (1-based; blank lines count, as they do in a spreadsheet). */
  row: number;
  cells: string[];
}

export class CsvParseError extends Error {
  constructor(
    message: string,
    readonly row: number,
  ) {
    super(message);
    this.name = 'CsvParseError';
  }
}

export class CsvTooManyRowsError extends Error {
  constructor(readonly maxRows: number) {
    super(`The file has more than ${maxRows.toLocaleString('en-GB')} rows. Split it into smaller files and import them one after the other.`);
    this.name = 'CsvTooManyRowsError';
  }
}

export type CsvDelimiter = ',' | ';' | '\t';
const DELIMITERS: CsvDelimiter[] = [',', ';', '\t'];

export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/** The delimiter that splits the first line into the most fields (outside quotes); csv-parse does not guess. */
export function detectDelimiter(text: string): CsvDelimiter {
  const counts = new Map<CsvDelimiter, number>(DELIMITERS.map((d) => [d, 0]));
  let quoted = false;
  for (let i = 0; i < text.length && i < 10_000; i++) {
    const ch = text[i];
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === '\n' || ch === '\r')) break;
    else if (!quoted && counts.has(ch as CsvDelimiter)) counts.set(ch as CsvDelimiter, counts.get(ch as CsvDelimiter)! + 1);
  }
  let best: CsvDelimiter = ',';
  for (const d of DELIMITERS) if (counts.get(d)! > counts.get(best)!) best = d;
  return best;
}

const LINE_BREAK = /\r\n|\r|\n/g;

/** Where the reader is: the spreadsheet row the next record starts on. */
interface Position {
  row: number;
  endedWithCr: boolean;
}

function parseRecords(text: string, delimiter: CsvDelimiter, maxRecords: number, relaxQuotes: boolean, at: Position): CsvRecord[] {
  const records: CsvRecord[] = [];
  parse(text, {
    bom: true,
    delimiter,
    raw: true,
    relax_column_count: true,
    relax_quotes: relaxQuotes,
    on_record: (given: string[]) => {
      // With raw: true csv-parse hands over { record, raw }; its types still say string[].
      const entry = given as unknown as { record: string[]; raw: string };
      // Row numbers come from the line breaks read so far, quoted ones included.
      const recordRow = at.endedWithCr && entry.raw.startsWith('\n') ? at.row - 1 : at.row;
      at.row = recordRow + (entry.raw.match(LINE_BREAK)?.length ?? 0);
      at.endedWithCr = entry.raw.endsWith('\r');
      const cells = entry.record;
      if (cells.length === 1 && cells[0].trim() === '') return null;
      if (records.length >= maxRecords) throw new CsvTooManyRowsError(maxRecords);
      records.push({ row: recordRow, cells });
      return null;
    },
  });
  return records;
}

export function readCsv(text: string, { delimiter = detectDelimiter(stripBom(text)), maxRecords = Infinity }: { delimiter?: CsvDelimiter; maxRecords?: number } = {}): CsvRecord[] {
  const at: Position = { row: 1, endedWithCr: false };
  try {
    return parseRecords(text, delimiter, maxRecords, false, at);
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    const row = Number((error as CsvError & { lines?: number }).lines ?? at.row);
    switch (error.code) {
      case 'CSV_QUOTE_NOT_CLOSED':
        // The row the open quote stands on, not the end of the file.
        throw new CsvParseError(`Row ${at.row}: a quoted field is never closed (a " is missing).`, at.row);
      case 'CSV_INVALID_CLOSING_QUOTE':
        throw new CsvParseError(`Row ${row}: there is text after a closing quote. Put the whole field in quotes and double any quote inside it.`, row);
      case 'INVALID_OPENING_QUOTE':
        // A quote inside an unquoted field (6" of krausen) is kept as written, as spreadsheets do.
        return parseRecords(text, delimiter, maxRecords, true, { row: 1, endedWithCr: false });
      default:
        throw new CsvParseError(`Row ${row}: ${error.message}`, row);
    }
  }
}

/** A spreadsheet would run text starting with = + - @ (or a tab or CR) as a formula; an apostrophe stops that (OWASP, CSV injection). */
export function formulaSafe(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** The text as typed, from a cell `formulaSafe` wrote (reading our own export back). */
export function unguardFormula(text: string): string {
  return text.startsWith("'") && FORMULA_START.test(text.slice(1)) ? text.slice(1) : text;
}

const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvCell = string | number | null | undefined;

/**
 * Records as CSV text, CRLF after each, quoted where RFC 4180 requires it (and around leading or
 * trailing spaces, which spreadsheets would drop). Numbers are written as given: format them first.
 */
export function writeCsv(records: readonly (readonly CsvCell[])[], { bom = false }: { bom?: boolean } = {}): string {
  return stringify(
    records.map((cells) => [...cells]),
    { bom, record_delimiter: 'windows', quoted_match: [/[\r\n]/, /^\s|\s$/] },
  );
}
