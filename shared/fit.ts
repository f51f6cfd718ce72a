import { z } from 'zod';
import type { SightModel } from '@/math/flight/sight-model';
import { distanceUnitSchema } from '@/shared/common';

/**
 * Schemas for a sight fit, a tape and a print sheet: the same ones parse the
 * command line's stdin, the server's request bodies and the web app's forms.
 * Imports only zod. Messages are plain words about the field; describeFitIssue
 * prefixes the field's path ("marks[1].distance: each distance may appear only once").
 *
 * Example: fitInputSchema.parse({ distanceUnit: 'yd', sight: { radiusMm: 820, peepHeightMm: 110 },
 *   arrow: { massGr: 420, diameterMm: 6.5 }, marks: [{ distance: 20, markMm: 14.9 }, { distance: 60, markMm: 32.6 }] })
 */

/** Shortest and longest distance accepted for a mark, prediction, shot or tape, in the input's unit. */
export const distanceLimits = { min: 5, max: 150 } as const;
/** Most marks one fit accepts. */
export const maxMarks = 40;
/** Steepest line-of-sight angle accepted, degrees either way. */
export const maxAngleDeg = 60;
/** Slowest and fastest arrow accepted, ft/s (a gap needing more or less is refused). */
export const speedLimitsFps = { min: 120, max: 500 } as const;

const number = (what: string, min: number, max: number, unit: string) =>
  z
    .number({ required_error: `Enter ${what}`, invalid_type_error: `Enter ${what} as a number` })
    .finite(`Enter ${what} as a number`)
    .min(min, `Enter ${what} between ${min} and ${max}${unit}`)
    .max(max, `Enter ${what} between ${min} and ${max}${unit}`);

const distance = (what: string) => number(what, distanceLimits.min, distanceLimits.max, '');

/** The sight: radius (peep to pin along the arrow, mm) and peep height above the arrow's axis (mm). */
export const sightSchema = z
  .object(
    {
      radiusMm: number('the sight radius', 300, 1200, ' mm'),
      peepHeightMm: number('the peep height', 50, 200, ' mm'),
    },
    { required_error: 'Enter the sight radius and peep height', invalid_type_error: 'Enter the sight radius and peep height' },
  )
  .strict();

/** The arrow: mass (grains), shaft diameter (mm), optional drag coefficient and chronographed speed (ft/s). */
export const arrowSchema = z
  .object(
    {
      massGr: number('the arrow mass', 150, 1500, ' gr'),
      diameterMm: number('the shaft diameter', 3, 12, ' mm'),
      dragCoefficient: number('the drag coefficient', 0.5, 5, '').optional(),
      speedFps: number('the chronographed speed', speedLimitsFps.min, speedLimitsFps.max, ' fps').optional(),
    },
    { required_error: 'Enter the arrow mass and diameter', invalid_type_error: 'Enter the arrow mass and diameter' },
  )
  .strict();

/** Air at the sight-in: altitude above sea level (m, default 0) and an optional measured temperature (°C). */
export const airSchema = z
  .object(
    {
      altitudeM: number('the altitude', -500, 5500, ' m').optional(),
      temperatureC: number('the temperature', -40, 50, ' °C').optional(),
    },
    { invalid_type_error: 'Enter the air as altitude and temperature' },
  )
  .strict();

/** One sighted mark: distance (in distanceUnit) and scale reading (mm, growing as the pin moves down). */
export const markSchema = z
  .object(
    {
      distance: distance('a distance'),
      markMm: number('the scale reading', -300, 300, ' mm'),
    },
    { invalid_type_error: 'Enter each mark as a distance and a reading' },
  )
  .strict();

/** A slope shot to predict: slant distance (in distanceUnit) and line-of-sight angle (degrees, + uphill). */
export const shotSchema = z
  .object(
    {
      distance: distance('a distance'),
      angleDeg: number('the angle', -maxAngleDeg, maxAngleDeg, '°'),
    },
    { invalid_type_error: 'Enter each shot as a distance and an angle' },
  )
  .strict();

const fitFields = {
  distanceUnit: distanceUnitSchema,
  sight: sightSchema,
  arrow: arrowSchema,
  air: airSchema.optional(),
  marks: z
    .array(markSchema, { required_error: 'Enter at least two marks', invalid_type_error: 'Enter the marks as a list' })
    .min(1, 'Enter at least two marks')
    .max(maxMarks, `Enter at most ${maxMarks} marks`)
    .superRefine((marks, context) => {
      // Numeric care: distances typed twice compare equal after parsing; a
      // 1e-9 tolerance also catches 20 and 20.0000000001 from unit round trips.
      marks.forEach((mark, index) => {
        if (marks.slice(0, index).some((earlier) => Math.abs(earlier.distance - mark.distance) < 1e-9)) {
          context.addIssue({ code: z.ZodIssueCode.custom, path: [index, 'distance'], message: 'Each distance may appear only once' });
        }
      });
    }),
  predict: z
    .array(distance('a distance'), { invalid_type_error: 'Enter the distances to predict as a list' })
    .max(200, 'Ask for at most 200 distances')
    .optional(),
  shots: z.array(shotSchema, { invalid_type_error: 'Enter the shots as a list' }).max(50, 'Ask for at most 50 shots').optional(),
};

/** The refusal of one mark without a chronographed speed (the field is `marks`). */
export const ONE_MARK_NEEDS_SPEED = 'Enter at least two marks, or one mark and the chronographed speed (arrow.speedFps)';

/**
 * One mark fits only with a chronographed speed: the mark fixes the scale zero,
 * the speed carries the trajectory's shape (see math/fit/fit-sight.ts).
 */
function oneMarkNeedsSpeed(value: { marks?: unknown[]; arrow?: { speedFps?: number } }, context: z.RefinementCtx) {
  if (Array.isArray(value.marks) && value.marks.length === 1 && value.arrow?.speedFps === undefined) {
    context.addIssue({ code: z.ZodIssueCode.custom, path: ['marks'], message: ONE_MARK_NEEDS_SPEED });
  }
}

/** What a fit needs: the command line's `pinwright fit` input, exactly. Two or more marks, or one mark with arrow.speedFps. */
export const fitInputSchema = z
  .object(fitFields, { required_error: 'Send one JSON object', invalid_type_error: 'Send one JSON object' })
  .strict()
  .superRefine(oneMarkNeedsSpeed);

/** Tape layout: range and step (in `unit`, default the marks' unit), width, orientation, mirror, numeral height. */
export const tapeOptionsSchema = z
  .object(
    {
      from: distance('the first distance').default(20),
      to: distance('the last distance').default(100),
      step: z
        .number({ invalid_type_error: 'Enter the step as a number' })
        .finite('Enter the step as a number')
        .refine(
          (step) => step >= 0.25 && Math.abs(5 / step - Math.round(5 / step)) < 1e-9,
          'The step must divide 5 evenly (0.5, 1, 2.5 or 5)',
        )
        .default(1),
      unit: distanceUnitSchema.optional(),
      widthMm: number('the tape width', 6, 40, ' mm').default(12),
      orientation: z.enum(['down', 'up'], { errorMap: () => ({ message: 'Choose down or up' }) }).default('down'),
      mirror: z.boolean({ invalid_type_error: 'Choose true or false' }).default(false),
      numeralHeightMm: number('the numeral height', 1.6, 5, ' mm').default(1.8),
    },
    { invalid_type_error: 'Enter the tape options as an object' },
  )
  .strict()
  .superRefine((tape, context) => {
    if (!(tape.to > tape.from))
      context.addIssue({ code: z.ZodIssueCode.custom, path: ['to'], message: 'The last distance must be beyond the first' });
  });

/**
 * math's SightModel (math/flight/sight-model.ts) as it travels in JSON: a
 * stored fit's `model`, a prediction's `model`. Fields the model does not know
 * are dropped on parse (rows stored by older versions carry none today).
 * Example: sightModelSchema.parse(fitSight(input).model).speedFps → ≈ 285
 */
export const sightModelSchema = z.object({
  distanceUnit: distanceUnitSchema,
  speedFps: z.number(),
  dragCoefficient: z.number(),
  airDensityKgM3: z.number(),
  arrowMassGr: z.number(),
  arrowDiameterMm: z.number(),
  peepHeightMm: z.number(),
  sightRadiusMm: z.number(),
  scaleZeroMm: z.number(),
  gravityMps2: z.number(),
  covariance: z.array(z.array(z.number())).optional(),
  oneMark: z.object({ distance: z.number(), nextDistance: z.number().nullable() }).optional(),
});

// Compile-time guard: the schema and math's SightModel describe the same object, both ways.
const modelFromMath = (model: SightModel): z.infer<typeof sightModelSchema> => model;
const modelToMath = (model: z.infer<typeof sightModelSchema>): SightModel => model;
void modelFromMath;
void modelToMath;

/** Paper sizes for the print sheet. */
export const paperSchema = z.enum(['a4', 'letter'], { errorMap: () => ({ message: 'Choose a4 or letter' }) });

const label = (what: string) =>
  z
    .string({ invalid_type_error: `Enter the ${what} as text` })
    .trim()
    .max(60, `Keep the ${what} to 60 characters`)
    .optional();

/** Small-print labels on the sheet: bow, build and date, free text; `note` is printed large under the title (e.g. "confirm at the range"). */
export const sheetLabelsSchema = z
  .object(
    {
      bow: label('bow name'),
      build: label('build name'),
      date: label('date'),
      note: z.string({ invalid_type_error: 'Enter the note as text' }).trim().max(300, 'Keep the note to 300 characters').optional(),
    },
    { invalid_type_error: 'Enter the labels as an object' },
  )
  .strict();

const sheetFields = {
  paper: paperSchema.default('a4'),
  labels: sheetLabelsSchema.optional(),
  variants: z.boolean({ invalid_type_error: 'Choose true or false' }).default(true),
  tape: tapeOptionsSchema.optional(),
};

/** Print sheet options: paper (default a4), labels, the ±0.5/1/2 % variants (default on), and the tape's options. */
export const sheetOptionsSchema = z.object(sheetFields, { invalid_type_error: 'Enter the sheet options as an object' }).strict();

/** `pinwright tape` input: a fit's input plus the tape options. */
export const tapeInputSchema = z
  .object(
    { ...fitFields, tape: tapeOptionsSchema.optional() },
    { required_error: 'Send one JSON object', invalid_type_error: 'Send one JSON object' },
  )
  .strict()
  .superRefine(oneMarkNeedsSpeed);

/** `pinwright sheet` input: a fit's input plus the sheet options (paper, labels, variants, tape). */
export const sheetInputSchema = z
  .object({ ...fitFields, ...sheetFields }, { required_error: 'Send one JSON object', invalid_type_error: 'Send one JSON object' })
  .strict()
  .superRefine(oneMarkNeedsSpeed);

/**
 * A zod path as people write it: ['marks', 1, 'distance'] → "marks[1].distance"; [] → "input".
 * Example: formatFieldPath(['marks', 1, 'distance']) → 'marks[1].distance'
 */
export function formatFieldPath(path: readonly (string | number)[]): string {
  if (path.length === 0) return 'input';
  return path.reduce<string>((text, part) => (typeof part === 'number' ? `${text}[${part}]` : text ? `${text}.${part}` : part), '');
}

/**
 * The field and message of one issue, in plain words; unknown fields are named.
 * Example: fitIssueOf(issue) → { field: 'marks', message: 'Enter at least two marks' }
 */
export function fitIssueOf(issue: z.ZodIssue): { field: string; message: string } {
  if (issue.code === z.ZodIssueCode.unrecognized_keys) {
    return { field: formatFieldPath([...issue.path, issue.keys[0]]), message: 'This field is not one Pinwright knows; check its spelling' };
  }
  return { field: formatFieldPath(issue.path), message: issue.message };
}

/**
 * One line naming the field: "marks[1].distance: each distance may appear only once".
 * Example: describeFitIssue(result.error.issues[0]) → 'marks: enter at least two marks'
 */
export function describeFitIssue(issue: z.ZodIssue): string {
  const { field, message } = fitIssueOf(issue);
  return `${field}: ${message.charAt(0).toLowerCase()}${message.slice(1)}`;
}

export type FitInput = z.input<typeof fitInputSchema>;
export type TapeOptionsInput = z.input<typeof tapeOptionsSchema>;
export type TapeOptions = z.infer<typeof tapeOptionsSchema>;
export type SheetOptionsInput = z.input<typeof sheetOptionsSchema>;
export type SheetOptions = z.infer<typeof sheetOptionsSchema>;
export type SheetLabels = z.infer<typeof sheetLabelsSchema>;
export type Paper = z.infer<typeof paperSchema>;
export type TapeInput = z.input<typeof tapeInputSchema>;
export type SheetInput = z.input<typeof sheetInputSchema>;
export type Mark = z.infer<typeof markSchema>;
export type Shot = z.infer<typeof shotSchema>;
