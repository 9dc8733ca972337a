/**
 * Physical constants and fixed parameter values used across stackday. SI units.
 * One home for every constant: no module keeps a private copy.
 */

/** Stefan–Boltzmann constant, W/(m² K⁴). CODATA 2018 (exact from SI defining constants). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Standard gravity, m/s². CGPM 1901 (conventional value). */
export const STANDARD_GRAVITY = 9.80665;

/** Absolute zero offset: T[K] = T[°C] + KELVIN_OFFSET. */
export const KELVIN_OFFSET = 273.15;

/** Standard atmosphere, Pa. */
export const STANDARD_PRESSURE = 101325;

/** Universal gas constant, J/(mol K). CODATA 2018 (exact). */
export const GAS_CONSTANT = 8.314462618;

/** Molar mass of dry air, kg/mol (ISO 2533 standard atmosphere: 28.9644 g/mol). */
export const MOLAR_MASS_AIR = 0.0289644;

/** Solar constant (total solar irradiance), W/m². Kopp & Lean 2011: 1360.8 ± 0.5 W/m². */
export const SOLAR_CONSTANT = 1361;

/** Seconds in one day. */
export const SECONDS_PER_DAY = 86400;

/** Convert °C to K. */
export const celsiusToKelvin = (c: number): number => c + KELVIN_OFFSET;
/** Convert K to °C. */
export const kelvinToCelsius = (k: number): number => k - KELVIN_OFFSET;
