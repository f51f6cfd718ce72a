import { z } from 'zod';
import { isoDateSchema, personSchema, textSchema } from './common';

/**
 * A bow's tuning set-up as a history of dated entries: centre shot, nock
 * height, brace height, axle-to-axle, peep height, sight radius, D-loop, cam timing, cam
 * lean, and the kind of rest and cam system the paper-tune advice is worded
 * for. The latest entry of each is what the bow shows. Entries are added,
 * never edited: an archer's record is not changed by a technician, and an
 * old value stays as history.
 *
 * Lengths are stored in millimetres (1 in = 25.4 mm exactly, international
 * yard and pound agreement, 1959); forms convert at the edge.
 *
 * Trade figures in the hints (common practice, no published source): centre
 * shot about 13/16 in (20.6 mm) from the riser; D-loop about 4⅛–4¼ in
 * (105–108 mm) of material; nock about 1/8 in (3 mm) above square to start.
 *
 * Example: setupEntryInputSchema.parse({ measure: 'centre-shot', valueMm: 20.6, measuredOn: '2026-12-02' })
 *   → { measure: 'centre-shot', valueMm: 20.6, choice: null, measuredOn: '2026-12-02', note: '' }
 */

export const setupMeasureKeys = [
  'centre-shot',
  'nock-height',
  'brace-height',
  'axle-to-axle',
  'peep-height',
  'sight-radius',
  'd-loop',
  'cam-timing',
  'cam-lean',
  'rest-kind',
  'cam-system',
] as const;
export type SetupMeasureKey = (typeof setupMeasureKeys)[number];

/** Kinds of rest the advice is worded for. */
export const restKinds = ['drop-away', 'blade', 'containment'] as const;
export type RestKind = (typeof restKinds)[number];
export const restKindNames: Record<RestKind, string> = {
  'drop-away': 'Drop-away rest',
  blade: 'Blade rest',
  containment: 'Full-containment rest',
};

/** Cam systems the advice is worded for. */
export const camSystems = ['single', 'hybrid', 'binary', 'dual'] as const;
export type CamSystem = (typeof camSystems)[number];
export const camSystemNames: Record<CamSystem, string> = {
  single: 'Single cam',
  hybrid: 'Hybrid cams',
  binary: 'Binary cams',
  dual: 'Twin cams (no yoke)',
};

export const camTimingChoices = ['together', 'top-first', 'bottom-first'] as const;
export const camTimingNames: Record<(typeof camTimingChoices)[number], string> = {
  together: 'Both stops touch together',
  'top-first': 'Top stop touches first',
  'bottom-first': 'Bottom stop touches first',
};
export const camLeanChoices = ['none', 'toward-riser', 'away-from-riser'] as const;
export const camLeanNames: Record<(typeof camLeanChoices)[number], string> = {
  none: 'No lean',
  'toward-riser': 'Leans toward the riser',
  'away-from-riser': 'Leans away from the riser',
};

/** How a measure is entered: a length, a choice with an optional amount, or a choice only. */
type MeasureSpec =
  | { form: 'length'; name: string; minMm: number; maxMm: number; hint: string; changeKind: ImpactChangeKind | null }
  | {
      form: 'choice-amount' | 'choice';
      name: string;
      choices: readonly string[];
      choiceNames: Record<string, string>;
      /** The choice that needs no amount (e.g. "together"). */
      neutral?: string;
      maxMm: number;
      hint: string;
      changeKind: ImpactChangeKind | null;
    };

/** The bow change kinds a set-up entry can stand for (see shared/level-status.ts). */
export type ImpactChangeKind = 'rest' | 'nock-height' | 'd-loop' | 'peep' | 'cams' | 'string' | 'sight-radius';

/**
 * Each measure: its name, the range a typo is caught by, a hint, and the
 * change it stands for when a new entry differs from the last (a set-up change
 * that can move the point of impact; see shared/staleness.ts).
 */
export const setupMeasures: Record<SetupMeasureKey, MeasureSpec> = {
  'centre-shot': {
    form: 'length',
    name: 'Centre shot',
    minMm: 5,
    maxMm: 50,
    hint: 'Riser to the arrow’s centre at the rest; commonly about 13/16 in (common practice).',
    changeKind: 'rest',
  },
  'nock-height': {
    form: 'length',
    name: 'Nock height above square',
    minMm: -10,
    maxMm: 20,
    hint: 'Nock point above square to the rest; commonly about 1/8 in to start (common practice).',
    changeKind: 'nock-height',
  },
  'brace-height': {
    form: 'length',
    name: 'Brace height',
    minMm: 100,
    maxMm: 230,
    hint: 'Deepest point of the grip to the string at rest.',
    changeKind: 'string',
  },
  'axle-to-axle': {
    form: 'length',
    name: 'Axle-to-axle',
    minMm: 600,
    maxMm: 1050,
    hint: 'Centre of one axle to the other.',
    changeKind: 'string',
  },
  'peep-height': {
    form: 'length',
    name: 'Peep height',
    minMm: 50,
    maxMm: 200,
    hint: 'Peep centre above the nock. The fit uses the bow’s own peep height until the bow is edited.',
    changeKind: 'peep',
  },
  'sight-radius': {
    form: 'length',
    name: 'Sight radius',
    minMm: 400,
    maxMm: 1200,
    hint: 'Peep to the sight’s pin or dot. The fit uses the bow’s own sight radius until the bow is edited.',
    changeKind: 'sight-radius',
  },
  'd-loop': {
    form: 'length',
    name: 'D-loop length',
    minMm: 10,
    maxMm: 160,
    hint: 'Commonly about 4⅛–4¼ in of material (common practice).',
    changeKind: 'd-loop',
  },
  'cam-timing': {
    form: 'choice-amount',
    name: 'Cam timing',
    choices: camTimingChoices,
    choiceNames: camTimingNames,
    neutral: 'together',
    maxMm: 20,
    hint: 'At full draw, do both draw stops touch the cables together?',
    changeKind: 'cams',
  },
  'cam-lean': {
    form: 'choice-amount',
    name: 'Cam lean',
    choices: camLeanChoices,
    choiceNames: camLeanNames,
    neutral: 'none',
    maxMm: 20,
    hint: 'At full draw, seen from behind: does the cam lean? Amount at the cam’s edge.',
    changeKind: 'cams',
  },
  'rest-kind': {
    form: 'choice',
    name: 'Rest kind',
    choices: restKinds,
    choiceNames: restKindNames,
    maxMm: 0,
    hint: 'The paper-tune advice is worded for it.',
    changeKind: 'rest',
  },
  'cam-system': {
    form: 'choice',
    name: 'Cam system',
    choices: camSystems,
    choiceNames: camSystemNames,
    maxMm: 0,
    hint: 'The paper-tune advice is worded for it.',
    changeKind: null,
  },
};

const measureKeySchema = z.enum(setupMeasureKeys, { errorMap: () => ({ message: 'Choose what was measured' }) });

/** Body of POST /api/bows/:bowId/setup: one new entry. */
export const setupEntryInputSchema = z
  .object({
    measure: measureKeySchema,
    valueMm: z.number({ invalid_type_error: 'The value must be a number' }).nullable().default(null),
    choice: z.string().nullable().default(null),
    measuredOn: isoDateSchema,
    note: textSchema('Note', 300),
  })
  .superRefine((entry, ctx) => {
    const spec = setupMeasures[entry.measure];
    if (spec.form === 'length') {
      if (entry.valueMm === null || Number.isNaN(entry.valueMm)) {
        ctx.addIssue({ code: 'custom', path: ['valueMm'], message: `Enter the ${spec.name.toLowerCase()}` });
      } else if (entry.valueMm < spec.minMm || entry.valueMm > spec.maxMm) {
        ctx.addIssue({ code: 'custom', path: ['valueMm'], message: `${spec.name} must be between ${spec.minMm} and ${spec.maxMm} mm` });
      }
      return;
    }
    if (entry.choice === null || !spec.choices.includes(entry.choice)) {
      ctx.addIssue({ code: 'custom', path: ['choice'], message: `Choose the ${spec.name.toLowerCase()}` });
      return;
    }
    if (spec.form === 'choice-amount' && entry.choice !== spec.neutral) {
      if (entry.valueMm === null || Number.isNaN(entry.valueMm)) {
        ctx.addIssue({ code: 'custom', path: ['valueMm'], message: `Enter the amount of the ${spec.name.toLowerCase()}` });
      } else if (entry.valueMm <= 0 || entry.valueMm > spec.maxMm) {
        ctx.addIssue({
          code: 'custom',
          path: ['valueMm'],
          message: `${spec.name} amount must be more than 0 and at most ${spec.maxMm} mm`,
        });
      }
    }
  })
  .transform((entry) => {
    const spec = setupMeasures[entry.measure];
    // A choice alone carries no amount; a neutral choice ("together", "none") neither.
    if (spec.form === 'choice' || (spec.form === 'choice-amount' && entry.choice === spec.neutral)) return { ...entry, valueMm: null };
    if (spec.form === 'length') return { ...entry, choice: null };
    return entry;
  });

/** An entry as the API returns it. */
export const setupEntrySchema = z.object({
  id: z.number().int(),
  bowId: z.number().int(),
  measure: measureKeySchema,
  valueMm: z.number().nullable(),
  choice: z.string().nullable(),
  measuredOn: z.string(),
  note: z.string(),
  addedBy: personSchema,
  /** True when someone other than the bow's archer added it (a technician on a shared bow). */
  byTechnician: z.boolean(),
  /** The change logged with it (it differed from the last entry), or null. */
  changeId: z.number().int().nullable(),
  createdAt: z.string(),
});

/** GET /api/bows/:bowId/setup → every entry, newest first, and the latest of each measure. */
export const setupListSchema = z.object({
  entries: z.array(setupEntrySchema),
  latest: z.record(z.string(), setupEntrySchema),
});

export type SetupEntryInput = z.infer<typeof setupEntryInputSchema>;
export type SetupEntry = z.infer<typeof setupEntrySchema>;
export type SetupList = z.infer<typeof setupListSchema>;

/**
 * Whether a new entry differs from the previous one of the same measure
 * (a first entry records what is there: not a change). Lengths are compared to
 * 0.05 mm — below what a ruler or a bow square reads (common practice, no
 * published source) — so a value re-typed through inches is not a change.
 * Example: entryDiffers({ valueMm: 20.6, choice: null }, { valueMm: 20.64, choice: null }) → false
 */
export function entryDiffers(
  previous: { valueMm: number | null; choice: string | null } | null,
  next: { valueMm: number | null; choice: string | null },
): boolean {
  if (!previous) return false;
  if (previous.choice !== next.choice) return true;
  if (previous.valueMm === null || next.valueMm === null) return previous.valueMm !== next.valueMm;
  return Math.abs(previous.valueMm - next.valueMm) > 0.05;
}

/**
 * An entry's value in words, in the archer's unit (mm, or inches to 1/100).
 * Example: setupValueWords({ measure: 'cam-timing', valueMm: 1.5, choice: 'top-first' }, 'mm') → 'Top stop touches first by 1.5 mm'
 */
export function setupValueWords(
  entry: { measure: SetupMeasureKey; valueMm: number | null; choice: string | null },
  unit: 'mm' | 'in',
): string {
  const spec = setupMeasures[entry.measure];
  const length = (mm: number) => (unit === 'in' ? `${(mm / 25.4).toFixed(3).replace(/0$/, '')} in` : `${Number(mm.toFixed(1))} mm`);
  if (spec.form === 'length') return entry.valueMm === null ? '—' : length(entry.valueMm);
  const name = entry.choice ? (spec.choiceNames[entry.choice] ?? entry.choice) : '—';
  return entry.valueMm === null ? name : `${name} by ${length(entry.valueMm)}`;
}
