import { fpsToMps } from '@/math/units/convert';
import { missAtRange, type ShotParameters } from '@/math/flight/solve-elevation';
import type { SightModel } from '@/math/flight/sight-model';

/**
 * How a predicted mark moves with each fitted parameter, at a solved shot.
 *
 * The trajectory depends on speed v, drag factor k and peep height h; the scale
 * adds scale zero s0 and sight radius R: mark = s0 + R·tan γ. At the solved
 * elevation the miss w(γ, v, k, h) is zero, so by the implicit-function rule
 *   ∂γ/∂q = −(∂w/∂q)/(∂w/∂γ)   for q in {v, k, h},
 * and ∂mark/∂q = R·sec²γ·∂γ/∂q, ∂mark/∂s0 = 1, ∂mark/∂R = tan γ.
 * The partial derivatives of w are forward differences at fixed γ: four extra
 * flights, no further root solving. Numeric care: the relative steps (1e-6)
 * leave a truncation error near 1e-6 of each derivative, ample for
 * Gauss–Newton steps and for one-sigma bands.
 *
 * `parameters` follows MODEL_PARAMETERS: mm per fps, mm per mm, mm per unit
 * Cd, mm per mm, mm per mm. `perRangeMmPerM` is how the mark moves with the
 * slant range itself, from ∂w/∂S = vw/vu (the flight's slope across the line
 * of sight where it crosses the target).
 * Example: markGradient(model, shot, 54.864, 0, 0.0397196).parameters[0] → −0.218 (mm of mark per fps at 60 yd)
 */
export interface MarkGradient {
  parameters: number[];
  perRangeMmPerM: number;
}

export function markGradient(
  model: Pick<SightModel, 'sightRadiusMm' | 'dragCoefficient'>,
  shot: ShotParameters,
  rangeM: number,
  losAngleRad: number,
  elevationRad: number,
): MarkGradient {
  const crossing = missAtRange(shot, rangeM, losAngleRad, elevationRad);
  const base = crossing.w;
  const elevationStep = 1e-7;
  const dMissDElevation = (missAtRange(shot, rangeM, losAngleRad, elevationRad + elevationStep).w - base) / elevationStep;

  const speedStep = 1e-6 * shot.speedMps;
  const dMissDSpeed =
    (missAtRange({ ...shot, speedMps: shot.speedMps + speedStep }, rangeM, losAngleRad, elevationRad).w - base) / speedStep;
  const dragStep = shot.dragPerM > 0 ? 1e-6 * shot.dragPerM : 1e-12;
  const dMissDDrag = (missAtRange({ ...shot, dragPerM: shot.dragPerM + dragStep }, rangeM, losAngleRad, elevationRad).w - base) / dragStep;
  const peepStep = 1e-6; // m
  const dMissDPeep =
    (missAtRange({ ...shot, peepHeightM: shot.peepHeightM + peepStep }, rangeM, losAngleRad, elevationRad).w - base) / peepStep;

  const tan = Math.tan(elevationRad);
  const scale = model.sightRadiusMm * (1 + tan * tan); // mm per rad of elevation
  const dragPerCd = model.dragCoefficient > 0 ? shot.dragPerM / model.dragCoefficient : 0;
  return {
    parameters: [
      (-scale * dMissDSpeed * fpsToMps(1)) / dMissDElevation, // mm per fps
      1, // mm per mm of scale zero
      (-scale * dMissDDrag * dragPerCd) / dMissDElevation, // mm per unit Cd
      (-scale * dMissDPeep * 0.001) / dMissDElevation, // mm per mm of peep height
      tan, // mm per mm of sight radius
    ],
    perRangeMmPerM: (-scale * (crossing.vw / crossing.vu)) / dMissDElevation,
  };
}
