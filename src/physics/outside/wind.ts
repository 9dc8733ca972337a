/**
 * Mean wind speed at height: the power-law profile of the atmospheric boundary layer.
 */

/**
 * Power-law exponents α of the mean wind profile by terrain.
 * ASHRAE Handbook of Fundamentals (2009), ch. 24 "Airflow around buildings", Table 1
 * (atmospheric boundary layer parameters): flat unobstructed/open water 0.10, open terrain with
 * scattered obstructions 0.14, urban/suburban/wooded 0.22, large city centre 0.33. Consistent with
 * Davenport's (1960s) classes and the 1/7 law for open country. *From memory, common practice.*
 */
export const TERRAIN_EXPONENTS = {
  flat: 0.1,
  open: 0.14,
  suburban: 0.22,
  city: 0.33,
} as const;

/** WMO standard height of surface wind measurements, m (WMO-No. 8, Guide to Instruments and Methods of Observation, ch. 5). */
export const STANDARD_WIND_HEIGHT_M = 10;

/** Terrain class names accepted by {@link TERRAIN_EXPONENTS}. */
export type Terrain = keyof typeof TERRAIN_EXPONENTS;

/**
 * Heights below this are taken as this height (m) in {@link windAtHeight}, so that z → 0 gives a
 * finite, non-zero wind instead of the power law's U → 0 (the law describes the mean flow above the
 * roughness elements, not at the ground).
 */
export const WIND_FLOOR_HEIGHT_M = 1;

/**
 * Mean wind speed at height `heightM` from the speed `windSpeedRef` at `referenceHeightM`, by the
 * power law `U(z) = U_ref (z / z_ref)^α`.
 *
 * Units: m/s, m. Validity: above the roughness sublayer and below the gradient height (a few hundred
 * metres); heights below {@link WIND_FLOOR_HEIGHT_M} are raised to it (both z and z_ref).
 * Source: Hellmann's power law, as used in ASHRAE Fundamentals (2009) ch. 24, eq. 4, and ASCE 7.
 *
 * Example: 5 m/s at 10 m, α = 0.22 → at 80 m: 5·8^0.22 = 7.90 m/s.
 */
export function windAtHeight(windSpeedRef: number, referenceHeightM: number, heightM: number, exponent: number): number {
  const z = Math.max(heightM, WIND_FLOOR_HEIGHT_M);
  const zRef = Math.max(referenceHeightM, WIND_FLOOR_HEIGHT_M);
  return windSpeedRef * (z / zRef) ** exponent;
}

/** Power-law exponent a and boundary-layer (gradient) thickness δ of one terrain class. */
export interface TerrainBoundaryLayer {
  /** Exponent a of U(z) ∝ z^a, –. */
  readonly exponent: number;
  /** Boundary-layer thickness δ, m: the height above which the mean wind no longer grows. */
  readonly thicknessM: number;
}

/**
 * Atmospheric boundary-layer parameters by terrain, ASHRAE Handbook of Fundamentals (2009), ch. 24
 * "Airflow around buildings", Table 1 (same table in the 2005–2021 editions): large city centres
 * a = 0.33, δ = 460 m; urban, suburban and wooded areas 0.22, 370 m; open terrain with scattered
 * obstructions under about 9 m (the usual weather-station terrain) 0.14, 270 m; flat unobstructed
 * areas exposed to wind over water 0.10, 210 m. The exponents are those of {@link TERRAIN_EXPONENTS};
 * the (a, δ) pairs were recalled and then checked against a journal table that reproduces the
 * ASHRAE values (Indoor Air 2023, article 5433093, Table 2).
 */
export const TERRAIN_BOUNDARY_LAYERS: Readonly<Record<Terrain, TerrainBoundaryLayer>> = {
  flat: { exponent: TERRAIN_EXPONENTS.flat, thicknessM: 210 },
  open: { exponent: TERRAIN_EXPONENTS.open, thicknessM: 270 },
  suburban: { exponent: TERRAIN_EXPONENTS.suburban, thicknessM: 370 },
  city: { exponent: TERRAIN_EXPONENTS.city, thicknessM: 460 },
};

/**
 * Validity of {@link windAtHeightFromStation}, for the correlation table.
 * - Heights: from a few metres above the roughness elements up to δ. Below {@link WIND_FLOOR_HEIGHT_M}
 *   the height is raised to it (the law describes the flow above the roughness, not in it).
 * - Above δ the wind is taken as the gradient wind U(δ): this is part of the published model
 *   (δ is defined as the height where the profile stops growing), so heights above δ are accepted,
 *   not extrapolated.
 * - Station height: the method assumes the anemometer stands in open, unobstructed exposure
 *   (WMO standard 10 m); readings from a sheltered station are outside it.
 */
export const WIND_TWO_TERRAIN_RANGE = {
  heightM: [WIND_FLOOR_HEIGHT_M, Infinity],
  stationHeightM: [WIND_FLOOR_HEIGHT_M, Infinity],
  constraints: ['z_met ≤ δ_met (the anemometer stands inside its own boundary layer)'],
  source:
    'ASHRAE Handbook of Fundamentals (2009), ch. 24, eq. 4 and Table 1 (from memory; table checked against a reproduction)',
  extrapolation:
    'Above δ: accepted (U = U(δ), the gradient wind, by definition of δ). Below about 1 m: not covered; ' +
    'the height is raised to the floor height.',
} as const;

/**
 * Mean wind speed at height `heightM` over the site's terrain from a weather-station reading
 * `windSpeedMet` taken at `metHeightM` over the station's terrain, by the two-terrain power law
 * (ASHRAE Fundamentals 2009, ch. 24, eq. 4):
 *
 *   U(z) = U_met (δ_met / z_met)^a_met (z / δ)^a,   z ≤ δ;   U(z) = U(δ) above δ
 *
 * The station's profile is carried up to its boundary-layer top δ_met, where the wind is the same
 * gradient wind over both terrains, and brought down the site's profile. With the same terrain on
 * both sides it reduces to {@link windAtHeight}.
 *
 * Units: m/s, m. Heights below {@link WIND_FLOOR_HEIGHT_M} are raised to it (z and z_met).
 * Range data: {@link WIND_TWO_TERRAIN_RANGE}.
 *
 * Example: 5 m/s at 10 m in open country (0.14, 270 m) → suburban site (0.22, 370 m) at 45 m:
 * 5 · 27^0.14 · (45/370)^0.22 = 5 · 1.58632 · 0.62909 = 4.990 m/s
 * (the site's exponent applied straight to the reading would give 5 · 4.5^0.22 = 6.96 m/s).
 */
export function windAtHeightFromStation(
  windSpeedMet: number,
  metHeightM: number,
  metTerrain: TerrainBoundaryLayer,
  heightM: number,
  siteTerrain: TerrainBoundaryLayer,
): number {
  const zMet = Math.max(metHeightM, WIND_FLOOR_HEIGHT_M);
  const z = Math.min(Math.max(heightM, WIND_FLOOR_HEIGHT_M), siteTerrain.thicknessM);
  const gradientWind = windSpeedMet * (metTerrain.thicknessM / zMet) ** metTerrain.exponent;
  return gradientWind * (z / siteTerrain.thicknessM) ** siteTerrain.exponent;
}
