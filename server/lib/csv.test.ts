import { describe, expect, it } from 'vitest';
import { CsvParseError, CsvTooManyRowsError, detectDelimiter, formulaSafe, readCsv, unguardFormula, writeCsv } from './csv';

const cells = (text: string) => readCsv(text).map((r) => r.cells);

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
    const records = readCsv('h1,h2\n"x\ny",1\n\nlast,2\n');
    expect(records.map((r) => r.row)).toEqual([1, 2, 5]);
  });

  it('refuses an unclosed quote and text after a closing quote, naming the row', () => {
    expect(() => readCsv('a,b\n"open,1\n')).toThrow(CsvParseError);
    expect(() => readCsv('a,b\n"open,1\n')).toThrow(/Row 2/);
    expect(() => readCsv('a,b\n"x"y,1\n')).toThrow(/after a closing quote/);
  });

  it('stops at the record limit without reading the rest', () => {
    const big = 'h\n' + '1\n'.repeat(100_000);
    expect(() => readCsv(big, { maxRecords: 1001 })).toThrow(CsvTooManyRowsError);
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
    expect(cells(writeCsv([row]))).toEqual([row]);
    expect(writeCsv([['a', 1, null], ['b', 2.5, undefined]])).toBe('a,1,\r\nb,2.5,\r\n');
    expect(writeCsv([['°C']], { bom: true })).toBe('\ufeff°C\r\n');
  });

  it('keeps a quote inside an unquoted field as written, as spreadsheets do', () => {
    expect(cells('note,value\n6" of krausen,1\n')).toEqual([
      ['note', 'value'],
      ['6" of krausen', '1'],
    ]);
  });

  it('names the row an unclosed quote opens on, not the end of the file', () => {
    expect(() => readCsv('a,b\n"open,1\nx\ny\n')).toThrow(/^Row 2:/);
  });
});

// OWASP "CSV Injection": cells starting with = + - @ tab or carriage return are run as formulas.
describe('the one spreadsheet-formula guard', () => {
  it('puts an apostrophe before text a spreadsheet would run', () => {
    for (const text of ['=1+1', '+1', '-1', '@SUM(A1)', '\t=1', '\r=1']) expect(formulaSafe(text)).toBe(`'${text}`);
  });

  it('is undone on reading our own export back, and only there', () => {
    for (const text of ['=1+1', '-1', '@x', '\t=1', "'quoted", 'plain']) expect(unguardFormula(formulaSafe(text))).toBe(text);
    expect(unguardFormula("'plain")).toBe("'plain");
  });

  it('leaves other text alone', () => {
    for (const text of ['Pale ale', '', '1.050', "it's 'fine'", ' =padded']) expect(formulaSafe(text)).toBe(text);
  });
});
