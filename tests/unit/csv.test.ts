/**
 * The CSV reader and writer against RFC 4180 ("Common Format and MIME Type
 * for Comma-Separated Values (CSV) Files", 2005, section 2) and the OWASP
 * "CSV Injection" page (cells starting with = + - @ tab or CR are prefixed
 * with an apostrophe).
 */
import { CsvError, csvField, neutraliseFormula, parseCsv, parseCsvRecords, toCsv } from '@/server/csv';

describe('parseCsv (RFC 4180)', () => {
  it('splits fields on commas and records on CRLF (rule 1), with or without a final line break (rule 2)', () => {
    expect(parseCsv('aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n')).toEqual([
      ['aaa', 'bbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
    expect(parseCsv('aaa,bbb,ccc\r\nzzz,yyy,xxx')).toEqual([
      ['aaa', 'bbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
  });

  it('reads quoted fields holding commas, line breaks and doubled quotes (rules 5–7)', () => {
    expect(parseCsv('"aaa","b\r\nbb","ccc"\r\nzzz,yyy,xxx\r\n')).toEqual([
      ['aaa', 'b\r\nbb', 'ccc'],
      ['zzz', 'yyy', 'xxx'],
    ]);
    expect(parseCsv('"aaa","b""bb","ccc"')).toEqual([['aaa', 'b"bb', 'ccc']]);
    expect(parseCsv('40,"12,5","a note, with a comma"')).toEqual([['40', '12,5', 'a note, with a comma']]);
    expect(parseCsv('"",x')).toEqual([['', 'x']]);
  });

  it('keeps spaces (rule 4: spaces are part of a field) and empty fields', () => {
    expect(parseCsv(' a , b ,,\r\n')).toEqual([[' a ', ' b ', '', '']]);
  });

  it('accepts LF or CR alone, drops a UTF-8 byte order mark, and numbers records by the line they start on', () => {
    expect(parseCsv('\uFEFFa,b\nc,d\re,f')).toEqual([
      ['a', 'b'],
      ['c', 'd'],
      ['e', 'f'],
    ]);
    const records = parseCsvRecords('h1,h2\r\n"multi\r\nline",x\r\n\r\nlast,y\r\n');
    expect(records.map((r) => r.line)).toEqual([1, 2, 4, 5]);
    expect(records[2].fields).toEqual(['']);
  });

  it('gives no records for an empty text', () => {
    expect(parseCsv('')).toEqual([]);
  });

  it('refuses an unclosed quote and text after a closing quote, naming the line', () => {
    expect(() => parseCsv('a,b\r\n"never closed,c\r\nd')).toThrow(CsvError);
    try {
      parseCsv('a,b\r\n"never closed,c');
    } catch (err) {
      expect((err as CsvError).line).toBe(2);
      expect((err as CsvError).message).toMatch(/never closed/);
    }
    expect(() => parseCsv('"a"b,c')).toThrow(/text follows a closing quote/);
    expect(() => parseCsv('a"b,c')).toThrow(/quote appears inside a field/);
  });
});

describe('toCsv', () => {
  it('quotes fields with commas, quotes or line breaks and ends each record with CRLF', () => {
    expect(toCsv([['plain', 'with, comma', 'with "quote"', 'two\nlines']])).toBe('plain,"with, comma","with ""quote""","two\nlines"\r\n');
    expect(toCsv([[1.5, -3, null, undefined, true]])).toBe('1.5,-3,,,true\r\n');
  });

  it('neutralises formula injection in text cells (OWASP CSV Injection)', () => {
    for (const start of ['=', '+', '-', '@', '\t', '\r']) {
      expect(neutraliseFormula(`${start}1+1`)).toBe(`'${start}1+1`);
    }
    expect(csvField('=HYPERLINK("http://example.test","x")')).toBe('"\'=HYPERLINK(""http://example.test"",""x"")"');
    expect(csvField('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvField('-2+3')).toBe("'-2+3");
    // A number is not text: a negative number stays a number.
    expect(csvField(-2.5)).toBe('-2.5');
    expect(csvField('safe text')).toBe('safe text');
  });

  it('round-trips through parseCsv', () => {
    const rows = [
      ['note', 'distance'],
      ['a, b', '20'],
      ['say "hi"', '30'],
      ['line\r\nbreak', '40'],
    ];
    expect(parseCsv(toCsv(rows))).toEqual(rows);
  });
});
