/**
 * Quasi-steady gas cooling through one axial segment of the flue (design notes §4).
 *
 * The gas crosses the stack in seconds while the wall changes over minutes, so within one step the
 * gas is steady: along a segment at uniform wall temperature T_w,
 *   ṁ c_p dT/dz = −h π D (T − T_w)  ⇒  T_out = T_w + (T_in − T_w) exp(−NTU),  NTU = h π D Δz / (ṁ c_p),
 * and the heat given to the wall is Q = ṁ c_p (T_in − T_out) = ṁ c_p (T_in − T_w)(1 − e^(−NTU)).
 * (Any heat-exchanger text, e.g. Incropera & DeWitt, Fundamentals of Heat and Mass Transfer,
 * §8.3.1, constant surface temperature.)
 */

/**
 * Number of transfer units of one segment: NTU = h π D Δz / (ṁ c_p), –.
 * Edge cases: no transfer area or h = 0 → 0; ṁ c_p ≤ 0 (no flow) with transfer → +Infinity.
 * Example: h 10 W/(m² K), D 2 m, Δz 5 m, ṁ 10 kg/s, c_p 1100 J/(kg K) → 0.02856.
 */
export function segmentNtu(filmCoefficient: number, innerDiameter: number, segmentLength: number, massFlow: number, specificHeat: number): number {
  const ua = filmCoefficient * Math.PI * innerDiameter * segmentLength;
  if (!(ua > 0)) return 0;
  const capacity = massFlow * specificHeat;
  return capacity > 0 ? ua / capacity : Infinity;
}

/**
 * Gas temperature leaving a segment, K: T_out = T_w + (T_in − T_w) exp(−h π D Δz / (ṁ c_p)).
 * Units: K, K, W/(m² K), m, m, kg/s, J/(kg K). With vanishing flow the gas leaves at the wall
 * temperature (never NaN). Example: T_in 500 K, T_w 400 K, NTU 0.02856 → 497.18 K.
 */
export function gasOutletTemperature(
  inletK: number,
  wallK: number,
  filmCoefficient: number,
  innerDiameter: number,
  segmentLength: number,
  massFlow: number,
  specificHeat: number,
): number {
  const ntu = segmentNtu(filmCoefficient, innerDiameter, segmentLength, massFlow, specificHeat);
  return wallK + (inletK - wallK) * Math.exp(-ntu);
}

/**
 * Heat from the gas to the wall of a segment, W: Q = ṁ c_p (T_in − T_out)
 * = −ṁ c_p (T_in − T_w) expm1(−NTU) (expm1 keeps full precision for small NTU). Same arguments as
 * `gasOutletTemperature`. Positive when the gas is hotter than the wall. With ṁ → 0, Q → 0 (the
 * little gas there is gives up all its excess over the wall temperature).
 * Example: T_in 500 K, T_w 400 K, ṁ 10 kg/s, c_p 1100, NTU 0.02856 → 30 970 W.
 */
export function heatToWall(
  inletK: number,
  wallK: number,
  filmCoefficient: number,
  innerDiameter: number,
  segmentLength: number,
  massFlow: number,
  specificHeat: number,
): number {
  const capacity = massFlow * specificHeat;
  if (!(capacity > 0)) return 0;
  const ntu = segmentNtu(filmCoefficient, innerDiameter, segmentLength, massFlow, specificHeat);
  return -capacity * (inletK - wallK) * Math.expm1(-ntu);
}
