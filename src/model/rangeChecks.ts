/**
 * Range checks of every correlation the model evaluated at one reported instant, through the
 * correlation registry: the roles of model/correlations.ts, with the inputs each segment (and each
 * air gap) used, and where (run time, height).
 */
import type { CorrelationRangeTally } from '../physics/correlations/registry.ts';
import { gapConvectionInputs, type GapConvectionInputs } from '../physics/wall/gap.ts';
import { LINK_GAP, type WallMesh } from '../physics/wall/mesh.ts';
import type { ModelInputs } from './inputs.ts';
import type { SegmentDiagnostics, StackGeometry } from './system.ts';
import { CORRELATIONS_IN_USE as USE, gapConvectionRangeInputs } from './correlations.ts';

const place = { t: 0, heightM: 0 };
const gapInputs: GapConvectionInputs = { rayleighGap: 0, pr: 0, aspectRatio: 0, innerDiameter: 0, outerDiameter: 0 };

/** What the range checks need of the assembled model. */
export interface RangeCheckContext {
  readonly inputs: ModelInputs;
  readonly mesh: WallMesh;
  readonly geometry: StackGeometry;
  /** Atmospheric pressure at the site, Pa (air in gaps). */
  readonly sitePressurePa: number;
}

/** Note every correlation evaluation of the instant at run time `t` with wall state `y` and boundary diagnostics `diag` in `tally`. */
export function checkCorrelationRanges(ctx: RangeCheckContext, t: number, y: Float64Array, diag: SegmentDiagnostics, tally: CorrelationRangeTally): void {
  const { inputs, mesh, geometry } = ctx;
  const n = mesh.nodeCount;
  const sectors = inputs.stack.sectors ?? 1;
  for (let s = 0; s < geometry.segments; s++) {
    place.t = t; // (one object for every note: the tally copies the place it keeps)
    place.heightM = geometry.midHeight[s]!;
    if (inputs.outside.filmCoefficient === undefined) {
      const pr = diag.prandtlOutside[s]!;
      const re = diag.reynoldsOutside[s]!;
      const ra = diag.rayleighOutside[s]!;
      if (re > 0) tally.note(USE.outsideCrossFlow, { re, pr }, place);
      if (ra > 0) tally.note(USE.outsideNatural, { ra, pr }, place);
      if (diag.slenderOutside[s] === 1)
        tally.note(USE.outsideSlender, { grashofHeight: diag.grashofOutside[s]!, pr, height: inputs.stack.height, diameter: geometry.outerDiameter }, place);
    }
    if (inputs.flue.filmCoefficient === undefined) {
      tally.note(USE.insideTube, { re: diag.reynoldsInside[s]!, pr: diag.prandtlInside[s]! }, place);
      const ra = diag.rayleighNaturalInside[s]!;
      if (ra > 0) tally.note(USE.insideNatural, { ra, pr: diag.prandtlInside[s]! }, place);
    }
    if (inputs.flue.gasRadiation)
      tally.note(USE.gasRadiation, { temperature: diag.gasInK[s]!, pathLength: diag.pathLengthAtmM[s]!, ratio: diag.waterToCarbonDioxide[s]! }, place);
    for (let i = 0; i < n - 1; i++) {
      if (mesh.linkKind[i] !== LINK_GAP) continue;
      // (the segment's first column: with sectors, its sector 0)
      const o = s * sectors * n;
      gapConvectionInputs(mesh.linkGap[i]!, y[o + i]!, y[o + i + 1]!, gapInputs, ctx.sitePressurePa, geometry.segmentLength);
      if (gapInputs.rayleighGap > 0) tally.note(USE.gapConvection, gapConvectionRangeInputs(gapInputs), place);
    }
  }
}
