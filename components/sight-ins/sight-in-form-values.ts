import { set, type FieldErrors, type Resolver } from 'react-hook-form';

import {
  numberToText,
  optionalQuantityTextToStored,
  optionalTextToNumber,
  storedToInputText,
  textToNumber,
} from '@/components/forms/form-numbers';
import { distanceToMetres, metresToDistance } from '@/math/units/convert';
import type { DistanceUnit } from '@/shared/auth';
import { sightInInputSchema, type SightIn, type SightInInput, type SightInUpdate } from '@/shared/sight-in';
import { localeDateOrder, messageInUnits, parseDateText, type DateOrder, type UnitsLike } from '@/shared/units';

/** One row of the marks table, as typed. */
export interface MarkRowText {
  distance: string;
  /** Scale reading, mm (readings are always mm: the sight's scale is read in mm). */
  scaleMm: string;
  arrowsShot: string;
  note: string;
}

/**
 * What the sight-in form holds: the header as text (the date as typed or
 * picked; altitude and temperature in the archer's units despite the "M" and
 * "C" names, kept so schema errors land on the right field), one distance unit
 * for the whole table, and the rows of the marks table.
 */
export interface SightInFormText {
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
 * The air as typed in the archer's units → metres and °C, as text for the live
 * fit (which reads the stored units); unreadable text stays as typed.
 * Example: airInStoredUnits({ altitudeM: '9200', temperatureC: '41' }, { altitudeUnit: 'ft', temperatureUnit: 'F' }) → { altitudeM: '2804.16', temperatureC: '5' }
 */
export function airInStoredUnits(
  text: { altitudeM?: string; temperatureC?: string },
  units: UnitsLike,
): { altitudeM: string; temperatureC: string } {
  const stored = (value: string | undefined, quantity: 'altitude' | 'temperature') => {
    const number = optionalQuantityTextToStored(value, quantity, units);
    return number === null || !Number.isFinite(number) ? (value ?? '') : String(number);
  };
  return { altitudeM: stored(text.altitudeM, 'altitude'), temperatureC: stored(text.temperatureC, 'temperature') };
}

/**
 * A live fit refused for its air (altitude or temperature out of range) says
 * the limits in the archer's units; anything else passes unchanged.
 * Example: liveFitInUnits({ state: 'refused', field: 'altitudeM', message: 'Enter the altitude between -500 and 5500 m', … }, { altitudeUnit: 'ft' }).message
 *   → 'Enter the altitude between -1640 and 18044 ft'
 */
export function liveFitInUnits<T extends { state: string }>(live: T, units: UnitsLike): T {
  const refused = live as unknown as { state: string; field?: string; message?: string };
  if (refused.state !== 'refused' || typeof refused.message !== 'string' || !/altitude|temperature/i.test(refused.field ?? '')) return live;
  return { ...live, message: messageInUnits(refused.message, units, ['altitude', 'temperature']) };
}

/**
 * The form's text → the API's sight-in input (the blank rows left out):
 * altitude and temperature from the archer's units to m and °C, the date from
 * ISO or the locale's numeric form to YYYY-MM-DD (left as typed when it cannot
 * be read, for the schema to refuse).
 * Example: sightInTextToInput({ …, unit: 'yd', marks: [{ distance: '20', scaleMm: '12.4', … }] }).marks[0] → { distance: 20, unit: 'yd', scaleMm: 12.4, arrowsShot: null, note: '' }
 */
export function sightInTextToInput(text: SightInFormText, units?: UnitsLike, order: DateOrder | null = localeDateOrder()) {
  const rows = text.marks ?? [];
  const date = parseDateText(text.date, order);
  return {
    buildId: textToNumber(text.buildId),
    date: date.iso ?? text.date,
    placeLabel: text.placeLabel,
    altitudeM: optionalQuantityTextToStored(text.altitudeM, 'altitude', units),
    temperatureC: optionalQuantityTextToStored(text.temperatureC, 'temperature', units),
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
 * The sight-in form's resolver for the archer's units: blank rows are left
 * out, the rest is checked with the shared sightInInputSchema (the server's
 * own), each message goes back to the table row it belongs to, altitude and
 * temperature limits are stated in the archer's units, and a date that cannot
 * be read says why (e.g. both readings of 12/02/2026 when the order is unknown).
 * Example: `useForm<SightInFormText, unknown, SightInInput>({ resolver: sightInFormResolverFor(me) })`
 */
export function sightInFormResolverFor(
  units?: UnitsLike,
  order: DateOrder | null = localeDateOrder(),
): Resolver<SightInFormText, unknown, SightInInput> {
  return async (values) => {
    const kept = keptRows(values.marks ?? []);
    const result = sightInInputSchema.safeParse(sightInTextToInput(values, units, order));
    if (result.success) return { values: result.data, errors: {} };
    const errors: FieldErrors<SightInFormText> = {};
    const seen = new Set<string>();
    const date = parseDateText(values.date, order);
    for (const issue of result.error.issues) {
      const path = tablePath(issue.path, kept);
      if (seen.has(path)) continue;
      seen.add(path);
      const message =
        path === 'date' && date.error !== undefined
          ? date.error
          : path === 'altitudeM' || path === 'temperatureC'
            ? messageInUnits(issue.message, units, ['altitude', 'temperature'])
            : issue.message;
      set(errors, path, { type: issue.code, message });
    }
    return { values: {}, errors };
  };
}

/** The resolver in stored units (m, °C) and the device's date order. */
export const sightInFormResolver: Resolver<SightInFormText, unknown, SightInInput> = sightInFormResolverFor();

/**
 * The form's starting text: a saved sight-in's marks in entry order (in their
 * own unit: the first mark's), or a new sight-in for `buildId` with two empty rows.
 * Example: sightInFormDefaults(undefined, 4, 'yd').marks.length → 2
 */
export function sightInFormDefaults(
  sightIn: SightIn | undefined,
  buildId: number | undefined,
  unit: DistanceUnit,
  units?: UnitsLike,
): SightInFormText {
  if (!sightIn) {
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
  const marks = [...sightIn.marks].sort((a, b) => a.position - b.position);
  const tableUnit = marks[0]?.unit ?? unit;
  // One unit per table: a mark saved in the other unit is converted exactly (1 yd = 0.9144 m).
  const inTableUnit = (distance: number, from: DistanceUnit) => metresToDistance(distanceToMetres(distance, from), tableUnit);
  return {
    buildId: String(sightIn.buildId),
    date: sightIn.date,
    placeLabel: sightIn.placeLabel,
    altitudeM: storedToInputText(sightIn.altitudeM, 'altitude', units),
    temperatureC: storedToInputText(sightIn.temperatureC, 'temperature', units),
    notes: sightIn.notes,
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
 * What a technician saves on a shared bow's sight-in: only the marks, the saved
 * ones exactly as stored (in entry order) and then the table's new rows (the
 * server refuses any other change to the archer's sight-in). `input` is the
 * checked form, whose first marks are the saved ones as shown.
 * Example: appendOnlyUpdate(sight-in with 20 and 40 yd, input with 20, 40 and 60 yd).marks → the stored 20 and 40 yd marks, then 60 yd
 */
export function appendOnlyUpdate(sightIn: SightIn, input: SightInInput): SightInUpdate {
  const stored = [...sightIn.marks]
    .sort((a, b) => a.position - b.position)
    .map(({ distance, unit, scaleMm, arrowsShot, note }) => ({ distance, unit, scaleMm, arrowsShot, note }));
  return { marks: [...stored, ...input.marks.slice(stored.length)] };
}
