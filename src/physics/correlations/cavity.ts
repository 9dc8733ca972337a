/**
 * Natural convection across a tall VERTICAL air gap (a vertical slot or cavity): one face warmer
 * than the other, both vertical, closed at top and bottom. The annular gap of a stack is such a
 * slot when its width is small next to its radius (curvature ignored).
 *
 * Pure functions of dimensionless groups on the GAP WIDTH L:
 *   Ra_L = g β |T₁ − T₂| L³ / (ν α),  A = H / L (aspect ratio, height over width),
 *   q = Nu k (T₁ − T₂) / L,  i.e. the gap conducts like a layer of conductivity k_eff = Nu · k.
 * Properties at the mean gap temperature (T₁ + T₂)/2; the caller supplies them.
 * Height H: the height of the gap over which the cell circulates. In the model this is the
 * segment height (the brief for this module), which gives a smaller A, hence a slightly larger
 * Nu₃ below, than the whole stack height would.
 */

/** Published validity of {@link nuVerticalCavityElSherbiny}, with the extrapolation stance. */
export const VERTICAL_CAVITY_ELSHERBINY_RANGE = {
  rayleigh: [1e2, 2e7],
  aspectRatio: [5, 110],
  prandtl: [0.7, 0.72],
  source:
    'S. M. ElSherbiny, G. D. Raithby, K. G. T. Hollands, "Heat transfer by natural convection across vertical ' +
    'and inclined air layers", J. Heat Transfer 104 (1982) 96–102, doi:10.1115/1.3245075 (vertical-layer ' +
    'equations and ranges from memory)',
  extrapolation:
    'Aspect ratio above 110: accepted with a flag. The A-dependent term Nu₃ only falls with A, and the ' +
    'A-independent terms Nu₁ (boundary-layer regime) and Nu₂ (conduction/transition) then govern, as expected ' +
    'for very tall slots. Ra below 1e2: accepted (Nu → 1, pure conduction, exact). Ra above 2e7: flagged; the ' +
    'Ra^(1/3) term keeps the turbulent scaling. Prandtl: measured with air only; other gases are outside.',
} as const;

/**
 * Nusselt number across a vertical air layer, ElSherbiny, Raithby & Hollands (1982), their
 * equations for the vertical layer (tilt 90°):
 *
 *   Nu = max(Nu₁, Nu₂, Nu₃)
 *   Nu₁ = 0.0605 Ra^(1/3)
 *   Nu₂ = { 1 + [0.104 Ra^0.293 / (1 + (6310/Ra)^1.36)]³ }^(1/3)
 *   Nu₃ = 0.242 (Ra/A)^0.273
 *
 * Ra on the gap width, A = H/L. Air (Pr ≈ 0.71). Ra ≤ 0 gives 1 (conduction). Never NaN for
 * Ra ≥ 0, A > 0. Range data: {@link VERTICAL_CAVITY_ELSHERBINY_RANGE}.
 *
 * Example: Ra = 10⁵, A = 20 → Nu₁ = 2.8082, Nu₂ = 3.0024, Nu₃ = 2.4753 → Nu = 3.0024.
 */
export function nuVerticalCavityElSherbiny(ra: number, aspectRatio: number): number {
  if (!(ra > 0)) return 1;
  const nu1 = 0.0605 * Math.cbrt(ra);
  const inner = (0.104 * Math.pow(ra, 0.293)) / (1 + Math.pow(6310 / ra, 1.36));
  const nu2 = Math.cbrt(1 + inner * inner * inner);
  const nu3 = 0.242 * Math.pow(ra / aspectRatio, 0.273);
  return Math.max(nu1, nu2, nu3);
}

/** Published validity of {@link nuVerticalCavityMacGregorEmery}, with the extrapolation stance. */
export const VERTICAL_CAVITY_MACGREGOR_EMERY_RANGE = {
  rayleigh: [1e4, 1e9],
  aspectRatio: [10, 40],
  prandtl: [1, 2e4],
  source:
    'R. K. MacGregor, A. F. Emery, "Free convection through vertical plane layers: moderate and high Prandtl ' +
    'number fluids", J. Heat Transfer 91 (1969) 391–403, doi:10.1115/1.3580194; as given in Incropera & DeWitt, ' +
    'Fundamentals of Heat and Mass Transfer (eqs. 9.51–9.52 in the 6th ed.; numbering differs by edition), ' +
    'ranges from memory: 10 ≤ H/L ≤ 40, 1 ≤ Pr ≤ 2·10⁴, 10⁴ ≤ Ra ≤ 10⁷ (first equation); ' +
    '1 ≤ H/L ≤ 40, 1 ≤ Pr ≤ 20, 10⁶ ≤ Ra ≤ 10⁹ (second)',
  extrapolation:
    'Air (Pr ≈ 0.7) lies BELOW the Prandtl range: the data were for liquids. Textbooks apply the equations to ' +
    'air all the same (the Pr^0.012 factor is nearly 1), but prefer ElSherbiny et al. for air. Aspect ratio ' +
    'above 40: not supported by the data; the (H/L)^−0.3 factor keeps falling. Below Ra = 1e4 the value is ' +
    'held at conduction (Nu = 1).',
} as const;

/**
 * Nusselt number across a vertical slot, MacGregor & Emery (1969) as given by Incropera & DeWitt:
 *
 *   Nu_a = 0.42 Ra^(1/4) Pr^0.012 (H/L)^(−0.3)     (10 ≤ H/L ≤ 40, 1 ≤ Pr ≤ 2·10⁴, 10⁴ ≤ Ra ≤ 10⁷)
 *   Nu_b = 0.046 Ra^(1/3)                           (1 ≤ H/L ≤ 40, 1 ≤ Pr ≤ 20, 10⁶ ≤ Ra ≤ 10⁹)
 *   Nu = max(1, Nu_a, Nu_b)
 *
 * The max joins the two published equations and conduction into one function (a choice made
 * here, not in the source): Nu_b overtakes Nu_a near the top of Nu_a's range, and both fall
 * below 1 only where conduction governs. Range data: {@link VERTICAL_CAVITY_MACGREGOR_EMERY_RANGE}.
 *
 * Example: Ra = 10⁶, Pr = 0.71, A = 20 → Nu_a = 0.42·31.623·0.99590·0.40709 = 5.3846,
 * Nu_b = 4.6000 → Nu = 5.385.
 */
export function nuVerticalCavityMacGregorEmery(ra: number, pr: number, aspectRatio: number): number {
  if (!(ra > 0)) return 1;
  const nuA = 0.42 * Math.sqrt(Math.sqrt(ra)) * Math.pow(pr, 0.012) * Math.pow(aspectRatio, -0.3);
  const nuB = 0.046 * Math.cbrt(ra);
  return Math.max(1, nuA, nuB);
}
