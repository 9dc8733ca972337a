/**
 * Natural draft of a stack.
 */
import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Theoretical natural draft, Pa: Δp = g H (ρ_air − ρ_gas), the hydrostatic pressure difference
 * between a column of outside air and a column of flue gas of the same height (before friction and
 * exit losses). Densities are means over the height (kg/m³); a negative result means the gas is
 * heavier than the air (no draft).
 * Example: H 50 m, ρ_air 1.20, ρ_gas 0.70 kg/m³ → 9.80665 × 50 × 0.50 = 245.2 Pa.
 */
export function stackDraftPa(heightM: number, airDensity: number, meanGasDensity: number): number {
  return STANDARD_GRAVITY * heightM * (airDensity - meanGasDensity);
}
