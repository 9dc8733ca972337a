/**
 * Can the flue carry the scheduled flow at all? At every firing point (and at the flow floor), the
 * mean gas velocity, Mach number and Reynolds number of the flue gas at that point's temperature
 * and the flue pressure. Beyond what a flue can carry is a problem (bad input); above the usual
 * design velocities a warning. Correlations used beyond their published range are warned by the
 * run's own range checks (model/rangeChecks.ts), not here.
 *
 * Checked at the schedule's points: between two points the flow and the temperature change
 * linearly, and the velocity (∝ ṁ T) can pass both ends only where one rises while the other
 * falls, by a small margin for real ramps.
 */
import type { ModelInputs } from '../../model/inputs.ts';
import { flueGasPropertyLookup } from '../../model/assemble.ts';
import { meanGasVelocity, pipeReynolds, speedOfSoundIdealGas } from '../../physics/flue/flow.ts';
import { molarMass } from '../../physics/flue/combustion.ts';
import { KELVIN_OFFSET, MOLAR_MASS_AIR } from '../../physics/constants.ts';

export const FLOW_LIMITS = {
  /**
   * Mean gas velocity beyond any flue, m/s: twice the upper end of the usual design velocities of
   * stacks, about 10–30 m/s (common practice). At 60 m/s the velocity head ρv²/2 of hot flue gas
   * (ρ ≈ 0.75 kg/m³) is 1.35 kPa, several times the natural draft of a 50 m stack.
   */
  velocity: 60,
  /**
   * Mach number beyond which the gas cannot be treated as incompressible: density changes by about
   * Ma²/2, 5 % at 0.3 (the usual limit, e.g. White, Fluid Mechanics, 7th ed. 2011, Sect. 9.1, from
   * memory). The flue model (quasi-steady enthalpy balance, tube-flow correlations) assumes it.
   */
  mach: 0.3,
  /** Above this mean velocity, m/s, a warning: beyond usual design practice (common practice). */
  usualVelocity: 30,
} as const;

/** A firing point as written in the scenario: its key path, which flow key it used, and its values (SI). */
export interface ScheduledFlow {
  /** `flue.schedule.daily[2].mass_flow`, `flue.off_mass_flow`. */
  readonly path: string;
  readonly massFlow: number;
  readonly inletTemperatureK: number;
}

const num = (x: number) => (Math.abs(x) >= 1e4 ? x.toExponential(2) : x >= 100 ? x.toFixed(0) : x.toPrecision(3));
const celsius = (k: number) => `${(k - KELVIN_OFFSET).toFixed(0)} °C`;

/** Problems (beyond what a flue carries) and warnings (beyond usual practice) for the scheduled flows. */
export function flowPlausibility(inputs: ModelInputs, flows: readonly ScheduledFlow[]): { problems: string[]; warnings: string[] } {
  const gas = flueGasPropertyLookup(inputs);
  const m = inputs.flue.properties === 'air' ? MOLAR_MASS_AIR : molarMass(inputs.flue.composition);
  const d = inputs.stack.innerDiameter;
  const problems: string[] = [];
  const warnings: string[] = [];
  for (const f of flows) {
    if (!(f.massFlow > 0)) continue;
    const p = gas(f.inletTemperatureK);
    const v = meanGasVelocity(f.massFlow, p.density, d);
    const mach = v / speedOfSoundIdealGas(f.inletTemperatureK, m, p.specificHeat);
    const re = pipeReynolds(f.massFlow, d, p.dynamicViscosity);
    const what = `${num(f.massFlow)} kg/s at ${celsius(f.inletTemperatureK)} in a ${num(d)} m flue: a mean gas velocity of ${num(v)} m/s (Mach ${num(mach)}, Reynolds ${num(re)})`;
    if (v > FLOW_LIMITS.velocity || mach > FLOW_LIMITS.mach)
      problems.push(
        `${f.path}: found ${what}; expected a flow the flue can carry, at most ${FLOW_LIMITS.velocity} m/s and Mach ${FLOW_LIMITS.mach} (check the flow's unit, or stack.inner_diameter)`,
      );
    else if (v > FLOW_LIMITS.usualVelocity) warnings.push(`${f.path}: ${what}, above the usual ${FLOW_LIMITS.usualVelocity} m/s of stacks; check the flow and stack.inner_diameter`);
  }
  return { problems: summarised(problems), warnings: summarised(warnings) };
}

/** At most five lines of one kind, then a count (a per-day schedule can repeat one mistake 366 times). */
function summarised(lines: string[]): string[] {
  return lines.length <= 5 ? lines : [...lines.slice(0, 5), `… and ${lines.length - 5} more points like these`];
}
