import { z } from 'zod';
import { addedBySchema } from './added-by';
import { countSchema, measureSchema, nameSchema, optionalMeasureSchema, textSchema, timestampsSchema } from './common';

/**
 * Arrow-build schemas: create/update bodies and the API's response shape.
 * Lengths in millimetres (cut length, balance point, diameter), masses in
 * grains, speed in feet per second. Shaft mass is grains per inch (the trade's
 * unit) × cut length.
 *
 * Example: buildInputSchema.parse({ name: 'Elk heavy', grainsPerInch: 9.3, cutLengthMm: 736.6,
 *   diameterMm: 6.2, pointGr: 125, vaneCount: 3, vaneWeightGr: 6 })
 *   → the same with insertGr 0, nockGr 0, … speedFps null, dragCoefficient null
 */

const buildFields = z.object({
  name: nameSchema('Build name', 60),
  shaftLabel: textSchema('Shaft label', 80),
  spine: countSchema('Spine', '', 100, 2000).nullable().default(null),
  grainsPerInch: measureSchema('Grains per inch', 'gpi', 2, 40),
  /** Cut length, mm (300–900 mm ≈ 11.8–35.4 in). */
  cutLengthMm: measureSchema('Cut length', 'mm', 300, 900),
  /** Shaft outside diameter, mm (used for drag). */
  diameterMm: measureSchema('Diameter', 'mm', 3, 12),
  pointGr: measureSchema('Point weight', 'gr', 0, 500),
  insertGr: measureSchema('Insert weight', 'gr', 0, 300).default(0),
  collarGr: measureSchema('Collar weight', 'gr', 0, 200).default(0),
  nockGr: measureSchema('Nock weight', 'gr', 0, 60).default(0),
  vaneCount: countSchema('Number of vanes', '', 0, 6).default(3),
  /** Weight of one vane, gr. */
  vaneWeightGr: measureSchema('Vane weight', 'gr', 0, 50).default(0),
  wrapGr: measureSchema('Wrap weight', 'gr', 0, 60).default(0),
  /** Balance point measured from the nock throat, mm; null if not measured. */
  balancePointMm: optionalMeasureSchema('Balance point', 'mm', 1, 900),
  /** Chronographed speed from this bow, fps; null if not measured. */
  speedFps: optionalMeasureSchema('Chronographed speed', 'fps', 120, 450),
  /** Drag coefficient referenced to the shaft cross-section; null to use the default. */
  dragCoefficient: optionalMeasureSchema('Drag coefficient', '', 0.5, 5),
});

type BuildFields = z.infer<typeof buildFields>;

function checkBalance(value: Partial<BuildFields>, ctx: z.RefinementCtx) {
  if (value.balancePointMm != null && value.cutLengthMm !== undefined && value.balancePointMm >= value.cutLengthMm) {
    ctx.addIssue({
      code: z.ZodIssueCode.custom,
      path: ['balancePointMm'],
      message: 'Balance point must be shorter than the cut length',
    });
  }
}

/** Body of POST /api/bows/:bowId/builds. */
export const buildInputSchema = buildFields.superRefine(checkBalance);
/** Body of PATCH /api/builds/:id: any subset; the server re-checks the merged build. */
export const buildUpdateSchema = buildFields.partial().superRefine(checkBalance);

/**
 * Quantities computed from the build by math/ and stored with it (recomputed on
 * every save). Energy and momentum need a speed: null when speedFps is null.
 * FOC needs the balance point: null when it is not measured.
 * Energy figures are no legal determination; follow local regulations.
 */
export const buildDerivedSchema = z.object({
  totalGr: z.number(),
  focPct: z.number().nullable(),
  kineticEnergyFtLb: z.number().nullable(),
  kineticEnergyJ: z.number().nullable(),
  momentumSlugFtPerS: z.number().nullable(),
  momentumKgMPerS: z.number().nullable(),
});

/** A build as the API returns it. */
export const buildSchema = buildFields
  .extend({
    id: z.number().int(),
    bowId: z.number().int(),
    derived: buildDerivedSchema,
    sightInCount: z.number().int(),
    addedBy: addedBySchema.optional(),
  })
  .merge(timestampsSchema);

export type BuildInput = z.infer<typeof buildInputSchema>;
export type BuildFormValues = z.input<typeof buildInputSchema>;
export type BuildUpdate = z.infer<typeof buildUpdateSchema>;
export type BuildDerived = z.infer<typeof buildDerivedSchema>;
export type Build = z.infer<typeof buildSchema>;
