import { describe, expect, it } from 'vitest';
import { CsvParseError, CsvTooManyRowsError, detectDelimiter, parseCsv, toCsvLine } from './csv';

const cells = (text: string) => parseCsv(text).map((r) => r.cells);

// The rules of RFC 4180 (IETF, October 2005), section 2, numbered as there.
describe('CSV after RFC 4180 section 2', () => {
  it('rules 1 and 2: records end with CRLF, the last one optionally', () => {
    expect(cells('aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n')).toEqual([
      ['aaa', 'bbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
    expect(cells('aaa,bbb,ccc\r\nzzz,yyy,xxx')).toEqual([
      ['aaa', 'bbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
  });

  it('rule 5: fields may be enclosed in double quotes', () => {
    expect(cells('"aaa","bbb","ccc"\r\nzzz,yyy,xxx')).toEqual([
      ['aaa', 'bbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
  });

  it('rule 6: quoted fields may hold line breaks and commas', () => {
    expect(cells('"aaa","b\r\nbb","ccc"\r\nzzz,yyy,xxx')).toEqual([
      ['aaa', 'b\r\nbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
    expect(cells('"a,b",c')).toEqual([['a,b', 'c']]);
  });

  it('rule 7: a double quote inside a quoted field is doubled', () => {
    expect(cells('"aaa","b""bb","ccc"')).toEqual([['aaa', 'b"bb', 'ccc']]);
  });

  it('numbers rows as a spreadsheet does, across quoted line breaks and blank lines', () => {
    const records = parseCsv('h1,h2\n"x\ny",1\n\nlast,2\n');
    expect(records.map((r) => r.row)).toEqual([1, 2, 5]);
  });

  it('refuses an unclosed quote and text after a closing quote, naming the row', () => {
    expect(() => parseCsv('a,b\n"open,1\n')).toThrow(CsvParseError);
    expect(() => parseCsv('a,b\n"open,1\n')).toThrow(/Row 2/);
    expect(() => parseCsv('a,b\n"x"y,1\n')).toThrow(/after a closing quote/);
  });

  it('stops at the record limit without reading the rest', () => {
    const big = 'h\n' + '1\n'.repeat(100_000);
    expect(() => parseCsv(big, { maxRecords: 1001 })).toThrow(CsvTooManyRowsError);
  });

  it('reads semicolon and tab files, and a byte-order mark, as spreadsheets write them', () => {
    expect(detectDelimiter('taken_at;value;unit\n')).toBe(';');
    expect(detectDelimiter('taken_at\tvalue\n')).toBe('\t');
    expect(cells('\ufeffa;b\n1,5;2')).toEqual([
      ['a', 'b'],
      ['1,5', '2'],
    ]);
  });

  it('writes what it reads back', () => {
    const row = ['plain', 'with,comma', 'with "quote"', 'two\nlines', '', ' padded '];
    expect(cells(toCsvLine(row))).toEqual([row]);
  });
});
