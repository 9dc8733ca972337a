/**
 * Inside the flue: fully developed convection in a circular duct.
 *
 * Pure functions of dimensionless groups. Characteristic length: the inner diameter of the flue
 * (Re = ṁ D / (A μ) = 4 ṁ / (π D μ), Nu = h D / k). Gas properties at the BULK (mixing-cup)
 * temperature of the gas in the segment (docs/model.md "Flue side"); the caller supplies them.
 */

/**
 * Darcy friction factor of a smooth tube, Petukhov (1970) / Filonenko (1954):
 *
 *   f = (0.790 ln Re − 1.64)⁻²
 *
 * - Validity: 3000 ≤ Re ≤ 5·10⁶, smooth walls.
 * - Source: B. S. Petukhov, "Heat transfer and friction in turbulent pipe flow with variable
 *   physical properties", Advances in Heat Transfer 6 (1970) 503–564,
 *   doi:10.1016/S0065-2717(08)70153-9.
 * - Outside its range the formula is only an extrapolation: near Re = 7.98 the bracket vanishes;
 *   this function is not meant to be called below Re ≈ 2000 (the blended Nusselt function never
 *   does).
 *
 * Example: Re = 10⁴ → 0.790·9.2103 − 1.64 = 5.6362, f = 1/5.6362² = 0.031479.
 */
export function frictionFactorPetukhov(re: number): number {
  const bracket = 0.79 * Math.log(re) - 1.64;
  return 1 / (bracket * bracket);
}

/**
 * Average Nusselt number of fully developed turbulent and transitional flow in a smooth tube,
 * Gnielinski (1976):
 *
 *   Nu = (f/8)(Re − 1000) Pr / [1 + 12.7 (f/8)^½ (Pr^⅔ − 1)]
 *
 * with the Darcy friction factor f from `frictionFactorPetukhov` unless given.
 * - Validity: 3000 ≤ Re ≤ 5·10⁶, 0.5 ≤ Pr ≤ 2000; properties at the bulk temperature;
 *   entrance effects and property-ratio corrections are not included (tall flues: L/D ≫ 10).
 * - Source: V. Gnielinski, "New equations for heat and mass transfer in turbulent pipe and
 *   channel flow", Int. Chem. Eng. 16 (1976) 359–368.
 *
 * Example: Re = 10⁴, Pr = 0.7, f = 0.031479 → f/8 = 0.0039349, numerator = 0.0039349·9000·0.7 =
 * 24.790, Pr^⅔ − 1 = −0.21166, denominator = 1 + 12.7·0.062729·(−0.21166) = 0.83138,
 * Nu = 29.817.
 */
export function nuPipeGnielinski(re: number, pr: number, f: number = frictionFactorPetukhov(re)): number {
  const f8 = f / 8;
  return (f8 * (re - 1000) * pr) / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(pr, 2 / 3) - 1));
}

/**
 * Nusselt number of fully developed laminar flow in a circular tube at uniform wall temperature:
 * Nu = 3.66 (3.6568). Valid Re ≤ 2300, thermally fully developed. Source: Graetz problem
 * solution, e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, eq. 8.55.
 * A flue wall is closer to uniform temperature than to uniform flux (4.36) over one segment.
 */
export const NU_PIPE_LAMINAR_CONSTANT_WALL = 3.66;

/** Upper Reynolds number of laminar flow in the blend (Gnielinski 2013). */
export const RE_LAMINAR_LIMIT = 2300;
/** Lower Reynolds number of fully turbulent flow in the blend (Gnielinski 2013). */
export const RE_TURBULENT_LIMIT = 1e4;

/**
 * Nusselt number in a smooth tube over all Re ≥ 0: laminar, transition, turbulent.
 *
 *   Re ≤ 2300:          Nu = 3.66
 *   2300 < Re < 10⁴:    Nu = (1 − γ) · 3.66 + γ · Nu_Gnielinski(10⁴, Pr),
 *                       γ = (Re − 2300) / (10⁴ − 2300)
 *   Re ≥ 10⁴:           Nu = Nu_Gnielinski(Re, Pr)
 *
 * The linear interpolation in Re between the laminar value at 2300 and the turbulent value at 10⁴
 * is the transition recommendation of V. Gnielinski, "On heat transfer in tubes", Int. J. Heat
 * Mass Transfer 63 (2013) 134–140, doi:10.1016/j.ijheatmasstransfer.2013.04.015 (also VDI Heat
 * Atlas, 2nd ed., chapter G1; from memory). Gnielinski uses his developing-flow laminar value at
 * Re = 2300; here the fully developed 3.66 is used (a tall flue is long next to its diameter),
 * which keeps the blend continuous at both ends. The 10⁴ threshold follows that paper: Gnielinski
 * (1976) applied directly down to 2300 would jump from 3.66 to about 7.2 (Pr = 0.7) at 2300.
 *
 * - Continuous in Re (not smooth in slope at 2300 and 10⁴). Never NaN for Re ≥ 0, Pr > 0
 *   (a NaN input propagates as NaN rather than being hidden).
 * - Properties at the bulk temperature. Validity of the turbulent part: Re ≤ 5·10⁶,
 *   0.5 ≤ Pr ≤ 2000.
 *
 * Example: Re = 6150 (γ = 0.5), Pr = 0.7 → (3.66 + 29.817)/2 = 16.739.
 */
export function nuPipeBlended(re: number, pr: number): number {
  if (re <= RE_LAMINAR_LIMIT) return NU_PIPE_LAMINAR_CONSTANT_WALL;
  if (re >= RE_TURBULENT_LIMIT) return nuPipeGnielinski(re, pr);
  const gamma = (re - RE_LAMINAR_LIMIT) / (RE_TURBULENT_LIMIT - RE_LAMINAR_LIMIT);
  return (1 - gamma) * NU_PIPE_LAMINAR_CONSTANT_WALL + gamma * nuPipeGnielinski(RE_TURBULENT_LIMIT, pr);
}
