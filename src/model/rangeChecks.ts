/**
 * Range checks of every correlation the model evaluated at one reported instant, through the
 * correlation registry: the roles of model/correlations.ts, with the inputs each segment (and each
 * air gap) used.
 */
import type { CorrelationRangeTally } from '../physics/correlations/registry.ts';
import { gapConvectionInputs, type GapConvectionInputs } from '../physics/wall/gap.ts';
import { LINK_GAP, type WallMesh } from '../physics/wall/mesh.ts';
import type { ModelInputs } from './inputs.ts';
import type { SegmentDiagnostics } from './system.ts';
import { CORRELATIONS_IN_USE as USE } from './correlations.ts';

const gapInputs: GapConvectionInputs = { rayleighGap: 0, pr: 0 };

/** Note every correlation evaluation of the instant with wall state `y` and boundary diagnostics `diag` in `tally`. */
export function checkCorrelationRanges(inputs: ModelInputs, mesh: WallMesh, y: Float64Array, diag: SegmentDiagnostics, segments: number, tally: CorrelationRangeTally): void {
  const n = mesh.nodeCount;
  for (let s = 0; s < segments; s++) {
    if (inputs.outside.filmCoefficient === undefined) {
      const pr = diag.prandtlOutside[s]!;
      const re = diag.reynoldsOutside[s]!;
      const ra = diag.rayleighOutside[s]!;
      if (re > 0) tally.note(USE.outsideCrossFlow, { re, pr });
      if (ra > 0) tally.note(USE.outsideNatural, { ra, pr });
      if (diag.slenderOutside[s] === 1)
        tally.note(USE.outsideSlender, { grashofHeight: diag.grashofOutside[s]!, pr, height: inputs.stack.height, diameter: 2 * mesh.outerRadius });
    }
    if (inputs.flue.filmCoefficient === undefined) tally.note(USE.insideTube, { re: diag.reynoldsInside[s]!, pr: diag.prandtlInside[s]! });
    for (let i = 0; i < n - 1; i++) {
      if (mesh.linkKind[i] !== LINK_GAP) continue;
      const gap = mesh.linkGap[i]!;
      gapConvectionInputs(gap, y[s * n + i]!, y[s * n + i + 1]!, gapInputs);
      tally.note(USE.gapConvection, { innerDiameter: 2 * gap.innerRadius, outerDiameter: 2 * gap.outerRadius, rayleighGap: gapInputs.rayleighGap, pr: gapInputs.pr });
    }
  }
}
