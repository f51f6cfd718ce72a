import { z } from 'zod';

import {
  lengthTextToMm,
  mmToLengthText,
  numberToText,
  optionalLengthTextToMm,
  optionalQuantityTextToStored,
  optionalTextToNumber,
  quantityTextToStored,
  storedToInputText,
  textToNumber,
  unitsOf,
  type FormUnits,
} from '@/components/forms/form-numbers';
import { mmToInches } from '@/math/units/convert';
import { buildInputSchema, type Build } from '@/shared/build';
import { buildNumberFields } from '@/shared/predict';

/**
 * What the build form holds: text for every number, each in the archer's
 * unit (shared/units.ts): cut length, diameter and balance point in inches or
 * mm, part weights in grains or grams, speed in fps or m/s (the "Mm", "Gr"
 * and "Fps" names are kept so schema errors land on the right field). Grains
 * per inch stays gr/in, as shafts are labelled.
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
export function buildTextToInput(text: BuildFormText, unit: FormUnits) {
  // A part's weight: '' → undefined (the schema's default 0), else grains.
  const mass = (value: string) => quantityTextToStored(value, 'mass', unit);
  return {
    name: text.name,
    shaftLabel: text.shaftLabel,
    spine: optionalTextToNumber(text.spine),
    grainsPerInch: textToNumber(text.grainsPerInch),
    cutLengthMm: lengthTextToMm(text.cutLengthMm, unit),
    diameterMm: lengthTextToMm(text.diameterMm, unit),
    pointGr: mass(text.pointGr),
    insertGr: mass(text.insertGr),
    collarGr: mass(text.collarGr),
    nockGr: mass(text.nockGr),
    vaneCount: textToNumber(text.vaneCount),
    vaneWeightGr: mass(text.vaneWeightGr),
    wrapGr: mass(text.wrapGr),
    balancePointMm: optionalLengthTextToMm(text.balancePointMm, unit),
    speedFps: optionalQuantityTextToStored(text.speedFps, 'speed', unit),
    dragCoefficient: optionalTextToNumber(text.dragCoefficient),
  };
}

/**
 * The form schema for one length unit: text → API input → the shared buildInputSchema.
 * Example: buildFormSchema('mm').safeParse(text).success
 */
export function buildFormSchema(unit: FormUnits) {
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
function diameterText(mm: number, unit: FormUnits): string {
  return unitsOf(unit)?.lengthUnit === 'in' ? numberToText(mmToInches(mm), 4) : numberToText(mm, 2);
}

/**
 * The form's starting text: a stored build, or a new build's defaults (three vanes, zeros for parts not fitted).
 * Example: buildFormDefaults(undefined, 'mm').vaneCount → '3'
 */
export function buildFormDefaults(build: Build | undefined, unit: FormUnits): BuildFormText {
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
    pointGr: storedToInputText(build.pointGr, 'mass', unit),
    insertGr: storedToInputText(build.insertGr, 'mass', unit),
    collarGr: storedToInputText(build.collarGr, 'mass', unit),
    nockGr: storedToInputText(build.nockGr, 'mass', unit),
    vaneCount: numberToText(build.vaneCount, 0),
    vaneWeightGr: storedToInputText(build.vaneWeightGr, 'mass', unit),
    wrapGr: storedToInputText(build.wrapGr, 'mass', unit),
    balancePointMm: mmToLengthText(build.balancePointMm, unit),
    speedFps: storedToInputText(build.speedFps, 'speed', unit),
    dragCoefficient: numberToText(build.dragCoefficient, 2),
  };
}
