/**
 * How stiff a system is, and what that costs an explicit integrator: a bound on the largest
 * eigenvalue of a tridiagonal Jacobian (Gershgorin), and the number of steps an explicit method
 * needs when its step is limited by stability rather than accuracy.
 */

/**
 * Real stability limit of Dormand–Prince 5(4) with local extrapolation: the stability polynomial
 * of the propagated fifth-order solution, R(z) = 1 + z + z²/2 + z³/6 + z⁴/24 + z⁵/120 + z⁶/600,
 * has |R(x)| ≤ 1 for real x in [−3.3066, 0] (the negative root of R(x) = 1, found numerically; Hairer & Wanner,
 * Solving ODEs I, 2nd ed. 1993, Sect. IV.2, give about −3.3, from memory). A step h is stable on a
 * decaying mode λ < 0 only while h·|λ| ≤ this.
 */
export const DORMAND_PRINCE_REAL_STABILITY_LIMIT = 3.3066;

/**
 * Gershgorin bound on the spectral radius of a tridiagonal matrix: every eigenvalue lies in a disc
 * centred on a diagonal entry with the row's off-diagonal magnitudes as radius, so
 * |λ| ≤ maxᵢ (|dᵢ| + |lᵢ| + |uᵢ|) (S. Gershgorin 1931, Izv. Akad. Nauk SSSR 6, 749–754).
 * `lower[0]` and `upper[n−1]` are ignored, as in the integrators. Also returns the row that sets it.
 * Example: the heat-equation matrix with dᵢ = −2c, lᵢ = uᵢ = c has bound 4c; its largest
 * eigenvalue is 4c·sin²(nπ/(2(n+1))), within 0.1 % of that for n = 50.
 */
export function gershgorinSpectralBound(lower: Float64Array, diag: Float64Array, upper: Float64Array): { bound: number; row: number } {
  const n = diag.length;
  let bound = 0;
  let row = 0;
  for (let i = 0; i < n; i++) {
    const r = Math.abs(diag[i]!) + (i > 0 ? Math.abs(lower[i]!) : 0) + (i < n - 1 ? Math.abs(upper[i]!) : 0);
    if (r > bound) {
      bound = r;
      row = i;
    }
  }
  return { bound, row };
}

/**
 * Steps an explicit method needs over `durationS` when stability limits its step to
 * `stabilityLimit / spectralRadius`: N ≈ durationS · spectralRadius / stabilityLimit (at least 1).
 * Example: spectral radius 2 s⁻¹ over one day with Dormand–Prince → 86 400 · 2 / 3.3066 = 52 260 steps.
 */
export function stabilityLimitedSteps(spectralRadius: number, durationS: number, stabilityLimit = DORMAND_PRINCE_REAL_STABILITY_LIMIT): number {
  return Math.max(1, Math.ceil((durationS * spectralRadius) / stabilityLimit));
}
