/**
 * The range checks of an instant read each segment's own wall: with sectors, the state of segment s
 * starts at s · sectors · nodes (model/system.ts), not at s · nodes.
 */
import { describe, expect, it } from 'vitest';
import { loadScenarioFile } from '../../src/input/scenario/load.ts';
import { assembleModel } from '../../src/model/assemble.ts';
import { checkCorrelationRanges } from '../../src/model/rangeChecks.ts';
import { makeSegmentDiagnostics } from '../../src/model/system.ts';
import { CorrelationRangeTally } from '../../src/physics/correlations/registry.ts';
import { LINK_GAP } from '../../src/physics/wall/mesh.ts';

describe('range checks with sectors', () => {
  it("check an air gap's convection at the segment's own temperatures", () => {
    // the benchmark wall (brick, wool, an air gap, steel), 2 segments × 2 sectors
    const base = loadScenarioFile('scenarios/bench-steel.yaml').inputs;
    const model = assembleModel({ ...base, stack: { ...base.stack, segments: 2, sectors: 2 } });
    const { mesh, system } = model;
    const n = mesh.nodeCount;
    const gap = Array.from(mesh.linkKind).indexOf(LINK_GAP);
    expect(gap).toBeGreaterThan(0);
    // an isothermal wall but for segment 1, whose gap faces differ by 40 K (in both sectors):
    // only segment 1 has convection in its gap to check
    const y = new Float64Array(system.size).fill(320);
    for (const j of [0, 1]) y[(1 * 2 + j) * n + gap] = 360;
    const diag = makeSegmentDiagnostics(2, 2);
    system.boundaries(0, y, diag);
    const tally = new CorrelationRangeTally();
    checkCorrelationRanges(model, 0, y, diag, tally);
    expect(tally.counts('nuVerticalCavityElSherbiny').checked).toBe(1);
  });
});
