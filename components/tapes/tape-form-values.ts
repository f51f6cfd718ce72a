import { z } from 'zod';

import { lengthTextToMm, mmToLengthText, numberToText, textToNumber } from '@/components/forms/form-numbers';
import { metresToDistance, distanceToMetres, type LengthUnit } from '@/math/units/convert';
import type { StoredFit } from '@/shared/sight-in';
import { tapeLayoutSchema, type Paper, type Tape, type TapeLayout, type TapeOrientation } from '@/shared/tape';
import type { DistanceUnit } from '@/shared/auth';

/** A printed tape is an estimate: shown on every tape view, word for word. */
export const TAPE_VIEW_CAUTION =
  'A printed tape is an estimate until every distance you will shoot has been confirmed at the range. Print at actual size (100 %, no fit-to-page) and measure the calibration bar before cutting.';

/** What the tape options form holds (width in the archer's length unit). */
export interface TapeFormText {
  fromDistance: string;
  toDistance: string;
  step: '1' | '5';
  unit: DistanceUnit;
  orientation: TapeOrientation;
  mirror: 'no' | 'yes';
  widthMm: string;
  paper: Paper;
  label: string;
}

/** Every field of the form, for matching server messages. */
export const tapeFormFields: readonly (keyof TapeFormText)[] = [
  'fromDistance',
  'toDistance',
  'step',
  'unit',
  'orientation',
  'mirror',
  'widthMm',
  'paper',
  'label',
];

const roundTenth = (mm: number | undefined) => (mm === undefined || !Number.isFinite(mm) ? mm : Math.round(mm * 10) / 10);

/** Text → a tape layout candidate (not yet checked). */
export function tapeTextToLayout(text: TapeFormText, lengthUnit: LengthUnit) {
  return {
    fromDistance: textToNumber(text.fromDistance),
    toDistance: textToNumber(text.toDistance),
    step: textToNumber(text.step),
    unit: text.unit,
    orientation: text.orientation,
    mirror: text.mirror === 'yes',
    // A cut width: to 0.1 mm, so a width shown in inches comes back as the millimetres it stands for.
    widthMm: roundTenth(lengthTextToMm(text.widthMm, lengthUnit)),
    paper: text.paper,
    label: text.label,
  };
}

/**
 * The form schema: text → the shared tapeLayoutSchema (the server's own).
 * Example: tapeFormSchema('mm').parse(text).widthMm → 8
 */
export function tapeFormSchema(lengthUnit: LengthUnit) {
  const text = z.string();
  return z
    .object(Object.fromEntries(tapeFormFields.map((field) => [field, text])) as Record<keyof TapeFormText, z.ZodString>)
    .transform((values) => tapeTextToLayout(values as unknown as TapeFormText, lengthUnit))
    .pipe(tapeLayoutSchema);
}

/**
 * The download query for a layout: /api/sight-ins/:id/tape.svg?<this>.
 * Example: layoutQuery(layout) → 'from=20&to=80&step=1&unit=yd&orientation=down&width=8&mirror=0&paper=letter'
 */
export function layoutQuery(layout: TapeLayout): string {
  const params = new URLSearchParams({
    from: String(layout.fromDistance),
    to: String(layout.toDistance),
    step: String(layout.step),
    unit: layout.unit,
    orientation: layout.orientation,
    width: String(layout.widthMm),
    mirror: layout.mirror ? '1' : '0',
    paper: layout.paper,
  });
  if (layout.label) params.set('label', layout.label);
  return params.toString();
}

/**
 * A new tape's options from the fit: its unit, from the shortest sighted
 * distance (at least 10, down to a multiple of 10) to the longest predicted
 * one, 1-unit steps, the bow's tape width, paper by the archer's distance unit.
 * Example: tapeFormDefaults(undefined, fit, 8, 'mm', 'yd') → { fromDistance: '20', toDistance: '100', … }
 */
export function tapeFormDefaults(
  tape: Tape | undefined,
  fit: StoredFit,
  bowTapeWidthMm: number,
  lengthUnit: LengthUnit,
  distanceUnit: DistanceUnit,
): TapeFormText {
  if (tape) {
    return {
      fromDistance: numberToText(tape.fromDistance, 2),
      toDistance: numberToText(tape.toDistance, 2),
      step: tape.step === 5 ? '5' : '1',
      unit: tape.unit,
      orientation: tape.orientation,
      mirror: tape.mirror ? 'yes' : 'no',
      widthMm: mmToLengthText(tape.widthMm, lengthUnit),
      paper: tape.paper,
      label: tape.label,
    };
  }
  const unit = fit.distanceUnit;
  const inUnit = (distance: number) => metresToDistance(distanceToMetres(distance, fit.distanceUnit), unit);
  const sighted = fit.residuals.map((residual) => inUnit(residual.distance));
  const reachable = fit.marks.filter((mark) => mark.markMm !== null).map((mark) => inUnit(mark.distance));
  const from = Math.max(10, Math.floor(Math.min(...sighted, 100) / 10) * 10);
  const to = Math.min(150, Math.max(from + 10, Math.floor(Math.max(...reachable, from + 10) / 10) * 10));
  return {
    fromDistance: String(from),
    toDistance: String(to),
    step: '1',
    unit,
    orientation: 'down',
    mirror: 'no',
    widthMm: mmToLengthText(bowTapeWidthMm, lengthUnit),
    paper: distanceUnit === 'yd' ? 'letter' : 'a4',
    label: '',
  };
}
