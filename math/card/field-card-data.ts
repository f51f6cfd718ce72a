import type { CardShiftRow, CardSlopeRow, FieldCardData } from '@/shared/field-card';
import { airDensityKgM3 } from '@/math/air/standard-atmosphere';
import { distanceToMetres, metresToDistance } from '@/math/units/convert';
import { predictMarkMm, predictMarksMm } from '@/math/flight/predict-mark';
import type { SightModel } from '@/math/flight/sight-model';
import { levelRangeForMark } from '@/math/slope/slope-shot';
import { airShift } from '@/math/field/air-shift';
import { windTable } from '@/math/field/wind-table';
import { FIELD_CARD_ANGLES_DEG, FIELD_CARD_DISTANCES } from '@/math/field/field-card';
import { FitInputError } from '@/math/fit/fit-input-error';
import { SLOPE_CAUTION } from '@/math/cautions';

/** The card's cautions, in the order printed. */
export const FIELD_CARD_CAUTIONS = [
  SLOPE_CAUTION,
  'Every figure here is an estimate from the fit: confirm each distance at the range.',
  'Follow the hunting rules where you hunt.',
] as const;

/**
 * The data of a field card for one fitted sight-in: what to hold up and down
 * slopes, in the hunt's air, and how the level marks shift there.
 *
 * For each line-of-sight angle θ (+ uphill) and slant distance S:
 * - markMm: the mark that hits at S on that slope in the card's air (the
 *   model's flight with the air density of `air`; the sight-in's without it);
 * - aimAsIf: the level distance whose mark *in the sight-in air* is that mark,
 *   i.e. the distance to set on the sight-in tape (levelRangeForMark), so one
 *   number carries both the slope and the air correction;
 * - horizontal: the rifleman's rule S·cos θ, and aimAsIfMinusHorizontal.
 * In the sight-in air this is exactly fieldCard/slopeShot. The shift rows are
 * airShift: the level mark at each distance in the card's air minus the
 * sight-in's (thinner air, less drag: long marks move up the scale, negative).
 * The wind table (windTable) gives the crosswind drift and hold at each
 * distance on the level, in the card's air.
 *
 * Air: `air.altitudeM` (m) and `air.temperatureC` (°C; absent: the standard
 * atmosphere's at that altitude, ISO 2533). `sightIn` names the air the
 * sight-in recorded (null parts: the fit assumed sea level / standard), for
 * the card's words only; the fitted model carries the density itself.
 *
 * Units: distances in model.distanceUnit, angles degrees, marks mm as the
 * archer reads the scale (`scaleSign` −1 for a scale growing upward).
 * Estimates: confirm on real terrain.
 *
 * Example: fieldCardData(model, { anglesDeg: [-30], distances: [40], air: { altitudeM: 2700 } }).rows[0] → { markMm: 19.69, aimAsIf: 33.19, horizontal: 34.64, aimAsIfMinusHorizontal: −1.45 } (the example model of sight-model.ts)
 */
export interface FieldCardDataOptions {
  anglesDeg?: readonly number[];
  distances?: readonly number[];
  /** The hunt's air; absent: the sight-in's. */
  air?: { altitudeM?: number; temperatureC?: number };
  /** The sight-in's recorded air (for the card's words). */
  sightIn?: { altitudeM: number | null; temperatureC: number | null };
  scaleSign?: 1 | -1;
}

export function fieldCardData(model: SightModel, options: FieldCardDataOptions = {}): FieldCardData {
  const anglesDeg = [...(options.anglesDeg ?? FIELD_CARD_ANGLES_DEG)];
  const distances = [...(options.distances ?? FIELD_CARD_DISTANCES)];
  const sign = options.scaleSign ?? 1;
  if (anglesDeg.length === 0 || distances.length === 0) throw new FitInputError('fieldCard', 'Choose at least one angle and one distance');
  anglesDeg.forEach((angle, i) => {
    if (!(Math.abs(angle) <= 60)) throw new FitInputError(`anglesDeg[${i}]`, 'Enter an angle between -60 and 60°');
  });
  distances.forEach((distance, i) => {
    if (!(distance >= 5 && distance <= 150)) throw new FitInputError(`distances[${i}]`, 'Enter a distance between 5 and 150');
  });

  const asked = options.air && (options.air.altitudeM !== undefined || options.air.temperatureC !== undefined);
  const sightInRecorded = options.sightIn ?? { altitudeM: null, temperatureC: null };
  const cardAir = asked
    ? {
        altitudeM: options.air?.altitudeM ?? sightInRecorded.altitudeM ?? 0,
        temperatureC: options.air?.temperatureC ?? null,
      }
    : { altitudeM: sightInRecorded.altitudeM, temperatureC: sightInRecorded.temperatureC };
  const cardDensity = asked
    ? airDensityKgM3({ altitudeM: cardAir.altitudeM ?? 0, temperatureC: cardAir.temperatureC ?? undefined })
    : model.airDensityKgM3;
  const there: SightModel = { ...model, airDensityKgM3: cardDensity };

  const rows: CardSlopeRow[] = anglesDeg.flatMap((angleDeg) =>
    distances.map((distance) => {
      const horizontal = distance * Math.cos((angleDeg * Math.PI) / 180);
      const markMm = predictMarkMm(there, distance, angleDeg);
      if (!Number.isFinite(markMm)) return { angleDeg, distance, markMm: null, aimAsIf: null, horizontal, aimAsIfMinusHorizontal: null };
      const levelM = levelRangeForMark(model, markMm, distanceToMetres(distance, model.distanceUnit));
      const aimAsIf = levelM === null ? null : metresToDistance(levelM, model.distanceUnit);
      return {
        angleDeg,
        distance,
        markMm: sign * markMm,
        aimAsIf,
        horizontal,
        aimAsIfMinusHorizontal: aimAsIf === null ? null : aimAsIf - horizontal,
      };
    }),
  );

  const finite = (value: number) => (Number.isFinite(value) ? value : null);
  let shift: CardShiftRow[];
  if (asked) {
    const shifted = airShift(model, { altitudeM: cardAir.altitudeM ?? 0, temperatureC: cardAir.temperatureC ?? undefined }, distances);
    shift = shifted.rows.map((row) => ({
      distance: row.distance,
      sightInMarkMm: finite(sign * row.sightInMarkMm),
      markMm: finite(sign * row.markMm),
      shiftMm: finite(sign * row.shiftMm),
    }));
  } else {
    // In the sight-in air the shift is zero by definition.
    shift = predictMarksMm(model, distances).map((markMm, i) => ({
      distance: distances[i],
      sightInMarkMm: finite(sign * markMm),
      markMm: finite(sign * markMm),
      shiftMm: Number.isFinite(markMm) ? 0 : null,
    }));
  }

  return {
    unit: model.distanceUnit,
    scaleDirection: sign === 1 ? 'down' : 'up',
    anglesDeg,
    distances,
    sightIn: { ...sightInRecorded, airDensityKgM3: model.airDensityKgM3 },
    air: { altitudeM: cardAir.altitudeM, temperatureC: cardAir.temperatureC, airDensityKgM3: cardDensity },
    sameAirAsSightIn: !asked,
    rows,
    shift,
    wind: windTable(there, distances),
    cautions: [...FIELD_CARD_CAUTIONS],
  };
}
