/** CSV reading and writing (RFC 4180), with formula injection neutralised on output. */
export { CsvError, parseCsv, parseCsvRecords, type CsvRecord } from './parse';
export { csvField, neutraliseFormula, toCsv, type CsvCell } from './write';
