import { CELSIUS_ZERO_K, FOOT_M, GRAIN_KG, INCH_MM, YARD_M } from '@/math/units/constants';

/**
 * Conversions at the edge: each takes a number in the unit its name gives and
 * returns the unit after "To". All are exact multiplications by the constants
 * in constants.ts (no rounding).
 *
 * Example: yardsToMetres(60) → 54.864
 */

/** Distance unit accepted at the edge: yards or metres. */
export type DistanceUnit = 'yd' | 'm';
/** Length unit accepted at the edge for sight readings and arrow lengths. */
export type LengthUnit = 'mm' | 'in';

/** Yards → metres. Example: yardsToMetres(60) → 54.864 */
export const yardsToMetres = (yards: number): number => yards * YARD_M;
/** Metres → yards. Example: metresToYards(91.44) → 100 */
export const metresToYards = (metres: number): number => metres / YARD_M;
/** Inches → millimetres. Example: inchesToMm(2) → 50.8 */
export const inchesToMm = (inches: number): number => inches * INCH_MM;
/** Millimetres → inches. Example: mmToInches(25.4) → 1 */
export const mmToInches = (mm: number): number => mm / INCH_MM;
/** Grains → kilograms. Example: grainsToKg(420) → 0.0272155422 */
export const grainsToKg = (grains: number): number => grains * GRAIN_KG;
/** Grains → grams. Example: grainsToGrams(100) → 6.479891 */
export const grainsToGrams = (grains: number): number => grains * GRAIN_KG * 1000;
/** Grams → grains. Example: gramsToGrains(6.479891) → 100 */
export const gramsToGrains = (grams: number): number => grams / 1000 / GRAIN_KG;
/** Feet per second → metres per second. Example: fpsToMps(300) → 91.44 */
export const fpsToMps = (fps: number): number => fps * FOOT_M;
/** Metres per second → feet per second. Example: mpsToFps(91.44) → 300 */
export const mpsToFps = (mps: number): number => mps / FOOT_M;
/** Degrees → radians. Example: degToRad(180) → π */
export const degToRad = (degrees: number): number => (degrees * Math.PI) / 180;
/** Radians → degrees. Example: radToDeg(Math.PI) → 180 */
export const radToDeg = (radians: number): number => (radians * 180) / Math.PI;
/** Degrees Celsius → kelvin. Example: celsiusToKelvin(15) → 288.15 */
export const celsiusToKelvin = (celsius: number): number => celsius + CELSIUS_ZERO_K;

/** A distance in yards or metres → metres. Example: distanceToMetres(20, 'yd') → 18.288 */
export function distanceToMetres(distance: number, unit: DistanceUnit): number {
  return unit === 'yd' ? yardsToMetres(distance) : distance;
}

/** Metres → a distance in yards or metres. Example: metresToDistance(18.288, 'yd') → 20 */
export function metresToDistance(metres: number, unit: DistanceUnit): number {
  return unit === 'yd' ? metresToYards(metres) : metres;
}

/** A length in mm or inches → millimetres. Example: lengthToMm(1, 'in') → 25.4 */
export function lengthToMm(length: number, unit: LengthUnit): number {
  return unit === 'in' ? inchesToMm(length) : length;
}
