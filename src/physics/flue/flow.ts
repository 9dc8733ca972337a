/**
 * The flow in a round flue as a whole: mean velocity, Reynolds number and speed of sound, for the
 * plausibility checks of a firing schedule (can a flue of this diameter carry this flow at all?).
 * SI units: kg/s, kg/m³, m, Pa s, K, J/(kg K), kg/mol.
 */
import { GAS_CONSTANT } from '../constants.ts';

/**
 * Mean gas velocity in a round flue, v = ṁ / (ρ π D² / 4), m/s (mass balance).
 * Example: ṁ 3.2 kg/s, ρ 0.74 kg/m³, D 1.4 m → v = 3.2 / (0.74 · 1.5394) = 2.81 m/s.
 */
export function meanGasVelocity(massFlow: number, density: number, innerDiameter: number): number {
  return massFlow / (density * Math.PI * innerDiameter * innerDiameter * 0.25);
}

/**
 * Reynolds number of pipe flow on the diameter, Re = ρ v D / μ = 4 ṁ / (π D μ), – (the form the
 * flue side uses, physics/flue/inside.ts).
 * Example: ṁ 3.2 kg/s, D 1.4 m, μ 2.5e-5 Pa s → Re = 12.8 / (π · 1.4 · 2.5e-5) = 116 410.
 */
export function pipeReynolds(massFlow: number, innerDiameter: number, dynamicViscosity: number): number {
  return (4 * massFlow) / (Math.PI * innerDiameter * dynamicViscosity);
}

/**
 * Speed of sound in an ideal gas, a = √(γ R T / M) with γ = c_p / (c_p − R/M), m/s (c_p per kg;
 * the ideal-gas relations of any thermodynamics text, e.g. Anderson, Modern Compressible Flow,
 * 3rd ed. 2003, eq. 3.18, from memory). Valid where the gas is ideal: flue gases at about
 * atmospheric pressure.
 * Example: dry air at 293.15 K, M 0.0289644 kg/mol, c_p 1006 J/(kg K) → R/M = 287.06 J/(kg K),
 * γ = 1.3993, a = 343.2 m/s.
 */
export function speedOfSoundIdealGas(temperatureK: number, molarMass: number, specificHeat: number): number {
  const gasConstant = GAS_CONSTANT / molarMass;
  const gamma = specificHeat / (specificHeat - gasConstant);
  return Math.sqrt(gamma * gasConstant * temperatureK);
}
