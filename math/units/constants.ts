/**
 * Exact unit definitions. Every conversion in Pinwright goes through these
 * numbers, once, at the edge; the math works in SI (metres, seconds, kilograms,
 * radians) inside.
 *
 * Sources: the international yard and pound agreement (1959) fixes the yard at
 * 0.9144 m, the inch at 25.4 mm and the avoirdupois pound at 0.45359237 kg; the
 * grain is 1/7000 pound = 64.79891 mg. Standard gravity 9.80665 m/s² is the value
 * of the 3rd CGPM (1901); the pound-force is one pound under standard gravity.
 *
 * Example: YARD_M * 100 → 91.44
 */

/** One international yard, in metres (exact, 1959). */
export const YARD_M = 0.9144;
/** One international foot, in metres (exact, 1959). */
export const FOOT_M = 0.3048;
/** One inch, in millimetres (exact, 1959). */
export const INCH_MM = 25.4;
/** One avoirdupois pound, in kilograms (exact, 1959). */
export const POUND_KG = 0.45359237;
/** One grain (1/7000 lb), in kilograms (exact: 64.79891 mg). */
export const GRAIN_KG = 64.79891e-6;
/** Standard acceleration of gravity, m/s² (exact, 3rd CGPM 1901). */
export const STANDARD_GRAVITY_MPS2 = 9.80665;
/** One pound-force, in newtons: POUND_KG × STANDARD_GRAVITY_MPS2 (exact). */
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY_MPS2;
/** One foot-pound-force, in joules: FOOT_M × POUND_FORCE_N (exact, ≈ 1.3558179483314). */
export const FOOT_POUND_J = FOOT_M * POUND_FORCE_N;
/** One slug (lbf·s²/ft), in kilograms (exact, ≈ 14.593902937). */
export const SLUG_KG = POUND_FORCE_N / FOOT_M;
/** Zero degrees Celsius, in kelvin (exact). */
export const CELSIUS_ZERO_K = 273.15;
