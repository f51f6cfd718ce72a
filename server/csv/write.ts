/**
 * A small CSV writer (RFC 4180: CRLF between records; a field holding a
 * comma, a quote, CR or LF is put in quotes, its quotes doubled), with
 * spreadsheet formula injection neutralised as the OWASP "CSV Injection" page
 * advises: a text cell starting with = + - @ tab or CR gets a leading
 * apostrophe, so a spreadsheet shows it as text instead of running it.
 * Numbers are written as numbers and left alone (a JavaScript number never
 * prints as a formula; -3.5 stays a number).
 *
 * Example: toCsv([['note', 'distance'], ['=HYPERLINK("x")', 20]])
 *   → 'note,distance\r\n"\'=HYPERLINK(""x"")",20\r\n'
 */

export type CsvCell = string | number | boolean | null | undefined;

const formulaStart = /^[=+\-@\t\r]/;

/** A text cell made safe to open in a spreadsheet (OWASP CSV Injection). */
export function neutraliseFormula(text: string): string {
  return formulaStart.test(text) ? `'${text}` : text;
}

/** One cell as CSV text. */
export function csvField(cell: CsvCell): string {
  if (cell === null || cell === undefined) return '';
  if (typeof cell === 'number') return Number.isFinite(cell) ? String(cell) : '';
  if (typeof cell === 'boolean') return cell ? 'true' : 'false';
  const text = neutraliseFormula(cell);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Rows as CSV text, each record ending in CRLF. */
export function toCsv(rows: CsvCell[][]): string {
  return rows.map((row) => `${row.map(csvField).join(',')}\r\n`).join('');
}
