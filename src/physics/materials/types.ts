/**
 * Wall materials: the data shape every material in the library (and every inline material in a
 * scenario) takes. SI units; temperatures in kelvin.
 */

import type { PropertyTable } from '../properties/table.ts';

export type { PropertyTable };

export interface Material {
  /** Library key, kebab-case, e.g. `carbon-steel`. */
  readonly name: string;
  /** One line for `stackday materials`. */
  readonly description: string;
  /** `solid` layers get finite-volume nodes; `gap` layers are still-air gaps (conduction + radiation + convection, no nodes). */
  readonly kind: 'solid' | 'gap';
  /** Density, kg/m³ (for a gap: unused, 0). */
  readonly density: number;
  /** Thermal conductivity k(T), W/(m K) (for a gap: unused, air properties apply). */
  readonly conductivity: PropertyTable;
  /** Specific heat cp(T), J/(kg K) (for a gap: unused). */
  readonly specificHeat: PropertyTable;
  /** Total hemispherical emissivity of the material's surface, 0–1. */
  readonly emissivity: number;
  /** Maximum service temperature, K. */
  readonly maxServiceTemperatureK: number;
  /** Young's modulus, Pa (for the thermal-stress indicator). */
  readonly youngsModulus: number;
  /** Linear thermal expansion coefficient, 1/K. */
  readonly thermalExpansion: number;
  /** Poisson's ratio, –. */
  readonly poissonRatio: number;
  /** Where the numbers come from: a named handbook table, or "from memory". */
  readonly source: string;
}
