/**
 * Thermal stress in the wall of a cylinder: the indicator the summary compares with an allowable
 * stress (docs/model.md, "Results"). An indicator, not a stress analysis: no restraint, no creep, no
 * cracking, no load other than the temperature difference.
 */

/**
 * Thermal-stress indicator of a thin cylinder wall with a temperature difference ΔT across it:
 *
 *   σ = E α |ΔT| / (2 (1 − ν)), Pa
 *
 * the hoop and axial stress at either surface of a long, thin-walled cylinder (wall thickness
 * small next to the radius) whose temperature varies linearly (in the thin-wall limit of the
 * logarithmic distribution) across the wall, free of external load, linear-elastic and isotropic.
 * Tension on the colder surface, compression on the hotter one; the indicator gives the magnitude.
 *
 * Inputs: Young's modulus E (Pa), linear thermal expansion α (1/K), Poisson's ratio ν (−), ΔT (K;
 * the sign does not matter). Valid for 0 ≤ ν < 0.5 and a wall thin next to its radius.
 *
 * Source: S. P. Timoshenko and J. N. Goodier, Theory of Elasticity, 3rd ed., McGraw-Hill, New York,
 * 1970, thermal stresses in a long circular cylinder, thin-walled case (§§150–151, section numbers
 * from memory).
 *
 * Example: E = 200 GPa, α = 12·10⁻⁶ /K, ν = 0.3, ΔT = 10 K →
 *   σ = 200·10⁹ · 12·10⁻⁶ · 10 / (2 · 0.7) = 17.14·10⁶ Pa = 17.1 MPa.
 */
export function thermalStressIndicator(youngsModulus: number, thermalExpansion: number, poissonRatio: number, deltaTK: number): number {
  return (youngsModulus * thermalExpansion * Math.abs(deltaTK)) / (2 * (1 - poissonRatio));
}
