import { z } from 'zod';

import { distanceUnitSchema } from './common';
import { altitudePrefSchema, massPrefSchema, speedPrefSchema, temperaturePrefSchema } from './units';

/**
 * Account schemas shared by the sign-up/sign-in forms and the server's
 * validate() middleware. Imports only zod.
 *
 * Example: signInSchema.parse({ email: ' Ada@Example.org ', password: 'x' })
 *   → { email: 'ada@example.org', password: 'x' }
 */

/** Shortest password accepted at sign-up, in characters. */
export const passwordMinLength = 10;
/** Longest password accepted, in characters (bounds hashing cost). */
export const passwordMaxLength = 200;
/** Longest display name, in characters. */
export const nameMaxLength = 80;
/** Longest e-mail address, in characters (RFC 5321 path limit). */
export const emailMaxLength = 254;

/** E-mail: trimmed, lower-cased, valid, at most 254 characters. */
export const emailSchema = z
  .string({ required_error: 'Enter your e-mail address', invalid_type_error: 'Enter your e-mail address' })
  .trim()
  .toLowerCase()
  .min(1, 'Enter your e-mail address')
  .max(emailMaxLength, `E-mail address must be at most ${emailMaxLength} characters`)
  .email('Enter a valid e-mail address');

/** New account: name 1–80 characters, e-mail, password 10+ characters. */
export const signUpSchema = z.object({
  name: z
    .string({ required_error: 'Enter your name', invalid_type_error: 'Enter your name' })
    .trim()
    .min(1, 'Enter your name')
    .max(nameMaxLength, `Name must be at most ${nameMaxLength} characters`),
  email: emailSchema,
  password: z
    .string({ required_error: 'Enter a password', invalid_type_error: 'Enter a password' })
    .min(passwordMinLength, `Password must be at least ${passwordMinLength} characters`)
    .max(passwordMaxLength, `Password must be at most ${passwordMaxLength} characters`),
  /** The first unit choice; the others follow from it (shared/units.ts unitDefaultsFor). Absent: yards. */
  distanceUnit: distanceUnitSchema.optional(),
});

/** Sign-in: e-mail and any non-empty password (length rules apply at sign-up only). */
export const signInSchema = z.object({
  email: emailSchema,
  password: z
    .string({ required_error: 'Enter your password', invalid_type_error: 'Enter your password' })
    .min(1, 'Enter your password')
    .max(passwordMaxLength, `Password must be at most ${passwordMaxLength} characters`),
});

/** Account roles: archer owns bows, tech reads shared bows, admin runs the service. */
export const roleSchema = z.enum(['archer', 'tech', 'admin']);
/** Preferred length unit: millimetres or inches. */
export const lengthUnitSchema = z.enum(['mm', 'in']);

/** The signed-in user as the API returns it (never the password hash). */
export const userSchema = z.object({
  id: z.number().int().positive(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  distanceUnit: distanceUnitSchema,
  lengthUnit: lengthUnitSchema,
  // The server always sends these (migration 0065); optional so that a user kept
  // from before them (an offline cache) still reads, shown in m, °C, fps and grains.
  altitudeUnit: altitudePrefSchema.optional(),
  temperatureUnit: temperaturePrefSchema.optional(),
  speedUnit: speedPrefSchema.optional(),
  massUnit: massPrefSchema.optional(),
});

export type SignUpInput = z.infer<typeof signUpSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
export type User = z.infer<typeof userSchema>;
export type Role = z.infer<typeof roleSchema>;
export type DistanceUnit = z.infer<typeof distanceUnitSchema>;
export type LengthUnit = z.infer<typeof lengthUnitSchema>;

/** The signed-in user's own changes: name and preferred units (each optional, at least one). */
export const profileUpdateSchema = z
  .object({
    name: signUpSchema.shape.name.optional(),
    distanceUnit: distanceUnitSchema.optional(),
    lengthUnit: lengthUnitSchema.optional(),
    altitudeUnit: altitudePrefSchema.optional(),
    temperatureUnit: temperaturePrefSchema.optional(),
    speedUnit: speedPrefSchema.optional(),
    massUnit: massPrefSchema.optional(),
  })
  .strict('Only your name and units can be changed here')
  .refine((v) => Object.values(v).some((value) => value !== undefined), {
    message: 'Nothing to change: give a name or a unit',
  });

export type ProfileUpdate = z.infer<typeof profileUpdateSchema>;
