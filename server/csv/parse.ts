/**
 * A small CSV reader following RFC 4180 ("Common Format and MIME Type for
 * Comma-Separated Values Files", 2005): fields separated by commas, records by
 * CRLF; a field may be enclosed in double quotes, and then may hold commas,
 * line breaks and quotes (a quote written twice). Leniencies, as most
 * spreadsheets write files: LF or CR alone also end a record; a UTF-8 byte
 * order mark is dropped; the final line break is optional; blank lines are
 * kept as empty records so row numbers match the file's lines.
 *
 * Example: parseCsv('distance,reading\r\n20,"12,5"\r\n') → [['distance', 'reading'], ['20', '12,5']]
 */

/** A malformed file: `line` is the 1-based line where the problem starts. */
export class CsvError extends Error {
  constructor(
    message: string,
    readonly line: number,
  ) {
    super(message);
    this.name = 'CsvError';
  }
}

export type CsvRecord = {
  /** The fields, unquoted. */
  fields: string[];
  /** 1-based line of the file where the record starts. */
  line: number;
};

/** Parses CSV text into records with the line each starts on. Throws CsvError on a malformed quote. */
export function parseCsvRecords(text: string): CsvRecord[] {
  const input = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = '';
  let line = 1;
  let recordLine = 1;
  let i = 0;
  let atFieldStart = true;
  const endField = () => {
    fields.push(field);
    field = '';
    atFieldStart = true;
  };
  const endRecord = () => {
    endField();
    records.push({ fields, line: recordLine });
    fields = [];
  };
  while (i < input.length) {
    const ch = input[i];
    if (atFieldStart && ch === '"') {
      // Quoted field: runs to the closing quote; "" is one quote.
      const openedOn = line;
      i += 1;
      for (;;) {
        if (i >= input.length) throw new CsvError(`A quoted field that starts on line ${openedOn} is never closed`, openedOn);
        const c = input[i];
        if (c === '"') {
          if (input[i + 1] === '"') {
            field += '"';
            i += 2;
            continue;
          }
          i += 1;
          break;
        }
        if (c === '\r' || c === '\n') {
          // CRLF inside quotes is one line break of the field's text.
          if (c === '\r' && input[i + 1] === '\n') {
            field += '\r\n';
            i += 2;
          } else {
            field += c;
            i += 1;
          }
          line += 1;
          continue;
        }
        field += c;
        i += 1;
      }
      const next = input[i];
      if (next !== undefined && next !== ',' && next !== '\r' && next !== '\n') {
        throw new CsvError(
          `On line ${line}, text follows a closing quote; put the whole field in quotes and write a quote inside it twice ("")`,
          line,
        );
      }
      atFieldStart = false;
      continue;
    }
    if (ch === ',') {
      endField();
      i += 1;
      continue;
    }
    if (ch === '\r' || ch === '\n') {
      endRecord();
      i += ch === '\r' && input[i + 1] === '\n' ? 2 : 1;
      line += 1;
      recordLine = line;
      continue;
    }
    if (ch === '"') {
      throw new CsvError(
        `On line ${line}, a quote appears inside a field that is not quoted; put the whole field in quotes and write the quote twice ("")`,
        line,
      );
    }
    field += ch;
    atFieldStart = false;
    i += 1;
  }
  // The last record, unless the text ended with a line break (or was empty).
  if (field !== '' || fields.length > 0 || !atFieldStart) endRecord();
  return records;
}

/** Parses CSV text into rows of fields. */
export function parseCsv(text: string): string[][] {
  return parseCsvRecords(text).map((record) => record.fields);
}
