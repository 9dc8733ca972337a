/**
 * Dry air: thermophysical properties against temperature, ideal-gas density, and the pressure of
 * the standard atmosphere at a site's elevation.
 *
 * Property table: Incropera, DeWitt, Bergman & Lavine, *Fundamentals of Heat and Mass Transfer*
 * (6th ed., Wiley 2007), Table A.4 "Thermophysical properties of gases at atmospheric pressure",
 * air, 100–2000 K. The numbers below were written FROM MEMORY, not copied from the book; they were
 * checked for internal consistency (Pr = μ cp / k to ±0.1 %, ρ = p M / (R T) at 100 kPa to ±0.3 %
 * from 200 K up; see test/properties/air.test.ts) and against Sutherland's law (within 2.3 % from
 * 200 to 1300 K). Rows above 1300 K are the least certain: their μ lies 5–11 % above Sutherland's
 * law and their k rises unevenly (1300→1500 K); check them against the book before relying on them.
 *
 * The table's density column corresponds to the ideal gas at 1 bar (100 kPa), not 1 atm, so the
 * density returned here is NOT interpolated from the table: it is the ideal-gas value at the
 * requested pressure (1 atm by default), and the kinematic viscosity is μ/ρ at that pressure.
 * cp, k and μ are independent of pressure at these conditions and are interpolated linearly.
 */
import { GAS_CONSTANT, MOLAR_MASS_AIR, STANDARD_GRAVITY, STANDARD_PRESSURE } from '../constants.ts';

/** Properties of dry air at one temperature and pressure. SI units. */
export interface AirProperties {
  /** Density, kg/m³ (ideal gas at the requested pressure). */
  density: number;
  /** Specific heat at constant pressure, J/(kg K). */
  specificHeat: number;
  /** Thermal conductivity, W/(m K). */
  conductivity: number;
  /** Dynamic viscosity, Pa s. */
  dynamicViscosity: number;
  /** Kinematic viscosity μ/ρ, m²/s. */
  kinematicViscosity: number;
  /** Prandtl number μ cp / k, –. */
  prandtl: number;
  /** Volumetric thermal expansion coefficient, 1/K (ideal gas: 1/T). */
  expansion: number;
}

/**
 * Incropera & DeWitt Table A.4, air at atmospheric pressure (FROM MEMORY; see the module comment).
 * Columns in the book's units: T (K), ρ (kg/m³, at 1 bar), cp (kJ/(kg K)), μ·10⁷ (N s/m²),
 * k·10³ (W/(m K)), Pr.
 */
export const AIR_TABLE_INCROPERA_A4: {
  readonly temperatureK: readonly number[];
  readonly density1Bar: readonly number[];
  readonly specificHeatKJ: readonly number[];
  readonly viscosityE7: readonly number[];
  readonly conductivityE3: readonly number[];
  readonly prandtl: readonly number[];
} = (() => {
  // prettier-ignore
  const rows: readonly (readonly [number, number, number, number, number, number])[] = [
    // T,     rho,    cp,    mu*1e7, k*1e3, Pr
    [100, 3.5562, 1.032, 71.1, 9.34, 0.786],
    [150, 2.3364, 1.012, 103.4, 13.8, 0.758],
    [200, 1.7458, 1.007, 132.5, 18.1, 0.737],
    [250, 1.3947, 1.006, 159.6, 22.3, 0.720],
    [300, 1.1614, 1.007, 184.6, 26.3, 0.707],
    [350, 0.9950, 1.009, 208.2, 30.0, 0.700],
    [400, 0.8711, 1.014, 230.1, 33.8, 0.690],
    [450, 0.7740, 1.021, 250.7, 37.3, 0.686],
    [500, 0.6964, 1.030, 270.1, 40.7, 0.684],
    [550, 0.6329, 1.040, 288.4, 43.9, 0.683],
    [600, 0.5804, 1.051, 305.8, 46.9, 0.685],
    [650, 0.5356, 1.063, 322.5, 49.7, 0.690],
    [700, 0.4975, 1.075, 338.8, 52.4, 0.695],
    [750, 0.4643, 1.087, 354.6, 54.9, 0.702],
    [800, 0.4354, 1.099, 369.8, 57.3, 0.709],
    [850, 0.4097, 1.110, 384.3, 59.6, 0.716],
    [900, 0.3868, 1.121, 398.1, 62.0, 0.720],
    [950, 0.3666, 1.131, 411.3, 64.3, 0.723],
    [1000, 0.3482, 1.141, 424.4, 66.7, 0.726],
    [1100, 0.3166, 1.159, 449.0, 71.5, 0.728],
    [1200, 0.2902, 1.175, 473.0, 76.3, 0.728],
    [1300, 0.2679, 1.189, 496.0, 82.0, 0.719],
    [1400, 0.2488, 1.207, 530.0, 91.0, 0.703],
    [1500, 0.2322, 1.230, 557.0, 100.0, 0.685],
    [1600, 0.2177, 1.248, 584.0, 106.0, 0.688],
    [1700, 0.2049, 1.267, 611.0, 113.0, 0.685],
    [1800, 0.1935, 1.286, 637.0, 120.0, 0.683],
    [1900, 0.1833, 1.307, 663.0, 128.0, 0.677],
    [2000, 0.1741, 1.337, 689.0, 137.0, 0.672],
  ];
  return {
    temperatureK: rows.map((r) => r[0]),
    density1Bar: rows.map((r) => r[1]),
    specificHeatKJ: rows.map((r) => r[2]),
    viscosityE7: rows.map((r) => r[3]),
    conductivityE3: rows.map((r) => r[4]),
    prandtl: rows.map((r) => r[5]),
  };
})();

// SI columns in typed arrays for the hot path.
const T = Float64Array.from(AIR_TABLE_INCROPERA_A4.temperatureK);
const CP = Float64Array.from(AIR_TABLE_INCROPERA_A4.specificHeatKJ, (x) => x * 1e3);
const MU = Float64Array.from(AIR_TABLE_INCROPERA_A4.viscosityE7, (x) => x * 1e-7);
const K = Float64Array.from(AIR_TABLE_INCROPERA_A4.conductivityE3, (x) => x * 1e-3);
const N = T.length;

/** Lowest and highest tabulated temperature, K; outside them the properties are held constant. */
export const AIR_TABLE_RANGE_K: readonly [number, number] = [T[0], T[N - 1]];

/** Specific gas constant of dry air, J/(kg K): R / M = 287.05 J/(kg K). */
export const SPECIFIC_GAS_CONSTANT_AIR = GAS_CONSTANT / MOLAR_MASS_AIR;

/**
 * Density of dry air as an ideal gas: ρ = p M / (R T) = p / (R_air T), kg/m³.
 * Valid where air is close to ideal (compressibility within 0.1 % of 1 from about 200 K upward at
 * 1 atm). Example: T = 288.15 K, p = 101 325 Pa → 1.2250 kg/m³ (the ISO 2533 sea-level density).
 */
export function airDensityIdealGas(temperatureK: number, pressurePa: number): number {
  return pressurePa / (SPECIFIC_GAS_CONSTANT_AIR * temperatureK);
}

let lastInterval = 0;

/**
 * Properties of dry air at `temperatureK` and `pressurePa` (default 1 atm), written into `out`
 * (no allocation). cp, k, μ: linear interpolation in Incropera Table A.4 (from memory), held
 * constant below 100 K and above 2000 K. ρ: ideal gas at `pressurePa`; ν = μ/ρ; Pr = μ cp / k;
 * expansion = 1/T (ideal gas). Returns `out`.
 *
 * Example: 300 K, 1 atm → ρ 1.1767 kg/m³, cp 1007 J/(kg K), k 0.0263 W/(m K),
 * μ 1.846e-5 Pa s, ν 1.569e-5 m²/s, Pr 0.707.
 */
export function airPropertiesInto(out: AirProperties, temperatureK: number, pressurePa: number = STANDARD_PRESSURE): AirProperties {
  let cp: number;
  let k: number;
  let mu: number;
  if (temperatureK <= T[0]) {
    cp = CP[0];
    k = K[0];
    mu = MU[0];
  } else if (temperatureK >= T[N - 1]) {
    cp = CP[N - 1];
    k = K[N - 1];
    mu = MU[N - 1];
  } else {
    // Start from the interval used last; a short scan when calls come at nearby temperatures.
    let i = lastInterval;
    while (temperatureK < T[i]) i--;
    while (temperatureK >= T[i + 1]) i++;
    lastInterval = i;
    const f = (temperatureK - T[i]) / (T[i + 1] - T[i]);
    cp = CP[i] + f * (CP[i + 1] - CP[i]);
    k = K[i] + f * (K[i + 1] - K[i]);
    mu = MU[i] + f * (MU[i + 1] - MU[i]);
  }
  const rho = pressurePa / (SPECIFIC_GAS_CONSTANT_AIR * temperatureK);
  out.density = rho;
  out.specificHeat = cp;
  out.conductivity = k;
  out.dynamicViscosity = mu;
  out.kinematicViscosity = mu / rho;
  out.prandtl = (mu * cp) / k;
  out.expansion = 1 / temperatureK;
  return out;
}

/** Properties of dry air at `temperatureK` (and `pressurePa`, default 1 atm) as a new object; see `airPropertiesInto`. */
export function airPropertiesAt(temperatureK: number, pressurePa: number = STANDARD_PRESSURE): AirProperties {
  return airPropertiesInto(
    { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, kinematicViscosity: 0, prandtl: 0, expansion: 0 },
    temperatureK,
    pressurePa,
  );
}

/** ISO 2533 standard atmosphere, troposphere: sea-level temperature (K), lapse rate (K/m). */
const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
const ISA_LAPSE_RATE = 0.0065;
/** Earth radius used for geopotential altitude in ISO 2533 / US Standard Atmosphere 1976, m. */
const ISA_EARTH_RADIUS_M = 6356766;

/**
 * Pressure of the standard atmosphere at a geometric elevation above mean sea level, Pa.
 *
 * Barometric formula of the troposphere (ISO 2533:1975; US Standard Atmosphere 1976):
 *   p = p₀ (1 − L H / T₀)^(g₀ M / (R L)),  H = r₀ z / (r₀ + z)  (geopotential altitude),
 * with p₀ = 101 325 Pa, T₀ = 288.15 K, L = 0.0065 K/m, g₀ = 9.80665 m/s², M = 0.0289644 kg/mol,
 * r₀ = 6 356 766 m; exponent ≈ 5.2559. Valid from below sea level (e.g. −500 m) to the tropopause
 * (11 km geopotential); above that the formula is not the standard atmosphere (it still returns a
 * value, continuing the troposphere's lapse rate). R is the CODATA 2018 value from constants.ts;
 * the standard's own R* = 8.31432 J/(mol K) is 17 ppm smaller, which moves p by at most 0.003 %
 * (0.6 Pa) below 11 km.
 *
 * Example: z = 1000 m → H = 999.84 m → p = 89 876 Pa (US Standard Atmosphere 1976 table: 8.9876·10⁴ Pa).
 */
export function airPressureAtElevation(elevationM: number): number {
  const h = (ISA_EARTH_RADIUS_M * elevationM) / (ISA_EARTH_RADIUS_M + elevationM);
  const exponent = (STANDARD_GRAVITY * MOLAR_MASS_AIR) / (GAS_CONSTANT * ISA_LAPSE_RATE);
  return STANDARD_PRESSURE * Math.pow(1 - (ISA_LAPSE_RATE * h) / ISA_SEA_LEVEL_TEMPERATURE_K, exponent);
}

