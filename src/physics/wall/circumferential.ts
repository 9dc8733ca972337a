/**
 * Heat flow round the wall between neighbouring circumferential sectors, and the bending of a tall
 * stack whose one side is warmer than the other.
 */

/**
 * Conductance between the same radial cell of two neighbouring sectors, per metre of height,
 * W/(m K): a cell of radial thickness Δr at mean radius r conducts round the circumference over the
 * arc r Δφ between the sectors' centres:  G = k Δr / (r Δφ).
 * (Fourier's law on the arc; the finite-volume link of a polar grid, e.g. Patankar 1980,
 * Numerical Heat Transfer and Fluid Flow, ch. 4, from memory.)
 * Example: steel k = 50, Δr = 8 mm, r = 0.8 m, 16 sectors (Δφ = 0.3927) → 50·0.008/(0.8·0.3927) = 1.273 W/(m K).
 */
export function circumferentialConductancePerMetre(conductivity: number, radialThickness: number, radius: number, sectorAngleRad: number): number {
  return (conductivity * radialThickness) / (radius * sectorAngleRad);
}

/**
 * Curvature of a tall hollow cylinder whose wall is warmer on one side: a mean-wall temperature
 * difference ΔT across the diameter D (between opposite sides) with expansion α gives
 *   κ = α ΔT / D   (1/m)
 * (plane sections: the strain α T varies linearly across the section; common practice, beam theory).
 * Example: steel α = 12e-6 /K, ΔT = 20 K, D = 1.6 m → 1.5e-4 /m.
 */
export function thermalBowCurvature(thermalExpansion: number, sideToSideDeltaTK: number, diameter: number): number {
  return (thermalExpansion * sideToSideDeltaTK) / diameter;
}

/**
 * Tip deflection of a cantilever (fixed at its base, free at its top) of height H cut into
 * segments of equal length with curvature κ_s each (s = 0 at the bottom), by the moment-area
 * theorem: δ = ∫₀ᴴ κ(z) (H − z) dz, exact for curvature constant within each segment:
 *   δ = Σ κ_s [ (H − z_s) Δz − Δz²/2 ],  z_s the segment's lower end.
 * Uniform κ gives κ H²/2 (beam theory, common practice). Units: 1/m, m → m; the sign follows κ.
 * Example: κ = 1.5e-4 /m on 45 m → 1.5e-4 · 45²/2 = 0.152 m.
 */
export function cantileverTipDeflection(curvatures: ArrayLike<number>, height: number): number {
  const n = curvatures.length;
  const dz = height / n;
  let deflection = 0;
  for (let s = 0; s < n; s++) deflection += curvatures[s]! * ((height - s * dz) * dz - (dz * dz) / 2);
  return deflection;
}
