/**
 * Where the stack's geometry weakens the model's assumptions (docs/model.md "Geometry"). Size alone
 * limits nothing: the radial conduction is exact for cylindrical layers of any thickness and
 * radius, and a very wide stack is a cylinder like any other. What changes with the proportions is
 * what the model leaves out:
 *
 * - a flue shorter than about ten diameters is mostly entrance region, where the film coefficient
 *   is above the fully developed tube value the model uses (turbulent entry lengths of about 10 D,
 *   Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., §8.1.1, from memory);
 * - a stack shorter than it is wide is a drum rather than a chimney: its top and bottom ends (not
 *   modelled) and axial conduction toward them matter, and outside natural convection on its
 *   height as on a vertical wall is doubtful;
 * - a layer thicker than a tenth of its inner radius is no longer a thin shell, so the thin-wall
 *   stress indicator E α ΔT / (2(1 − ν)) is only approximate there (the thin-wall limit t ≤ r/10,
 *   common practice); said where an allowable stress is set and the layer carries load (a modulus
 *   of at least LOAD_BEARING_MODULUS_PA; insulation has a nominal one).
 */
import type { ModelInputs } from './inputs.ts';

/** Height over inner diameter below which the flue is mostly entrance region. */
export const ENTRANCE_LENGTH_DIAMETERS = 10;
/** Height over outer diameter below which the stack is squat. */
export const SQUAT_HEIGHT_TO_DIAMETER = 1;
/** Thickness over inner radius above which a layer is not a thin shell. */
export const THIN_SHELL_THICKNESS_TO_RADIUS = 0.1;
/** Young's modulus from which a layer is taken to carry load, Pa (the library gives insulation a nominal 1 MPa). */
export const LOAD_BEARING_MODULUS_PA = 1e8;

const r2 = (x: number): string => String(Number(x.toFixed(2)));

/** Warnings about the geometry (module note); empty for a slender stack with thin layers. */
export function geometryWarnings(inputs: ModelInputs, outerDiameter: number): string[] {
  const { height, innerDiameter } = inputs.stack;
  const out: string[] = [];
  if (height < SQUAT_HEIGHT_TO_DIAMETER * outerDiameter)
    out.push(
      `the stack is shorter (${r2(height)} m) than it is wide (${r2(outerDiameter)} m): its top and bottom ends and axial conduction toward them are not modelled, and outside natural convection on the height as on a vertical wall is doubtful`,
    );
  else if (height < ENTRANCE_LENGTH_DIAMETERS * innerDiameter)
    out.push(
      `the flue is only ${r2(height / innerDiameter)} diameters tall (under ${ENTRANCE_LENGTH_DIAMETERS}): much of it is entrance region, where the inside film coefficient is above the fully developed value used`,
    );
  let radius = innerDiameter / 2;
  for (const layer of inputs.layers) {
    const m = layer.material;
    const judged = inputs.limits.allowableStressPa !== undefined && m.kind === 'solid' && m.youngsModulus >= LOAD_BEARING_MODULUS_PA && m.thermalExpansion > 0;
    if (judged && layer.thickness > THIN_SHELL_THICKNESS_TO_RADIUS * radius)
      out.push(
        `layer ${layer.label} is ${r2(layer.thickness / radius)} of its inner radius thick (over ${THIN_SHELL_THICKNESS_TO_RADIUS}): its thin-wall stress indicator is approximate (the conduction is exact for any thickness)`,
      );
    radius += layer.thickness;
  }
  return out;
}
