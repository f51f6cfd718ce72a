import { z } from 'zod';

import {
  lengthTextToMm,
  mmToLengthText,
  numberToText,
  optionalLengthTextToMm,
  optionalTextToNumber,
  textToNumber,
} from '@/components/bows/form-numbers';
import { mmToInches } from '@/math/units/convert';
import type { LengthUnit } from '@/shared/auth';
import { buildInputSchema, type Build } from '@/shared/build';
import { buildNumberFields } from '@/shared/predict';

/**
 * What the build form holds: text for every number; cut length, diameter and
 * balance point in the archer's length unit (the "Mm" names are kept so schema
 * errors land on the right field); weights in grains; speed in fps.
 */
export interface BuildFormText {
  name: string;
  shaftLabel: string;
  spine: string;
  grainsPerInch: string;
  cutLengthMm: string;
  diameterMm: string;
  pointGr: string;
  insertGr: string;
  collarGr: string;
  nockGr: string;
  vaneCount: string;
  vaneWeightGr: string;
  wrapGr: string;
  balancePointMm: string;
  speedFps: string;
  dragCoefficient: string;
}

/** Every field of the form, for matching server messages. */
export const buildFormFields: readonly (keyof BuildFormText)[] = ['name', 'shaftLabel', ...buildNumberFields];

/**
 * Text → the API's build input (lengths in mm; empty optional weights take the
 * schema's default of 0; empty optional measurements become null).
 * Example: buildTextToInput({ …, cutLengthMm: '29' }, 'in').cutLengthMm → 736.6
 */
export function buildTextToInput(text: BuildFormText, unit: LengthUnit) {
  return {
    name: text.name,
    shaftLabel: text.shaftLabel,
    spine: optionalTextToNumber(text.spine),
    grainsPerInch: textToNumber(text.grainsPerInch),
    cutLengthMm: lengthTextToMm(text.cutLengthMm, unit),
    diameterMm: lengthTextToMm(text.diameterMm, unit),
    pointGr: textToNumber(text.pointGr),
    insertGr: textToNumber(text.insertGr),
    collarGr: textToNumber(text.collarGr),
    nockGr: textToNumber(text.nockGr),
    vaneCount: textToNumber(text.vaneCount),
    vaneWeightGr: textToNumber(text.vaneWeightGr),
    wrapGr: textToNumber(text.wrapGr),
    balancePointMm: optionalLengthTextToMm(text.balancePointMm, unit),
    speedFps: optionalTextToNumber(text.speedFps),
    dragCoefficient: optionalTextToNumber(text.dragCoefficient),
  };
}

/**
 * The form schema for one length unit: text → API input → the shared buildInputSchema.
 * Example: buildFormSchema('mm').safeParse(text).success
 */
export function buildFormSchema(unit: LengthUnit) {
  const text = z.string();
  return z
    .object(Object.fromEntries(buildFormFields.map((field) => [field, text])) as Record<keyof BuildFormText, z.ZodString>)
    .transform((values) => buildTextToInput(values, unit))
    .pipe(buildInputSchema);
}

/**
 * Diameter text in the archer's unit: mm to 0.01, inches to 0.001 (the trade
 * writes shaft diameters as e.g. .246 in).
 */
function diameterText(mm: number, unit: LengthUnit): string {
  return unit === 'in' ? numberToText(mmToInches(mm), 4) : numberToText(mm, 2);
}

/**
 * The form's starting text: a stored build, or a new build's defaults (three vanes, zeros for parts not fitted).
 * Example: buildFormDefaults(undefined, 'mm').vaneCount → '3'
 */
export function buildFormDefaults(build: Build | undefined, unit: LengthUnit): BuildFormText {
  if (!build) {
    return {
      name: '',
      shaftLabel: '',
      spine: '',
      grainsPerInch: '',
      cutLengthMm: '',
      diameterMm: '',
      pointGr: '',
      insertGr: '',
      collarGr: '',
      nockGr: '',
      vaneCount: '3',
      vaneWeightGr: '',
      wrapGr: '',
      balancePointMm: '',
      speedFps: '',
      dragCoefficient: '',
    };
  }
  return {
    name: build.name,
    shaftLabel: build.shaftLabel,
    spine: numberToText(build.spine, 0),
    grainsPerInch: numberToText(build.grainsPerInch, 2),
    cutLengthMm: mmToLengthText(build.cutLengthMm, unit),
    diameterMm: diameterText(build.diameterMm, unit),
    pointGr: numberToText(build.pointGr, 1),
    insertGr: numberToText(build.insertGr, 1),
    collarGr: numberToText(build.collarGr, 1),
    nockGr: numberToText(build.nockGr, 1),
    vaneCount: numberToText(build.vaneCount, 0),
    vaneWeightGr: numberToText(build.vaneWeightGr, 1),
    wrapGr: numberToText(build.wrapGr, 1),
    balancePointMm: mmToLengthText(build.balancePointMm, unit),
    speedFps: numberToText(build.speedFps, 1),
    dragCoefficient: numberToText(build.dragCoefficient, 2),
  };
}
