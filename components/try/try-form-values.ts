import { z } from 'zod';

import { lengthTextToMm, quantityTextToStored, textToNumber } from '@/components/forms/form-numbers';
import type { DistanceUnit, LengthUnit } from '@/shared/auth';
import { sheetInputSchema, type FitInput, type SheetInput } from '@/shared/fit';

/**
 * The visitor's one-off tape: two marks, the sight's measurements and, if
 * known, the arrow; lengths in the visitor's chosen unit, readings in mm.
 */
export interface TryFormText {
  lengthUnit: LengthUnit;
  distanceUnit: DistanceUnit;
  sightRadius: string;
  peepHeight: string;
  nearDistance: string;
  nearReading: string;
  farDistance: string;
  farReading: string;
  arrowGr: string;
  diameter: string;
  speedFps: string;
  tapeFrom: string;
  tapeTo: string;
  tapeWidthMm: string;
  paper: 'a4' | 'letter';
}

/**
 * The arrow assumed when the visitor leaves it out: a 420 gr arrow on a 6.5 mm
 * shaft, a middling hunting arrow (common practice, no published source). With
 * two marks the fit solves the speed; mass and diameter only set how strongly
 * drag bends the long-range marks.
 */
export const ASSUMED_ARROW = { massGr: 420, diameterMm: 6.5 } as const;

/** The empty form: yards and millimetres to start (the visitor can switch), the common 20 and 60 yd marks. */
export const tryFormDefaults: TryFormText = {
  lengthUnit: 'mm',
  distanceUnit: 'yd',
  sightRadius: '',
  peepHeight: '',
  nearDistance: '20',
  nearReading: '',
  farDistance: '60',
  farReading: '',
  arrowGr: '',
  diameter: '',
  speedFps: '',
  tapeFrom: '20',
  tapeTo: '80',
  tapeWidthMm: '10',
  paper: 'letter',
};

/**
 * The form's text → the math core's fit input (the CLI's and /api/try/fit's input, exactly).
 * The arrow's weight reads grains and its speed fps unless the visitor types
 * another unit after the number ("27 g", "85 m/s"); the tape width reads mm
 * unless typed otherwise ("0.5 in"), as every other form does (shared/units.ts).
 * Example: tryFitInput({ …, sightRadius: '33', lengthUnit: 'in', nearReading: '12.4', … }).sight.radiusMm → 838.2
 *          tryFitInput({ …, speedFps: '85 m/s', … }).arrow.speedFps → 278.87…
 */
export function tryFitInput(text: TryFormText): FitInput {
  const massGr = quantityTextToStored(text.arrowGr, 'mass', { massUnit: 'gr' });
  const diameterMm = lengthTextToMm(text.diameter, text.lengthUnit);
  const speedFps = quantityTextToStored(text.speedFps, 'speed', { speedUnit: 'fps' });
  const arrow: FitInput['arrow'] = {
    massGr: massGr ?? ASSUMED_ARROW.massGr,
    diameterMm: diameterMm ?? ASSUMED_ARROW.diameterMm,
  };
  if (speedFps !== undefined) arrow.speedFps = speedFps;
  return {
    distanceUnit: text.distanceUnit,
    sight: {
      radiusMm: lengthTextToMm(text.sightRadius, text.lengthUnit) as number,
      peepHeightMm: lengthTextToMm(text.peepHeight, text.lengthUnit) as number,
    },
    arrow,
    marks: [
      { distance: textToNumber(text.nearDistance) as number, markMm: textToNumber(text.nearReading) as number },
      { distance: textToNumber(text.farDistance) as number, markMm: textToNumber(text.farReading) as number },
    ],
  };
}

/** The sheet request for /api/try/sheet.svg and sheet.pdf (the tape options included). */
export function trySheetInput(text: TryFormText): SheetInput {
  return {
    ...tryFitInput(text),
    tape: {
      from: textToNumber(text.tapeFrom) as number,
      to: textToNumber(text.tapeTo) as number,
      widthMm: quantityTextToStored(text.tapeWidthMm, 'length', { lengthUnit: 'mm' }) as number,
      step: 1,
    },
    paper: text.paper,
  };
}

/** Where a sheet-input issue belongs on the form. */
export function tryFieldOf(path: readonly (string | number)[]): string {
  const joined = path.join('.');
  const map: Record<string, string> = {
    'sight.radiusMm': 'sightRadius',
    'sight.peepHeightMm': 'peepHeight',
    'marks.0.distance': 'nearDistance',
    'marks.0.markMm': 'nearReading',
    'marks.1.distance': 'farDistance',
    'marks.1.markMm': 'farReading',
    'arrow.massGr': 'arrowGr',
    'arrow.diameterMm': 'diameter',
    'arrow.speedFps': 'speedFps',
    'tape.from': 'tapeFrom',
    'tape.to': 'tapeTo',
    'tape.widthMm': 'tapeWidthMm',
    paper: 'paper',
  };
  return map[joined] ?? (joined.startsWith('marks') ? 'farReading' : 'root.form');
}

/**
 * The try form's schema: text → the shared sheetInputSchema (the server's own).
 * Example: tryFormSchema.safeParse(text).success
 */
export const tryFormSchema = z
  .object(Object.fromEntries(Object.keys(tryFormDefaults).map((key) => [key, z.string()])) as Record<keyof TryFormText, z.ZodString>)
  .transform((text) => trySheetInput(text as unknown as TryFormText))
  .pipe(sheetInputSchema);
