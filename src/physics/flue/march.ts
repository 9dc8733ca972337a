/**
 * Quasi-steady gas cooling through one axial segment of the flue (docs/model.md, "Flue side").
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
  return marchThroughSegment(inletK, wallK, filmCoefficient * Math.PI * innerDiameter * segmentLength, massFlow * specificHeat, scratch).gasOutK;
}

const scratch: SegmentMarch = { gasOutK: 0, heatW: 0, conductanceWPerK: 0 };

/** Outcome of the gas crossing one segment (see `marchThroughSegment`). */
export interface SegmentMarch {
  /** Gas temperature leaving the segment, K. */
  gasOutK: number;
  /** Heat from the gas into the wall over the segment, W. */
  heatW: number;
  /** −∂heatW/∂T_w, W/K (≥ 0): how much more heat the wall takes per kelvin it is colder. */
  conductanceWPerK: number;
}

/**
 * The gas crossing one segment at uniform wall temperature, all at once (no allocation: fills `out`):
 *   ε = 1 − e^(−UA/(ṁc_p)) (computed as −expm1, exact for tiny NTU),
 *   T_out = T_in − (T_in − T_w) ε,   Q = ṁ c_p (T_in − T_w) ε,   −∂Q/∂T_w = ṁ c_p ε.
 * `ua` = h π D Δz in W/K, `capacityRate` = ṁ c_p in W/K. No flow (ṁ c_p = 0): the gas leaves at the
 * wall temperature and gives nothing; no transfer (UA = 0): the gas leaves unchanged.
 * Example: T_in 500 K, T_w 400 K, UA 314.159 W/K, ṁc_p 11 000 W/K → ε 0.028156, T_out 497.1844 K,
 * Q 30 972 W.
 */
export function marchThroughSegment(inletK: number, wallK: number, ua: number, capacityRate: number, out: SegmentMarch): SegmentMarch {
  const effectiveness = !(ua > 0) ? 0 : capacityRate > 0 ? -Math.expm1(-ua / capacityRate) : 1;
  out.gasOutK = inletK - (inletK - wallK) * effectiveness;
  out.heatW = capacityRate > 0 ? capacityRate * (inletK - wallK) * effectiveness : 0;
  out.conductanceWPerK = capacityRate > 0 ? capacityRate * effectiveness : 0;
  return out;
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
  return marchThroughSegment(inletK, wallK, filmCoefficient * Math.PI * innerDiameter * segmentLength, massFlow * specificHeat, scratch).heatW;
}
