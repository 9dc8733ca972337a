/**
 * Thermal radiation: the sky and the ground seen by the outer surface, and the exchange across
 * an air gap between two concentric cylindrical surfaces. SI units, temperatures in kelvin,
 * grey diffuse surfaces.
 */

import { KELVIN_OFFSET, STEFAN_BOLTZMANN } from '../constants.ts';

/**
 * Clear-sky effective temperature, Swinbank (1963):
 *
 *   T_sky = 0.0552 T_air^1.5      (T in K)
 *
 * - Validity: clear skies, screen-level air temperature roughly 260–310 K (the data were taken
 *   in Australia and over the Indian Ocean; common practice to use it more widely).
 * - Source: W. C. Swinbank, "Long-wave radiation from clear skies", Q. J. R. Meteorol. Soc. 89
 *   (1963) 339–348, doi:10.1002/qj.49708938105.
 *
 * Example: T_air = 293.15 K → 293.15^1.5 = 5019.2, T_sky = 0.0552·5019.2 = 277.06 K.
 */
export function skyTemperatureSwinbank(airTemperatureK: number): number {
  return 0.0552 * Math.pow(airTemperatureK, 1.5);
}

export interface BerdahlMartinOptions {
  /**
   * Local hour of the day (0–24, from midnight) for the diurnal term Δε = 0.013 cos(2π t/24)
   * (Berdahl & Martin 1984, from memory). Omitted: no diurnal term (the daily mean).
   */
  readonly hourOfDay?: number;
  /**
   * Station pressure, Pa, for the altitude term Δε = 0.00012 (P_hPa − 1000)
   * (Berdahl & Martin 1984, from memory). Omitted: no pressure term.
   */
  readonly pressurePa?: number;
}

/**
 * Clear-sky emissivity from the dew point, Berdahl & Martin (1984):
 *
 *   ε_clear = 0.711 + 0.56 (T_dp/100) + 0.73 (T_dp/100)²     (T_dp in °C)
 *
 * with optional diurnal (+0.013 cos(2π t/24), t in hours from midnight) and pressure
 * (+0.00012 (P − 1000), P in hPa) terms (both from memory).
 * - Validity: clear skies, dew points about −20 °C to +30 °C (US stations).
 * - Source: P. Berdahl, M. Martin, "Emissivity of clear skies", Solar Energy 32 (1984) 663–664,
 *   doi:10.1016/0038-092X(84)90144-0.
 *
 * Example: T_dp = 10 °C (283.15 K) → 0.711 + 0.056 + 0.0073 = 0.7743.
 */
export function skyEmissivityBerdahlMartin(
  dewPointK: number,
  options: BerdahlMartinOptions = {},
): number {
  const x = (dewPointK - KELVIN_OFFSET) / 100;
  let eps = 0.711 + 0.56 * x + 0.73 * x * x;
  if (options.hourOfDay !== undefined) {
    eps += 0.013 * Math.cos((2 * Math.PI * options.hourOfDay) / 24);
  }
  if (options.pressurePa !== undefined) {
    eps += 0.00012 * (options.pressurePa / 100 - 1000);
  }
  return eps;
}

/**
 * Cloudy-sky emissivity, correction of Clark & Allen (1978) as quoted in Duffie & Beckman,
 * Solar Engineering of Thermal Processes:
 *
 *   ε = ε_clear (1 + 0.0224 N − 0.0035 N² + 0.00028 N³),   N = cloud cover in tenths (0–10)
 *
 * - Input `cloudCover` is the fraction 0–1 (glossary); N = 10·cloudCover. Values outside 0–1 are
 *   clamped. The result is capped at 1 (a sky cannot emit more than a black body at air
 *   temperature in this model).
 * - Source: G. Clark, C. P. Allen, "The estimation of atmospheric radiation for clear and cloudy
 *   skies", Proc. 2nd National Passive Solar Conference, Philadelphia (1978) 675–678 (from memory).
 *
 * Example: ε_clear = 0.75, overcast (N = 10): 1 + 0.224 − 0.35 + 0.28 = 1.154 → ε = 0.8655.
 */
export function skyEmissivityCloudClarkAllen(clearEmissivity: number, cloudCover: number): number {
  const n = 10 * Math.min(1, Math.max(0, cloudCover));
  const factor = 1 + 0.0224 * n - 0.0035 * n * n + 0.00028 * n * n * n;
  return Math.min(1, clearEmissivity * factor);
}

/**
 * The cloud correction stackday uses by default: `skyEmissivityCloudClarkAllen`
 * (ε_clear, cloudCover 0–1) → ε_cloudy.
 */
export const skyEmissivityCloudCorrection = skyEmissivityCloudClarkAllen;

/**
 * Effective sky temperature from a sky emissivity: the black-body temperature that emits
 * ε_sky σ T_air⁴.   T_sky = ε^(1/4) T_air   (K).  Definition (e.g. Duffie & Beckman).
 * Example: ε = 0.8, T_air = 290 K → 0.8^0.25 = 0.94574, T_sky = 274.26 K.
 */
export function skyTemperatureFromEmissivity(eps: number, airTemperatureK: number): number {
  return Math.pow(eps, 0.25) * airTemperatureK;
}

/**
 * Net long-wave radiation LEAVING a vertical grey surface that sees half sky and half ground
 * (view factor ½ each, docs/model.md "Outside"), W per m² of surface:
 *
 *   q = ε σ [ ½ (T_s⁴ − T_sky⁴) + ½ (T_s⁴ − T_ground⁴) ]
 *
 * Positive when the surface loses heat. Source: grey-body exchange with large surroundings
 * (e.g. Incropera & DeWitt, eq. 1.7) with the view factors of a vertical surface.
 * Example: T_s = 300 K, ε = 0.9, T_sky = 280 K, T_ground = 300 K →
 * 0.9·5.670374419e-8·½·(8.1e9 − 6.14656e9) = 49.845 W/m².
 */
export function radiationToSkyAndGround(
  surfaceK: number,
  emissivity: number,
  skyK: number,
  groundK: number,
): number {
  // fourth powers as products (hot path)
  const ts2 = surfaceK * surfaceK;
  const sky2 = skyK * skyK;
  const ground2 = groundK * groundK;
  const ts4 = ts2 * ts2;
  return emissivity * STEFAN_BOLTZMANN * (0.5 * (ts4 - sky2 * sky2) + 0.5 * (ts4 - ground2 * ground2));
}

/**
 * ∂q/∂T_s of `radiationToSkyAndGround`, W/(m² K): 4 ε σ T_s³ (sky and ground fixed).
 * For Jacobians. Example: T_s = 300 K, ε = 0.9 → 4·0.9·5.670374419e-8·2.7e7 = 5.5116 W/(m² K).
 */
export function radiationCoefficientToSkyAndGround(surfaceK: number, emissivity: number): number {
  return 4 * emissivity * STEFAN_BOLTZMANN * surfaceK * surfaceK * surfaceK;
}

/** Denominator 1/ε1 + (r1/r2)(1/ε2 − 1) of the grey exchange between concentric cylinders. */
function concentricCylinderResistance(
  epsInner: number,
  epsOuter: number,
  rInner: number,
  rOuter: number,
): number {
  return 1 / epsInner + (rInner / rOuter) * (1 / epsOuter - 1);
}

/**
 * Net radiation from the inner to the outer of two long concentric grey diffuse cylinders,
 * W per m² of the INNER surface:
 *
 *   q₁ = σ (T₁⁴ − T₂⁴) / [1/ε₁ + (r₁/r₂)(1/ε₂ − 1)]
 *
 * Source: e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table 13.3 (long
 * concentric cylinders). Multiply by 2π r₁ for W per m of height.
 * Example: T₁ = 400 K, T₂ = 300 K, ε₁ = ε₂ = 0.8, r₁ = 1, r₂ = 1.1 →
 * denominator = 1.25 + 0.90909·0.25 = 1.47727, q₁ = 5.670374419e-8·1.75e10/1.47727 = 671.72 W/m².
 */
export function radiationConcentricCylinders(
  innerK: number,
  outerK: number,
  epsInner: number,
  epsOuter: number,
  rInner: number,
  rOuter: number,
): number {
  return (
    (STEFAN_BOLTZMANN * (innerK ** 4 - outerK ** 4)) /
    concentricCylinderResistance(epsInner, epsOuter, rInner, rOuter)
  );
}

/**
 * Linearized (secant) radiation coefficient between concentric cylinders, W/(m² K) of the inner
 * surface, such that q₁ = h_r (T₁ − T₂) exactly:
 *
 *   h_r = σ (T₁² + T₂²)(T₁ + T₂) / [1/ε₁ + (r₁/r₂)(1/ε₂ − 1)]
 *
 * Stays finite at T₁ = T₂ (then h_r = 4σT³/denominator). docs/model.md "Wall".
 * Example (as above): 5.670374419e-8·250000·700/1.47727 = 6.7172 W/(m² K).
 */
export function radiationCoefficientConcentricCylinders(
  innerK: number,
  outerK: number,
  epsInner: number,
  epsOuter: number,
  rInner: number,
  rOuter: number,
): number {
  return (
    (STEFAN_BOLTZMANN * (innerK * innerK + outerK * outerK) * (innerK + outerK)) /
    concentricCylinderResistance(epsInner, epsOuter, rInner, rOuter)
  );
}
