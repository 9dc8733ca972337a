/**
 * Natural convection inside closed gaps: the annular air gap between two concentric cylinders.
 * Pure functions; the caller supplies the gas properties at the mean gap temperature
 * (T_inner + T_outer)/2.
 */

/** Half the difference of the diameters: the gap width L = (D_o − D_i)/2, m. */
function gapWidth(innerDiameter: number, outerDiameter: number): number {
  return (outerDiameter - innerDiameter) / 2;
}

/**
 * Raithby–Hollands modified Rayleigh number of a concentric-cylinder annulus:
 *
 *   Ra_c = [ln(D_o/D_i)]⁴ Ra_L / (L³ (D_i^(−3/5) + D_o^(−3/5))⁵),   L = (D_o − D_i)/2
 *
 * Ra_L = g β (T_i − T_o) L³ / (ν α) on the gap width. Diameters in m, D_o > D_i.
 * Source: as `effectiveConductivityRatioAnnulusRaithbyHollands`.
 */
export function rayleighAnnulusRaithbyHollands(
  innerDiameter: number,
  outerDiameter: number,
  rayleighGap: number,
): number {
  const l = gapWidth(innerDiameter, outerDiameter);
  const lnRatio = Math.log(outerDiameter / innerDiameter);
  const shape = Math.pow(Math.pow(innerDiameter, -0.6) + Math.pow(outerDiameter, -0.6), 5);
  return (lnRatio ** 4 * rayleighGap) / (l ** 3 * shape);
}

/**
 * Effective conductivity ratio k_eff/k of the gas in the annulus between two long concentric
 * cylinders, Raithby & Hollands (1975):
 *
 *   k_eff/k = max(1, 0.386 (Pr/(0.861 + Pr))^(1/4) Ra_c^(1/4))
 *
 * with Ra_c from `rayleighAnnulusRaithbyHollands`. The heat flow per unit length is then
 * q' = 2π k_eff (T_i − T_o) / ln(D_o/D_i): the gap is treated as a conducting layer.
 * - The max(1, …) enforces pure conduction below the onset of convection (Ra_c ≲ 100).
 * - Caution: the correlation was derived for HORIZONTAL annuli. docs/model.md ("Wall") applies it to
 *   the vertical annular gap of a stack; a tall vertical annulus behaves more like a vertical
 *   slot, so treat the result as an estimate (common practice when no better data exist).
 * - Validity of the convective branch: 10² ≤ Ra_c ≤ 10⁷ (Incropera & DeWitt, section 9.8, from
 *   memory); 0.7 ≤ Pr ≤ 6000 (from memory). Properties at the mean gap temperature. The sign of
 *   Ra_L does not matter (|ΔT| is the driver); negative Ra is treated as its magnitude.
 * - Source: G. D. Raithby, K. G. T. Hollands, "A general method of obtaining approximate
 *   solutions to laminar and turbulent free convection problems", Advances in Heat Transfer 11
 *   (1975) 265–315, doi:10.1016/S0065-2717(08)70076-5; as given in Incropera & DeWitt,
 *   Fundamentals of Heat and Mass Transfer, eqs. 9.58–9.60.
 *
 * Example: D_i = 1.0 m, D_o = 1.1 m (L = 0.05 m), Ra_L = 10⁶, Pr = 0.7 →
 * ln 1.1 = 0.0953102, ⁴ = 8.25196e-5; D_i^−0.6 = 1, D_o^−0.6 = 0.944418, sum⁵ = 27.795;
 * Ra_c = 8.25196e-5·10⁶/(1.25e-4·27.795) = 2.3751e4; Ra_c^¼ = 12.414;
 * (0.7/1.561)^¼ = 0.818321; k_eff/k = 0.386·0.818321·12.414 = 3.921.
 */
export function effectiveConductivityRatioAnnulusRaithbyHollands(
  innerDiameter: number,
  outerDiameter: number,
  rayleighGap: number,
  pr: number,
): number {
  const raC = rayleighAnnulusRaithbyHollands(innerDiameter, outerDiameter, Math.abs(rayleighGap));
  const convective = 0.386 * Math.pow(pr / (0.861 + pr), 0.25) * Math.pow(raC, 0.25);
  return Math.max(1, convective);
}
