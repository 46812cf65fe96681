/**
 * A small CSV reader after RFC 4180 (fields in double quotes may hold the delimiter, line breaks
 * and doubled quotes), lenient where spreadsheets are: LF or CRLF line ends, a byte-order mark,
 * semicolons or tabs instead of commas, blank lines skipped. It stops as soon as a file has more
 * records than allowed, so an oversized upload is refused without being read to the end.
 */

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

/** The delimiter that splits the first line into the most fields (outside quotes). */
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

export function parseCsv(input: string, { delimiter = detectDelimiter(stripBom(input)), maxRecords = Infinity }: { delimiter?: CsvDelimiter; maxRecords?: number } = {}): CsvRecord[] {
  const text = stripBom(input);
  const records: CsvRecord[] = [];
  let row = 1;
  let cells: string[] = [];
  let field = '';
  let i = 0;
  const n = text.length;
  let recordRow = 1;

  const endRecord = () => {
    cells.push(field);
    field = '';
    const blank = cells.length === 1 && cells[0].trim() === '';
    if (!blank) {
      if (records.length >= maxRecords) throw new CsvTooManyRowsError(maxRecords);
      records.push({ row: recordRow, cells });
    }
    cells = [];
  };

  while (i < n) {
    const ch = text[i];
    if (ch === '"' && field === '') {
      // A quoted field: read to the closing quote; "" is one quote.
      const startRow = row;
      i++;
      let closed = false;
      let start = i;
      while (i < n) {
        const c = text[i];
        if (c === '"') {
          if (text[i + 1] === '"') {
            field += text.slice(start, i + 1);
            i += 2;
            start = i;
            continue;
          }
          field += text.slice(start, i);
          i++;
          closed = true;
          break;
        }
        if (c === '\n') row++;
        i++;
      }
      if (!closed) throw new CsvParseError(`Row ${startRow}: a quoted field is never closed (a " is missing).`, startRow);
      // Only a delimiter or a line end may follow a closing quote.
      const next = text[i];
      if (i < n && next !== delimiter && next !== '\n' && next !== '\r') {
        throw new CsvParseError(`Row ${row}: there is text after a closing quote. Put the whole field in quotes and double any quote inside it.`, row);
      }
      // Keep the field marked as quoted-and-empty distinct from "no field yet" by appending nothing.
      continue;
    }
    if (ch === delimiter) {
      cells.push(field);
      field = '';
      i++;
      continue;
    }
    if (ch === '\r' || ch === '\n') {
      endRecord();
      if (ch === '\r' && text[i + 1] === '\n') i++;
      i++;
      row++;
      recordRow = row;
      continue;
    }
    // Plain characters up to the next special one, in one slice.
    let j = i + 1;
    while (j < n) {
      const c = text[j];
      if (c === delimiter || c === '\n' || c === '\r') break;
      j++;
    }
    field += text.slice(i, j);
    i = j;
  }
  if (field !== '' || cells.length > 0) endRecord();
  return records;
}

/** One record as CSV text, quoting where RFC 4180 requires it. */
export function toCsvLine(cells: readonly (string | number | null | undefined)[]): string {
  return cells
    .map((cell) => {
      const text = cell === null || cell === undefined ? '' : String(cell);
      return /[",\r\n]/.test(text) || /^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
    })
    .join(',');
}
