/**
 * Air inside the flue, from the same property table as the air outside.
 *
 * A scenario that asks for `properties: air` in the flue should see the air of the outside film
 * (Incropera & DeWitt Table A.4 via `airPropertiesAt`), not the kinetic-theory mixture of
 * `makeGasPropertyTable(airAsFlueGas, …)`, which differs from the table by a few per cent.
 */
import { airPropertiesAt, airPropertiesInto } from './air.ts';
import type { GasPropertyLookup, MutableGasProperties } from './flueGas.ts';

/**
 * A flue-gas property lookup (the interface `makeGasPropertyTable` returns) that reads dry air from
 * Incropera & DeWitt Table A.4 (from memory; see air.ts) at the total pressure `pressurePa`.
 *
 * - cp, k, μ: linear interpolation in the table (independent of pressure), held constant below
 *   100 K and above 2000 K; Pr = μ cp / k.
 * - ρ: ideal gas at `pressurePa` (so a site at altitude gets its lower density, and with it a
 *   lower Re and Gr for the same mass flow and ΔT).
 *
 * Example: 500 K, 101 325 Pa → ρ = 0.7060 kg/m³, cp = 1030 J/(kg K), k = 0.0407 W/(m K),
 * μ = 2.701e-5 Pa s, Pr = 0.6836.
 */
export function makeAirGasPropertyLookup(pressurePa: number): GasPropertyLookup {
  if (!(pressurePa > 0)) throw new RangeError(`air property lookup: pressure must be positive (got ${pressurePa} Pa)`);
  const a = airPropertiesAt(300, pressurePa);
  return (temperatureK: number, into?: MutableGasProperties) => {
    airPropertiesInto(a, temperatureK, pressurePa);
    const out = into ?? { density: 0, specificHeat: 0, conductivity: 0, dynamicViscosity: 0, prandtl: 0 };
    out.density = a.density;
    out.specificHeat = a.specificHeat;
    out.conductivity = a.conductivity;
    out.dynamicViscosity = a.dynamicViscosity;
    out.prandtl = a.prandtl;
    return out;
  };
}
