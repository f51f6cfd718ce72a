import { mmToInches, type LengthUnit } from '@/math/units/convert';
import { messageInUnits, parseQuantity, storedToText, type Quantity, type UnitsLike } from '@/shared/units';

/**
 * The edge between what an archer types and what the API stores. Forms hold
 * numbers as text (so "2." or "" survive while typing); on submit the text is
 * turned into numbers, lengths into millimetres, and the shared schema checks
 * the result. 1 in = 25.4 mm exactly (international yard and pound, 1959).
 *
 * Example: textToNumber(' 12,5 ') → 12.5; lengthTextToMm('33', 'in') → 838.2
 */

/**
 * Typed text → number: '' → undefined (the schema then says "Enter …" or applies
 * its default); a decimal comma is accepted; anything else unparseable → NaN
 * (the schema then says "… must be a number").
 * Example: textToNumber('7,25') → 7.25; textToNumber('abc') → NaN
 */
export function textToNumber(text: string | undefined | null): number | undefined {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return undefined;
  const normal = trimmed.replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(normal)) return NaN;
  return Number(normal);
}

/** Like textToNumber, but '' → null (an optional measurement left empty). Example: optionalTextToNumber('') → null */
export function optionalTextToNumber(text: string | undefined | null): number | null {
  const value = textToNumber(text);
  return value === undefined ? null : value;
}

/** A form's units: a bare length unit (older callers) or an account's choices. */
export type FormUnits = LengthUnit | UnitsLike;

/** FormUnits → the choices shared/units reads. Example: unitsOf('in') → { lengthUnit: 'in' } */
export function unitsOf(units: FormUnits): UnitsLike {
  return typeof units === 'string' ? { lengthUnit: units } : units;
}

/**
 * A quantity typed in the archer's unit (or with a unit of its own after it,
 * "28.5 in", "9200 ft") → its stored unit (shared/units.ts); '' → undefined;
 * unreadable → NaN (the schema then says "… must be a number").
 * Example: quantityTextToStored('50', 'temperature', { temperatureUnit: 'F' }) → 10
 */
export function quantityTextToStored(text: string | undefined | null, quantity: Quantity, units: FormUnits): number | undefined {
  const parsed = parseQuantity(text, quantity, unitsOf(units));
  return parsed.error !== undefined ? NaN : parsed.value;
}

/** As quantityTextToStored, but '' → null (an optional measurement left empty). */
export function optionalQuantityTextToStored(text: string | undefined | null, quantity: Quantity, units: FormUnits): number | null {
  const value = quantityTextToStored(text, quantity, units);
  return value === undefined ? null : value;
}

/** A stored value → input text in the archer's unit. Example: storedToInputText(723.9, 'length', 'in') → '28.5' */
export function storedToInputText(stored: number | null | undefined, quantity: Quantity, units: FormUnits, digits?: number): string {
  return storedToText(stored, quantity, unitsOf(units), digits);
}

/** A schema message with stored units → the archer's units ("at least 500 mm" → "at least 19.69 in"). */
export function messageForUnits(message: string, units: FormUnits, only?: readonly Quantity[]): string {
  return messageInUnits(message, unitsOf(units), only);
}

/**
 * A length typed in `unit` → millimetres (undefined / NaN pass through); a
 * unit typed after the number is honoured ("28.5 in" in a mm field).
 * Example: lengthTextToMm('4.5', 'in') → 114.3
 */
export function lengthTextToMm(text: string | undefined | null, unit: FormUnits): number | undefined {
  return quantityTextToStored(text, 'length', unit);
}

/** As lengthTextToMm, but '' → null. Example: optionalLengthTextToMm('', 'mm') → null */
export function optionalLengthTextToMm(text: string | undefined | null, unit: FormUnits): number | null {
  const value = lengthTextToMm(text, unit);
  return value === undefined ? null : value;
}

/**
 * A number → text for an input, without float noise: at most `digits` decimals,
 * trailing zeros dropped. null/undefined → ''.
 * Example: numberToText(838.2000000001) → '838.2'
 */
export function numberToText(value: number | null | undefined, digits = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  return String(Number(value.toFixed(digits)));
}

/**
 * A stored length (mm) → text in the archer's unit: mm to 0.1 mm, inches to 1/1000 in.
 * Example: mmToLengthText(838.2, 'in') → '33'
 */
export function mmToLengthText(mm: number | null | undefined, unit: FormUnits): string {
  return storedToText(mm, 'length', unitsOf(unit));
}

/**
 * A length for display: "838 mm" or "33.00 in".
 * Example: formatLength(838.2, 'in') → '33.00 in'
 */
export function formatLength(mm: number | null | undefined, unit: LengthUnit, mmDigits = 0): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '—';
  return unit === 'in' ? `${mmToInches(mm).toFixed(2)} in` : `${mm.toFixed(mmDigits)} mm`;
}

/**
 * A draw length as the trade states it: in inches (to the quarter inch people
 * set bows to, shown to two places), with millimetres beside it for an archer
 * who works in mm.
 * Example: formatDrawLength(723.9, 'mm') → '28.50 in (724 mm)'
 */
export function formatDrawLength(mm: number | null | undefined, unit: LengthUnit): string {
  if (mm === null || mm === undefined || !Number.isFinite(mm)) return '—';
  const inches = formatLength(mm, 'in');
  return unit === 'in' ? inches : `${inches} (${formatLength(mm, 'mm')})`;
}

/**
 * Adds the inch equivalent to a schema message that names millimetres, for an
 * archer who types inches: "… at least 400 mm" → "… at least 400 mm (15.75 in)".
 * Example: withInches('Sight radius must be at least 400 mm') → 'Sight radius must be at least 400 mm (15.75 in)'
 */
export function withInches(message: string): string {
  return message.replace(
    /(-?\d+(?:\.\d+)?) mm\b/g,
    (_, digits: string) => `${digits} mm (${numberToText(mmToInches(Number(digits)), 2)} in)`,
  );
}
