import { z } from 'zod';
import { distanceUnitSchema, measureSchema } from './common';
import { distanceLimits, maxAngleDeg } from './fit';
import { queryNumber, queryNumberList } from './compare';

/**
 * Field card schemas: the query of GET /api/sight-ins/:id/field-card (and its
 * .svg and .pdf), and the card's data as math/card computes it: for each
 * slope and slant distance the mark to hold and the "aim as if" level
 * distance beside the rifleman's-rule horizontal distance, and how each level
 * mark shifts at another altitude and temperature. Slope and altitude
 * corrections are estimates; confirm on real terrain.
 *
 * Example: fieldCardQuerySchema.parse({ angles: '-30,0,30', distances: '20,40', altitudeM: '2700' })
 *   → { angles: [-30, 0, 30], distances: [20, 40], altitudeM: 2700 }
 */

/** Most slopes and distances one card holds (it must stay readable at 100 × 150 mm). */
export const fieldCardLimits = { maxAngles: 9, maxDistances: 6 } as const;

const angleSchema = z
  .number({ invalid_type_error: 'Each angle must be a number' })
  .min(-maxAngleDeg, `Each angle must be at least -${maxAngleDeg}°`)
  .max(maxAngleDeg, `Each angle must be at most ${maxAngleDeg}°`);
const distanceSchema = z
  .number({ invalid_type_error: 'Each distance must be a number' })
  .min(distanceLimits.min, `Each distance must be at least ${distanceLimits.min}`)
  .max(distanceLimits.max, `Each distance must be at most ${distanceLimits.max}`);

/** Each value once, in the order given. */
function distinct(label: string) {
  return (values: number[] | undefined, ctx: z.RefinementCtx) => {
    values?.forEach((value, index) => {
      if (values.indexOf(value) !== index)
        ctx.addIssue({ code: z.ZodIssueCode.custom, path: [index], message: `${label} ${value} is listed twice` });
    });
  };
}

/**
 * Query of the field card: `angles` (line-of-sight angles, degrees, + uphill,
 * comma separated; default −40 to +40 every 10), `distances` (slant
 * distances in the sight-in's unit; default 20 to 60 every 10), and an
 * optional hunt air: `altitudeM` and `temperatureC` (without a temperature,
 * the standard atmosphere's at that altitude). Without either, the card is
 * for the air of the sight-in.
 */
export const fieldCardQuerySchema = z.object({
  angles: queryNumberList(
    z
      .array(angleSchema)
      .min(1, 'Choose at least one angle')
      .max(fieldCardLimits.maxAngles, `Choose at most ${fieldCardLimits.maxAngles} angles for one card`)
      .superRefine(distinct('Angle')),
  ),
  distances: queryNumberList(
    z
      .array(distanceSchema)
      .min(1, 'Choose at least one distance')
      .max(fieldCardLimits.maxDistances, `Choose at most ${fieldCardLimits.maxDistances} distances for one card`)
      .superRefine(distinct('Distance')),
  ),
  altitudeM: queryNumber(measureSchema('Altitude', 'm', -500, 5000)),
  temperatureC: queryNumber(measureSchema('Temperature', '°C', -40, 50)),
});

const finiteOrNull = z.number().nullable();

/** Air as the card states it. */
export const cardAirSchema = z.object({
  /** m; null when the sight-in did not record it (the fit then assumed sea level). */
  altitudeM: finiteOrNull,
  /** °C; null for the standard atmosphere's temperature at that altitude. */
  temperatureC: finiteOrNull,
  airDensityKgM3: z.number(),
});

/** One slope × distance cell of the card. */
export const cardSlopeRowSchema = z.object({
  angleDeg: z.number(),
  /** Slant distance, the card's unit. */
  distance: z.number(),
  /** The mark to hold, mm as the archer reads the scale; null when out of reach. */
  markMm: finiteOrNull,
  /** The level distance whose mark on the sight-in tape is that mark: set the tape to it. Null when none. */
  aimAsIf: finiteOrNull,
  /** Rifleman's rule: slant distance × cos(angle). */
  horizontal: z.number(),
  /** aimAsIf − horizontal. */
  aimAsIfMinusHorizontal: finiteOrNull,
});

/** How one level mark moves in the hunt's air against the sight-in's. */
export const cardShiftRowSchema = z.object({
  distance: z.number(),
  sightInMarkMm: finiteOrNull,
  markMm: finiteOrNull,
  /** markMm − sightInMarkMm, mm (negative: up the scale). */
  shiftMm: finiteOrNull,
});

/**
 * The crosswind table: per wind speed (mph for yards, km/h for metres) at full
 * value (from 3 or 9 o'clock), per card distance on the level, the drift at
 * the target (cm, in) and the hold as a sideways pin offset at the sight (mm).
 */
export const cardWindSchema = z.object({
  speedUnit: z.enum(['mph', 'km/h']),
  rows: z.array(
    z.object({
      speed: z.number(),
      crossMps: z.number(),
      cells: z.array(z.object({ distance: z.number(), driftCm: finiteOrNull, driftIn: finiteOrNull, holdMm: finiteOrNull })),
    }),
  ),
  /** Wind varies along the path; only practice in wind confirms the holds. */
  caution: z.string(),
});

/** The card's data (math/card fieldCardData): what the JSON, the SVG and the PDF all show. */
export const fieldCardDataSchema = z.object({
  unit: distanceUnitSchema,
  scaleDirection: z.enum(['down', 'up']),
  anglesDeg: z.array(z.number()),
  distances: z.array(z.number()),
  sightIn: cardAirSchema,
  /** The air the marks are for (the hunt's, or the sight-in's). */
  air: cardAirSchema,
  /** True when the card is for the sight-in air (no altitude or temperature asked). */
  sameAirAsSightIn: z.boolean(),
  /** Angles outer, distances inner, in the order asked. */
  rows: z.array(cardSlopeRowSchema),
  /** Level marks at each distance, sight-in air against the card's air. */
  shift: z.array(cardShiftRowSchema),
  /** Crosswind drift and hold at each distance, in the card's air. */
  wind: cardWindSchema,
  cautions: z.array(z.string()),
});

/** Words printed on the card with the data. */
export const fieldCardLabelsSchema = z.object({
  bow: z.string(),
  build: z.string(),
  /** Sight-in date, YYYY-MM-DD. */
  date: z.string(),
  place: z.string(),
});

/** GET /api/sight-ins/:id/field-card → this. */
export const fieldCardResponseSchema = z.object({
  sightInId: z.number().int(),
  bowId: z.number().int(),
  card: fieldCardDataSchema,
  labels: fieldCardLabelsSchema,
});

export type FieldCardQuery = z.infer<typeof fieldCardQuerySchema>;
export type CardAir = z.infer<typeof cardAirSchema>;
export type CardSlopeRow = z.infer<typeof cardSlopeRowSchema>;
export type CardShiftRow = z.infer<typeof cardShiftRowSchema>;
export type CardWind = z.infer<typeof cardWindSchema>;
export type FieldCardData = z.infer<typeof fieldCardDataSchema>;
export type FieldCardLabels = z.infer<typeof fieldCardLabelsSchema>;
export type FieldCardResponse = z.infer<typeof fieldCardResponseSchema>;
