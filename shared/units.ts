import { z } from 'zod';

import { CELSIUS_ZERO_K, FOOT_M, GRAIN_KG, INCH_MM } from '@/math/units/constants';
import { distanceUnitSchema } from './common';

/**
 * The archer's units, and the one place every form and screen converts
 * between what is shown and typed and what is stored. Stored values keep the
 * units in their names (lengths in mm, altitude in m, temperature in °C, speed
 * in fps, mass in grains); each quantity is shown in the archer's choice.
 *
 * The factors are math/units' exact definitions (international yard and pound,
 * 1959: 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 gr = 64.79891 mg) and the Celsius
 * scale's definition (°F = °C × 9/5 + 32). This file imports zod and those
 * constants only (pure numbers, no React or server code).
 *
 * Example: parseQuantity('28.5', 'length', inchUnits) → { value: 723.9 }
 *          parseQuantity('9200 ft', 'altitude', metricUnits) → { value: 2804.16 }
 *          messageInUnits('Draw length must be at least 500 mm', inchUnits) → 'Draw length must be at least 19.69 in'
 */

/** Preferred length unit (sight radius, draw length, arrow lengths): inches or millimetres. */
export const lengthPrefSchema = z.enum(['mm', 'in'], { errorMap: () => ({ message: 'Lengths are in millimetres (mm) or inches (in)' }) });
/** Preferred altitude unit: feet or metres. */
export const altitudePrefSchema = z.enum(['ft', 'm'], { errorMap: () => ({ message: 'Altitude is in feet (ft) or metres (m)' }) });
/** Preferred temperature unit: degrees Fahrenheit (F) or Celsius (C). */
export const temperaturePrefSchema = z.enum(['F', 'C'], { errorMap: () => ({ message: 'Temperature is in °F (F) or °C (C)' }) });
/** Preferred speed unit: feet per second or metres per second. */
export const speedPrefSchema = z.enum(['fps', 'mps'], { errorMap: () => ({ message: 'Speed is in fps or m/s (mps)' }) });
/** Preferred mass unit for arrow parts: grains or grams. */
export const massPrefSchema = z.enum(['gr', 'g'], { errorMap: () => ({ message: 'Mass is in grains (gr) or grams (g)' }) });

/** Every unit choice of an account. */
export const unitPreferencesSchema = z.object({
  distanceUnit: distanceUnitSchema,
  lengthUnit: lengthPrefSchema,
  altitudeUnit: altitudePrefSchema,
  temperatureUnit: temperaturePrefSchema,
  speedUnit: speedPrefSchema,
  massUnit: massPrefSchema,
});

export type UnitPreferences = z.infer<typeof unitPreferencesSchema>;
export type AltitudeUnit = z.infer<typeof altitudePrefSchema>;
export type TemperatureUnit = z.infer<typeof temperaturePrefSchema>;
export type SpeedUnit = z.infer<typeof speedPrefSchema>;
export type MassUnit = z.infer<typeof massPrefSchema>;

/**
 * The rest of the choices that follow from the first one (distances) at
 * sign-up: yards → inches, feet, °F, fps; metres → mm, m, °C, m/s. Arrow mass
 * stays in grains for both: grains are the trade's unit for arrow and point
 * weights everywhere (common practice, no published source).
 * Example: unitDefaultsFor('m').speedUnit → 'mps'
 */
export function unitDefaultsFor(distanceUnit: 'yd' | 'm'): UnitPreferences {
  return distanceUnit === 'yd'
    ? { distanceUnit, lengthUnit: 'in', altitudeUnit: 'ft', temperatureUnit: 'F', speedUnit: 'fps', massUnit: 'gr' }
    : { distanceUnit, lengthUnit: 'mm', altitudeUnit: 'm', temperatureUnit: 'C', speedUnit: 'mps', massUnit: 'gr' };
}

/** A quantity a field or screen shows, with its stored unit. */
export type Quantity = 'length' | 'altitude' | 'temperature' | 'speed' | 'mass';

/** The unit each quantity is stored in (the "Mm", "M", "C", "Fps", "Gr" of field names). */
export const storedUnit: Record<Quantity, string> = { length: 'mm', altitude: 'm', temperature: '°C', speed: 'fps', mass: 'gr' };

/** Enough of a user to know their units (older callers may not have every choice yet). */
export type UnitsLike = Partial<UnitPreferences> | null | undefined;

/** The archer's choice for a quantity (the stored unit's side when not chosen). */
function choice(quantity: Quantity, units: UnitsLike): 'imperial' | 'metric' {
  switch (quantity) {
    case 'length':
      return units?.lengthUnit === 'in' ? 'imperial' : 'metric';
    case 'altitude':
      return units?.altitudeUnit === 'ft' ? 'imperial' : 'metric';
    case 'temperature':
      return units?.temperatureUnit === 'F' ? 'imperial' : 'metric';
    case 'speed':
      return units?.speedUnit === 'mps' ? 'metric' : 'imperial';
    case 'mass':
      return units?.massUnit === 'g' ? 'metric' : 'imperial';
  }
}

/** The two units of each quantity as shown: [imperial, metric]. */
const symbols: Record<Quantity, readonly [string, string]> = {
  length: ['in', 'mm'],
  altitude: ['ft', 'm'],
  temperature: ['°F', '°C'],
  speed: ['fps', 'm/s'],
  mass: ['gr', 'g'],
};

/**
 * The symbol a quantity is shown in for these units.
 * Example: shownUnit('temperature', { temperatureUnit: 'F' }) → '°F'
 */
export function shownUnit(quantity: Quantity, units: UnitsLike): string {
  return symbols[quantity][choice(quantity, units) === 'imperial' ? 0 : 1];
}

/** symbol → [to stored, from stored], exact. */
const converters: Record<string, readonly [(value: number) => number, (stored: number) => number]> = {
  mm: [(v) => v, (s) => s],
  in: [(v) => v * INCH_MM, (s) => s / INCH_MM],
  cm: [(v) => v * 10, (s) => s / 10],
  m: [(v) => v, (s) => s],
  ft: [(v) => v * FOOT_M, (s) => s / FOOT_M],
  '°C': [(v) => v, (s) => s],
  '°F': [(v) => ((v - 32) * 5) / 9, (s) => (s * 9) / 5 + 32],
  K: [(v) => v - CELSIUS_ZERO_K, (s) => s + CELSIUS_ZERO_K],
  fps: [(v) => v, (s) => s],
  'm/s': [(v) => v / FOOT_M, (s) => s * FOOT_M],
  gr: [(v) => v, (s) => s],
  g: [(v) => v / 1000 / GRAIN_KG, (s) => s * GRAIN_KG * 1000],
};

/** A value in `symbol` → the quantity's stored unit. Example: toStoredFrom(28.5, 'in') → 723.9 */
export function toStoredFrom(value: number, symbol: string): number {
  return converters[symbol][0](value);
}

/** A stored value → `symbol`. Example: fromStoredTo(723.9, 'in') → 28.5 */
export function fromStoredTo(stored: number, symbol: string): number {
  return converters[symbol][1](stored);
}

/**
 * A value as shown to the archer → stored. Example: toStored(50, 'temperature', { temperatureUnit: 'F' }) → 10
 */
export function toStored(value: number, quantity: Quantity, units: UnitsLike): number {
  return toStoredFrom(value, shownUnit(quantity, units));
}

/**
 * A stored value → as shown. Example: fromStored(723.9, 'length', { lengthUnit: 'in' }) → 28.5
 */
export function fromStored(stored: number, quantity: Quantity, units: UnitsLike): number {
  return fromStoredTo(stored, shownUnit(quantity, units));
}

/** Unit words an archer may type after a number, per quantity, → the symbol they mean. */
const typedUnits: Record<Quantity, Record<string, string>> = {
  length: {
    mm: 'mm',
    millimetre: 'mm',
    millimetres: 'mm',
    millimeter: 'mm',
    millimeters: 'mm',
    cm: 'cm',
    in: 'in',
    inch: 'in',
    inches: 'in',
    '"': 'in',
    '″': 'in',
  },
  altitude: { m: 'm', metre: 'm', metres: 'm', meter: 'm', meters: 'm', ft: 'ft', foot: 'ft', feet: 'ft', "'": 'ft', '′': 'ft' },
  temperature: { c: '°C', '°c': '°C', '°': '', f: '°F', '°f': '°F', k: 'K' },
  speed: { fps: 'fps', 'ft/s': 'fps', 'm/s': 'm/s', mps: 'm/s' },
  mass: { gr: 'gr', grain: 'gr', grains: 'gr', g: 'g', gram: 'g', grams: 'g' },
};

/** The result of reading a typed value: the stored value, or a message (with no field name: the caller adds it). */
export type Parsed = { value: number | undefined; error?: undefined } | { value?: undefined; error: string };

/** "1 234,5" or "1,234.5" or "12,5" → a number string with a point; null when not a plain number. */
function normalNumber(text: string): string | null {
  let digits = text.replace(/[\s\u00a0\u202f]/g, '');
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(digits)) digits = digits.replace(/,/g, '');
  else digits = digits.replace(',', '.');
  return /^[-+−]?(\d+\.?\d*|\.\d+)$/.test(digits) ? digits.replace('−', '-') : null;
}

/**
 * Typed text for a quantity → the stored value. The number is read in the
 * unit the field shows, unless the archer typed a unit of the same quantity
 * after it ("28.5 in" in a millimetre field, "9200 ft", "45 °F"). Empty →
 * { value: undefined }. A decimal comma is accepted.
 * Example: parseQuantity('28.5 in', 'length', { lengthUnit: 'mm' }) → { value: 723.9 }
 *          parseQuantity('12 kg', 'mass', {}) → { error: 'kg is not a mass unit here: type grains (gr) or grams (g)' }
 */
export function parseQuantity(text: string | null | undefined, quantity: Quantity, units: UnitsLike): Parsed {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return { value: undefined };
  const match = /^(.*?[\d.])\s*([^\d\s.,][^\d]*)?$/.exec(trimmed);
  const numberText = match ? normalNumber(match[1]) : null;
  if (!match || numberText === null) return { error: 'must be a number' };
  let symbol = shownUnit(quantity, units);
  const typed = match[2]?.trim().toLowerCase();
  if (typed) {
    const known = typedUnits[quantity][typed];
    if (known === undefined) {
      const [imperial, metric] = symbols[quantity];
      return { error: `“${match[2].trim()}” is not a unit for this field: type ${imperial} or ${metric}` };
    }
    if (known !== '') symbol = known;
  }
  return { value: toStoredFrom(Number(numberText), symbol) };
}

/** Decimals a shown value is rounded to in an input, per symbol. */
const inputDigits: Record<string, number> = { mm: 1, in: 3, m: 0, ft: 0, '°C': 1, '°F': 1, fps: 1, 'm/s': 2, gr: 1, g: 2 };

/** A number without float noise: at most `digits` decimals, trailing zeros dropped. Example: plain(19.6850393, 2) → '19.69' */
function plain(value: number, digits: number): string {
  const rounded = Number(value.toFixed(digits));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/**
 * A stored value → text for an input in the shown unit (no unit symbol);
 * null → ''. `digits` overrides the usual rounding.
 * Example: storedToText(723.9, 'length', { lengthUnit: 'in' }) → '28.5'
 */
export function storedToText(stored: number | null | undefined, quantity: Quantity, units: UnitsLike, digits?: number): string {
  if (stored === null || stored === undefined || !Number.isFinite(stored)) return '';
  const symbol = shownUnit(quantity, units);
  return plain(fromStoredTo(stored, symbol), digits ?? inputDigits[symbol]);
}

/**
 * A stored value for reading, with its unit: "28.50 in", "2804 m", "50 °F".
 * null → '—'.
 * Example: formatQuantity(10, 'temperature', { temperatureUnit: 'F' }) → '50 °F'
 */
export function formatQuantity(stored: number | null | undefined, quantity: Quantity, units: UnitsLike, digits?: number): string {
  if (stored === null || stored === undefined || !Number.isFinite(stored)) return '—';
  const symbol = shownUnit(quantity, units);
  const shown = fromStoredTo(stored, symbol);
  const places =
    digits ?? ({ in: 2, mm: 0, ft: 0, m: 0, '°F': 0, '°C': 0, fps: 0, 'm/s': 1, gr: 0, g: 1 } as Record<string, number>)[symbol];
  return `${shown.toFixed(places)} ${symbol}`;
}

/** Stored-unit symbols in schema messages, and the quantity each is. */
const messageUnits: Record<string, Quantity> = { mm: 'length', m: 'altitude', '°C': 'temperature', fps: 'speed', gr: 'mass' };

/** Decimals a limit is stated with, per shown symbol. */
const limitDigits: Record<string, number> = { in: 2, mm: 0, ft: 0, m: 0, '°F': 0, '°C': 0, fps: 0, 'm/s': 1, gr: 0, g: 1 };

/**
 * A schema message that states stored units ("… at least 500 mm", "… between
 * -500 and 5000 m", "… at most 50 °C") → the same message in the units the
 * archer sees. A lower limit is rounded up and an upper limit down, so the
 * number the message states is itself accepted. `only` limits the rewrite to
 * some quantities (e.g. a message about distances in metres is not an altitude).
 * Example: messageInUnits('Draw length must be at least 500 mm', { lengthUnit: 'in' }) → 'Draw length must be at least 19.69 in'
 */
export function messageInUnits(message: string, units: UnitsLike, only?: readonly Quantity[]): string {
  return message.replace(
    /(at least|at most|between)?(\s*)(-?\d+(?:\.\d+)?)(?:( and )(-?\d+(?:\.\d+)?))? ?(mm|m|°C|fps|gr)(?![\w/])/g,
    (whole, bound: string | undefined, space: string, first: string, and: string | undefined, second: string | undefined, unit: string) => {
      const quantity = messageUnits[unit];
      if (only && !only.includes(quantity)) return whole;
      const symbol = shownUnit(quantity, units);
      if (symbol === unit) return whole;
      const digits = limitDigits[symbol];
      const step = 10 ** -digits;
      const round = (value: number, way: 'up' | 'down' | 'near') => {
        const shown = fromStoredTo(value, symbol);
        // A hair of slack (1e-9) so an exact limit (−40 °C = −40 °F) is not pushed a step.
        const scaled = shown / step;
        const whole = way === 'up' ? Math.ceil(scaled - 1e-9) : way === 'down' ? Math.floor(scaled + 1e-9) : Math.round(scaled);
        return plain(whole * step, digits);
      };
      const lowWay = bound === 'at most' ? 'down' : bound ? 'up' : 'near';
      if (second !== undefined && and)
        return `${bound ?? ''}${space}${round(Number(first), 'up')}${and}${round(Number(second), 'down')} ${symbol}`;
      return `${bound ?? ''}${space}${round(Number(first), lowWay)} ${symbol}`;
    },
  );
}

// ---- Dates as typed ----

/** Day, month and year order of a locale's short date. */
export type DateOrder = 'DMY' | 'MDY' | 'YMD';

/**
 * The order of day, month and year in `locale`'s numeric dates (Intl), e.g.
 * 'en-US' → 'MDY', 'en-GB' → 'DMY'; the device's locale when none given.
 */
export function localeDateOrder(locale?: string): DateOrder {
  try {
    const parts = new Intl.DateTimeFormat(locale, { year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(
      new Date(Date.UTC(2026, 11, 24)),
    );
    const order = parts
      .filter((part) => part.type === 'day' || part.type === 'month' || part.type === 'year')
      .map((part) => part.type[0].toUpperCase())
      .join('');
    return order === 'MDY' || order === 'YMD' ? order : 'DMY';
  } catch {
    return 'DMY';
  }
}

const monthNames = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
];
const pad = (value: number) => String(value).padStart(2, '0');

/** A real calendar date → YYYY-MM-DD, else null. */
function isoOf(year: number, month: number, day: number): string | null {
  if (month < 1 || month > 12 || day < 1 || day > 31 || year < 1000 || year > 9999) return null;
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCMonth() === month - 1 && date.getUTCDate() === day ? `${year}-${pad(month)}-${pad(day)}` : null;
}

/** "2026-12-02" → "2 December 2026". */
export function dateWords(iso: string): string {
  const [year, month, day] = iso.split('-').map(Number);
  return `${day} ${monthNames[month - 1]} ${year}`;
}

/** A typed date read: the ISO date (with a note saying how a two-way form was read), or a message. */
export type ParsedDate = { iso: string; note?: string; error?: undefined } | { iso?: undefined; note?: undefined; error: string };

/**
 * A typed date → YYYY-MM-DD. Accepts ISO (2026-12-02) and the numeric forms
 * people write: 2/12/2026, 12.02.2026, 12-02-2026 (two-digit years are 20xx).
 * When both numbers could be the month, the locale's order decides and the
 * note says which date was read ("Read as 12 February 2026"); with no
 * `order` such a date is refused with both readings named.
 * Example: parseDateText('12/02/2026', 'MDY') → { iso: '2026-12-02', note: 'Read as 2 December 2026 (month first)' }
 *          parseDateText('31/12/2026', 'MDY') → { iso: '2026-12-31' }
 */
export function parseDateText(text: string | null | undefined, order: DateOrder | null): ParsedDate {
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return { error: 'Enter the date' };
  const iso = /^(\d{4})-(\d{1,2})-(\d{1,2})$/.exec(trimmed);
  if (iso) {
    const read = isoOf(Number(iso[1]), Number(iso[2]), Number(iso[3]));
    return read ? { iso: read } : { error: `${trimmed} is not a date that exists` };
  }
  const parts = /^(\d{1,2})[./\-\s](\d{1,2})[./\-\s](\d{2}|\d{4})$/.exec(trimmed);
  if (!parts) return { error: 'Enter the date as YYYY-MM-DD (e.g. 2026-12-02) or pick it' };
  const [first, second] = [Number(parts[1]), Number(parts[2])];
  const year = parts[3].length === 2 ? 2000 + Number(parts[3]) : Number(parts[3]);
  const dayFirst = isoOf(year, second, first);
  const monthFirst = isoOf(year, first, second);
  if (!dayFirst && !monthFirst) return { error: `${trimmed} is not a date that exists` };
  if (dayFirst && monthFirst && dayFirst !== monthFirst) {
    if (order === null || order === 'YMD') {
      return { error: `${trimmed} could be ${dateWords(dayFirst)} or ${dateWords(monthFirst)}: enter it as YYYY-MM-DD or pick it` };
    }
    const read = order === 'MDY' ? monthFirst : dayFirst;
    return {
      iso: read,
      note: `Read as ${dateWords(read)} (${order === 'MDY' ? 'month' : 'day'} first); if you meant ${dateWords(order === 'MDY' ? dayFirst : monthFirst)}, enter it as YYYY-MM-DD`,
    };
  }
  return { iso: (dayFirst ?? monthFirst) as string };
}

/**
 * The air of a sight-in or a hunt in the archer's units; a missing altitude is
 * sea level (assumed), a missing temperature the standard one.
 * Example: airInUnits({ altitudeM: 2804.16, temperatureC: 5 }, { altitudeUnit: 'ft', temperatureUnit: 'F' }) → '9200 ft, 41 °F'
 */
export function airInUnits(air: { altitudeM: number | null; temperatureC: number | null }, units: UnitsLike): string {
  const altitude = air.altitudeM === null ? 'sea level (assumed)' : formatQuantity(air.altitudeM, 'altitude', units);
  const temperature =
    air.temperatureC === null ? 'standard temperature' : formatQuantity(air.temperatureC, 'temperature', units).replace(/^-/, '−');
  return `${altitude}, ${temperature}`;
}
