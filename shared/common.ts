import { z } from 'zod';

/**
 * Small schema builders shared by the bow, build, sight-in and tape schemas, so
 * every field message reads the same way: "Sight radius must be at least 400 mm",
 * "Enter the draw weight", "Nickname must be at most 60 characters".
 * Imports only zod.
 *
 * Example: measureSchema('Draw weight', 'lb', 20, 100).safeParse(12).error.issues[0].message
 *   → 'Draw weight must be at least 20 lb'
 */

function withUnit(value: number, unit: string): string {
  if (!unit) return String(value);
  return unit === '%' ? `${value} %` : `${value} ${unit}`;
}

/** A measured number between min and max (inclusive) in `unit`, required. */
export function measureSchema(label: string, unit: string, min: number, max: number) {
  return z
    .number({ required_error: `Enter the ${label.toLowerCase()}`, invalid_type_error: `${label} must be a number` })
    .min(min, `${label} must be at least ${withUnit(min, unit)}`)
    .max(max, `${label} must be at most ${withUnit(max, unit)}`);
}

/** A whole number between min and max (inclusive) in `unit`, required. */
export function countSchema(label: string, unit: string, min: number, max: number) {
  return measureSchema(label, unit, min, max).int(`${label} must be a whole number`);
}

/** Optional measured number: null or absent means "not measured" (stored as null). */
export function optionalMeasureSchema(label: string, unit: string, min: number, max: number) {
  return measureSchema(label, unit, min, max).nullable().default(null);
}

/** Required one-line text, trimmed, 1..max characters. */
export function nameSchema(label: string, max: number) {
  return z
    .string({ required_error: `Enter the ${label.toLowerCase()}`, invalid_type_error: `${label} must be text` })
    .trim()
    .min(1, `Enter the ${label.toLowerCase()}`)
    .max(max, `${label} must be at most ${max} characters`);
}

/** Optional free text, trimmed, at most max characters; absent means ''. */
export function textSchema(label: string, max: number) {
  return z
    .string({ invalid_type_error: `${label} must be text` })
    .trim()
    .max(max, `${label} must be at most ${max} characters`)
    .default('');
}

/** A calendar date as YYYY-MM-DD (no time, no zone). */
export const isoDateSchema = z
  .string({ required_error: 'Enter the date', invalid_type_error: 'Enter the date as YYYY-MM-DD' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Enter the date as YYYY-MM-DD')
  .refine((value) => {
    const date = new Date(`${value}T00:00:00Z`);
    return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
  }, 'That date does not exist');

/** Distance unit of a mark, a pin or a tape: yards or metres (same values as auth's distanceUnitSchema, with a field message). */
export const distanceUnitSchema = z.enum(['yd', 'm'], {
  errorMap: () => ({ message: 'Choose yards (yd) or metres (m)' }),
});

/** Largest record id: the id columns are MariaDB INT (signed 32-bit). */
export const maxRecordId = 2_147_483_647;

/** A record id in a URL path, e.g. /api/bows/12. */
function idSchema(what: string) {
  return z.coerce
    .number({ invalid_type_error: `The ${what} id must be a number` })
    .int(`The ${what} id must be a whole number`)
    .positive(`The ${what} id must be a positive number`)
    .max(maxRecordId, `There is no ${what} with so large an id`);
}

/** Highest page number a list accepts (far beyond any real list; keeps OFFSET inside the database's range). */
export const maxPage = 100_000;

/**
 * A `page` query parameter: a whole number from 1 to maxPage, 1 when absent.
 * Example: pageSchema.safeParse('4e17').success → false ('Page must be at most 100000')
 */
export const pageSchema = z.coerce
  .number({ invalid_type_error: 'Page must be a number' })
  .int('Page must be a whole number')
  .min(1, 'Page starts at 1')
  .max(maxPage, `Page must be at most ${maxPage}`)
  .default(1);

/** Params of /…/:id routes. */
export const idParamSchema = z.object({ id: idSchema('record') });
/** Params of /api/bows/:bowId/… routes. */
export const bowIdParamSchema = z.object({ bowId: idSchema('bow') });
/** Params of /api/sight-ins/:sightInId/… routes. */
export const sightInIdParamSchema = z.object({ sightInId: idSchema('sightIn') });

/** Body field for a reference to another record (e.g. a sight-in's buildId). */
export function refIdSchema(what: string) {
  return z
    .number({ required_error: `Choose the ${what}`, invalid_type_error: `Choose the ${what}` })
    .int(`Choose the ${what}`)
    .positive(`Choose the ${what}`)
    .max(maxRecordId, `Choose the ${what}`);
}

/** Timestamps as the API sends them (ISO 8601 strings). */
export const timestampsSchema = z.object({ createdAt: z.string(), updatedAt: z.string() });

/** Who did something, as the API names them: a user's id and name. */
export const personSchema = z.object({ id: z.number().int(), name: z.string() });

export type IdParam = z.infer<typeof idParamSchema>;
