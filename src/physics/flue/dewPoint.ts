/**
 * Dew points of a flue gas: water (from the water-vapour partial pressure) and sulfuric acid
 * (Verhoff & Banchero 1974, from the H2O and SO3 partial pressures).
 */
import type { GasComposition } from '../properties/flueGas.ts';
import { celsiusToKelvin, STANDARD_PRESSURE } from '../constants.ts';

/** Pascals per mmHg (torr): 101325/760, exact by definition of the standard atmosphere. */
export const PA_PER_MMHG = STANDARD_PRESSURE / 760;

/**
 * IAPWS-IF97 region 4 coefficients n1…n10 (IAPWS R7-97(2012), Table 34). n2 = −0.72421316703206e6:
 * with these values eqs. 30 and 31 reproduce the release's check values (Tables 35 and 36) to all
 * nine printed digits (see test/physics/flue/dewPoint.test.ts).
 */
const N = [
  0, 0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
  0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

/** Triple-point pressure of water (IF97 lower limit of the saturation line at 273.15 K), Pa. */
const IF97_MIN_PRESSURE_PA = 611.213;
/** Critical pressure of water, Pa. */
const IF97_MAX_PRESSURE_PA = 22.064e6;

/**
 * Saturation pressure of water, Pa, IAPWS-IF97 region 4, eq. 30 (Wagner et al. 2000, J. Eng. Gas
 * Turbines Power 122:150, doi:10.1115/1.483186). Valid 273.15–647.096 K.
 * Example: 333.15 K (60 °C) → 19 946 Pa.
 */
export function waterSaturationPressureIf97(temperatureK: number): number {
  const th = temperatureK + N[9] / (temperatureK - N[10]);
  const A = th * th + N[1] * th + N[2];
  const B = N[3] * th * th + N[4] * th + N[5];
  const C = N[6] * th * th + N[7] * th + N[8];
  const r = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return r ** 4 * 1e6;
}

/**
 * Saturation temperature of water, K, IAPWS-IF97 region 4 backward equation, eq. 31 (the exact
 * inverse of eq. 30 by construction). Valid 611.213 Pa – 22.064 MPa. Example: 101 325 Pa → 373.124 K.
 */
export function waterSaturationTemperatureIf97(pressurePa: number): number {
  const beta = Math.pow(pressurePa / 1e6, 0.25);
  const E = beta * beta + N[3] * beta + N[6];
  const F = N[1] * beta * beta + N[4] * beta + N[7];
  const G = N[2] * beta * beta + N[5] * beta + N[8];
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  const s = N[10] + D;
  return (s - Math.sqrt(s * s - 4 * (N[9] + N[10] * D))) / 2;
}

/**
 * Water dew point, K, of a gas whose water-vapour partial pressure is `waterPartialPressurePa`:
 * the saturation temperature at that pressure.
 * - 611.213 Pa … 22.064 MPa: IAPWS-IF97 region 4 (eq. 31).
 * - Below 611.213 Pa (dew point below 0 °C; a very dry gas): the Magnus formula over liquid water of
 *   Alduchov & Eskridge (1996, J. Appl. Meteor. 35:601), e = 610.94 exp(17.625 t/(t + 243.04)) Pa,
 *   t in °C, inverted and shifted by 0.0036 K so that the two pieces meet at 611.213 Pa.
 * - p ≤ 0 (no water vapour): −Infinity — the gas never condenses water, and `T − dewPoint` margins
 *   stay +Infinity.
 * Above the critical pressure: RangeError.
 */
export function waterDewPointK(waterPartialPressurePa: number): number {
  const p = waterPartialPressurePa;
  if (Number.isNaN(p)) throw new RangeError('water partial pressure is NaN');
  if (p <= 0) return -Infinity;
  if (p > IF97_MAX_PRESSURE_PA) throw new RangeError(`water partial pressure ${p} Pa is above the critical pressure 22.064 MPa`);
  if (p >= IF97_MIN_PRESSURE_PA) return waterSaturationTemperatureIf97(p);
  return magnusDewPointK(p) + MAGNUS_JOIN_SHIFT_K;
}

function magnusDewPointK(p: number): number {
  const l = Math.log(p / 610.94);
  return celsiusToKelvin((243.04 * l) / (17.625 - l));
}

/** Shift making the Magnus branch continuous with IF97 at 611.213 Pa (both read ≈ 273.15 K there). */
const MAGNUS_JOIN_SHIFT_K = 273.15 - magnusDewPointK(IF97_MIN_PRESSURE_PA);

/**
 * Sulfuric-acid dew point, K, Verhoff & Banchero (1974), Chem. Eng. Prog. 70(8):71–72:
 * 1000/T = 2.276 − 0.0294 ln p_H2O − 0.0858 ln p_SO3 + 0.0062 ln p_H2O · ln p_SO3,
 * partial pressures in mmHg, T in K. p_SO3 counts all SO3 (as SO3 and H2SO4 vapour).
 * Fitted to the H2SO4–H2O vapour–liquid data; used in practice for p_H2O about 5–25 % of 1 atm
 * and SO3 about 1–1000 ppm.
 * Example: 10 % H2O (76 mmHg) and 10 ppm SO3 (0.0076 mmHg) at 1 atm → 410.45 K (137.3 °C).
 */
export function acidDewPointVerhoffBanchero(waterPartialPressureMmHg: number, so3PartialPressureMmHg: number): number {
  if (!(waterPartialPressureMmHg > 0) || !(so3PartialPressureMmHg > 0))
    throw new RangeError(`Verhoff–Banchero needs positive H2O and SO3 partial pressures (got ${waterPartialPressureMmHg}, ${so3PartialPressureMmHg} mmHg)`);
  const lw = Math.log(waterPartialPressureMmHg);
  const ls = Math.log(so3PartialPressureMmHg);
  return 1000 / (2.276 - 0.0294 * lw - 0.0858 * ls + 0.0062 * lw * ls);
}

export interface FlueGasDewPoints {
  /** Water dew point, K (−Infinity when the gas holds no water). */
  readonly waterDewPointK: number;
  /** Sulfuric-acid dew point, K, or null when the gas holds no SO3 or no water. */
  readonly acidDewPointK: number | null;
}

/**
 * Both dew points of a flue gas at total pressure `pressurePa` (partial pressure = mole fraction ×
 * total pressure). Example: 10 % H2O, 10 ppm SO3, 101 325 Pa → water 319.2 K, acid 410.45 K.
 */
export function flueGasDewPoints(composition: GasComposition, pressurePa: number): FlueGasDewPoints {
  const pH2O = composition.H2O * pressurePa;
  const pSO3 = composition.SO3 * pressurePa;
  return {
    waterDewPointK: waterDewPointK(pH2O),
    acidDewPointK: pSO3 > 0 && pH2O > 0 ? acidDewPointVerhoffBanchero(pH2O / PA_PER_MMHG, pSO3 / PA_PER_MMHG) : null,
  };
}
