/**
 * Conductance of an air gap between two concentric cylindrical surfaces, per metre of height
 * (design.md section 2): still-air conduction, raised by natural convection where the gap is wide
 * enough (Raithby–Hollands effective conductivity), plus grey radiation between the two surfaces.
 */
import { airPropertiesAt, airPropertiesInto } from '../properties/air.ts';
import { effectiveConductivityRatioAnnulusRaithbyHollands } from '../correlations/enclosure.ts';
import { STANDARD_GRAVITY } from '../constants.ts';
import { radiationCoefficientConcentricCylinders } from '../correlations/radiation.ts';
import type { GapLink } from './mesh.ts';

/**
 * Conductance of the gap per metre of height, W/(m K), between surface temperatures t1K (inner)
 * and t2K (outer): G = 2π k_eff / ln(r₂/r₁) + 2π r₁ σ (T₁² + T₂²)(T₁ + T₂) / (1/ε₁ + (r₁/r₂)(1/ε₂ − 1)).
 * Air properties at the mean of the two surface temperatures.
 */
const scratchAir = airPropertiesAt(300);

export function gapConductancePerMetre(gap: GapLink, t1K: number, t2K: number): number {
  const r1 = gap.innerRadius;
  const r2 = gap.outerRadius;
  const tm = 0.5 * (t1K + t2K);
  const air = airPropertiesInto(scratchAir, tm);
  const width = r2 - r1;
  const diffusivity = air.kinematicViscosity / air.prandtl;
  const rayleigh = (STANDARD_GRAVITY * air.expansion * Math.abs(t1K - t2K) * width ** 3) / (air.kinematicViscosity * diffusivity);
  const ratio = effectiveConductivityRatioAnnulusRaithbyHollands(2 * r1, 2 * r2, rayleigh, air.prandtl);
  const conduction = (2 * Math.PI * air.conductivity * ratio) / Math.log(r2 / r1);
  const radiationCoefficient = radiationCoefficientConcentricCylinders(t1K, t2K, gap.innerEmissivity, gap.outerEmissivity, r1, r2);
  return conduction + 2 * Math.PI * r1 * radiationCoefficient;
}
