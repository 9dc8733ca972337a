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
