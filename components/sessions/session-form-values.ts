import { set, type FieldErrors, type Resolver } from 'react-hook-form';

import { numberToText, optionalTextToNumber, textToNumber } from '@/components/bows/form-numbers';
import { distanceToMetres, metresToDistance } from '@/math/units/convert';
import type { DistanceUnit } from '@/shared/auth';
import { sessionInputSchema, type Session, type SessionInput, type SessionUpdate } from '@/shared/session';

/** One row of the marks table, as typed. */
export interface MarkRowText {
  distance: string;
  /** Scale reading, mm (readings are always mm: the sight's scale is read in mm). */
  scaleMm: string;
  arrowsShot: string;
  note: string;
}

/**
 * What the sight-in form holds: the header as text, one distance unit for the
 * whole table, and the rows of the marks table.
 */
export interface SessionFormText {
  buildId: string;
  date: string;
  placeLabel: string;
  altitudeM: string;
  temperatureC: string;
  notes: string;
  unit: DistanceUnit;
  marks: MarkRowText[];
}

/** An empty row of the marks table. */
export const emptyMarkRow: MarkRowText = { distance: '', scaleMm: '', arrowsShot: '', note: '' };

/** True when a row has nothing typed in it (such rows are ignored, not saved). */
export function isBlankRow(row: MarkRowText | undefined): boolean {
  return !row || [row.distance, row.scaleMm, row.arrowsShot, row.note].every((text) => (text ?? '').trim() === '');
}

/**
 * Indices of the rows that count (not blank), in table order: the saved mark
 * k is table row kept[k], so errors on marks.k go back to the right row.
 * Example: keptRows([row20, blank, row60]) → [0, 2]
 */
export function keptRows(rows: readonly (MarkRowText | undefined)[]): number[] {
  return rows.flatMap((row, index) => (isBlankRow(row) ? [] : [index]));
}

/** Today's date in the device's time zone, as YYYY-MM-DD. */
export function todayIso(now = new Date()): string {
  const pad = (value: number) => String(value).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/**
 * The form's text → the API's session input (the blank rows left out).
 * Example: sessionTextToInput({ …, unit: 'yd', marks: [{ distance: '20', scaleMm: '12.4', … }] }).marks[0] → { distance: 20, unit: 'yd', scaleMm: 12.4, arrowsShot: null, note: '' }
 */
export function sessionTextToInput(text: SessionFormText) {
  const rows = text.marks ?? [];
  return {
    buildId: textToNumber(text.buildId),
    date: text.date,
    placeLabel: text.placeLabel,
    altitudeM: optionalTextToNumber(text.altitudeM),
    temperatureC: optionalTextToNumber(text.temperatureC),
    notes: text.notes,
    marks: keptRows(rows).map((index) => {
      const row = rows[index];
      return {
        distance: textToNumber(row.distance),
        unit: text.unit,
        scaleMm: textToNumber(row.scaleMm),
        arrowsShot: optionalTextToNumber(row.arrowsShot),
        note: row.note,
      };
    }),
  };
}

/**
 * A saved mark's path ("marks.k.field", k counting saved marks) → the table
 * row's path; "marks" (the whole list) → "marks.root", where a field array keeps its own error.
 * Example: tablePath(['marks', 1, 'scaleMm'], [0, 2]) → 'marks.2.scaleMm'
 */
export function tablePath(path: readonly (string | number)[], kept: readonly number[]): string {
  if (path[0] === 'marks') {
    if (path.length === 1) return 'marks.root';
    const index = Number(path[1]);
    const row = Number.isInteger(index) && kept[index] !== undefined ? kept[index] : index;
    return ['marks', row, ...path.slice(2)].join('.');
  }
  return path.join('.') || 'root.form';
}

/**
 * The sight-in form's resolver: blank rows are left out, the rest is checked
 * with the shared sessionInputSchema (the server's own), and each message goes
 * back to the table row it belongs to.
 * Example: `useForm<SessionFormText, unknown, SessionInput>({ resolver: sessionFormResolver })`
 */
export const sessionFormResolver: Resolver<SessionFormText, unknown, SessionInput> = async (values) => {
  const kept = keptRows(values.marks ?? []);
  const result = sessionInputSchema.safeParse(sessionTextToInput(values));
  if (result.success) return { values: result.data, errors: {} };
  const errors: FieldErrors<SessionFormText> = {};
  const seen = new Set<string>();
  for (const issue of result.error.issues) {
    const path = tablePath(issue.path, kept);
    if (seen.has(path)) continue;
    seen.add(path);
    set(errors, path, { type: issue.code, message: issue.message });
  }
  return { values: {}, errors };
};

/**
 * The form's starting text: a saved session's marks in entry order (in their
 * own unit: the first mark's), or a new session for `buildId` with two empty rows.
 * Example: sessionFormDefaults(undefined, 4, 'yd').marks.length → 2
 */
export function sessionFormDefaults(session: Session | undefined, buildId: number | undefined, unit: DistanceUnit): SessionFormText {
  if (!session) {
    return {
      buildId: buildId ? String(buildId) : '',
      date: todayIso(),
      placeLabel: '',
      altitudeM: '',
      temperatureC: '',
      notes: '',
      unit,
      marks: [{ ...emptyMarkRow }, { ...emptyMarkRow }],
    };
  }
  const marks = [...session.marks].sort((a, b) => a.position - b.position);
  const tableUnit = marks[0]?.unit ?? unit;
  // One unit per table: a mark saved in the other unit is converted exactly (1 yd = 0.9144 m).
  const inTableUnit = (distance: number, from: DistanceUnit) => metresToDistance(distanceToMetres(distance, from), tableUnit);
  return {
    buildId: String(session.buildId),
    date: session.date,
    placeLabel: session.placeLabel,
    altitudeM: numberToText(session.altitudeM, 0),
    temperatureC: numberToText(session.temperatureC, 1),
    notes: session.notes,
    unit: tableUnit,
    marks: marks.map((mark) => ({
      distance: numberToText(inTableUnit(mark.distance, mark.unit), 2),
      scaleMm: numberToText(mark.scaleMm, 2),
      arrowsShot: numberToText(mark.arrowsShot, 0),
      note: mark.note,
    })),
  };
}

/**
 * What a technician saves on a shared bow's session: only the marks, the saved
 * ones exactly as stored (in entry order) and then the table's new rows (the
 * server refuses any other change to the archer's session). `input` is the
 * checked form, whose first marks are the saved ones as shown.
 * Example: appendOnlyUpdate(session with 20 and 40 yd, input with 20, 40 and 60 yd).marks → the stored 20 and 40 yd marks, then 60 yd
 */
export function appendOnlyUpdate(session: Session, input: SessionInput): SessionUpdate {
  const stored = [...session.marks]
    .sort((a, b) => a.position - b.position)
    .map(({ distance, unit, scaleMm, arrowsShot, note }) => ({ distance, unit, scaleMm, arrowsShot, note }));
  return { marks: [...stored, ...input.marks.slice(stored.length)] };
}
