import { z } from 'zod';
import { distanceUnitSchema } from './common';
import { markInputSchema } from './sight-in';

/**
 * Importing marks into a sight-in from a CSV file: the request, and the
 * per-row answer the preview shows before anything is saved. Imports only zod.
 *
 * Example: markImportSchema.parse({ csv: 'distance,reading\n20,12.4\n30,19.8' })
 *   → { csv: '…', unit: 'yd' }
 */

/** Largest file accepted, bytes (UTF-8). */
export const importMaxBytes = 200 * 1024;
/** Most data rows accepted in one file. */
export const importMaxRows = 500;

/** Body of POST /api/sight-ins/:id/marks/import (`?dryRun=1` for the preview). */
export const markImportSchema = z.object({
  csv: z.string({ required_error: 'Choose a CSV file', invalid_type_error: 'The file must be text' }).min(1, 'The file is empty'),
  /** Unit for distances that carry none (no unit column, no "yd"/"m" after the number). */
  unit: distanceUnitSchema.default('yd'),
});

export const markImportQuerySchema = z.object({
  dryRun: z
    .enum(['0', '1', 'true', 'false'], { errorMap: () => ({ message: 'dryRun must be 1 or 0' }) })
    .optional()
    .transform((value) => value === '1' || value === 'true'),
});

/** One data row of the file: the mark it gives, or its problems in plain words. */
export const importRowSchema = z.object({
  /** Line of the file the row starts on (the header is line 1). */
  line: z.number().int().positive(),
  status: z.enum(['ok', 'error']),
  mark: markInputSchema.nullable(),
  problems: z.array(z.string()),
});

export const importResultSchema = z.object({
  dryRun: z.boolean(),
  /** True when the marks were added to the sight-in. */
  saved: z.boolean(),
  rows: z.array(importRowSchema),
  okCount: z.number().int(),
  errorCount: z.number().int(),
  /** A problem with the file as a whole (no distance column, too many marks for the sight-in…), else null. */
  fileProblem: z.string().nullable(),
});

export type MarkImport = z.infer<typeof markImportSchema>;
export type ImportRow = z.infer<typeof importRowSchema>;
export type ImportResult = z.infer<typeof importResultSchema>;
