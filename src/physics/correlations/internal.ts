/**
 * Inside the flue: fully developed convection in a circular duct.
 *
 * Pure functions of dimensionless groups. Characteristic length: the inner diameter of the flue
 * (Re = ṁ D / (A μ) = 4 ṁ / (π D μ), Nu = h D / k). Gas properties at the BULK (mixing-cup)
 * temperature of the gas in the segment (docs/model.md "Flue side"); the caller supplies them.
 * Natural convection on the lining and its combination with the forced flow are at the end.
 */
import { STANDARD_GRAVITY } from '../constants.ts';
import { nuVerticalPlateChurchillChu } from './external.ts';

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

/** Gas properties at the film temperature (T_wall + T_gas)/2, SI (a `GasProperties` fits). */
export interface LiningFilmGas {
  /** Density, kg/m³. */
  readonly density: number;
  /** Thermal conductivity, W/(m K). */
  readonly conductivity: number;
  /** Dynamic viscosity, Pa s. */
  readonly dynamicViscosity: number;
  /** Prandtl number, –. */
  readonly prandtl: number;
}

/** Natural-convection film on the flue lining: coefficient and the groups behind it. */
export interface LiningNaturalConvection {
  /** Film coefficient, W/(m² K) (0 when wall and gas are at the same temperature). */
  readonly h: number;
  /** Rayleigh number on the height, g β |ΔT| L³ Pr / ν². */
  readonly rayleigh: number;
  /** Nusselt number on the height, h L / k (0 with no temperature difference). */
  readonly nusselt: number;
}

/**
 * Validity of {@link naturalConvectionLiningCoefficient} (Churchill–Chu vertical plate), for the
 * correlation table.
 */
export const LINING_NATURAL_CONVECTION_RANGE = {
  rayleigh: [0.1, 1e12],
  prandtl: [0, Infinity],
  source:
    'Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323–1329, doi:10.1016/0017-9310(75)90243-4; ' +
    'range 0.1 ≤ Ra_L ≤ 1e12 as quoted by Incropera & DeWitt (from memory)',
  extrapolation:
    'Above Ra_L = 1e12 (any lining taller than about 10 m at ΔT of tens of K): accepted in common practice. ' +
    'The turbulent branch of the correlation tends to Nu ∝ Ra^(1/3), which makes h independent of the height, ' +
    'the behaviour of turbulent free-convection data on tall plates; the value is flagged, not refused. ' +
    'Below 0.1: not reached by any flue.',
} as const;

/**
 * Natural-convection film coefficient of the flue lining, from the vertical-plate correlation of
 * Churchill & Chu (1975) ({@link nuVerticalPlateChurchillChu}) at the gas–wall temperature
 * difference:
 *
 *   Ra_L = g β |T_w − T_g| L³ Pr / ν²,  β = 1/T_f,  ν = μ/ρ,  T_f = (T_w + T_g)/2
 *   h = Nu_CC(Ra_L, Pr) k / L
 *
 * - Length L: the HEIGHT OF THE STACK (the lining height), not the segment's. The boundary layer
 *   grows along the whole continuous lining from the flue inlet, as on the outside surface
 *   (`outsideFilmCoefficient` uses the stack height for the same reason). The choice matters
 *   little: a lining of a few metres or more is turbulent (Ra_L > 1e9), where the correlation tends
 *   to Nu ∝ Ra^(1/3) and h to a value independent of L (60 m against a 5 m segment: 3.61 against
 *   3.80 W/(m² K) in the example below, 5 %).
 * - Properties at the film temperature (`gas`), β of an ideal gas. Sign of ΔT does not matter: a
 *   wall warmer than the gas drives an upward boundary layer, a colder one a downward layer.
 * - Equal temperatures: h = 0 exactly (no buoyancy; the forced value then stands alone).
 * - Not included: the confinement of the boundary layer by the duct (its thickness stays well
 *   below the radius of a flue of a metre or more), and variation of ΔT along the height (the
 *   local ΔT of the segment is used with the whole height, common practice).
 * - Range data: {@link LINING_NATURAL_CONVECTION_RANGE}. `nusseltOf` is the vertical-surface
 *   correlation (default Churchill–Chu); `out` may be a scratch object (no allocation).
 *
 * Example: wall 150 °C, gas 200 °C, L = 60 m, air at T_f = 448.15 K (Incropera Table A.4:
 * k = 0.037170, μ = 2.49938e-5, ρ = 0.787632 at 1 atm, Pr = 0.686355) → ν = 3.17328e-5,
 * Ra_L = 1.6108e14, Nu = 5822.8, h = 3.607 W/(m² K) — about ten times the 0.377 W/(m² K) of the
 * forced flow of 0.15 kg/s in a 1.4 m flue.
 */
export function naturalConvectionLiningCoefficient(
  wallTemperatureK: number,
  gasTemperatureK: number,
  height: number,
  gas: LiningFilmGas,
  nusseltOf: (ra: number, pr: number) => number = nuVerticalPlateChurchillChu,
  out: { h: number; rayleigh: number; nusselt: number } = { h: 0, rayleigh: 0, nusselt: 0 },
): LiningNaturalConvection {
  const deltaT = Math.abs(wallTemperatureK - gasTemperatureK);
  if (deltaT === 0) {
    out.h = 0;
    out.rayleigh = 0;
    out.nusselt = 0;
    return out;
  }
  const filmK = 0.5 * (wallTemperatureK + gasTemperatureK);
  const nu = gas.dynamicViscosity / gas.density;
  const rayleigh = (STANDARD_GRAVITY * deltaT * height * height * height * gas.prandtl) / (filmK * nu * nu);
  const nusselt = nusseltOf(rayleigh, gas.prandtl);
  out.h = (nusselt * gas.conductivity) / height;
  out.rayleigh = rayleigh;
  out.nusselt = nusselt;
  return out;
}

/**
 * Whether buoyancy at the lining AIDS the upward flue flow: true when the wall is warmer than the
 * gas (the heated boundary layer rises with the flow, e.g. a warm lining at idle), false when the
 * gas is warmer (the cooled layer sinks against the flow, e.g. under firing).
 */
export function isBuoyancyAidingUpwardFlow(wallTemperatureK: number, gasTemperatureK: number): boolean {
  return wallTemperatureK > gasTemperatureK;
}

/**
 * Validity and stance of {@link mixedConvectionChurchill}, for the correlation table.
 */
export const MIXED_CONVECTION_RANGE = {
  forced: [0, Infinity],
  natural: [0, Infinity],
  source:
    'Churchill, AIChE J. 23 (1977) 10–16 (aiding flow, exponent 3); minus sign for opposing flow as in ' +
    'Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, section 9.9 (from memory)',
  extrapolation:
    'Aiding flow: accepted over the whole range (the form is an interpolation between two limits). ' +
    'Opposing flow: the minus sign is the textbook rule for laminar boundary layers; it falls to 0 where ' +
    'the two parts are equal, whereas measured heat transfer passes through a finite minimum (separation), ' +
    'and in TURBULENT pipe flow opposing buoyancy raises heat transfer rather than lowering it (Jackson, ' +
    'Cotton & Axcell, Int. J. Heat Fluid Flow 10 (1989) 2–15, from memory). Flag opposing flow with ' +
    'turbulent forced flow (Re > 2300) as outside the rule.',
} as const;

/**
 * Mixed forced and natural convection, Churchill's combination with the sign of the buoyancy:
 *
 *   aiding:    X = (X_F³ + X_N³)^(1/3)
 *   opposing:  X = |X_F³ − X_N³|^(1/3)
 *
 * X is a Nusselt number on a common length or a film coefficient (combine film coefficients when
 * the two lengths differ, as here: the forced flow's diameter and the lining's height).
 * - Aiding: never below the larger part; equals the other part exactly when one is 0.
 * - Opposing: below the larger part by construction; the absolute value makes the weaker
 *   mechanism reduce the stronger whichever it is; never negative, never NaN for finite inputs
 *   ≥ 0. It reaches 0 where the parts are equal, which real flows do not (see
 *   {@link MIXED_CONVECTION_RANGE}): the caller decides whether to accept that near-cancellation
 *   or to floor it.
 * - Source: S. W. Churchill, "A comprehensive correlating equation for laminar, assisting, forced
 *   and free convection", AIChE J. 23 (1977) 10–16, doi:10.1002/aic.690230103 (aiding form,
 *   exponent 3); opposing form as in Incropera & DeWitt §9.9 (from memory).
 *
 * Example (1.4 m flue, gas 200 °C, lining 150 °C, h_N = 3.607 W/(m² K)): idle 0.15 kg/s,
 * h_F = 0.377 → aiding 3.608, opposing 3.606; full fire 3.2 kg/s, h_F = 5.347 → aiding 5.846,
 * opposing 4.732 W/(m² K).
 */
export function mixedConvectionChurchill(forced: number, natural: number, aiding: boolean): number {
  if (natural === 0) return forced;
  if (forced === 0) return natural;
  // Scaled by the larger part so that cubes neither underflow nor overflow.
  const larger = Math.max(forced, natural);
  const r = Math.min(forced, natural) / larger;
  const r3 = r * r * r;
  return larger * Math.cbrt(aiding ? 1 + r3 : 1 - r3);
}
