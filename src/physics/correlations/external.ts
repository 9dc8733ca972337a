/**
 * Outside surface of the stack: forced convection in cross flow, natural convection on the
 * vertical surface, their combination, and the film coefficient of one segment.
 *
 * Pure functions of dimensionless groups. The caller supplies air properties evaluated at the
 * FILM temperature T_f = (T_s + T_air)/2 (docs/model.md, "Outside"); nothing here looks properties up.
 */

import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Average Nusselt number of a circular cylinder in cross flow, Churchill & Bernstein (1977),
 * full form:
 *
 *   Nu_D = 0.3 + 0.62 Re^½ Pr^⅓ / [1 + (0.4/Pr)^⅔]^¼ · [1 + (Re/282000)^(5/8)]^(4/5)
 *
 * - Characteristic length: outer diameter D (Re = U D / ν, Nu = h D / k).
 * - Properties at the film temperature.
 * - Validity: Re·Pr > 0.2, all Re of practical interest (the authors' data reach Re ≈ 10⁷).
 * - Limits: Re = 0 gives 0.3 (the correlation's floor); never NaN for Re ≥ 0, Pr > 0.
 * - Source: S. W. Churchill, M. Bernstein, "A correlating equation for forced convection from
 *   gases and liquids to a circular cylinder in crossflow", J. Heat Transfer 99 (1977) 300–306,
 *   doi:10.1115/1.3450685.
 *
 * Worked example (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed.,
 * Example 7.4, from memory): air at T_f = 350 K, Pr = 0.700, Re = 6071 → Nu_D ≈ 40.6.
 */
export function nuCylinderChurchillBernstein(re: number, pr: number): number {
  // Rational powers as roots and products (hot path; equal to Math.pow within a few ulp):
  // x^(2/3) = cbrt(x)², y^(1/4) = √√y, x^(5/8) = √x · x^(1/8).
  const c = Math.cbrt(0.4 / pr);
  const laminarPart = (0.62 * Math.sqrt(re) * Math.cbrt(pr)) / Math.sqrt(Math.sqrt(1 + c * c));
  const x = re / 282000;
  const rootX = Math.sqrt(x);
  const turbulentFactor = Math.pow(1 + rootX * Math.sqrt(Math.sqrt(rootX)), 4 / 5);
  return 0.3 + laminarPart * turbulentFactor;
}

/**
 * Average Nusselt number of an isothermal vertical plate in natural convection, Churchill & Chu
 * (1975), the correlation for the whole range of Ra (their eq. for laminar and turbulent flow):
 *
 *   Nu_L = { 0.825 + 0.387 Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27) }²
 *
 * - Characteristic length: the vertical height L (Ra_L = g β |ΔT| L³ / (ν α), Nu = h L / k).
 * - Properties at the film temperature.
 * - Validity: 10⁻¹ ≤ Ra_L ≤ 10¹² (Incropera, from memory); all Pr. Tall stacks exceed 10¹²:
 *   the value is then an extrapolation (flagged by the correlation table).
 * - Limits: Ra = 0 gives 0.825² = 0.680625 (the correlation's floor); never NaN for Ra ≥ 0.
 * - Source: S. W. Churchill, H. H. S. Chu, "Correlating equations for laminar and turbulent free
 *   convection from a vertical plate", Int. J. Heat Mass Transfer 18 (1975) 1323–1329,
 *   doi:10.1016/0017-9310(75)90243-4.
 *
 * Worked example (Incropera & DeWitt, 6th ed., Example 9.2, from memory): Ra_L = 1.813·10⁹,
 * Pr = 0.690 → Nu_L ≈ 147.
 */
export function nuVerticalPlateChurchillChu(ra: number, pr: number): number {
  // Rational powers as roots and products (hot path; equal to Math.pow within a few ulp):
  // x^(9/16) = √x · x^(1/16), y^(8/27) = (y^(1/27))⁸, Ra^(1/6) = √∛Ra.
  const x = 0.492 / pr;
  const x16 = Math.sqrt(Math.sqrt(Math.sqrt(Math.sqrt(x))));
  const y27 = Math.cbrt(Math.cbrt(Math.cbrt(1 + Math.sqrt(x) * x16)));
  const y2 = y27 * y27;
  const y4 = y2 * y2;
  const prandtlFunction = y4 * y4;
  const root = 0.825 + (0.387 * Math.sqrt(Math.cbrt(ra))) / prandtlFunction;
  return root * root;
}

/**
 * Whether a vertical cylinder is too slender to be treated as a vertical plate.
 *
 * The plate result applies when the boundary layer is thin next to the diameter:
 *   D / L ≥ 35 / Gr_L^(1/4)
 * (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, section 9.6.1, citing T. Cebeci,
 * "Laminar-free-convective-heat transfer from the outer surface of a vertical slender circular
 * cylinder", Proc. 5th Int. Heat Transfer Conf., Tokyo, 1974, paper NC1.4; from memory).
 * Returns `true` when the criterion FAILS, i.e. the cylinder is slender and the plate value
 * underestimates the heat transfer. With Gr_L = 0 the criterion cannot be met: returns `true`.
 *
 * Units: diameter and height in m; grashofHeight = g β |ΔT| L³ / ν², based on the height.
 * Example: D = 2 m, L = 50 m, Gr_L = 10¹⁴ → 35/10^3.5 = 0.0111 ≤ 0.04: not slender.
 */
export function isSlenderVerticalCylinder(
  diameter: number,
  height: number,
  grashofHeight: number,
): boolean {
  return diameter / height < 35 / Math.sqrt(Math.sqrt(grashofHeight));
}

/**
 * Correction factor Nu_cylinder / Nu_plate for a slender vertical cylinder in LAMINAR natural
 * convection, Popiel, Wojtkowiak & Bober (2007):
 *
 *   Nu / Nu_plate = 1 + B [32^0.5 Gr_L^(−1/4) L/D]^C
 *   B = 0.0571322 + 0.20305 Pr^(−0.43)
 *   C = 0.9165 − 0.0043 Pr^0.5 + 0.01333 ln Pr + 0.0004809 / Pr
 *
 * - Validity: laminar flow (Ra_L up to about 10⁹), 0.01 ≤ Pr ≤ 100, isothermal cylinder.
 *   Not applicable to turbulent boundary layers, so `outsideFilmCoefficient` applies it only for
 *   Ra_L ≤ 10⁹ and otherwise keeps the plate value with the `slender` flag set.
 * - Source: C. O. Popiel, J. Wojtkowiak, K. Bober, "Laminar free convective heat transfer from
 *   isothermal vertical slender cylinder", Exp. Thermal Fluid Sci. 32 (2007) 607–613,
 *   doi:10.1016/j.expthermflusci.2007.07.003; reviewed in C. O. Popiel, Heat Transfer Eng. 29
 *   (2008) 521–536. Coefficients as given in the CalebBell/ht library documentation, which
 *   notes that the 2008 review misprints 32^0.5 as 32²; not checked against the paper here.
 *
 * Example: Pr = 0.7, Gr_L = 10⁸, L/D = 100 → B = 0.29384, C = 0.90883,
 * x = 5.6569·0.01·100 = 5.6569, factor = 1 + 0.29384·5.6569^0.90883 ≈ 2.419.
 */
export function slenderCylinderFactorPopiel(
  grashofHeight: number,
  pr: number,
  height: number,
  diameter: number,
): number {
  const b = 0.0571322 + 0.20305 * Math.pow(pr, -0.43);
  const c = 0.9165 - 0.0043 * Math.sqrt(pr) + 0.01333 * Math.log(pr) + 0.0004809 / pr;
  const x = (Math.sqrt(32) * height) / (Math.sqrt(Math.sqrt(grashofHeight)) * diameter);
  return 1 + b * Math.pow(x, c);
}

/**
 * Mixed forced and natural convection, Churchill's combination:
 *
 *   Nu = (Nu_F^n + Nu_N^n)^(1/n),   n = 3 by default
 *
 * Both Nusselt numbers must be on the SAME characteristic length (combine film coefficients
 * h = Nu k / L when the lengths differ, as `outsideFilmCoefficient` does).
 * Source: S. W. Churchill, "A comprehensive correlating equation for laminar, assisting, forced
 * and free convection", AIChE J. 23 (1977) 10–16; n = 3 for transverse/assisting flow is common
 * practice. Returns the other value exactly when one is 0. Example: Nu_F = 3, Nu_N = 4, n = 3 → (27 + 64)^(1/3) = 91^(1/3) ≈ 4.498.
 */
export function nuMixedChurchill(nuForced: number, nuNatural: number, exponent = 3): number {
  // Exact when one mechanism is absent (avoids the round-off of (x^n)^(1/n)).
  if (nuNatural === 0) return nuForced;
  if (nuForced === 0) return nuNatural;
  // n = 3 (the default and the hot path): cubes and a cube root instead of Math.pow.
  if (exponent === 3) return Math.cbrt(nuForced * nuForced * nuForced + nuNatural * nuNatural * nuNatural);
  return Math.pow(Math.pow(nuForced, exponent) + Math.pow(nuNatural, exponent), 1 / exponent);
}

/** Air properties at the film temperature, SI. */
export interface FilmAirProperties {
  /** Thermal conductivity k, W/(m K). */
  readonly conductivity: number;
  /** Kinematic viscosity ν, m²/s. */
  readonly kinematicViscosity: number;
  /** Prandtl number, –. */
  readonly prandtl: number;
  /** Volumetric expansion coefficient β, 1/K (1/T_f for an ideal gas). */
  readonly expansion: number;
}

export interface OutsideFilmInput {
  /** Wind speed at the segment's height, m/s (≥ 0). */
  readonly windSpeed: number;
  /** Outer diameter of the stack, m (length scale of forced convection). */
  readonly outerDiameter: number;
  /** Height of the stack, m (vertical length scale of natural convection). */
  readonly height: number;
  /** Outer surface temperature, K. */
  readonly surfaceTemperatureK: number;
  /** Ambient air temperature, K. */
  readonly airTemperatureK: number;
}

export interface OutsideFilmResult {
  /** Combined film coefficient, W/(m² K). */
  readonly h: number;
  /** Forced-convection Nusselt number on the outer diameter (0 with no wind). */
  readonly nuForced: number;
  /** Natural-convection Nusselt number on the stack height (0 with no temperature difference). */
  readonly nuNatural: number;
  /** Combined Nusselt number, on the outer diameter: h D / k. */
  readonly nuMixed: number;
  /** Reynolds number on the outer diameter. */
  readonly re: number;
  /** Rayleigh number on the stack height (with |T_s − T_air|). */
  readonly ra: number;
  /** Grashof number on the stack height. */
  readonly grashof: number;
  /** Forced-convection film coefficient, W/(m² K). */
  readonly hForced: number;
  /** Natural-convection film coefficient, W/(m² K). */
  readonly hNatural: number;
  /** True when the slender-cylinder criterion fails (see `isSlenderVerticalCylinder`). */
  readonly slender: boolean;
  /** True when the Popiel slender-cylinder correction was applied (slender and Ra_L ≤ 10⁹). */
  readonly slenderCorrected: boolean;
}

/**
 * The four correlations `outsideFilmCoefficient` combines, as plain functions: the model passes the
 * ones it selected by name from the correlation registry; the default is this module's own.
 */
export interface OutsideFilmCorrelations {
  /** Nu_D of a cylinder in cross flow from (Re, Pr). */
  readonly forced: (re: number, pr: number) => number;
  /** Nu_L of a vertical surface from (Ra_L, Pr). */
  readonly natural: (ra: number, pr: number) => number;
  /** Slender-cylinder factor Nu_cyl/Nu_plate from (Gr_L, Pr, L, D). */
  readonly slender: (grashofHeight: number, pr: number, height: number, diameter: number) => number;
  /** Combination of forced and natural (on a common basis). */
  readonly mixed: (forced: number, natural: number) => number;
}

/** This module's correlations: Churchill–Bernstein, Churchill–Chu, Popiel, Churchill's n = 3 mix. */
export const DEFAULT_OUTSIDE_FILM_CORRELATIONS: OutsideFilmCorrelations = {
  forced: nuCylinderChurchillBernstein,
  natural: nuVerticalPlateChurchillChu,
  slender: slenderCylinderFactorPopiel,
  mixed: (a, b) => nuMixedChurchill(a, b, 3),
};

/** Upper Ra_L of the laminar range in which the Popiel slender-cylinder factor is applied. */
export const POPIEL_MAX_RAYLEIGH = 1e9;

/**
 * Outside film coefficient of one segment. `air` holds the air properties at the film
 * temperature (surfaceTemperatureK + airTemperatureK)/2 (extra fields are ignored).
 *
 *   Re = U D / ν,  Gr_H = g β |T_s − T_air| H³ / ν²,  Ra_H = Gr_H Pr
 *   h_F = Nu_CB(Re, Pr) k / D,  h_N = Nu_CC(Ra_H, Pr) k / H  (× Popiel factor if slender, laminar)
 *   h = (h_F³ + h_N³)^(1/3)     (Churchill's combination on a common basis)
 *
 * - Properties at the film temperature (caller's job). Natural convection uses the whole stack
 *   height as its length: an average over the height, applied to every segment (common practice).
 * - Zero wind: no forced contribution, h = h_N exactly (the 0.3 floor of Churchill–Bernstein is
 *   not added; it would change h by less than 0.3 k/D). Equal temperatures: no natural
 *   contribution, h = h_F exactly. Both zero: the correlations' floors are combined,
 *   h = ((0.3 k/D)³ + (0.680625 k/H)³)^(1/3), a small positive diffusive limit (never NaN, never 0).
 * - Surfaces colder than the air (ΔT < 0) use |ΔT|: the boundary layer flows downward instead.
 *
 * Example: U = 0, D = 2 m, H = 50 m, T_s = 310 K, T_air = 290 K, air at 300 K
 * (k = 0.0263, ν = 15.89e-6, Pr = 0.707, β = 1/300) → Gr_H ≈ 3.24·10¹⁴, Nu_N ≈ 6566,
 * h ≈ 3.45 W/(m² K).
 */
export function outsideFilmCoefficient(
  input: OutsideFilmInput,
  air: FilmAirProperties,
  correlations: OutsideFilmCorrelations = DEFAULT_OUTSIDE_FILM_CORRELATIONS,
): OutsideFilmResult {
  return outsideFilmCoefficientInto(input.windSpeed, input.outerDiameter, input.height, input.surfaceTemperatureK, input.airTemperatureK, air, correlations, {
    h: 0, nuForced: 0, nuNatural: 0, nuMixed: 0, re: 0, ra: 0, grashof: 0, hForced: 0, hNatural: 0, slender: false, slenderCorrected: false,
  });
}

/** `outsideFilmCoefficient` with scalar inputs, writing into `out` (no allocation: the model's hot path). */
export function outsideFilmCoefficientInto(
  windSpeed: number,
  outerDiameter: number,
  stackHeight: number,
  surfaceTemperatureK: number,
  airTemperatureK: number,
  air: FilmAirProperties,
  correlations: OutsideFilmCorrelations,
  out: { -readonly [K in keyof OutsideFilmResult]: OutsideFilmResult[K] },
): OutsideFilmResult {
  const deltaT = Math.abs(surfaceTemperatureK - airTemperatureK);
  const nu = air.kinematicViscosity;
  const re = (Math.abs(windSpeed) * outerDiameter) / nu;
  const grashof = (STANDARD_GRAVITY * air.expansion * deltaT * stackHeight * stackHeight * stackHeight) / (nu * nu);
  const ra = grashof * air.prandtl;

  const hasWind = re > 0;
  const hasBuoyancy = ra > 0;

  const nuForced = hasWind ? correlations.forced(re, air.prandtl) : 0;
  const slender = isSlenderVerticalCylinder(outerDiameter, stackHeight, grashof);
  const slenderCorrected = hasBuoyancy && slender && ra <= POPIEL_MAX_RAYLEIGH;
  let nuNatural = 0;
  if (hasBuoyancy) {
    nuNatural = correlations.natural(ra, air.prandtl);
    if (slenderCorrected) {
      nuNatural *= correlations.slender(grashof, air.prandtl, stackHeight, outerDiameter);
    }
  }

  let hForced = (nuForced * air.conductivity) / outerDiameter;
  let hNatural = (nuNatural * air.conductivity) / stackHeight;
  if (!hasWind && !hasBuoyancy) {
    hForced = (correlations.forced(0, air.prandtl) * air.conductivity) / outerDiameter;
    hNatural = (correlations.natural(0, air.prandtl) * air.conductivity) / stackHeight;
  }
  const h = correlations.mixed(hForced, hNatural);
  out.h = h;
  out.nuForced = nuForced;
  out.nuNatural = nuNatural;
  out.nuMixed = (h * outerDiameter) / air.conductivity;
  out.re = re;
  out.ra = ra;
  out.grashof = grashof;
  out.hForced = hForced;
  out.hNatural = hNatural;
  out.slender = slender;
  out.slenderCorrected = slenderCorrected;
  return out;
}
