import { celsiusToKelvin } from '@/math/units/convert';

/**
 * Air of the ISO 2533:1975 / U.S. Standard Atmosphere 1976 troposphere
 * (geopotential heights 0–11 000 m):
 *   T = 288.15 − 0.0065·H   (K)
 *   p = 101325·(T/288.15)^5.255876   (Pa)
 *   rho = p/(287.053·T)   (kg/m³)
 * The exponent is g0·M0/(R*·L) = 5.255876 and 287.053 J/(kg·K) is the gas
 * constant for air of the same standard.
 *
 * Example: standardAtmosphere(1000).densityKgM3 → 1.11164 (ISO 2533 table value)
 */

/** Sea-level standard temperature, K (ISO 2533). */
export const SEA_LEVEL_TEMPERATURE_K = 288.15;
/** Sea-level standard pressure, Pa (ISO 2533). */
export const SEA_LEVEL_PRESSURE_PA = 101325;
/** Tropospheric temperature gradient, K per geopotential metre (ISO 2533). */
export const LAPSE_RATE_K_PER_M = 0.0065;
/** Specific gas constant of air, J/(kg·K) (ISO 2533). */
export const AIR_GAS_CONSTANT = 287.053;
/** Exponent g0/(R·L) of the barometric formula (ISO 2533). */
export const BAROMETRIC_EXPONENT = 5.255876;
/** Radius of the earth used to turn geometric into geopotential height, m (US Std Atm 1976). */
export const EARTH_RADIUS_M = 6356766;

/** Standard air at a height: temperature (K), pressure (Pa) and density (kg/m³). */
export interface StandardAir {
  temperatureK: number;
  pressurePa: number;
  densityKgM3: number;
}

/**
 * Standard air at geopotential height `geopotentialM` (metres, −5000…11 000).
 * Example: standardAtmosphere(0) → { temperatureK: 288.15, pressurePa: 101325, densityKgM3: 1.225 }
 */
export function standardAtmosphere(geopotentialM: number): StandardAir {
  if (!Number.isFinite(geopotentialM) || geopotentialM < -5000 || geopotentialM > 11000) {
    throw new RangeError(`standardAtmosphere: height ${geopotentialM} m is outside the troposphere model (−5000…11 000 m)`);
  }
  const temperatureK = SEA_LEVEL_TEMPERATURE_K - LAPSE_RATE_K_PER_M * geopotentialM;
  const pressurePa = SEA_LEVEL_PRESSURE_PA * Math.pow(temperatureK / SEA_LEVEL_TEMPERATURE_K, BAROMETRIC_EXPONENT);
  return { temperatureK, pressurePa, densityKgM3: pressurePa / (AIR_GAS_CONSTANT * temperatureK) };
}

/**
 * Geometric altitude above sea level (m) → geopotential height (m):
 * H = r0·z/(r0 + z) (US Standard Atmosphere 1976, eq. 18). The two differ by
 * 2.5 m at 4000 m, about 0.03 % of air density.
 * Example: geopotentialHeightM(4000) → 3997.48
 */
export function geopotentialHeightM(altitudeM: number): number {
  return (EARTH_RADIUS_M * altitudeM) / (EARTH_RADIUS_M + altitudeM);
}

/** Where and in what air a shot is taken: altitude above sea level (m), optional measured temperature (°C). */
export interface AirConditions {
  altitudeM?: number;
  temperatureC?: number;
}

/**
 * Air density (kg/m³) at a geometric altitude, with an optional measured
 * temperature: the standard pressure at that altitude is kept and the measured
 * temperature replaces the standard one (ideal gas, dry air).
 * Example: airDensityKgM3({ altitudeM: 0, temperatureC: 30 }) → 1.16439
 */
export function airDensityKgM3(air: AirConditions = {}): number {
  const standard = standardAtmosphere(geopotentialHeightM(air.altitudeM ?? 0));
  if (air.temperatureC === undefined) return standard.densityKgM3;
  const temperatureK = celsiusToKelvin(air.temperatureC);
  if (!(temperatureK > 150)) throw new RangeError(`airDensityKgM3: temperature ${air.temperatureC} °C is not physical`);
  return standard.pressurePa / (AIR_GAS_CONSTANT * temperatureK);
}
