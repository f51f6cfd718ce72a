import { z } from 'zod';
import { distanceUnitSchema, maxRecordId, measureSchema, textSchema, timestampsSchema } from './common';
import { distanceLimits, type TapeOptionsInput } from './fit';

/**
 * Tape schemas: a saved print layout for a sight-in's fit, and the query options
 * of the tape/sheet downloads. A printed tape is an estimate until every
 * distance you will shoot has been confirmed at the range.
 *
 * Example: tapeLayoutSchema.parse({ fromDistance: 20, toDistance: 80 })
 *   → { fromDistance: 20, toDistance: 80, step: 1, unit: 'yd', orientation: 'down',
 *       widthMm: 12, mirror: false, paper: 'letter', label: '' }
 */

/** Longest span of ticks on one tape, in distance units. */
export const maxTapeSpan = 150;

/** Which way the numbers run along the printed tape: growing downward or upward. */
export const tapeOrientationSchema = z.enum(['down', 'up'], {
  errorMap: () => ({ message: 'Choose whether the numbers run down or up the tape' }),
});
/** Paper size of the print sheet. */
export const paperSchema = z.enum(['a4', 'letter'], { errorMap: () => ({ message: 'Choose A4 or Letter paper' }) });

/** Tick steps that divide 5 evenly, so the long ticks at every 5 and 10 fall on ticks. */
export const tickSteps = [0.5, 1, 2.5, 5] as const;
const tickStepSchema = z
  .number({ invalid_type_error: 'Tick step must be a number' })
  .refine((step) => tickSteps.some((allowed) => Math.abs(allowed - step) < 1e-9), 'Tick step must be 0.5, 1, 2.5 or 5');

const layoutFields = z.object({
  fromDistance: measureSchema('From distance', '', distanceLimits.min, distanceLimits.max),
  toDistance: measureSchema('To distance', '', distanceLimits.min, distanceLimits.max),
  /** Distance between ticks, in `unit`: 0.5, 1, 2.5 or 5 (a step that divides 5, so every 5 gets a tick). */
  step: tickStepSchema.default(1),
  unit: distanceUnitSchema.default('yd'),
  orientation: tapeOrientationSchema.default('down'),
  widthMm: measureSchema('Tape width', 'mm', 6, 40).default(12),
  mirror: z.boolean({ invalid_type_error: 'Mirror must be true or false' }).default(false),
  paper: paperSchema.default('letter'),
  label: textSchema('Label', 60),
});

type LayoutFields = z.infer<typeof layoutFields>;

function checkRange(value: Partial<LayoutFields>, ctx: z.RefinementCtx) {
  if (value.fromDistance === undefined || value.toDistance === undefined) return;
  if (value.toDistance <= value.fromDistance) {
    ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['toDistance'], message: 'To distance must be beyond the from distance' });
  }
}

/** Body of POST /api/sight-ins/:sightInId/tapes (and the layout part of the try routes). */
export const tapeLayoutSchema = layoutFields.superRefine(checkRange);
/** Body of PATCH /api/tapes/:id: any subset; the server re-checks the merged layout. */
export const tapeUpdateSchema = layoutFields.partial().superRefine(checkRange);

/** A saved tape as the API returns it. */
export const tapeSchema = layoutFields
  .extend({ id: z.number().int(), sightInId: z.number().int(), bowId: z.number().int() })
  .merge(timestampsSchema);

const queryNumber = (schema: z.ZodTypeAny) =>
  z.preprocess((raw) => (raw === '' || raw === undefined ? undefined : Number(raw)), schema.optional());
const queryBoolean = z.preprocess(
  (raw) =>
    raw === undefined || raw === '' ? undefined : raw === 'true' || raw === '1' ? true : raw === 'false' || raw === '0' ? false : raw,
  z.boolean({ invalid_type_error: 'Mirror must be true or false' }).optional(),
);

/**
 * Query of GET /api/sight-ins/:id/tape.svg, sheet.svg and sheet.pdf: either
 * `tape=<saved tape id>` or any layout options (the rest default from the fit:
 * the sighted range, 1 yd steps, the bow's tape width).
 * Example: ?from=20&to=80&unit=yd&orientation=up&mirror=1
 */
export const tapeQuerySchema = z
  .object({
    tape: queryNumber(
      z
        .number({ invalid_type_error: 'The tape id must be a number' })
        .int('The tape id must be a whole number')
        .positive('The tape id must be a positive number')
        .max(maxRecordId, 'There is no tape with so large an id'),
    ),
    from: queryNumber(measureSchema('From distance', '', distanceLimits.min, distanceLimits.max)),
    to: queryNumber(measureSchema('To distance', '', distanceLimits.min, distanceLimits.max)),
    step: queryNumber(tickStepSchema),
    unit: distanceUnitSchema.optional(),
    orientation: tapeOrientationSchema.optional(),
    width: queryNumber(measureSchema('Tape width', 'mm', 6, 40)),
    mirror: queryBoolean,
    paper: paperSchema.optional(),
    label: z.string().trim().max(60, 'Label must be at most 60 characters').optional(),
  })
  .superRefine((value, ctx) => {
    if (value.from !== undefined && value.to !== undefined && value.to <= value.from) {
      ctx.addIssue({ code: z.ZodIssueCode.custom, path: ['to'], message: 'To distance must be beyond the from distance' });
    }
  });

/**
 * math's tape options for a saved or asked-for layout: the one mapping the tape
 * editor's preview and the server's tape and sheet downloads use.
 * Example: tapeOptionsOf({ fromDistance: 20, toDistance: 80, step: 1, unit: 'yd', orientation: 'down', widthMm: 8, mirror: false })
 *   → { from: 20, to: 80, step: 1, unit: 'yd', orientation: 'down', widthMm: 8, mirror: false }
 */
export function tapeOptionsOf(
  layout: Pick<TapeLayout, 'fromDistance' | 'toDistance' | 'step' | 'unit' | 'orientation' | 'widthMm' | 'mirror'>,
): TapeOptionsInput {
  return {
    from: layout.fromDistance,
    to: layout.toDistance,
    step: layout.step,
    unit: layout.unit,
    orientation: layout.orientation,
    widthMm: layout.widthMm,
    mirror: layout.mirror,
  };
}

export type TapeOrientation = z.infer<typeof tapeOrientationSchema>;
export type Paper = z.infer<typeof paperSchema>;
export type TapeLayout = z.infer<typeof tapeLayoutSchema>;
export type TapeLayoutFormValues = z.input<typeof tapeLayoutSchema>;
export type TapeUpdate = z.infer<typeof tapeUpdateSchema>;
export type Tape = z.infer<typeof tapeSchema>;
export type TapeQuery = z.infer<typeof tapeQuerySchema>;
