/**
 * Conductance of an air gap between two concentric cylindrical surfaces, per metre of height
 * (docs/model.md, "Wall"): still-air conduction, raised by natural convection where the gap is
 * wide enough (an effective-conductivity correlation, by default Raithby–Hollands), plus grey
 * radiation between the two surfaces.
 */
import { airPropertiesInto, airPropertiesAt } from '../properties/air.ts';
import { effectiveConductivityRatioAnnulusRaithbyHollands } from '../correlations/enclosure.ts';
import { STANDARD_GRAVITY, STANDARD_PRESSURE } from '../constants.ts';
import { radiationCoefficientConcentricCylinders } from '../correlations/radiation.ts';
import type { GapLink } from './mesh.ts';

/** k_eff/k of the gap from its dimensionless groups (the caller picks the correlation). */
export type GapConvectionRatio = (inputs: GapConvectionInputs) => number;

/** The default: Raithby–Hollands for a concentric annulus (the model selects a vertical-layer correlation instead). */
const annulusRatio: GapConvectionRatio = (g) => effectiveConductivityRatioAnnulusRaithbyHollands(g.innerDiameter, g.outerDiameter, g.rayleighGap, g.pr);

const scratchAir = airPropertiesAt(300);

/** The groups of the gap's convection correlation at surface temperatures t1K, t2K. */
export interface GapConvectionInputs {
  /** Rayleigh number on the gap width, g β |T₁ − T₂| L³ / (ν α). */
  rayleighGap: number;
  /** Prandtl number of the air at the mean temperature. */
  pr: number;
  /** Height of the gap over width (the segment height is the height of one circulation cell), –. */
  aspectRatio: number;
  /** Diameters of the two faces, m. */
  innerDiameter: number;
  outerDiameter: number;
}

/**
 * Rayleigh number on the gap width and Prandtl number of the air in the gap, properties at the
 * mean of the two surface temperatures and the pressure `pressurePa` (default 1 atm); the aspect
 * ratio of a gap `heightM` tall. Fills and returns `out`.
 */
export function gapConvectionInputs(gap: GapLink, t1K: number, t2K: number, out: GapConvectionInputs, pressurePa: number = STANDARD_PRESSURE, heightM = Infinity): GapConvectionInputs {
  const air = airPropertiesInto(scratchAir, 0.5 * (t1K + t2K), pressurePa);
  const width = gap.outerRadius - gap.innerRadius;
  const diffusivity = air.kinematicViscosity / air.prandtl;
  out.rayleighGap = (STANDARD_GRAVITY * air.expansion * Math.abs(t1K - t2K) * width * width * width) / (air.kinematicViscosity * diffusivity);
  out.pr = air.prandtl;
  out.aspectRatio = heightM / width;
  out.innerDiameter = 2 * gap.innerRadius;
  out.outerDiameter = 2 * gap.outerRadius;
  return out;
}

const inputs: GapConvectionInputs = { rayleighGap: 0, pr: 0, aspectRatio: 0, innerDiameter: 0, outerDiameter: 0 };

/**
 * Conductance of the gap per metre of height, W/(m K), between surface temperatures t1K (inner)
 * and t2K (outer): G = 2π k k_eff/k / ln(r₂/r₁) + 2π r₁ σ (T₁² + T₂²)(T₁ + T₂) / (1/ε₁ + (r₁/r₂)(1/ε₂ − 1)).
 * Air properties at the mean of the two surface temperatures and `pressurePa`; k_eff/k from
 * `convectionRatio` (default Raithby–Hollands for an annulus) with the gap `heightM` tall.
 */
export function gapConductancePerMetre(
  gap: GapLink,
  t1K: number,
  t2K: number,
  convectionRatio: GapConvectionRatio = annulusRatio,
  pressurePa: number = STANDARD_PRESSURE,
  heightM = Infinity,
): number {
  const r1 = gap.innerRadius;
  const r2 = gap.outerRadius;
  gapConvectionInputs(gap, t1K, t2K, inputs, pressurePa, heightM);
  const ratio = convectionRatio(inputs);
  const conduction = (2 * Math.PI * scratchAir.conductivity * ratio) / Math.log(r2 / r1);
  const radiationCoefficient = radiationCoefficientConcentricCylinders(t1K, t2K, gap.innerEmissivity, gap.outerEmissivity, r1, r2);
  return conduction + 2 * Math.PI * r1 * radiationCoefficient;
}
