import { z } from 'zod';

import {
  lengthTextToMm,
  mmToLengthText,
  numberToText,
  optionalQuantityTextToStored,
  optionalTextToNumber,
  storedToInputText,
  textToNumber,
  type FormUnits,
} from '@/components/forms/form-numbers';
import type { DistanceUnit } from '@/shared/auth';
import { bowInputSchema, type Bow, type Hand, type ScaleDirection, type SightKind } from '@/shared/bow';

/**
 * What the bow form holds: text for every number (lengths and the rated speed
 * in the archer's units, despite the "Mm" and "Fps" names kept so that schema
 * errors land on the right field), choices as their values, pin distances as
 * one list "20, 30, 40".
 */
export interface BowFormText {
  nickname: string;
  hand: Hand;
  drawWeightLb: string;
  drawLengthMm: string;
  letOffPct: string;
  ratedSpeedFps: string;
  sightDescription: string;
  sightKind: SightKind;
  sightRadiusMm: string;
  peepHeightMm: string;
  scaleDirection: ScaleDirection;
  tapeWidthMm: string;
  pinDistances: string;
  pinDistanceUnit: DistanceUnit;
  notes: string;
}

/** "20, 30 40;50" → [20, 30, 40, 50]; unparseable entries become NaN (the schema names them). */
export function pinListToNumbers(text: string): number[] {
  return text
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map((part) => textToNumber(part) as number);
}

/** To 0.1 mm (NaN and undefined pass through). */
const roundTenth = (mm: number | undefined) => (mm === undefined || !Number.isFinite(mm) ? mm : Math.round(mm * 10) / 10);

/**
 * The form schema for the archer's units (a length unit, or an account's
 * choices): text → the API's bow input (mm, fps), then the shared bowInputSchema.
 * Example: bowFormSchema('in').parse({ …, sightRadiusMm: '33' }).sightRadiusMm → 838.2
 */
export function bowFormSchema(unit: FormUnits) {
  const optionalLengthMm = (text: string) => {
    const value = lengthTextToMm(text, unit);
    return value === undefined ? null : value;
  };
  return z
    .object({
      nickname: z.string(),
      hand: z.string(),
      drawWeightLb: z.string(),
      drawLengthMm: z.string(),
      letOffPct: z.string(),
      ratedSpeedFps: z.string(),
      sightDescription: z.string(),
      sightKind: z.string(),
      sightRadiusMm: z.string(),
      peepHeightMm: z.string(),
      scaleDirection: z.string(),
      tapeWidthMm: z.string(),
      pinDistances: z.string(),
      pinDistanceUnit: z.string(),
      notes: z.string(),
    })
    .transform((text) => ({
      nickname: text.nickname,
      hand: text.hand,
      drawWeightLb: textToNumber(text.drawWeightLb),
      drawLengthMm: lengthTextToMm(text.drawLengthMm, unit),
      letOffPct: optionalTextToNumber(text.letOffPct),
      ratedSpeedFps: optionalQuantityTextToStored(text.ratedSpeedFps, 'speed', unit),
      sightDescription: text.sightDescription,
      sightKind: text.sightKind,
      sightRadiusMm: lengthTextToMm(text.sightRadiusMm, unit),
      peepHeightMm: lengthTextToMm(text.peepHeightMm, unit),
      scaleDirection: text.scaleDirection,
      // A cut width: to 0.1 mm, so the default 8 mm shown as 0.315 in comes back as 8 mm.
      tapeWidthMm: roundTenth(optionalLengthMm(text.tapeWidthMm) ?? undefined),
      // Only a sight with fixed pins keeps its pin list.
      pinDistances: text.sightKind === 'single-pin-slider' ? [] : pinListToNumbers(text.pinDistances),
      pinDistanceUnit: text.pinDistanceUnit,
      notes: text.notes,
    }))
    .pipe(bowInputSchema);
}

/**
 * The form's starting text: a stored bow in the archer's unit, or a new bow's defaults.
 * Example: bowFormDefaults(undefined, 'mm', 'yd').tapeWidthMm → '8'
 */
export function bowFormDefaults(bow: Bow | undefined, unit: FormUnits, distanceUnit: DistanceUnit): BowFormText {
  if (!bow) {
    return {
      nickname: '',
      hand: 'right',
      drawWeightLb: '',
      drawLengthMm: '',
      letOffPct: '',
      ratedSpeedFps: '',
      sightDescription: '',
      sightKind: 'single-pin-slider',
      sightRadiusMm: '',
      peepHeightMm: '',
      scaleDirection: 'down',
      tapeWidthMm: mmToLengthText(8, unit),
      pinDistances: '',
      pinDistanceUnit: distanceUnit,
      notes: '',
    };
  }
  return {
    nickname: bow.nickname,
    hand: bow.hand,
    drawWeightLb: numberToText(bow.drawWeightLb, 1),
    drawLengthMm: mmToLengthText(bow.drawLengthMm, unit),
    letOffPct: numberToText(bow.letOffPct, 1),
    ratedSpeedFps: storedToInputText(bow.ratedSpeedFps, 'speed', unit),
    sightDescription: bow.sightDescription,
    sightKind: bow.sightKind,
    sightRadiusMm: mmToLengthText(bow.sightRadiusMm, unit),
    peepHeightMm: mmToLengthText(bow.peepHeightMm, unit),
    scaleDirection: bow.scaleDirection,
    tapeWidthMm: mmToLengthText(bow.tapeWidthMm, unit),
    pinDistances: bow.pinDistances.map((distance) => numberToText(distance, 1)).join(', '),
    pinDistanceUnit: bow.pinDistanceUnit,
    notes: bow.notes,
  };
}

/** The bow fields a form shows, in the order errors from the server are matched. */
export const bowFormFields: readonly (keyof BowFormText)[] = [
  'nickname',
  'hand',
  'drawWeightLb',
  'drawLengthMm',
  'letOffPct',
  'ratedSpeedFps',
  'sightDescription',
  'sightKind',
  'sightRadiusMm',
  'peepHeightMm',
  'scaleDirection',
  'tapeWidthMm',
  'pinDistances',
  'pinDistanceUnit',
  'notes',
];
