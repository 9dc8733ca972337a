/**
 * The flue side of one axial segment: the inside film coefficient, the gas crossing the segment
 * and the heat it gives the inner surface, with the derivative the implicit integrator needs.
 *
 *   Re = 4 ṁ / (π D μ),  h = Nu(Re, Pr) k / D  (or a fixed h),  bulk properties at the segment's
 *   inlet gas temperature;
 *   gas cooling on:  the quasi-steady march of `marchThroughSegment` (T_out, Q = ṁ c_p (T_in − T_w) ε);
 *   gas cooling off: every segment sees the inlet temperature, q' = h π D (T_in − T_w).
 *
 * SI units: K, kg/s, m, W/m (per metre of stack height), W/(m K). Pure apart from writing `out`.
 */
import type { GasProperties } from '../properties/flueGas.ts';
import { marchThroughSegment, type SegmentMarch } from './march.ts';

/** What stays fixed for the whole run on the flue side of a segment. */
export interface FlueSideSpec {
  /** Inner (flue) diameter, m. */
  readonly innerDiameter: number;
  /** Axial length of the segment, m. */
  readonly segmentLength: number;
  /** Fixed inside film coefficient, W/(m² K); undefined: from `nusselt`. */
  readonly filmCoefficient: number | undefined;
  /** Whether the gas cools as it rises. */
  readonly gasCooling: boolean;
  /** Tube Nusselt number on the inner diameter from (Re, Pr), bulk properties. */
  readonly nusselt: (re: number, pr: number) => number;
}

/** The flue side of one segment at one instant. */
export interface FlueSideOfSegment {
  /** Gas temperature leaving the segment, K. */
  gasOutK: number;
  /** Heat from the gas into the inner surface, W per metre of height. */
  heatPerMetre: number;
  /** −∂(heatPerMetre)/∂T_inner, W/(m K) (≥ 0), for the Jacobian. */
  sinkPerMetre: number;
  /** Inside film coefficient, W/(m² K). */
  filmCoefficient: number;
  /** Reynolds number on the inner diameter, –. */
  reynolds: number;
  /** Prandtl number of the gas, –. */
  prandtl: number;
}

export function emptyFlueSide(): FlueSideOfSegment {
  return { gasOutK: 0, heatPerMetre: 0, sinkPerMetre: 0, filmCoefficient: 0, reynolds: 0, prandtl: 0 };
}

const march: SegmentMarch = { gasOutK: 0, heatW: 0, conductanceWPerK: 0 };

/**
 * Flue side of one segment: gas entering at `gasInK` with mass flow `massFlow` (kg/s) and bulk
 * properties `gas` (at gasInK), inner surface at `wallK`. Fills and returns `out`.
 * Example: D 1.4 m, Δz 3.75 m, ṁ 3.2 kg/s, μ 2.5e-5 Pa s → Re = 4·3.2/(π·1.4·2.5e-5) = 116 410.
 */
export function flueSideOfSegment(spec: FlueSideSpec, gasInK: number, wallK: number, massFlow: number, gas: GasProperties, out: FlueSideOfSegment): FlueSideOfSegment {
  const di = spec.innerDiameter;
  const dz = spec.segmentLength;
  const reynolds = (4 * massFlow) / (Math.PI * di * gas.dynamicViscosity);
  const h = spec.filmCoefficient ?? (spec.nusselt(reynolds, gas.prandtl) * gas.conductivity) / di;
  if (spec.gasCooling) {
    marchThroughSegment(gasInK, wallK, h * Math.PI * di * dz, massFlow * gas.specificHeat, march);
    out.gasOutK = march.gasOutK;
    out.heatPerMetre = march.heatW / dz;
    out.sinkPerMetre = march.conductanceWPerK / dz;
  } else {
    out.gasOutK = gasInK;
    out.heatPerMetre = h * Math.PI * di * (gasInK - wallK);
    out.sinkPerMetre = h * Math.PI * di;
  }
  out.filmCoefficient = h;
  out.reynolds = reynolds;
  out.prandtl = gas.prandtl;
  return out;
}
