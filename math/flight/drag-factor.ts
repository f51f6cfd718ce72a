import { grainsToKg } from '@/math/units/convert';

/**
 * Drag factor k of the flight equations, a = −k·v·velocity:
 *   k = rho·Cd·A/(2·m),  A = π·d²/4 (the shaft's cross-section)
 * Cd is referenced to the shaft cross-section, as in the wind-tunnel values of
 * Ortiz Enriquez et al. (Proceedings 49(1):56, MDPI 2020: 1.56 short vanes,
 * 2.05 large vanes) and Miyazaki et al. (Sports Engineering 16 (2013) 43–54).
 *
 * Arguments: air density kg/m³, drag coefficient (1), shaft diameter mm,
 * arrow mass grains. Result: 1/m.
 * Example: dragFactorPerM({ airDensityKgM3: 1.225, dragCoefficient: 2, diameterMm: 6.5, massGr: 420 }) → 0.0014937 /m
 */
export function dragFactorPerM(arrow: { airDensityKgM3: number; dragCoefficient: number; diameterMm: number; massGr: number }): number {
  const diameterM = arrow.diameterMm / 1000;
  const areaM2 = (Math.PI * diameterM * diameterM) / 4;
  return (arrow.airDensityKgM3 * arrow.dragCoefficient * areaM2) / (2 * grainsToKg(arrow.massGr));
}
