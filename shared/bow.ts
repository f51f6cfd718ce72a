import { z } from 'zod';
import { distanceUnitSchema, measureSchema, nameSchema, optionalMeasureSchema, textSchema, timestampsSchema } from './common';
import { bowConfirmSchema } from './staleness-api';

/**
 * Bow schemas: the create/update bodies (used by the bow form as its resolver
 * and by the server's validate()), and the shapes the API returns (one bow's
 * full record, with its builds, sight-ins and tapes, is in ./bow-detail).
 * Every length is in millimetres (convert inches at the form's edge:
 * 1 in = 25.4 mm exactly, international yard and pound, 1959).
 *
 * Example: bowInputSchema.parse({ nickname: 'Ridge slider', hand: 'right', drawWeightLb: 62,
 *   drawLengthMm: 711, sightKind: 'single-pin-slider', sightRadiusMm: 840, peepHeightMm: 112 })
 *   → the same with defaults (letOffPct null, scaleDirection 'down', pinDistances [] …)
 */

/** Which hand draws the string. */
export const handSchema = z.enum(['right', 'left'], { errorMap: () => ({ message: 'Choose right or left hand' }) });

/** Single-pin slider (one pin on a moving scale), fixed multi-pin, or hybrid (fixed pins on a slider). */
export const sightKindSchema = z.enum(['single-pin-slider', 'fixed-multi-pin', 'hybrid'], {
  errorMap: () => ({ message: 'Choose the kind of sight: single-pin slider, fixed multi-pin or hybrid' }),
});

/** Which way the sight's scale readings grow as the pin moves: 'down' (the usual) or 'up'. */
export const scaleDirectionSchema = z.enum(['down', 'up'], {
  errorMap: () => ({ message: 'Choose whether the scale readings grow downward or upward' }),
});

/** Most fixed pins a bow may list. */
export const maxPins = 10;

/** One fixed pin's distance (in the bow's pinDistanceUnit). */
export const pinDistanceSchema = measureSchema('Pin distance', '', 1, 150);

const bowFields = z.object({
  nickname: nameSchema('Nickname', 60),
  hand: handSchema,
  drawWeightLb: measureSchema('Draw weight', 'lb', 20, 100),
  /** Draw length, mm (500–900 mm ≈ 19.7–35.4 in). */
  drawLengthMm: measureSchema('Draw length', 'mm', 500, 900),
  letOffPct: optionalMeasureSchema('Let-off', '%', 0, 99),
  ratedSpeedFps: optionalMeasureSchema('Rated speed', 'fps', 150, 450),
  sightDescription: textSchema('Sight description', 200),
  sightKind: sightKindSchema,
  /** Peep to pin at full draw, mm. */
  sightRadiusMm: measureSchema('Sight radius', 'mm', 400, 1200),
  /** Peep centre above the arrow's axis at the nock, mm. */
  peepHeightMm: measureSchema('Peep height', 'mm', 50, 200),
  scaleDirection: scaleDirectionSchema.default('down'),
  /** Width of the printed tape that fits the sight's window, mm. */
  tapeWidthMm: measureSchema('Tape width', 'mm', 6, 40).default(12),
  pinDistances: z
    .array(pinDistanceSchema, { invalid_type_error: 'Pin distances must be a list of numbers' })
    .max(maxPins, `List at most ${maxPins} pin distances`)
    .default([]),
  pinDistanceUnit: distanceUnitSchema.default('yd'),
  notes: textSchema('Notes', 2000),
});

type BowFields = z.infer<typeof bowFields>;

/** Cross-field rules: a fixed multi-pin sight lists its pins, each distance once. */
function checkPins(value: Partial<BowFields>, ctx: z.RefinementCtx) {
  const pins = value.pinDistances;
  if (value.sightKind === 'fixed-multi-pin' && pins !== undefined && pins.length === 0) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['pinDistances'], message: 'List the distance of each fixed pin' });
  }
  if (pins) {
    const seen = new Set<number>();
    pins.forEach((distance, index) => {
      if (seen.has(distance)) {
        ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['pinDistances', index], message: `Pin distance ${distance} is listed twice` });
      }
      seen.add(distance);
    });
  }
}

/** Body of POST /api/bows. */
export const bowInputSchema = bowFields.superRefine(checkPins);
/**
 * Body of PATCH /api/bows/:id: any subset of the fields. The server merges it
 * with the stored bow and checks the result with bowInputSchema.
 */
export const bowUpdateSchema = bowFields.partial().superRefine(checkPins);

/** A bow as the API returns it. */
export const bowSchema = bowFields.extend({ id: z.number().int(), userId: z.number().int() }).merge(timestampsSchema);

/** The Bench's readiness summary of one bow. */
export const bowReadinessSchema = z.object({
  /** The most recent sight-in (by date, then id), or null. */
  latestSightIn: z
    .object({
      id: z.number().int(),
      date: z.string(),
      /** RMS of the fit's residuals, mm. */
      rmsMm: z.number().nullable(),
      markCount: z.number().int(),
      /** Longest sighted distance, in `longestUnit`. */
      longestDistance: z.number().nullable(),
      longestUnit: distanceUnitSchema.nullable(),
    })
    .nullable(),
  buildCount: z.number().int(),
  sightInCount: z.number().int(),
  hasTape: z.boolean(),
  /** Level-check status; filled in by the level-check feature (null until then). */
  level: z.unknown().nullable(),
  /**
   * The tape (or latest sight-in) to confirm at the range after a change that
   * moves the point of impact, with the reason (shared/staleness.ts); null when current.
   */
  confirm: bowConfirmSchema.nullable().optional(),
});

/** An item of GET /api/bows: the bow with its readiness. */
export const bowSummarySchema = bowSchema.extend({ readiness: bowReadinessSchema });

/** GET /api/bows → { bows: BowSummary[] } */
export const bowListResponseSchema = z.object({ bows: z.array(bowSummarySchema) });

export type Hand = z.infer<typeof handSchema>;
export type SightKind = z.infer<typeof sightKindSchema>;
export type ScaleDirection = z.infer<typeof scaleDirectionSchema>;
export type BowInput = z.infer<typeof bowInputSchema>;
/** What a form holds before defaults apply (the resolver's input type). */
export type BowFormValues = z.input<typeof bowInputSchema>;
export type BowUpdate = z.infer<typeof bowUpdateSchema>;
export type Bow = z.infer<typeof bowSchema>;
export type BowReadiness = z.infer<typeof bowReadinessSchema>;
export type BowSummary = z.infer<typeof bowSummarySchema>;
