import { z } from 'zod';

import { stepGuides } from '@/components/level/step-guide';
import { numberToText, optionalTextToNumber } from '@/components/forms/form-numbers';
import {
  levelResultSchema,
  levelStepKeySchema,
  readingUnitSchema,
  stepEntrySchema,
  type LevelStep,
  type LevelStepKey,
} from '@/shared/level';

/**
 * The step form holds the reading as text (so "0." survives while typing); on
 * submit the text becomes a number and the shared stepEntrySchema checks the
 * result, exactly as the server will.
 * Example: stepTextSchema.parse({ step: 'setup', result: 'pass', reading: '0,5', readingUnit: 'bubble', adjustment: '' })
 *   → { step: 'setup', result: 'pass', reading: 0.5, readingUnit: 'bubble', adjustment: '' }
 */
export const stepTextSchema = z
  .object({
    step: levelStepKeySchema,
    result: levelResultSchema.nullable(),
    reading: z.string(),
    readingUnit: readingUnitSchema.nullable(),
    adjustment: z.string(),
  })
  .transform((text) => ({ ...text, reading: optionalTextToNumber(text.reading) }))
  .pipe(stepEntrySchema);

export type StepText = z.input<typeof stepTextSchema>;

/** The form's starting values from a saved step (the step's usual unit when none was saved). */
export function stepTextFrom(step: LevelStep | undefined, key: LevelStepKey): StepText {
  return {
    step: key,
    result: step?.result ?? null,
    reading: numberToText(step?.reading ?? null, 3),
    readingUnit: step?.readingUnit ?? stepGuides[key].readingUnit,
    adjustment: step?.adjustment ?? '',
  };
}
