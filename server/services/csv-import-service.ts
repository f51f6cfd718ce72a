/**
 * Importing marks into a sight-in from a CSV file. Columns: distance,
 * reading (the scale reading, mm), and optionally arrows, note and unit — by
 * header name (in any order; other columns are ignored, so a bow export can be
 * read back) or, without a header, in that order. Distances are in yards or
 * metres: from a unit column, a unit written after the number ("40 yd",
 * "35m"), a unit in the header ("distance (m)"), else the unit chosen on import.
 *
 * The preview (`dryRun`) checks every row and says what is wrong with each in
 * plain words; without it the marks are added all or nothing, through the
 * sight-ins service (so the sight-in is refitted in the same transaction).
 *
 * Example: await importMarks(marit, 9, { csv: 'distance,reading\n70,48.2', unit: 'yd' }, true)
 *   → { dryRun: true, saved: false, rows: [{ line: 2, status: 'ok', mark: { distance: 70, … } }], … }
 */
import { ApiError } from '@/server/errors';
import { CsvError, parseCsvRecords, type CsvRecord } from '@/server/csv';
import type { User } from '@/server/models';
import { distanceToMetres } from '@/math/units/convert';
import { sightInFor } from '@/server/services/bow-access';
import { getSightIn, updateSightIn } from '@/server/services/sight-in-service';
import { importMaxBytes, importMaxRows, type ImportResult, type ImportRow, type MarkImport } from '@/shared/csv';
import { markInputSchema, maxMarks, type MarkInput } from '@/shared/sight-in';

type Unit = 'yd' | 'm';
type Column = 'distance' | 'reading' | 'arrows' | 'note' | 'unit';
type Layout = { columns: Partial<Record<Column, number>>; headerUnit: Unit | null; hasHeader: boolean };

/** Distances compared in metres (math/units, exact). */
const toMetres = distanceToMetres;

const unitWords: Record<string, Unit> = {
  yd: 'yd',
  yds: 'yd',
  yard: 'yd',
  yards: 'yd',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
};

const headerNames: Record<string, Column> = {
  distance: 'distance',
  dist: 'distance',
  range: 'distance',
  reading: 'reading',
  readingmm: 'reading',
  scale: 'reading',
  scalemm: 'reading',
  scalereading: 'reading',
  mark: 'reading',
  sightmark: 'reading',
  arrows: 'arrows',
  arrowsshot: 'arrows',
  shots: 'arrows',
  note: 'note',
  notes: 'note',
  marknote: 'note',
  comment: 'note',
  unit: 'unit',
  units: 'unit',
  distanceunit: 'unit',
};

const numberPattern = /^([+-]?\d+(?:[.,]\d+)?|[+-]?[.,]\d+)\s*([a-zA-Z]*)$/;
const readNumber = (text: string) => Number(text.replace(',', '.'));

/** "Distance (m)" → { name: 'distance', unit: 'm' }; "reading_mm" → { name: 'reading' }. */
function headerColumn(cell: string): { column: Column | null; unit: Unit | null } {
  let text = cell.trim().toLowerCase();
  let unit: Unit | null = null;
  const bracket = /[([]\s*([a-z]+)\s*[)\]]/.exec(text);
  if (bracket && unitWords[bracket[1]]) {
    unit = unitWords[bracket[1]];
    text = text.replace(bracket[0], '');
  }
  const key = text.replace(/[^a-z]/g, '');
  if (headerNames[key]) return { column: headerNames[key], unit };
  // distance_yd, distance_m
  for (const suffix of ['yd', 'm']) {
    if (key.endsWith(suffix) && headerNames[key.slice(0, -suffix.length)] === 'distance')
      return { column: 'distance', unit: suffix as Unit };
  }
  if (unitWords[key]) return { column: 'distance', unit: unitWords[key] }; // a column headed "yards"
  return { column: null, unit };
}

function layoutOf(first: CsvRecord): Layout {
  const firstCell = first.fields[0]?.trim() ?? '';
  if (numberPattern.test(firstCell)) {
    return { columns: { distance: 0, reading: 1, arrows: 2, note: 3 }, headerUnit: null, hasHeader: false };
  }
  const columns: Layout['columns'] = {};
  let headerUnit: Unit | null = null;
  first.fields.forEach((cell, index) => {
    const { column, unit } = headerColumn(cell);
    if (column && columns[column] === undefined) columns[column] = index;
    if (column === 'distance' && unit) headerUnit = unit;
  });
  return { columns, headerUnit, hasHeader: true };
}

function quoteCell(text: string): string {
  const shown = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  return `“${shown}”`;
}

/** One data row → a mark, or the row's problems in plain words. */
function readRow(record: CsvRecord, layout: Layout, defaultUnit: Unit): { mark: MarkInput | null; problems: string[] } {
  const problems: string[] = [];
  const cell = (column: Column) => {
    const index = layout.columns[column];
    return index === undefined ? '' : (record.fields[index] ?? '').trim();
  };
  if (!layout.hasHeader && record.fields.length > 4) {
    problems.push(
      `This row has ${record.fields.length} fields; without a header row the columns are distance, reading, arrows, note (a note with commas needs quotes)`,
    );
  }

  let distance: number | null = null;
  let unit: Unit | null = null;
  const distanceText = cell('distance');
  if (distanceText === '') problems.push('The distance is missing');
  else {
    const match = numberPattern.exec(distanceText);
    if (!match) problems.push(`The distance ${quoteCell(distanceText)} is not a number`);
    else {
      distance = readNumber(match[1]);
      if (match[2]) {
        unit = unitWords[match[2].toLowerCase()] ?? null;
        if (!unit) problems.push(`The distance unit ${quoteCell(match[2])} is neither yd nor m`);
      }
    }
  }
  const unitText = cell('unit');
  if (unitText !== '') {
    const fromColumn = unitWords[unitText.toLowerCase()];
    if (!fromColumn) problems.push(`The unit ${quoteCell(unitText)} is neither yd nor m`);
    else if (unit && unit !== fromColumn) problems.push(`The distance says ${unit} but the unit column says ${fromColumn}`);
    else unit = fromColumn;
  }
  unit ??= layout.headerUnit ?? defaultUnit;

  let scaleMm: number | null = null;
  const readingText = cell('reading');
  if (readingText === '') problems.push('The scale reading is missing');
  else {
    const match = numberPattern.exec(readingText);
    if (!match || (match[2] !== '' && match[2].toLowerCase() !== 'mm')) {
      problems.push(`The scale reading ${quoteCell(readingText)} is not a number of millimetres`);
    } else scaleMm = readNumber(match[1]);
  }

  let arrowsShot: number | null = null;
  const arrowsText = cell('arrows');
  if (arrowsText !== '') {
    if (!/^\d+$/.test(arrowsText)) problems.push(`Arrows shot ${quoteCell(arrowsText)} is not a whole number`);
    else arrowsShot = Number(arrowsText);
  }
  const note = cell('note');

  if (problems.length > 0 || distance === null || scaleMm === null) return { mark: null, problems };
  // The same rules (and words) as a mark typed into the sight-in form.
  const parsed = markInputSchema.safeParse({ distance, unit, scaleMm, arrowsShot, note });
  if (!parsed.success) return { mark: null, problems: parsed.error.issues.map((issue) => issue.message) };
  return { mark: parsed.data, problems: [] };
}

function sizeError(bytes: number): ApiError {
  return new ApiError(
    413,
    'file_too_large',
    `The file is ${Math.ceil(bytes / 1024)} KB; at most ${importMaxBytes / 1024} KB can be imported at once. Split it into smaller files.`,
  );
}

/**
 * POST /api/sight-ins/:id/marks/import. With `dryRun` nothing is written and
 * the answer lists each row; without it, any problem refuses the whole file
 * (400, each row's problems under `fields["rows.<line>"]`) and nothing is written.
 */
export async function importMarks(user: User, sightInId: number, input: MarkImport, dryRun: boolean): Promise<ImportResult> {
  const bytes = Buffer.byteLength(input.csv, 'utf8');
  if (bytes > importMaxBytes) throw sizeError(bytes);
  await sightInFor(user, sightInId, 'add');
  const existing = (await getSightIn(user, sightInId)).marks;

  const result = (rows: ImportRow[], fileProblem: string | null): ImportResult => ({
    dryRun,
    saved: false,
    rows,
    okCount: rows.filter((row) => row.status === 'ok').length,
    errorCount: rows.filter((row) => row.status === 'error').length,
    fileProblem,
  });
  const refuse = (outcome: ImportResult): never => {
    const fields: Record<string, string> = {};
    if (outcome.fileProblem) fields.file = outcome.fileProblem;
    for (const row of outcome.rows) if (row.status === 'error') fields[`rows.${row.line}`] = row.problems.join('; ');
    const message =
      outcome.fileProblem ??
      `${outcome.errorCount} of ${outcome.rows.length} rows have problems; nothing was imported. Correct them and try again.`;
    throw ApiError.badRequest(message, fields);
  };

  let records: CsvRecord[];
  try {
    records = parseCsvRecords(input.csv).filter((record) => record.fields.some((field) => field.trim() !== ''));
  } catch (err) {
    if (!(err instanceof CsvError)) throw err;
    const outcome = result([], `The file is not valid CSV: ${err.message}.`);
    return dryRun ? outcome : refuse(outcome);
  }
  const layout = records.length > 0 ? layoutOf(records[0]) : null;
  const dataRows = layout?.hasHeader ? records.slice(1) : records;
  if (!layout || dataRows.length === 0) {
    const outcome = result([], 'The file has no rows of marks.');
    return dryRun ? outcome : refuse(outcome);
  }
  if (dataRows.length > importMaxRows) {
    throw new ApiError(
      413,
      'too_many_rows',
      `The file has ${dataRows.length} rows of marks; at most ${importMaxRows} can be imported at once.`,
    );
  }
  const missing = (['distance', 'reading'] as const).filter((column) => layout.columns[column] === undefined);
  if (missing.length > 0) {
    const outcome = result(
      [],
      `The header row has no ${missing.join(' or ')} column. Name the columns distance, reading, arrows, note (or leave the header out and put them in that order).`,
    );
    return dryRun ? outcome : refuse(outcome);
  }

  // Each distance once per sight-in: against the stored marks and the rows above.
  const taken = existing.map((mark) => ({ metres: toMetres(mark.distance, mark.unit), where: 'already in this sight-in' }));
  const rows: ImportRow[] = dataRows.map((record) => {
    const { mark, problems } = readRow(record, layout, input.unit);
    if (mark) {
      const metres = toMetres(mark.distance, mark.unit);
      const clash = taken.find((other) => Math.abs(other.metres - metres) < 0.001);
      if (clash)
        return { line: record.line, status: 'error', mark: null, problems: [`A mark at ${mark.distance} ${mark.unit} is ${clash.where}`] };
      taken.push({ metres, where: `on line ${record.line} of the file` });
      return { line: record.line, status: 'ok', mark, problems: [] };
    }
    return { line: record.line, status: 'error', mark: null, problems };
  });

  const total = existing.length + dataRows.length;
  const fileProblem =
    total > maxMarks
      ? `The sight-in has ${existing.length} marks and the file adds ${dataRows.length}; a sight-in holds at most ${maxMarks}.`
      : null;
  const outcome = result(rows, fileProblem);
  if (dryRun) return outcome;
  if (outcome.errorCount > 0 || fileProblem) refuse(outcome);

  const marks = [
    ...existing.map(({ distance, unit, scaleMm, arrowsShot, note }) => ({ distance, unit, scaleMm, arrowsShot, note })),
    ...rows.map((row) => row.mark!),
  ];
  await updateSightIn(user, sightInId, { marks });
  return { ...outcome, saved: true };
}
